import { crc32, deflateSync } from 'node:zlib';
import jpeg from 'jpeg-js';
import { PDFDocument } from 'pdf-lib';

// Real files of the types attachments take, made by their specification or a known encoder, for upload tests.

/**
 * A 1 × 1 red PNG written from the PNG specification (W3C PNG Recommendation, 3rd edition, §5.2 signature,
 * §5.3 chunk layout with its CRC-32, §11.2.1 IHDR, §11.2.4 IDAT as a zlib stream of filtered scanlines).
 */
export function minimalPng(): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
    const out = Buffer.alloc(12 + data.length);
    out.writeUInt32BE(data.length, 0);
    body.copy(out, 4);
    out.writeUInt32BE(crc32(body), 8 + data.length);
    return out;
  };
  // width 1, height 1, bit depth 8, colour type 2 (truecolour), deflate, adaptive filtering, no interlace
  const ihdr = Buffer.from([0, 0, 0, 1, 0, 0, 0, 1, 8, 2, 0, 0, 0]);
  const scanline = Buffer.from([0, 255, 0, 0]); // filter type 0, then one RGB pixel
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk('IHDR', ihdr), chunk('IDAT', deflateSync(scanline)), chunk('IEND', Buffer.alloc(0))]);
}

/** A 2 × 2 JPEG encoded by jpeg-js (npm registry). */
export function smallJpeg(): Buffer {
  return Buffer.from(jpeg.encode({ data: Buffer.alloc(2 * 2 * 4, 200), width: 2, height: 2 }, 80).data);
}

/** A one-page PDF written by pdf-lib (npm registry). */
export async function smallPdf(): Promise<Buffer> {
  const doc = await PDFDocument.create();
  doc.addPage([595.28, 841.89]);
  return Buffer.from(await doc.save());
}
