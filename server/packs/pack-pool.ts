import { availableParallelism } from 'node:os';
import { Readable } from 'node:stream';
import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import { workerModule } from '../export/worker-module';
import type { Logger } from '../logger';
import type { PackMessage, PackOrder, PackProgress } from './pack-order';

/** What a pack being made gives: its name and error count once checked, the zip as a stream. */
export interface PackInMaking {
  planned: Promise<{ root: string; errors: number }>;
  zip: Readable;
}

/**
 * Bench packs made in worker threads (piscina), so that a request thread answers everyone else while a
 * pack of hundreds of panels is drawn, checked and zipped. One thread less than the machine has (one to
 * two), started when a pack is asked for and ended after a minute without one.
 */
export class PackPool {
  private readonly pool: Piscina;

  constructor(logger: Logger, threads = Math.max(1, Math.min(2, availableParallelism() - 1))) {
    const { filename, execArgv } = workerModule('pack-worker', import.meta.url);
    this.pool = new Piscina({ filename, execArgv, minThreads: 0, maxThreads: threads, idleTimeout: 60_000 });
    // A worker that fails outside a task (its module does not load, say): the task waiting on it fails too.
    this.pool.on('error', (err: unknown) => logger.error({ err }, 'a pack worker failed'));
  }

  /**
   * Makes the pack of `order` in a worker; the zip streams back as the reader takes it (the worker waits
   * for a slow reader), and destroying the stream stops the worker's task. `onProgress` hears each panel
   * the worker reaches.
   */
  make(order: PackOrder, onProgress?: (progress: PackProgress) => void): PackInMaking {
    const { port1: port, port2: workerPort } = new MessageChannel();
    let owed = 0;
    let ended = false;
    let settle!: { resolve: (planned: { root: string; errors: number }) => void; reject: (err: unknown) => void };
    const planned = new Promise<{ root: string; errors: number }>((resolve, reject) => (settle = { resolve, reject }));
    const zip = new Readable({
      read() {
        for (; owed > 0; owed--) port.postMessage('more');
      },
      destroy(err, callback) {
        if (!ended) port.postMessage('cancel');
        port.close();
        callback(err);
      },
    });
    port.on('message', (message: PackMessage) => {
      if (message.type === 'planned') settle.resolve({ root: message.root, errors: message.errors });
      else if (message.type === 'progress') onProgress?.(message.progress);
      else if (message.type === 'chunk') {
        if (zip.push(Buffer.from(message.bytes.buffer, message.bytes.byteOffset, message.bytes.byteLength))) port.postMessage('more');
        else owed++;
      } else {
        ended = true;
        zip.push(null);
      }
    });
    this.pool.run({ order, port: workerPort }, { transferList: [workerPort] }).catch((err: unknown) => {
      settle.reject(err);
      zip.destroy(err as Error);
    });
    // Whoever reads the zip hears of a failure through it (pipeline, for-await); these listeners only keep a
    // failure before anyone reads from ending the process as unhandled.
    planned.catch(() => undefined);
    zip.on('error', () => undefined);
    return { planned, zip };
  }

  /** Ends the worker threads; packs still being made fail. */
  close(): Promise<void> {
    return this.pool.destroy();
  }
}
