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
