import { describe, expect, it } from 'vitest';
import { freeId } from './free-id';

describe('freeId', () => {
  it('keeps a free id, else takes the first free number', () => {
    expect(freeId('b1', new Set())).toBe('b1');
    expect(freeId('b1', new Set(['b1', 'b1-2']))).toBe('b1-3');
    expect(freeId('plate-0', new Set(['plate-0-1']), true)).toBe('plate-0-2');
    expect(freeId('x'.repeat(64), new Set(), true)).toHaveLength(60);
  });
});
