// The five files of every panel of a pack agree hole for hole, each read by a general-purpose reader of its
// format from npm: the DXF by dxf-parser, the template sheets by pdfjs-dist (Mozilla's PDF reader), the SVG
// maps by jsdom's XML parser, the hole schedule by papaparse and the drilling programs by gcode-parser
// (gcode-reader.ts), which agree on the holes of each face and edge. Nothing here reads our own hole list.
import DxfParser from 'dxf-parser';
import Papa from 'papaparse';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { describe, expect, it } from 'vitest';
import { packTools } from '../../server/export/export-platform';
import { DEMO_JOBS } from '../../server/demo/seed-demo';
import { generateJob } from '../../shared/bench/generate-job';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import type { PackManifest } from '../../shared/export/manifest';
import { DEFAULT_MACHINE_SETTINGS } from '../../shared/export/machine-settings';
import { planPack } from '../../shared/export/pack';
import type { JobDocument, Panel } from '../../shared/model/job-document';
import { parseJobDocument } from '../../shared/model/parse-job';
import { readPdfPage } from '../../shared/testing/pdf-page';
import { readProgram } from './gcode-reader';

const tools = await packTools();
const PT = 72 / 25.4;
/** How far an edge strip lies from the outline on a drawing, mm (map-panel.ts): the strip is read back from it. */
const STRIP_GAP = 6;

/** A hole as any file can state it: face or edge, position to 0.01 mm, diameter and depth (or THRU). */
type Hole = string;
const r2 = (v: number) => (Math.round(v * 100) / 100).toFixed(2);
const faceHole = (face: string, x: number, y: number, d: number, depth: string) => `${face} ${r2(x)} ${r2(y)} Ø${r2(d)} ${depth}`;
const edgeHole = (edge: string, at: number, z: number, d: number, depth: string) => `${edge} at ${r2(at)} z ${r2(z)} Ø${r2(d)} ${depth}`;
const deep = (depth: number | string) => (depth === 'THRU' ? 'THRU' : r2(Number(depth)));
/** A hole without its depth: what a drawing shows by position, for the PDF whose depths come from its bore table. */
const placeOf = (hole: Hole) => hole.split(' ').slice(0, -1).join(' ');

// jsdom ships no types of its own; its XML parser is used through this little interface.
interface XmlElement {
  getAttribute(name: string): string | null;
  textContent: string | null;
  getElementsByTagName(name: string): ArrayLike<XmlElement> & Iterable<XmlElement>;
}
const jsdomModule = 'jsdom';
const { JSDOM } = (await import(jsdomModule)) as { JSDOM: new (html: string) => { window: { DOMParser: new () => { parseFromString(text: string, type: string): { documentElement: XmlElement } } } } };
const xml = new new JSDOM('').window.DOMParser();

/** Where a drawing says the reference edge lies: the one words every map and template page carries. */
function referenceAtIn(text: string): 'left' | 'right' {
  const said = /reference edge \(x = 0\) at the (left|right)/.exec(text);
  expect(said, 'a drawing that says where its reference edge is').not.toBeNull();
  return said![1] as 'left' | 'right';
}

/**
 * Where a point of a drawing lies in the panel's frame, from the outline's top left corner (ox, oy) on it and
 * the side of the sheet the drawing says the reference edge is on.
 */
function fromDrawing(panel: Panel, face: string, referenceAt: 'left' | 'right', ox: number, oy: number, cx: number, cy: number, r: number): { face: string; x: number; y: number } | { edge: string; at: number; z: number } {
  const { width: W, height: H } = panel;
  const u = cx - ox;
  const v = cy - oy;
  const x = referenceAt === 'left' ? u : W - u;
  const [leftEdge, rightEdge] = referenceAt === 'left' ? ['x0', 'x1'] : ['x1', 'x0'];
  // Outside the outline: an edge strip, face A's side next to the panel, z running away from it.
  if (u < -r + 0.001 && v > 0 && v < H) return { edge: leftEdge, at: H - v, z: -u - STRIP_GAP };
  if (u > W + r - 0.001 && v > 0 && v < H) return { edge: rightEdge, at: H - v, z: u - W - STRIP_GAP };
  if (v < -r + 0.001) return { edge: 'y1', at: x, z: -v - STRIP_GAP };
  if (v > H + r - 0.001) return { edge: 'y0', at: x, z: v - H - STRIP_GAP };
  return { face, x, y: H - v };
}

/** The SVG maps: each circle of a hole mark with its centre, its radius and the depth its label gives. */
function svgHoles(panel: Panel, files: Map<string, Uint8Array>, paths: string[]): Hole[] {
  const holes: Hole[] = [];
  for (const path of paths.filter((p) => p.endsWith('.svg'))) {
    const face = / face (A|B)\.svg$/.exec(path)![1];
    const doc = xml.parseFromString(new TextDecoder().decode(files.get(path)), 'image/svg+xml');
    const outline = [...doc.documentElement.getElementsByTagName('rect')].find((r) => Number(r.getAttribute('width')) === panel.width && Number(r.getAttribute('height')) === panel.height)!;
    const [ox, oy] = [Number(outline.getAttribute('x')), Number(outline.getAttribute('y'))];
    const referenceAt = referenceAtIn([...doc.documentElement.getElementsByTagName('text')].map((t) => t.textContent).join(' '));
    for (const g of [...doc.documentElement.getElementsByTagName('g')].filter((g) => g.getAttribute('data-hole') !== null)) {
      const circle = g.getElementsByTagName('circle')[0];
      const label = g.getElementsByTagName('text')[0].textContent!;
      const depth = / THRU$/.test(label) ? 'THRU' : deep(label.slice(1));
      const r = Number(circle.getAttribute('r'));
      const at = fromDrawing(panel, face, referenceAt, ox, oy, Number(circle.getAttribute('cx')), Number(circle.getAttribute('cy')), r);
      holes.push('edge' in at ? edgeHole(at.edge, at.at, at.z, 2 * r, depth) : faceHole(at.face, at.x, at.y, 2 * r, depth));
    }
  }
  return holes;
}

/**
 * The DXF: each face hole a CIRCLE, each edge hole a rectangle with its words; face and depth from the layer
 * name. The reference edge is the line on its own layer: at x = 0 of the drawing, or at the panel's width
 * when the face is drawn with it on the right, x then reading leftward from it.
 */
function dxfHoles(panel: Panel, text: string): Hole[] {
  const { entities } = new DxfParser().parseSync(text) as unknown as { entities: { type: string; layer: string; center?: { x: number; y: number }; radius?: number; vertices?: { x: number; y: number }[]; text?: string }[] };
  const reference = entities.find((e) => e.layer === 'REFERENCE_EDGE' && e.type === 'LINE') as unknown as { vertices: { x: number }[] };
  const onRight = Math.abs(reference.vertices[0].x - panel.width) < 0.001;
  expect(onRight || Math.abs(reference.vertices[0].x) < 0.001, `${panel.id}: the DXF's reference edge on an edge of the outline`).toBe(true);
  const fromX = (x: number) => (onRight ? panel.width - x : x);
  const holes: Hole[] = [];
  for (const e of entities) {
    const layer = /^(FACE_(A|B)|EDGE_(X0|X1|Y0|Y1))-DIA_([\d.]+)-(DEPTH_([\d.]+)|THROUGH)-[A-Z_]+$/.exec(e.layer);
    if (!layer) continue;
    const depth = layer[6] === undefined ? 'THRU' : deep(layer[6]);
    if (e.type === 'CIRCLE') holes.push(faceHole(layer[2], fromX(e.center!.x), e.center!.y, 2 * e.radius!, depth));
    if (e.type === 'LWPOLYLINE') {
      const xs = e.vertices!.map((v) => fromX(v.x));
      const ys = e.vertices!.map((v) => v.y);
      const edge = layer[3].toLowerCase();
      const along = edge === 'x0' || edge === 'x1' ? (Math.min(...ys) + Math.max(...ys)) / 2 : (Math.min(...xs) + Math.max(...xs)) / 2;
      const diameter = edge === 'x0' || edge === 'x1' ? Math.max(...ys) - Math.min(...ys) : Math.max(...xs) - Math.min(...xs);
      const words = entities.find((w) => w.type === 'TEXT' && w.layer === e.layer && w.text!.startsWith(`${layer[3]} AT ${r2(along).replace(/\.?0+$/, '')} `))!.text!;
      const z = Number(/ H ([\d.]+) FROM FACE A/.exec(words)![1]);
      holes.push(edgeHole(edge, along, z, diameter, depth));
    }
  }
  return holes;
}

/** The hole schedule's rows of one panel. */
function csvHoles(rows: Record<string, string>[], panel: Panel): Hole[] {
  return rows
    .filter((r) => r.panel === panel.id)
    .map((r) => {
      const depth = r.through === 'yes' ? 'THRU' : deep(r.depth);
      if (r['face or edge'] === 'A' || r['face or edge'] === 'B') return faceHole(r['face or edge'], Number(r.x), Number(r.y), Number(r.diameter), depth);
      const edge = r['face or edge'].replace('edge ', '');
      const at = edge === 'x0' || edge === 'x1' ? Number(r.y) : Number(r.x);
      return edgeHole(edge, at, Number(r['z from face A']), Number(r.diameter), depth);
    });
}

/**
 * The template sheets: per map, the holes the figure draws (the curved paths, circles, read on its first tiled
 * page, where the whole figure is painted and clipped) and the bore table of its information sheet, which
 * gives each way of drilling (where, diameter, depth) with its count.
 */
async function pdfHoles(panel: Panel, bytes: Uint8Array): Promise<{ drawn: string[]; table: string[] }> {
  const doc = await getDocument({ data: bytes.slice(), disableFontFace: true, useSystemFonts: false }).promise;
  const drawn: string[] = [];
  const table: string[] = [];
  let face = '';
  let tiled = false;
  for (let n = 1; n <= doc.numPages; n++) {
    const items = (await (await doc.getPage(n)).getTextContent()).items.filter((i) => 'str' in i && i.str.trim() !== '') as { str: string; transform: number[] }[];
    const text = items.map((i) => i.str).join('\n');
    const info = /Template sheets, face (A|B): read this sheet first/.exec(text);
    if (info) {
      [face, tiled] = [info[1], false];
      // The bore table: rows of Key, Ø, Depth, Drilled from, Count, For, between its header and the legend.
      const start = items.findIndex((i) => i.str === 'Drilled from');
      const end = items.findIndex((i) => i.str === 'Legend');
      const rows = new Map<number, { x: number; str: string }[]>();
      for (const item of items.slice(start + 3, end)) {
        const y = Math.round(item.transform[5]);
        rows.set(y, [...(rows.get(y) ?? []), { x: item.transform[4], str: item.str }]);
      }
      for (const cells of rows.values()) {
        const [, diameter, depth, where, count] = cells.sort((a, b) => a.x - b.x).map((c) => c.str);
        if (where === undefined || count === undefined || Number.isNaN(Number(count))) continue;
        const edge = /^edge (x0|x1|y0|y1), ([\d.]+) from face A$/.exec(where);
        const at = edge ? `${edge[1]} z ${r2(Number(edge[2]))}` : where.replace('face ', '');
        for (let k = 0; k < Number(count); k++) table.push(`${at} Ø${r2(Number(diameter))} ${deep(depth)}`);
      }
      continue;
    }
    if (tiled || !/Row 1 of \d+, column 1 of \d+;/.test(text)) continue;
    tiled = true;
    const referenceAt = referenceAtIn(text);
    const { paths, heightPt } = await readPdfPage(bytes, n);
    const outline = paths.find((p) => !p.curved && Math.abs(p.x1 - p.x0 - panel.width * PT) < 0.01 && Math.abs(p.y1 - p.y0 - panel.height * PT) < 0.01)!;
    expect(outline, `${panel.id}: the outline on page ${n}`).toBeDefined();
    const [ox, oy] = [outline.x0 / PT, (heightPt - outline.y1) / PT];
    for (const c of paths.filter((p) => p.curved)) {
      const r = (c.x1 - c.x0) / PT / 2;
      const at = fromDrawing(panel, face, referenceAt, ox, oy, (c.x0 + c.x1) / 2 / PT, (heightPt - (c.y0 + c.y1) / 2) / PT, r);
      drawn.push('edge' in at ? `${at.edge} at ${r2(at.at)} z ${r2(at.z)} Ø${r2(2 * r)}` : `${at.face} ${r2(at.x)} ${r2(at.y)} Ø${r2(2 * r)}`);
    }
  }
  return { drawn, table };
}

/** How a hole appears in a bore table: where it is drilled from (with an edge hole's height from face A), its bit and its depth. */
function tableEntry(hole: Hole): string {
  const parts = hole.split(' ');
  return parts[1] === 'at' ? `${parts[0]} z ${parts[4]} ${parts[5]} ${parts[6]}` : `${parts[0]} ${parts[3]} ${parts[4]}`;
}

const sorted = (list: readonly string[]) => [...list].sort();

/** The drilling programs: per face or edge (`face-a`, `edge-x0` …), the holes each drills and the holes its header names as left out. */
function programHoles(files: Map<string, Uint8Array>, paths: string[]): Map<string, { drilled: number; named: number }> {
  const sides = new Map<string, { drilled: number; named: number }>();
  for (const path of paths.filter((p) => p.endsWith('.nc'))) {
    // Any surface height will do for counting; the read-back test checks the heights.
    const read = readProgram(new TextDecoder().decode(files.get(path)), -1000);
    const named = read.comments.filter((c) => /^\s*\S+: (no tool|a through hole)/.test(c)).length;
    sides.set(/\.([a-z0-9-]+)\.nc$/.exec(path)![1], { drilled: read.drilled.length, named });
  }
  return sides;
}

/** Where the hole schedule says a hole is drilled from, as a program's file names it. */
const sideOfHole = (hole: Hole) => (hole.split(' ')[1] === 'at' ? `edge-${hole.split(' ')[0]}` : `face-${hole.split(' ')[0].toLowerCase()}`);

/** Makes the pack of a job, with drilling programs by the default machine settings, and checks every panel's five files against each other. */
async function expectAgreement(job: JobDocument): Promise<number> {
  const machine = DEFAULT_MACHINE_SETTINGS;
  const pack = planPack({ ctx: { job, catalog: builtinCatalog(), date: new Date('2026-03-14T09:30:00Z'), generator: { name: 'Borewright', version: '0.0.0-test' } }, paper: 'a4', machine, ...tools });
  const files = new Map<string, Uint8Array>();
  for (const file of pack.files) files.set(file.path.slice(pack.root.length + 1), await file.bytes());
  const manifest = JSON.parse(new TextDecoder().decode(files.get('manifest.json'))) as PackManifest;
  const schedule = Papa.parse<Record<string, string>>(new TextDecoder().decode(files.get('hole schedule.csv')), { header: true, skipEmptyLines: true });
  expect(schedule.errors).toEqual([]);
  let holes = 0;
  for (const entry of manifest.panels) {
    const panel = job.panels.find((p) => p.id === entry.id)!;
    const dxf = entry.files.find((p) => p.endsWith('.dxf'))!;
    const pdf = entry.files.find((p) => p.endsWith('.pdf'))!;
    const fromCsv = sorted(csvHoles(schedule.data, panel));
    const fromDxf = sorted(dxfHoles(panel, new TextDecoder().decode(files.get(dxf))));
    const fromSvg = sorted(svgHoles(panel, files, entry.files));
    const fromPdf = await pdfHoles(panel, files.get(pdf)!);
    expect(fromDxf, `${panel.id}: DXF against the hole schedule`).toEqual(fromCsv);
    expect(fromSvg, `${panel.id}: SVG maps against the hole schedule`).toEqual(fromCsv);
    expect(sorted(fromPdf.drawn), `${panel.id}: template drawing against the hole schedule`).toEqual(sorted(fromCsv.map(placeOf)));
    expect(sorted(fromPdf.table), `${panel.id}: template bore table against the hole schedule`).toEqual(sorted(fromCsv.map(tableEntry)));
    // No hole twice: one bore drilled once, whoever needs it.
    expect(new Set(fromCsv).size, `${panel.id}: a hole listed twice`).toBe(fromCsv.length);
    expect(entry.holes).toBe(fromCsv.length);
    // The programs: one per face and edge with holes, each drilling or naming every hole of its side once.
    const programs = programHoles(files, entry.files);
    const bySide = new Map<string, number>();
    for (const hole of fromCsv) bySide.set(sideOfHole(hole), (bySide.get(sideOfHole(hole)) ?? 0) + 1);
    expect(sorted([...programs.keys()]), `${panel.id}: a program per face and edge with holes`).toEqual(sorted([...bySide.keys()]));
    for (const [side, count] of bySide) expect(programs.get(side)!.drilled + programs.get(side)!.named, `${panel.id} ${side}: holes drilled or named by its program`).toBe(count);
    expect(entry.notDrilled!.length).toBe([...programs.values()].reduce((sum, p) => sum + p.named, 0));
    holes += fromCsv.length;
  }
  return holes;
}

describe('one truth across the bench pack: every panel’s DXF, template sheets, SVG maps, hole schedule and drilling programs agree', () => {
  for (const input of DEMO_JOBS) {
    it(`on every panel of the demo job ${input.name}`, async () => {
      const parsed = parseJobDocument(input);
      if (!parsed.ok) throw new Error(parsed.errors.join('; '));
      expect(await expectAgreement(parsed.value)).toBeGreaterThan(100);
    }, 120_000);
  }

  it('on every panel of the 300-panel bench job, whose plate and pin screws share line-bored holes', async () => {
    const job = generateJob(100);
    expect(job.panels).toHaveLength(300);
    // Each side's 66 system holes (3 rows of 22) take its plate, pin and runner screws; the door's cups and handle holes are its own.
    const holes = await expectAgreement(job);
    expect(holes).toBeGreaterThan(300 * 20);
  }, 900_000);
});
