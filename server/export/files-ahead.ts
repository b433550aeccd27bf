import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import type { ExportContext } from '../../shared/export/export-context';
import type { MachineSettings } from '../../shared/export/machine-settings';
import { planPack, type Pack, type PackInput, type PackPanel } from '../../shared/export/pack';
import type { PanelDrilling } from '../../shared/export/panel-drilling';
import type { PaperName } from '../../shared/export/paper';
import { workerModule } from './worker-module';

/** What a panel-files worker is started with: the pack's context and options as plain data. */
export interface PanelFilesSetup {
  ctx: Omit<ExportContext, 'panelVersion'> & { panelVersions: Record<string, number | undefined> };
  paper: PaperName;
  machine?: MachineSettings;
}
/** A panel to make every file of. */
export interface PanelTask {
  drilling: PanelDrilling;
  base: string;
}

/**
 * Threads to make a pack's files with where the pack has the machine to itself: a second one only where a
 * core is left over besides. On two cores V8's own threads (garbage collection, compiling) already use the
 * second core while one thread packs, and a second packing thread measured no faster, with 4 s more CPU
 * and 120 to 150 MB more memory (`npm run bench:pack`).
 */
export function packThreads(): number {
  return Math.max(1, Math.min(2, availableParallelism() - 1));
}

/**
 * Plans the bench pack of `input` (planPack) to be made by `threads` threads: this one, which makes the
 * sheets, the lists and whichever panel the zip writer reaches first, and `threads - 1` worker threads
 * that make panels' files ahead of the writer, at most two panels a thread ahead. The files, their order
 * and so the zip and the manifest are the same whatever the threads. With one thread it is planPack.
 */
export function planPackAhead(input: PackInput, threads: number): Pack {
  if (threads <= 1) return planPack(input);
  const ahead = new FilesAhead(input, threads - 1, 2 * threads);
  const pack = planPack({ ...input, made: (path) => ahead.made(path) });
  ahead.plan(pack.panels ?? []);
  return { ...pack, close: () => ahead.close() };
}

/** Panels' files made in worker threads, in the order the zip writer will ask for them. */
class FilesAhead {
  private panels: PackPanel[] = [];
  private readonly panelOf = new Map<string, number>();
  /** The files of panels sent to a helper and not yet all taken, by panel and path. */
  private readonly waiting = new Map<number, Map<string, Promise<Uint8Array>>>();
  private pool: Piscina | undefined;
  private busy = 0;
  /** The panel the writer is on, and the first panel not yet sent to a helper nor reached by the writer. */
  private writer = -1;
  private next = 0;
  private closed = false;

  constructor(
    private readonly input: PackInput,
    private readonly count: number,
    private readonly window: number,
  ) {}

  plan(panels: PackPanel[]): void {
    this.panels = panels;
    panels.forEach((p, i) => p.paths.forEach((path) => this.panelOf.set(path, i)));
  }

  /**
   * A file's bytes made by a helper, or undefined for this thread to make it: not a panel's, a panel of its
   * own share, or one the writer reached before a helper was free to take it.
   */
  made(path: string): Promise<Uint8Array> | undefined {
    const panel = this.panelOf.get(path);
    if (panel === undefined) {
      this.pump();
      return undefined;
    }
    this.writer = panel;
    if (panel >= this.next) this.next = panel + 1;
    const files = this.waiting.get(panel);
    const bytes = files?.get(path);
    if (files && bytes) {
      files.delete(path);
      if (files.size === 0) this.waiting.delete(panel);
    }
    this.pump();
    return bytes;
  }

  /** Sends the next panels to idle helpers, while they stay within the window ahead of the writer. */
  private pump(): void {
    if (this.closed) return;
    for (; this.busy < this.count && this.next < this.panels.length && this.next <= this.writer + this.window; this.next++) {
      // Every `threads`th panel is this thread's own to make when the writer reaches it: it has the zip to
      // write besides, so it takes its share of the panels between the sheets' and the zip's work.
      if (this.next % (this.count + 1) !== 0) this.send(this.next);
    }
    if (this.next >= this.panels.length && this.busy === 0) this.close();
  }

  private send(id: number): void {
    const { drilling, base, paths } = this.panels[id];
    this.pool ??= this.start();
    this.busy++;
    const task: PanelTask = { drilling, base };
    const all = (this.pool.run(task) as Promise<Uint8Array[]>).finally(() => {
      this.busy--;
      this.pump();
    });
    const files = new Map(paths.map((path, i) => [path, all.then((made) => made[i])]));
    // The writer hears of a failure when it asks for the file; until then it is no unhandled rejection.
    for (const file of files.values()) file.catch(() => undefined);
    this.waiting.set(id, files);
  }

  private start(): Piscina {
    const { ctx, paper, machine } = this.input;
    const { panelVersion, ...plain } = ctx;
    const workerData: PanelFilesSetup = {
      ctx: { ...plain, panelVersions: Object.fromEntries(ctx.job.panels.map((p) => [p.id, panelVersion?.(p.id)])) },
      paper,
      ...(machine ? { machine } : {}),
    };
    const { filename, execArgv } = workerModule('panel-files-worker', import.meta.url);
    const pool = new Piscina({ filename, execArgv, workerData, minThreads: this.count, maxThreads: this.count, concurrentTasksPerWorker: 1 });
    // A worker that fails outside a task fails the task it was given: the writer hears of it from the file.
    pool.on('error', () => undefined);
    return pool;
  }

  /** Ends the helpers: all panels are made, or the zip is done or stopped. */
  close(): void {
    if (this.closed) return;
    this.closed = true;
    // Tasks still running fail, and no one waits for them any more.
    void this.pool?.destroy().catch(() => undefined);
  }
}
