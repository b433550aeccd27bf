import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { jobDocumentJsonSchema, parseJobDocument } from './parse-job';

// The team kit's example document (../shared/examples/wall-carcass.json) is written outside this project.
const example = JSON.parse(readFileSync(new URL('../../../shared/examples/wall-carcass.json', import.meta.url), 'utf8'));

describe('parseJobDocument', () => {
  it('reads the team kit example', () => {
    const result = parseJobDocument(example);
    expect(result.ok).toBe(true);
    if (result.ok) {
      expect(result.value.panels[0].bores.length).toBeGreaterThan(0);
      expect(result.value.limits.sagRatio).toBe(144);
    }
  });

  it('names every problem by its path', () => {
    const bad = structuredClone(example);
    bad.panels[0].bores[1].diameter = -5;
    bad.panels[0].width = Number.NaN;
    bad.panels[0].material = 'nope';
    const result = parseJobDocument(bad);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors.some((e) => e.startsWith('panels[0].width'))).toBe(true);
      expect(result.errors.some((e) => e.startsWith('panels[0].bores[1]'))).toBe(true);
    }
  });

  it('refuses a reference to a missing material once the fields are valid', () => {
    const bad = structuredClone(example);
    bad.panels[0].material = 'nope';
    const result = parseJobDocument(bad);
    expect(result).toEqual({ ok: false, errors: ['panels[0].material: no material with id "nope"'] });
  });

  it('refuses an unknown format and non-objects', () => {
    expect(parseJobDocument({ ...example, format: 'other/9' })).toEqual({
      ok: false,
      errors: ['format: expected "borewright.job/1", found "other/9"'],
    });
    expect(parseJobDocument([]).ok).toBe(false);
    expect(parseJobDocument(null).ok).toBe(false);
  });

  it('refuses absurd sizes', () => {
    const bad = structuredClone(example);
    bad.panels[0].height = 100_000;
    bad.panels[0].thickness = 0;
    const result = parseJobDocument(bad);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors).toHaveLength(2);
  });
});

describe('jobDocumentJsonSchema', () => {
  it('is a draft 2020-12 schema naming the format', () => {
    const schema = jobDocumentJsonSchema();
    expect(schema['$schema']).toBe('https://json-schema.org/draft/2020-12/schema');
    expect(JSON.stringify(schema)).toContain('borewright.job/1');
  });
});

describe('messages for a bore that is neither a face nor an edge bore', () => {
  it('names the field of the branch the author meant', () => {
    const bad = structuredClone(example);
    bad.panels[0].bores[0].face = 'C';
    const result = parseJobDocument(bad);
    expect(result).toEqual({ ok: false, errors: ['panels[0].bores[0].face: Invalid option: expected one of "A"|"B"'] });
  });
});
