import { registerWindow, SVG, type Container, type Element } from '@svgdotjs/svg.js';
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

function strokeAttrs(stroke: Stroke | undefined): Record<string, string | number> {
  if (!stroke) return { stroke: 'none' };
  const attrs: Record<string, string | number> = { stroke: stroke.color, 'stroke-width': n(stroke.width) };
  if (stroke.dash) attrs['stroke-dasharray'] = stroke.dash.map(n).join(' ');
  return attrs;
}

function drawShape(root: Container, shape: Shape): Element {
  switch (shape.kind) {
    case 'line':
      return root.line(n(shape.x1), n(shape.y1), n(shape.x2), n(shape.y2)).attr(strokeAttrs(shape.stroke));
    case 'rect':
      return root
        .rect(n(shape.width), n(shape.height))
        .attr({ x: n(shape.x), y: n(shape.y), fill: shape.fill ?? 'none', ...strokeAttrs(shape.stroke) });
    case 'circle':
      return root
        .circle(n(2 * shape.r))
        .attr({ cx: n(shape.cx), cy: n(shape.cy), fill: shape.fill ?? 'none', ...strokeAttrs(shape.stroke) });
    case 'text': {
      // x and y are set as attributes: svg.js's move() places text by font metrics, which differ between
      // svgdom and browsers. `plain` writes a text node, which the serialiser escapes.
      const x = n(shape.x);
      const y = n(shape.y);
      const node = root.plain(shape.text).attr({ x, y, 'font-size': n(shape.size), fill: shape.color });
      if (shape.anchor !== 'start') node.attr('text-anchor', shape.anchor);
      if (shape.upright) node.attr('transform', `rotate(-90 ${x} ${y})`);
      return node;
    }
    case 'symbol': {
      // Written out in place, so that every circle in the file has its true centre: what a reader of
      // the file (or a CAM program) expects of a drilling map.
      const group = root.group();
      if (shape.hole !== undefined) group.attr('data-hole', shape.hole);
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
