import { describe, expect, it } from 'vitest';
import { shopHinge } from '../testing/shop-fitting';
import { parseFittingFile, parseFittingImport } from './parse-catalog';

const pin = (id: string) => ({
  id,
  name: 'Test pin',
  purpose: 'shelf-pin',
  onSystemRow: true,
  bores: [{ id: 'pin', kind: 'face', x: 0, y: 0, diameter: 5, depth: 'system', source: 'test' }],
});

describe('parseFittingFile', () => {
  it('reads a valid file', () => {
    const result = parseFittingFile({ fittings: [pin('my-pin')] });
    expect(result.ok && result.value.map((f) => f.id)).toEqual(['my-pin']);
  });

  it('reports every problem led by its path', () => {
    const bad = pin('my-pin');
    const file = {
      fittings: [
        pin('a'),
        pin('b'),
        pin('c'),
        {
          ...bad,
          id: 'Bad Id',
          bores: [bad.bores[0], { ...bad.bores[0], id: 'two', diameter: -1 }, { ...bad.bores[0], id: 'x', kind: 'corner' }],
        },
      ],
    };
    const result = parseFittingFile(file);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors).toContain('fittings[3].bores[1].diameter: must be greater than 0');
      expect(result.errors.some((e) => e.startsWith('fittings[3].id: must be kebab-case'))).toBe(true);
      expect(result.errors.some((e) => e.startsWith('fittings[3].bores[2].kind: '))).toBe(true);
      expect(result.errors.every((e) => /^fittings\[3\]\./.test(e))).toBe(true);
    }
  });

  it('refuses joins to missing bores, duplicate ids and unsourced numbers', () => {
    const file = {
      fittings: [
        { ...pin('a'), joins: [['pin', 'nope']] },
        { ...pin('a'), bores: [{ ...pin('a').bores[0], source: ' ' }] },
      ],
    };
    const result = parseFittingFile(file);
    expect(result.ok ? [] : [...result.errors].sort()).toEqual([
      'fittings[0].joins[0][1]: no bore with id "nope"',
      'fittings[1].bores[0].source: must say where the numbers come from',
      'fittings[1].id: duplicate id "a"',
    ]);
  });

  it('refuses a depth that is neither a length nor a keyword, and a non-object', () => {
    const result = parseFittingFile({ fittings: [{ ...pin('a'), bores: [{ ...pin('a').bores[0], depth: 'deep' }] }] });
    expect(result.ok ? [] : result.errors).toEqual(['fittings[0].bores[0].depth: must be a depth in mm, "system" or "through"']);
    expect(parseFittingFile('nonsense').ok).toBe(false);
  });
});

describe('parseFittingImport', () => {
  it('takes one fitting, with paths led by its own fields', () => {
    expect(parseFittingImport(shopHinge()).ok).toBe(true);
    const result = parseFittingImport({ ...shopHinge(), bores: [] });
    expect(result.ok ? [] : result.errors).toEqual(['bores: a fitting needs at least one bore', 'hinge.cupBore: no face bore with id "cup"']);
  });

  it('takes a catalog file, with paths led by its place in the file', () => {
    const result = parseFittingImport({ fittings: [shopHinge('a'), { ...shopHinge('b'), onSystemRow: 'yes' }] });
    expect(result.ok ? [] : result.errors).toEqual(['fittings[1].onSystemRow: Invalid input: expected boolean, received string']);
  });

  it('refuses what is neither an object nor a file', () => {
    for (const input of [null, [shopHinge()], 'hinge'])
      expect(parseFittingImport(input)).toEqual({ ok: false, errors: ['send one fitting as a JSON object, or a catalog file { "fittings": [...] }'] });
  });
});
