/**
 * The deepest nesting of arrays and objects any JSON Borewright reads may have. A job document nests
 * about seven deep (job, panels, panel, placements, placement, params, value); a carcass description
 * a few more. Anything far deeper is not ours, and walking it (ours or a library's recursion) could
 * overflow the stack, so it is refused before it is parsed.
 */
export const MAX_JSON_DEPTH = 64;

export const TOO_DEEP_MESSAGE = `nests arrays or objects more than ${MAX_JSON_DEPTH} deep, deeper than any Borewright document`;

/**
 * Whether a JSON text opens more than `max` arrays or objects inside one another, read as text in
 * one pass without recursion (brackets inside strings do not count). It does not check that the text
 * is JSON: the parser that runs after it says so. Bytes of UTF-8 read one by one as Latin-1 give the
 * same answer, since no byte of a multi-byte character looks like a quote, a backslash or a bracket.
 */
export function jsonTooDeep(text: string, max = MAX_JSON_DEPTH): boolean {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c) i++; // a backslash: the next character is escaped
      else if (c === 0x22) inString = false;
    } else if (c === 0x22) inString = true;
    else if (c === 0x5b || c === 0x7b) {
      if (++depth > max) return true;
    } else if (c === 0x5d || c === 0x7d) depth--;
  }
  return false;
}
