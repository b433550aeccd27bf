import { line, text, translate, type Drawing, type Shape } from './drawing';
import { INK, MUTED } from './palette';
import { fitText, wrapText } from './text-width';

export interface Column {
  title: string;
  width: number;
}

const TABLE_SIZE = 2.7;
const TABLE_ROW = 4.6;
const FOOTER = 10;

/**
 * Lays blocks of a document (headings, paragraphs, tables) down pages of a fixed size, starting a new page
 * when a block does not fit, then numbers the pages: how the cover sheet, of any length, is set.
 */
export class PageFlow {
  private readonly pages: Shape[][] = [];
  private current: Shape[] = [];
  private y = 0;

  constructor(
    readonly width: number,
    readonly height: number,
    readonly margin: number,
  ) {
    this.newPage();
  }

  /** The width between the margins, mm. */
  get measure(): number {
    return this.width - 2 * this.margin;
  }

  private newPage(): void {
    this.current = [];
    this.pages.push(this.current);
    this.y = this.margin;
  }

  /** Makes room for a block `height` mm tall: a new page when the rest of this one is too short. */
  room(height: number): void {
    if (this.y + height > this.height - this.margin - FOOTER && this.y > this.margin) this.newPage();
  }

  /** Places shapes drawn from their own top left at the current line and moves down past them. */
  place(shapes: readonly Shape[], height: number): void {
    this.room(height);
    this.current.push(...translate(shapes, this.margin, this.y));
    this.y += height;
  }

  /** Leaves vertical space. */
  gap(height: number): void {
    this.y += height;
  }

  /** A paragraph wrapped to the measure, kept on one page when it fits one. */
  paragraph(value: string, size: number, color = INK, indent = 0): void {
    const lines = wrapText(value, size, this.measure - indent);
    const lead = size * 1.35;
    this.place(
      lines.map((l, i) => text(indent, size + i * lead, l, size, color)),
      lines.length * lead + size * 0.4,
    );
  }

  /** A heading, kept with at least a few lines of what follows it. */
  heading(value: string): void {
    this.room(5 + 4 * TABLE_ROW);
    this.gap(3);
    this.place([text(0, 5, value, 5, INK), line(0, 7, this.measure, 7, { color: INK, width: 0.3 })], 10);
  }

  /** A table, its header row repeated on every page it runs onto; `colors` gives a colour per row. */
  table(columns: readonly Column[], rows: readonly string[][], colors: readonly string[] = []): void {
    const header = () => this.row(columns, columns.map((c) => c.title), MUTED);
    header();
    rows.forEach((cells, i) => {
      if (this.y + TABLE_ROW > this.height - this.margin - FOOTER) {
        this.newPage();
        header();
      }
      this.row(columns, cells, colors[i] ?? INK);
    });
  }

  private row(columns: readonly Column[], cells: readonly string[], color: string): void {
    let x = 0;
    const shapes: Shape[] = [];
    columns.forEach((c, i) => {
      shapes.push(text(x + 0.8, TABLE_ROW - 1.3, fitText(cells[i] ?? '', TABLE_SIZE, c.width - 1.6), TABLE_SIZE, color));
      x += c.width;
    });
    shapes.push(line(0, TABLE_ROW, x, TABLE_ROW, { color: '#BBBBBB', width: 0.15 }));
    this.place(shapes, TABLE_ROW);
  }

  /** How many pages the flow has taken so far. */
  get pageCount(): number {
    return this.pages.length;
  }

  /**
   * The pages as drawings, each with a footer naming it `page k of n`; `numbering` counts them within a
   * longer file instead (the first one's number and the file's page count).
   */
  finish(title: string, footer: string, numbering?: { first: number; total: number }): Drawing[] {
    const n = this.pages.length;
    const first = numbering?.first ?? 1;
    const total = numbering?.total ?? n;
    return this.pages.map((shapes, i) => ({
      width: this.width,
      height: this.height,
      title: `${title}, page ${first + i} of ${total}`,
      shapes: [...shapes, text(this.margin, this.height - this.margin, fitText(`${footer}. Page ${first + i} of ${total}.`, 2.6, this.measure), 2.6, MUTED)],
    }));
  }
}
