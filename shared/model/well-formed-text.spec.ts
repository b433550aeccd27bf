import { describe, expect, it } from 'vitest';
import { jobCreateBody } from '../api/contract';
import { formatIssues } from './validation-messages';
import { isWellFormedText, LONE_SURROGATE_MESSAGE } from './well-formed-text';
import { parseJobDocument } from './parse-job';

describe('well-formed text', () => {
  // A surrogate pair encodes one code point above U+FFFF; either half alone encodes nothing
  // (The Unicode Standard, §3.8 Surrogates and §3.9 D91 well-formed UTF-16, published).
  it('accepts pairs in order and refuses either half alone or a pair reversed', () => {
    for (const good of ['', 'Larch Lane', 'Küche 橱柜', '🪚 saw', '\ud83e\ude9a']) expect(isWellFormedText(good), good).toBe(true);
    for (const bad of ['a\udfffb', '\ud800', 'end \ud83e', '\ude9a\ud83e', '\udc00\ud800x']) expect(isWellFormedText(bad), JSON.stringify(bad)).toBe(false);
  });

  it('is the rule of the shared schemas, naming the field for the server, the browser and the command line alike', () => {
    const body = jobCreateBody.safeParse({ name: 'a\udfffb', notes: 'ok' });
    expect(body.success).toBe(false);
    expect(formatIssues(body.error!)).toEqual([`name: ${LONE_SURROGATE_MESSAGE}`]);
    const doc = parseJobDocument({ format: 'borewright.job/1', name: 'Job', notes: 'x\ud800', materials: [] });
    expect(doc.ok ? [] : doc.errors).toEqual([`notes: ${LONE_SURROGATE_MESSAGE}`]);
  });
});
