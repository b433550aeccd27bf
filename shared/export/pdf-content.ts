import { roundTo } from './units';

/**
 * A PDF content stream written as text (ISO 32000-1 §8 and §9 operators), in points with the origin at the
 * bottom left. pdf-lib's drawing calls build an object per operator and per number, which a template file
 * of some thousand shapes pays for in garbage collection; this writes the same operators straight into a
 * string. Colour, line width and dash are written only when they change, and are saved and restored with
 * the graphics state (`q` / `Q`) like the reader's own.
 */

/** A colour as red, green and blue from 0 to 1. */
export type Rgb = readonly [number, number, number];

interface PenState {
  fill?: string;
  stroke?: string;
  width?: string;
  dash?: string;
}

/** Bézier handle length for a quarter circle of radius 1: 4 (√2 − 1) / 3. */
const KAPPA = (4 * (Math.SQRT2 - 1)) / 3;

/**
 * A number as the content stream writes it: rounded to 0.001 pt (0.35 µm, far below what a printer or a
 * reader's eye can place), so never in exponent form, which PDF numbers do not have (a sheet's points stay
 * far below 10^21, where String would write one).
 */
export function pdfNumber(value: number): string {
  if (!Number.isFinite(value)) throw new Error(`A PDF number must be finite, not ${value}`);
  return String(roundTo(value, 0.001));
}

const rgbText = ([r, g, b]: Rgb) => `${pdfNumber(r)} ${pdfNumber(g)} ${pdfNumber(b)}`;

export class PdfContent {
  private readonly parts: string[] = [];
  private pen: PenState = {};
  private readonly saved: PenState[] = [];

  /** Saves the graphics state: what follows until `restore` cannot change what comes after it. */
  save(): void {
    this.parts.push('q');
    this.saved.push({ ...this.pen });
  }

  restore(): void {
    const pen = this.saved.pop();
    if (!pen) throw new Error('restore() without save()');
    this.parts.push('Q');
    this.pen = pen;
  }

  /** Clips what follows (until `restore`) to a rectangle. */
  clipRect(x: number, y: number, width: number, height: number): void {
    this.parts.push(`${pdfNumber(x)} ${pdfNumber(y)} ${pdfNumber(width)} ${pdfNumber(height)} re W n`);
  }

  fillColor(rgb: Rgb): void {
    const value = rgbText(rgb);
    if (this.pen.fill !== value) this.parts.push(`${value} rg`);
    this.pen.fill = value;
  }

  /** The pen for stroking: colour, width and dash pattern (dash and gap lengths; none for solid). */
  strokeStyle(rgb: Rgb, width: number, dash: readonly number[] = []): void {
    const color = rgbText(rgb);
    const w = pdfNumber(width);
    const d = `[${dash.map(pdfNumber).join(' ')}] 0`;
    if (this.pen.stroke !== color) this.parts.push(`${color} RG`);
    if (this.pen.width !== w) this.parts.push(`${w} w`);
    if (this.pen.dash !== d) this.parts.push(`${d} d`);
    this.pen = { ...this.pen, stroke: color, width: w, dash: d };
  }

  line(x1: number, y1: number, x2: number, y2: number): void {
    this.parts.push(`${pdfNumber(x1)} ${pdfNumber(y1)} m ${pdfNumber(x2)} ${pdfNumber(y2)} l S`);
  }

  /** A rectangle from its lower left corner, filled with the fill colour, stroked with the pen, or both. */
  rect(x: number, y: number, width: number, height: number, paint: Paint): void {
    this.parts.push(`${pdfNumber(x)} ${pdfNumber(y)} ${pdfNumber(width)} ${pdfNumber(height)} re ${PAINT[paint]}`);
  }

  /** A circle as four Bézier quarters, painted like `rect`. */
  circle(cx: number, cy: number, r: number, paint: Paint): void {
    const k = r * KAPPA;
    const p = (x: number, y: number) => `${pdfNumber(x)} ${pdfNumber(y)}`;
    this.parts.push(
      `${p(cx + r, cy)} m ${p(cx + r, cy + k)} ${p(cx + k, cy + r)} ${p(cx, cy + r)} c ${p(cx - k, cy + r)} ${p(cx - r, cy + k)} ${p(cx - r, cy)} c ` +
        `${p(cx - r, cy - k)} ${p(cx - k, cy - r)} ${p(cx, cy - r)} c ${p(cx + k, cy - r)} ${p(cx + r, cy - k)} ${p(cx + r, cy)} c h ${PAINT[paint]}`,
    );
  }

  /**
   * A line of text in the fill colour, its baseline starting at (x, y), turned a quarter anticlockwise when
   * `upright`. `encoded` is the text as the font encodes it, a PDF string such as `<0041>`.
   */
  text(font: string, size: number, x: number, y: number, encoded: string, upright: boolean): void {
    const matrix = upright ? `0 1 -1 0 ${pdfNumber(x)} ${pdfNumber(y)}` : `1 0 0 1 ${pdfNumber(x)} ${pdfNumber(y)}`;
    this.parts.push(`BT /${font} ${pdfNumber(size)} Tf ${matrix} Tm ${encoded} Tj ET`);
  }

  /** Shows a form XObject (a kept drawing) with its origin at (x, y). */
  show(name: string, x: number, y: number): void {
    this.parts.push(`q 1 0 0 1 ${pdfNumber(x)} ${pdfNumber(y)} cm /${name} Do Q`);
  }

  /** The stream's text: every operator on a line of its own. */
  toString(): string {
    if (this.saved.length > 0) throw new Error(`${this.saved.length} save() without restore()`);
    return this.parts.join('\n');
  }
}

export type Paint = 'fill' | 'stroke' | 'both';

const PAINT: Record<Paint, string> = { fill: 'f', stroke: 'S', both: 'B' };
