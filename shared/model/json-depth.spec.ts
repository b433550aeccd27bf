import { describe, expect, it } from 'vitest';
import { jsonTooDeep, MAX_JSON_DEPTH } from './json-depth';

const nest = (depth: number, open = '[', close = ']') => `${open.repeat(depth)}${close.repeat(depth)}`;

describe('jsonTooDeep', () => {
  it('counts arrays and objects opened inside one another, up to the limit and past it', () => {
    expect(jsonTooDeep(nest(MAX_JSON_DEPTH))).toBe(false);
    expect(jsonTooDeep(nest(MAX_JSON_DEPTH + 1))).toBe(true);
    expect(jsonTooDeep(`${'{"a":'.repeat(MAX_JSON_DEPTH + 1)}1${'}'.repeat(MAX_JSON_DEPTH + 1)}`)).toBe(true);
    expect(jsonTooDeep('[[1],[2],{"a":[3]}]', 3)).toBe(false);
    expect(jsonTooDeep('[[1],[2],{"a":[3]}]', 2)).toBe(true);
  });

  it('reads a million brackets without recursion', () => {
    expect(jsonTooDeep(nest(1_000_000))).toBe(true);
  });

  it('does not count brackets inside strings, escaped quotes included', () => {
    expect(jsonTooDeep(JSON.stringify({ name: '['.repeat(500) }))).toBe(false);
    expect(jsonTooDeep(JSON.stringify({ name: `say \\"${'{'.repeat(500)}` }))).toBe(false);
    expect(jsonTooDeep(JSON.stringify(['\\', '[[[[['.repeat(100)]))).toBe(false);
  });

  it('reads UTF-8 bytes as Latin-1 alike', () => {
    const text = JSON.stringify({ name: 'Küche 橱柜 🪚 [', list: [[['ok']]] });
    expect(jsonTooDeep(Buffer.from(text, 'utf8').toString('latin1'), 4)).toBe(false);
    expect(jsonTooDeep(Buffer.from(text, 'utf8').toString('latin1'), 3)).toBe(true);
  });
});
