import { constants, setPriority } from 'node:os';
import type { MessagePort } from 'node:worker_threads';
import { GENERATOR, packTools } from '../export/export-platform';
import { planPackAhead } from '../export/files-ahead';
import { packZipStream } from '../export/pack-zip';
import type { PackMessage, PackOrder } from './pack-order';

// On Linux each thread has its own niceness, and 0 names the calling thread: a pack gives way to the
// thread that answers requests when the cores are busy. Elsewhere 0 names the whole process, so not there.
if (process.platform === 'linux') setPriority(0, constants.priority.PRIORITY_LOW);

/**
 * Threads that make one pack's files: this one alone. The pool already gives packs all cores but the one
 * that answers requests; a second thread per pack would take that core from them.
 */
const THREADS = 1;

/** Chunks of the zip sent and not yet taken by the response: the worker waits beyond this many. */
const WINDOW = 8;

/**
 * A pack worker's task (pack-pool.ts): makes the bench pack of `order` and sends the zip through `port`,
 * chunk by chunk as the response takes them, telling which panel it has reached. "cancel" on the port
 * (the download was stopped) ends the task without finishing the zip.
 */
export default async function makePack({ order, port }: { order: PackOrder; port: MessagePort }): Promise<void> {
  const send = (message: PackMessage, transfer: ArrayBuffer[] = []) => port.postMessage(message, transfer);
  const { labelLinks } = order;
  const panels = new Set<string>();
  const pack = planPackAhead(
    {
      ctx: { job: order.job, catalog: order.catalog, date: order.date, generator: GENERATOR, panelVersion: (id) => order.panelVersions[id], unit: order.unit },
      paper: order.paper,
      ...(labelLinks ? { labelLink: (panel) => labelLinks[panel.id] } : {}),
      ...(order.machine ? { machine: order.machine } : {}),
      ...(await packTools()),
      onProgress: (_done, _total, _label, panel) => {
        if (panel === undefined || panels.has(panel)) return;
        panels.add(panel);
        send({ type: 'progress', progress: { panel: panels.size, panels: order.job.panels.length } });
      },
    },
    THREADS,
  );
  send({ type: 'planned', root: pack.root, errors: pack.errors });
  const zip = packZipStream(pack, order.date);
  try {
    await new Promise<void>((resolve, reject) => {
      let unanswered = 0;
      port.on('message', (message: 'more' | 'cancel') => {
        if (message === 'cancel') {
          zip.pause();
          pack.close?.();
          resolve();
        } else if (--unanswered < WINDOW) zip.resume();
      });
      zip.on('data', (chunk: Buffer) => {
        // A copy of its own, handed over rather than copied again: the chunk may share a pooled buffer.
        const bytes = new Uint8Array(chunk);
        send({ type: 'chunk', bytes }, [bytes.buffer as ArrayBuffer]);
        if (++unanswered >= WINDOW) zip.pause();
      });
      zip.on('end', () => {
        send({ type: 'end' });
        resolve();
      });
      zip.on('error', reject);
    });
  } finally {
    port.close();
  }
}
