import JSZip from 'jszip';
import { Readable } from 'node:stream';
import type { Pack, PackFile } from '../../shared/export/pack';

/**
 * A stream that makes its file only when the zip writer reaches it: the zip writer pauses every input
 * stream until its turn, so only the file being written is in memory.
 */
function lazyFile(file: PackFile): Readable {
  return Readable.from(
    (async function* () {
      yield Buffer.from(await file.bytes());
    })(),
    { objectMode: false },
  );
}

/**
 * The pack as a zip, streamed: each file is made when its turn comes, written with a data descriptor
 * (`streamFiles`) so that no file's size is needed up front, compressed unless it is a PDF (compressed
 * already). Pipe it to a response or a file; an error in making a file is an error of the stream. The
 * pack is closed when the stream ends, fails or is destroyed.
 */
export function packZipStream(pack: Pack, date: Date): NodeJS.ReadableStream {
  const zip = new JSZip();
  for (const file of pack.files) {
    // No folder entries: every file carries its folders in its path, and the zip stays the same from run to run.
    zip.file(file.path, lazyFile(file), { binary: true, date, createFolders: false, compression: file.compress ? 'DEFLATE' : 'STORE' });
  }
  const stream = zip.generateNodeStream({ type: 'nodebuffer', streamFiles: true, compression: 'DEFLATE', compressionOptions: { level: 6 } });
  // Whatever makes files ahead (planPackAhead's worker threads) ends with the zip, however it ends.
  if (pack.close) for (const event of ['end', 'error', 'close']) stream.once(event, pack.close);
  return stream;
}
