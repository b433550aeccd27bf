import * as z from 'zod';

/**
 * Text Borewright stores must be well-formed UTF-16: a lone surrogate (half of a pair, U+D800 to
 * U+DFFF on its own) has no UTF-8 form, so PostgreSQL's jsonb refuses it and its text columns would
 * keep a replacement character instead. One rule, used by every text field of the shared schemas, so
 * the browser, the server and the command line refuse the same input with the same words.
 */
export const LONE_SURROGATE_MESSAGE = 'must not contain a lone UTF-16 surrogate (half of a character pair, \\uD800 to \\uDFFF)';

const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

/** Whether every surrogate of the text is one half of a pair. */
export function isWellFormedText(text: string): boolean {
  return !LONE_SURROGATE.test(text);
}

/** A string of well-formed text; chain `.trim()`, `.max()` and the rest on it as on `z.string()`. */
export const text = z.string().refine(isWellFormedText, LONE_SURROGATE_MESSAGE);
