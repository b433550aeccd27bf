import { createSVGWindow } from 'svgdom';
import { describe, expect, it } from 'vitest';
import type { PanelFaceBore } from '../layout/bore';
import { exportContext, exportJob } from '../testing/export-job';
import { panelDrillingMaps } from './drilling-map';
import type { FaceHole } from './map-view';
import { jobDrilling } from './panel-drilling';
import { drawingToSvg } from './svg-render';

const ctx = exportContext(exportJob({ name: '<script>alert("job")</script> & Co' }));
const drilling = jobDrilling(ctx.job, ctx.catalog, [])[0];
const side = drilling.panel;
const holes = drilling.holes;
const [faceA, faceB] = panelDrillingMaps(ctx, drilling).map((map) => drawingToSvg(map, createSVGWindow()));

/** The little of the DOM these checks read; the project's type checks carry no DOM types. */
interface XmlElement {
  getAttribute(name: string): string | null;
  hasAttribute(name: string): boolean;
  textContent: string | null;
  getElementsByTagName(name: string): ArrayLike<XmlElement> & Iterable<XmlElement>;
}
interface XmlDocument {
  documentElement: XmlElement;
  getElementsByTagName(name: string): ArrayLike<XmlElement> & Iterable<XmlElement>;
}
interface Jsdom {
  JSDOM: new (html: string) => { window: { DOMParser: new () => { parseFromString(text: string, type: string): XmlDocument } } };
}

// jsdom ships no types of its own; its parser is used through the interfaces above.
const jsdomModule = 'jsdom';
const { JSDOM } = (await import(jsdomModule)) as Jsdom;

/** Parses an SVG file with jsdom's XML parser: an outside reader, not the svgdom that wrote it. */
function parse(svg: string): XmlDocument {
  const doc = new new JSDOM('').window.DOMParser().parseFromString(svg, 'image/svg+xml');
  expect(doc.getElementsByTagName('parsererror')).toHaveLength(0);
  return doc;
}

const num = (el: XmlElement, name: string) => Number(el.getAttribute(name));

/** The panel outline: the rectangle as large as the panel. */
function outline(doc: XmlDocument): { x: number; y: number } {
  const rect = [...doc.getElementsByTagName('rect')].find((r) => num(r, 'width') === side.width && num(r, 'height') === side.height);
  if (!rect) throw new Error('no outline in the map');
  return { x: num(rect, 'x'), y: num(rect, 'y') };
}

function expectCircles(doc: XmlDocument, expected: PanelFaceBore[], mirrored: boolean): void {
  const circles = [...doc.getElementsByTagName('circle')];
  const o = outline(doc);
  for (const bore of expected) {
    const cx = o.x + (mirrored ? side.width - bore.x : bore.x);
    const cy = o.y + side.height - bore.y;
    const match = circles.find((c) => Math.abs(num(c, 'cx') - cx) < 0.001 && Math.abs(num(c, 'cy') - cy) < 0.001);
    expect(match, `circle of bore ${bore.id}`).toBeDefined();
    expect(num(match!, 'r')).toBeCloseTo(bore.diameter / 2, 6);
    expect(match!.hasAttribute('stroke-dasharray')).toBe(bore.face === 'B');
  }
}

describe('drilling map as SVG', () => {
  it('is drawn at full size: width and height in mm, a viewBox in mm', () => {
    // W3C CSS Values and Units Level 3: 1 in = 96 px = 25.4 mm; with the size in mm and a viewBox of the
    // same numbers, one user unit is one millimetre.
    const root = parse(faceA).documentElement;
    expect(root.getAttribute('width')).toMatch(/^[\d.]+mm$/);
    expect(root.getAttribute('height')).toMatch(/^[\d.]+mm$/);
    const [minX, minY, w, h] = root.getAttribute('viewBox')!.split(' ').map(Number);
    expect([minX, minY]).toEqual([0, 0]);
    expect(`${w}mm`).toBe(root.getAttribute('width'));
    expect(`${h}mm`).toBe(root.getAttribute('height'));
  });

  it('draws every face A hole as a circle of its diameter where it is drilled, seen from face A, named by its key', () => {
    const onA = holes.filter((b): b is FaceHole => b.kind === 'face' && b.face === 'A');
    expect(onA.length).toBeGreaterThan(40);
    expectCircles(parse(faceA), onA, false);
    const keys = [...parse(faceA).getElementsByTagName('g')].map((g) => g.getAttribute('data-hole')).filter((k) => k !== null);
    expect(keys.sort()).toEqual(holes.filter((h) => !(h.kind === 'face' && h.face === 'B')).map((h) => h.key).sort());
  });

  it('draws face B holes dashed on a map of their own, seen from face B', () => {
    const onB = holes.filter((b): b is FaceHole => b.kind === 'face' && b.face === 'B');
    expect(onB).toHaveLength(1);
    expectCircles(parse(faceB), onB, true);
  });

  it('draws a right side as its face is truly seen: the left side’s map turned over, the reference edge on the right', () => {
    // A carcass's two sides are mirror images (trade-reference §8a, common practice): the same document
    // coordinates, x from the front edge and y from the lower edge, lie on opposite hands. Looking at a left
    // side's inside face the front edge is on the left; at a right side's, on the right. A template drawn
    // the left side's way for a right side lines up with the panel only upside down.
    const right = exportContext(exportJob());
    right.job.panels[0].name = 'Base unit, right side';
    const rightDrilling = jobDrilling(right.job, right.catalog, [])[0];
    expect(rightDrilling.hand?.hand).toBe('right');
    const [rightA, rightB] = panelDrillingMaps(right, rightDrilling).map((map) => drawingToSvg(map, createSVGWindow()));
    expectCircles(parse(rightA), holes.filter((b): b is FaceHole => b.kind === 'face' && b.face === 'A'), true);
    expectCircles(parse(rightB), holes.filter((b): b is FaceHole => b.kind === 'face' && b.face === 'B'), false);
    const says = (svg: string) => [...parse(svg).getElementsByTagName('text')].map((t) => t.textContent ?? '').join(' | ');
    expect(says(rightA)).toContain('reference edge (x = 0) at the right');
    expect(says(rightB)).toContain('reference edge (x = 0) at the left');
    expect(says(faceA)).toContain('reference edge (x = 0) at the left');
  });

  it('draws a door hung on the left side with its hinge edge on the right: its face A is its back, seen from inside', () => {
    // Common practice (geometry of handed parts): a door hinged on the left as seen from the front has its
    // hinge edge on the right when its back is looked at.
    const door = jobDrilling(ctx.job, ctx.catalog, []).find((d) => d.panel.role === 'door')!;
    expect(door.hand?.hand).toBe('left');
    const svg = drawingToSvg(panelDrillingMaps(ctx, door)[0], createSVGWindow());
    const texts = [...parse(svg).getElementsByTagName('text')].map((t) => t.textContent ?? '').join(' | ');
    expect(texts).toContain('reference edge (x = 0) at the right');
    expect(texts).toContain('hinged on the LEFT (seen from the front)');
    const rect = [...parse(svg).getElementsByTagName('rect')].find((r) => num(r, 'width') === door.panel.width && num(r, 'height') === door.panel.height)!;
    const cups = [...parse(svg).getElementsByTagName('circle')].filter((c) => num(c, 'r') === 17.5);
    expect(cups.map((c) => num(c, 'cx') - num(rect, 'x'))).toEqual([door.panel.width - 21.5, door.panel.width - 21.5]);
  });

  it('writes names as text, never as markup', () => {
    const doc = parse(faceA);
    expect(doc.getElementsByTagName('script')).toHaveLength(0);
    const texts = [...doc.getElementsByTagName('text')].map((t) => t.textContent ?? '');
    expect(texts.some((t) => t.includes('<script>'))).toBe(true);
    expect(doc.getElementsByTagName('title')[0].textContent).toContain('<script>alert("job")</script> & Co');
  });

  it('stays well-formed XML when a name holds characters XML cannot (set past the schema)', () => {
    const odd = exportContext(exportJob());
    odd.job.name = 'bell\u0007 and half a pair \ud800 ok';
    const svg = drawingToSvg(panelDrillingMaps(odd, drilling)[0], createSVGWindow());
    expect(parse(svg).getElementsByTagName('title')[0].textContent).toContain('bell  and half a pair   ok');
  });

  it('places every text by its own x and y attributes', () => {
    for (const t of parse(faceA).getElementsByTagName('text')) {
      expect(Number.isFinite(num(t, 'x')) && Number.isFinite(num(t, 'y'))).toBe(true);
    }
  });

  it('shows each purpose by a letter as well as a colour', () => {
    const texts = [...parse(faceA).getElementsByTagName('text')].map((t) => t.textContent);
    // The plate's screws share the system holes: they are drawn once, as the plate's (M), 13 deep.
    expect(texts).toContain('M13');
    expect(texts).toContain('S13');
    expect(texts).toContain('B THRU');
    expect(texts).toContain('mounting plate');
  });
});
