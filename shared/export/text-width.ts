/**
 * Text widths estimated from character classes of a DejaVu-like sans-serif, in ems. Layout runs where no
 * font is loaded (the SVG is drawn without one), so it estimates a little wide to keep text from touching.
 */
function classWidth(ch: string): number {
  if (ch === ' ') return 0.32;
  if (/[0-9]/.test(ch)) return 0.64;
  if (/[iljtf.,:;'|!()[\]]/.test(ch)) return 0.36;
  if (/[mwMW@%]/.test(ch)) return 0.95;
  if (/[A-Z]/.test(ch)) return 0.72;
  return 0.6;
}

/** The widths of the first 256 code points, looked up rather than matched: a pack measures a great deal of text. */
const LATIN1 = Float64Array.from({ length: 256 }, (_, code) => classWidth(String.fromCharCode(code)));

function charWidth(ch: string): number {
  const code = ch.charCodeAt(0);
  return code < 256 && ch.length === 1 ? LATIN1[code] : classWidth(ch);
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
  // The longest start that leaves room for the ellipsis, measured in one pass.
  const room = width / size - charWidth('…');
  const chars = [...value];
  let ems = 0;
  let fits = 0;
  while (fits < chars.length && ems + charWidth(chars[fits]) <= room) ems += charWidth(chars[fits++]);
  return chars.slice(0, fits).join('').trimEnd() + '…';
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
