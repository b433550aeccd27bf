/**
 * One line of text drawn on a canvas that fills its box, right-aligned, in the font and colour the box's
 * styles give it. Changing a canvas's pixels asks nothing of the page's layout, and so less of the browser
 * on every frame than a new text node would (tests/bench/editor.bench.ts measures the difference).
 */
export class CanvasLine {
  private readonly context: CanvasRenderingContext2D;
  private readonly width: number;
  private readonly height: number;
  private shown = '';

  /** Measures the box and reads its styles now: make one again when either may have changed. */
  constructor(canvas: HTMLCanvasElement) {
    const context = canvas.getContext('2d');
    if (!context) throw new Error('this browser draws no 2D canvas');
    const style = getComputedStyle(canvas);
    const ratio = window.devicePixelRatio || 1;
    this.width = canvas.clientWidth;
    this.height = canvas.clientHeight;
    // Sharp at the screen's own resolution: the bitmap has the device's pixels, drawn in CSS pixels.
    canvas.width = Math.round(this.width * ratio);
    canvas.height = Math.round(this.height * ratio);
    context.scale(ratio, ratio);
    context.font = `${style.fontStyle} ${style.fontWeight} ${style.fontSize} ${style.fontFamily}`;
    context.fillStyle = style.color;
    context.textAlign = 'right';
    context.textBaseline = 'middle';
    this.context = context;
  }

  /** Shows `text` in place of what was there. */
  write(text: string): void {
    if (text === this.shown) return;
    this.shown = text;
    this.context.clearRect(0, 0, this.width, this.height);
    if (text) this.context.fillText(text, this.width, this.height / 2);
  }
}
