import { existsSync, readFileSync } from 'node:fs';
import { SourceMap } from 'node:module';
import { join } from 'node:path';

/** A CPU profile as Chromium's Profiler.stop gives it. */
export interface CpuProfile {
  nodes: { id: number; callFrame: { functionName: string; url: string; lineNumber: number; columnNumber: number }; children?: number[] }[];
  samples: number[];
  timeDeltas: number[];
}

/** Where the app's bundles are, with their source maps when the build made them (`ng build --source-map`). */
const BUILT = join(process.cwd(), 'dist/borewright/browser');

const maps = new Map<string, SourceMap | undefined>();

function sourceMapOf(url: string): SourceMap | undefined {
  const file = url.split('/').pop() ?? '';
  if (!maps.has(file)) {
    const path = join(BUILT, `${file}.map`);
    maps.set(file, file && existsSync(path) ? new SourceMap(JSON.parse(readFileSync(path, 'utf8'))) : undefined);
  }
  return maps.get(file);
}

/** A frame's source file and function, through the bundle's source map where there is one. */
function placeOf(frame: CpuProfile['nodes'][number]['callFrame']): { file: string; fn: string } {
  const bundle = frame.url.split('/').pop() ?? '';
  const fn = frame.functionName || '(anonymous)';
  if (!bundle) return { file: '(browser)', fn };
  const entry = sourceMapOf(frame.url)?.findEntry(frame.lineNumber, frame.columnNumber);
  if (!entry || !('originalSource' in entry)) return { file: bundle, fn: `${fn} ${bundle}:${frame.lineNumber + 1}:${frame.columnNumber + 1}` };
  const file = entry.originalSource.replace(/^.*node_modules\//, '').replace(/^.*?\/(src|shared)\//, '$1/');
  return { file, fn: `${(entry as { name?: string }).name ?? fn} ${file}:${entry.originalLine + 1}` };
}

/** What a sample's self time is put down to: the library or the app's folder it ran in. */
function areaOf(file: string): string {
  if (file.startsWith('src/') || file.startsWith('shared/')) return file.split('/').slice(0, 4).join('/');
  return file.startsWith('@') ? file.split('/').slice(0, 2).join('/') : file.split('/')[0];
}

function lines(totals: Map<string, number>, busy: number, count: number, moves: number): string[] {
  return [...totals]
    .sort((a, b) => b[1] - a[1])
    .slice(0, count)
    .map(([key, t]) => `${((100 * t) / busy).toFixed(1).padStart(5)} %  ${(t / 1000 / moves).toFixed(2).padStart(5)} ms a move  ${key}`);
}

/**
 * Self time of a profile by area (library or app folder) and by function, as a share of the busy
 * samples and in ms a pointer move; idle left out. "(program)" is the browser's own work outside script
 * (input, style, layout, paint), "(garbage collector)" the script's garbage.
 */
export function profileSummary(profile: CpuProfile, moves: number, count = 15): string[] {
  const places = new Map(profile.nodes.map((n) => [n.id, placeOf(n.callFrame)]));
  const byArea = new Map<string, number>();
  const byFunction = new Map<string, number>();
  let busy = 0;
  profile.samples.forEach((id, i) => {
    const place = places.get(id)!;
    const t = profile.timeDeltas[i] ?? 0;
    if (place.fn === '(idle)') return;
    busy += t;
    const area = place.file === '(browser)' ? place.fn : areaOf(place.file);
    byArea.set(area, (byArea.get(area) ?? 0) + t);
    byFunction.set(place.fn, (byFunction.get(place.fn) ?? 0) + t);
  });
  return [
    `busy ${(busy / 1000 / moves).toFixed(2)} ms a move in the profile; self time by area:`,
    ...lines(byArea, busy, count, moves).map((l) => `  ${l}`),
    'by function:',
    ...lines(byFunction, busy, count, moves).map((l) => `  ${l}`),
  ];
}

/** A trace event of Chromium's tracing, as Tracing's data gives it. */
export interface TraceEvent {
  name: string;
  ph: string;
  ts: number;
  dur?: number;
  pid: number;
  tid: number;
  args?: { name?: string };
}

/**
 * Self time of the page's main thread by trace event (RunTask, EventDispatch, Paint, Layout, FunctionCall
 * …), ms a pointer move: what the browser did around the script, which a CPU profile lumps as "(program)".
 */
export function traceSummary(events: TraceEvent[], moves: number, count = 15): string[] {
  const main = events.find((e) => e.ph === 'M' && e.name === 'thread_name' && e.args?.name === 'CrRendererMain');
  if (!main) return ['no main thread in the trace'];
  const complete = events.filter((e) => e.pid === main.pid && e.tid === main.tid && e.ph === 'X' && e.dur !== undefined).sort((a, b) => a.ts - b.ts || b.dur! - a.dur!);
  const self = new Map<string, number>();
  const open: { end: number; name: string }[] = [];
  let top = 0;
  for (const e of complete) {
    while (open.length > 0 && open.at(-1)!.end <= e.ts) open.pop();
    const parent = open.at(-1);
    if (parent) self.set(parent.name, (self.get(parent.name) ?? 0) - e.dur!);
    else top += e.dur!;
    self.set(e.name, (self.get(e.name) ?? 0) + e.dur!);
    open.push({ end: e.ts + e.dur!, name: e.name });
  }
  return [`main thread busy ${(top / 1000 / moves).toFixed(2)} ms a move in the trace; self time by event:`, ...lines(self, top, count, moves).map((l) => `  ${l}`)];
}
