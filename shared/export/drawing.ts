/**
 * A drawing as plain data: shapes on a sheet in millimetres, origin at the top left, y downwards.
 * The drilling map, the template pages and the cover sheet are laid out once as a Drawing; the SVG and
 * PDF renderers only translate it, so both files show the same thing at the same size.
 */

export interface Stroke {
  color: string;
  /** Line width in mm. */
  width: number;
  /** Dash and gap lengths in mm; none for a solid line. */
  dash?: readonly number[];
}

export type TextAnchor = 'start' | 'middle' | 'end';

export interface LineShape {
  kind: 'line';
  x1: number;
  y1: number;
  x2: number;
  y2: number;
  stroke: Stroke;
}

export interface RectShape {
  kind: 'rect';
  x: number;
  y: number;
  width: number;
  height: number;
  stroke?: Stroke;
  fill?: string;
}

export interface CircleShape {
  kind: 'circle';
  cx: number;
  cy: number;
  r: number;
  stroke?: Stroke;
  fill?: string;
}

export interface TextShape {
  kind: 'text';
  /** The anchor point on the baseline. */
  x: number;
  y: number;
  text: string;
  /** Font size in mm (the em height). */
  size: number;
  color: string;
  anchor: TextAnchor;
  /** Quarter turn anticlockwise, so the text reads upwards. */
  upright?: boolean;
}

/**
 * A small drawing placed at (x, y) by reference: a page that repeats the same mark (check bars,
 * registration crosses) stores it once. Shapes with the same `id` must be the same drawing.
 */
export interface SymbolShape {
  kind: 'symbol';
  id: string;
  x: number;
  y: number;
  drawing: Drawing;
  /** The key of the hole this mark stands for (panel-holes.ts), written into the SVG as `data-hole`. */
  hole?: string;
}

export type Shape = LineShape | RectShape | CircleShape | TextShape | SymbolShape;

export interface Drawing {
  /** Sheet size in mm. */
  width: number;
  height: number;
  /** What the drawing shows, for the SVG title and the PDF page label. */
  title: string;
  shapes: Shape[];
}

/** A straight line. */
export function line(x1: number, y1: number, x2: number, y2: number, stroke: Stroke): LineShape {
  return { kind: 'line', x1, y1, x2, y2, stroke };
}

/**
 * Text as one printable line: control characters, unpaired surrogates and the two non-characters XML
 * refuses become spaces, since an SVG file cannot hold them and a PDF line cannot break. Markup needs
 * nothing here: every renderer writes text as text.
 */
export function printable(value: string): string {
  return value.replace(/[\u0000-\u001f\u007f\ufffe\uffff]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g, ' ');
}

/** A line of text anchored on its baseline. */
export function text(
  x: number,
  y: number,
  value: string,
  size: number,
  color: string,
  anchor: TextAnchor = 'start',
  upright = false,
): TextShape {
  const shape: TextShape = { kind: 'text', x, y, text: printable(value), size, color, anchor };
  return upright ? { ...shape, upright } : shape;
}

/** Moves shapes by (dx, dy): how a part laid out at the origin is placed on the sheet. */
export function translate(shapes: readonly Shape[], dx: number, dy: number): Shape[] {
  return shapes.map((s) => {
    switch (s.kind) {
      case 'line':
        return { ...s, x1: s.x1 + dx, y1: s.y1 + dy, x2: s.x2 + dx, y2: s.y2 + dy };
      case 'rect':
        return { ...s, x: s.x + dx, y: s.y + dy };
      case 'circle':
        return { ...s, cx: s.cx + dx, cy: s.cy + dy };
      case 'text':
      case 'symbol':
        return { ...s, x: s.x + dx, y: s.y + dy };
    }
  });
}
