/**
 * Text widths estimated from character classes of a DejaVu-like sans-serif, in ems. Layout runs where no
 * font is loaded (the SVG is drawn without one), so it estimates a little wide to keep text from touching.
 */
function charWidth(ch: string): number {
  if (ch === ' ') return 0.32;
  if (/[0-9]/.test(ch)) return 0.64;
  if (/[iljtf.,:;'|!()[\]]/.test(ch)) return 0.36;
  if (/[mwMW@%]/.test(ch)) return 0.95;
  if (/[A-Z]/.test(ch)) return 0.72;
  return 0.6;
}

/** The estimated advance width of a line of text at a font size, in the size's unit. */
export function estimateTextWidth(value: string, size: number): number {
  let ems = 0;
  for (const ch of value) ems += charWidth(ch);
  return ems * size;
}

/** The text, cut short with an ellipsis where it would be wider than `width`. */
export function fitText(value: string, size: number, width: number): string {
  if (estimateTextWidth(value, size) <= width) return value;
  const chars = [...value];
  while (chars.length > 0 && estimateTextWidth(chars.join('') + '…', size) > width) chars.pop();
  return chars.join('').trimEnd() + '…';
}

/** Text broken into lines no wider than `width` at a size, at spaces; a word longer than a line is cut. */
export function wrapText(value: string, size: number, width: number): string[] {
  const lines: string[] = [];
  let current = '';
  for (const word of value.split(/\s+/).filter((w) => w !== '')) {
    const candidate = current === '' ? word : `${current} ${word}`;
    if (estimateTextWidth(candidate, size) <= width) current = candidate;
    else {
      if (current !== '') lines.push(current);
      current = fitText(word, size, width);
    }
  }
  if (current !== '') lines.push(current);
  return lines;
}
