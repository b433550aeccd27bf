import { Circle, Color, G, Line, Rect, registerWindow, SVG, Text, type Container, type Element } from '@svgdotjs/svg.js';
import { printable, translate, type Drawing, type Shape, type Stroke } from './drawing';
import { roundTo } from './units';

/**
 * A window whose document can make SVG elements: svgdom's on the server (a fresh one per drawing, since
 * registering is global), the page's own in a browser. Typed loosely so that shared/ needs no DOM types.
 */
export interface SvgWindow {
  document: unknown;
}

const n = (value: number) => roundTo(value, 0.001);

type Attrs = Record<string, string | number>;

const colors = new Map<string, string>();
/** svg.js's own test of what it writes as a colour (hex or rgb()); its typings leave it out. */
const isColor = (value: string) => (Color as unknown as { isColor(value: string): boolean }).isColor(value);

/** A colour as svg.js writes a fill or stroke (`#RRGGBB` in lower case), worked out once per colour. */
function color(value: string): string {
  let written = colors.get(value);
  if (written === undefined) colors.set(value, (written = isColor(value) ? new Color(value).toString() : value));
  return written;
}

function strokeAttrs(stroke: Stroke | undefined): Attrs {
  if (!stroke) return { stroke: 'none' };
  const attrs: Attrs = { stroke: color(stroke.color), 'stroke-width': n(stroke.width) };
  if (stroke.dash) attrs['stroke-dasharray'] = stroke.dash.map(n).join(' ');
  return attrs;
}

/**
 * Adds an element with its attributes in the order given. The values are ours, already rounded numbers and
 * colours as svg.js writes them, so they are set on the node as they are: svg.js's `attr` parses every value
 * again (and rebuilds a text at each `x` and `font-size`), which was most of the time of a drilling map.
 */
function add<T extends Element>(parent: Container, element: T, attrs: Attrs): T {
  parent.put(element);
  const node = element.node as { setAttribute(name: string, value: string): void };
  for (const name in attrs) node.setAttribute(name, String(attrs[name]));
  return element;
}

function drawShape(root: Container, shape: Shape): Element {
  switch (shape.kind) {
    case 'line':
      return add(root, new Line(), { x1: n(shape.x1), y1: n(shape.y1), x2: n(shape.x2), y2: n(shape.y2), ...strokeAttrs(shape.stroke) });
    case 'rect':
      return add(root, new Rect(), {
        width: n(shape.width),
        height: n(shape.height),
        x: n(shape.x),
        y: n(shape.y),
        fill: color(shape.fill ?? 'none'),
        ...strokeAttrs(shape.stroke),
      });
    case 'circle':
      // The radius as svg.js's circle(diameter) writes it: half the rounded diameter.
      return add(root, new Circle(), { r: n(2 * shape.r) / 2, cx: n(shape.cx), cy: n(shape.cy), fill: color(shape.fill ?? 'none'), ...strokeAttrs(shape.stroke) });
    case 'text': {
      // x and y are set as attributes: svg.js's move() places text by font metrics, which differ between
      // svgdom and browsers. `plain` writes a text node, which the serialiser escapes.
      const x = n(shape.x);
      const y = n(shape.y);
      const attrs: Attrs = { x, y, 'font-size': n(shape.size), fill: color(shape.color) };
      if (shape.anchor !== 'start') attrs['text-anchor'] = shape.anchor;
      if (shape.upright) attrs['transform'] = `rotate(-90 ${x} ${y})`;
      return add(root, new Text(), attrs).plain(shape.text);
    }
    case 'symbol': {
      // Written out in place, so that every circle in the file has its true centre: what a reader of
      // the file (or a CAM program) expects of a drilling map.
      const group = add(root, new G(), shape.hole !== undefined ? { 'data-hole': shape.hole } : {});
      for (const inner of translate(shape.drawing.shapes, shape.x, shape.y)) drawShape(group, inner);
      return group;
    }
  }
}

/**
 * Writes a drawing as an SVG file at its true size: width and height in millimetres and a viewBox in
 * millimetres, so one user unit is one millimetre (1 in = 25.4 mm = 96 px, CSS Values and Units).
 */
export function drawingToSvg(drawing: Drawing, window: SvgWindow): string {
  const win = window as { document: object };
  registerWindow(win as never, win.document as never);
  const root = SVG()
    .attr({ width: `${n(drawing.width)}mm`, height: `${n(drawing.height)}mm` })
    .viewbox(0, 0, n(drawing.width), n(drawing.height))
    .attr({ 'font-family': 'DejaVu Sans, Verdana, Arial, sans-serif' });
  root.element('title').words(printable(drawing.title));
  root.rect(n(drawing.width), n(drawing.height)).attr({ fill: '#ffffff' });
  for (const shape of drawing.shapes) drawShape(root, shape);
  return `<?xml version="1.0" encoding="UTF-8"?>\n${root.svg()}\n`;
}
