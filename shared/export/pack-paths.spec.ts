import { describe, expect, it } from 'vitest';
import { safeSegment, UniqueNames } from './pack-paths';

describe('safeSegment', () => {
  it('never opens a folder: slashes and backslashes become dashes', () => {
    expect(safeSegment('Base/Wall\\Tall')).toBe('Base-Wall-Tall');
    expect(safeSegment('../../etc/passwd')).toBe('etc-passwd');
  });

  it('never names the folder itself or its parent', () => {
    expect(safeSegment('..', 'c1')).toBe('c1');
    expect(safeSegment('.', 'c1')).toBe('c1');
    expect(safeSegment('...hidden')).toBe('hidden');
    expect(safeSegment('name. . ')).toBe('name');
  });

  it('drops control characters and the characters Windows forbids', () => {
    expect(safeSegment('left\u0000side\u001f\u007f')).toBe('left-side-');
    expect(safeSegment('a:b*c?d"e<f>g|h')).toBe('a-b-c-d-e-f-g-h');
  });

  it('keeps letters of any script, spaces and commas', () => {
    expect(safeSegment('Küche, Schrank 3')).toBe('Küche, Schrank 3');
  });

  it('avoids the names Windows reserves', () => {
    expect(safeSegment('CON')).toBe('_CON');
    expect(safeSegment('lpt1.txt')).toBe('_lpt1.txt');
  });

  it('falls back when nothing is left, and cuts long names', () => {
    expect(safeSegment('///', 'panel:7')).toBe('panel-7');
    expect(safeSegment('', '')).toBe('unnamed');
    expect([...safeSegment('x'.repeat(300))]).toHaveLength(80);
  });
});

describe('UniqueNames', () => {
  it('numbers a name already taken in the folder, without regard to case', () => {
    const names = new UniqueNames();
    expect(names.take('Shelf')).toBe('Shelf');
    expect(names.take('shelf')).toBe('shelf (2)');
    expect(names.take('Shelf')).toBe('Shelf (3)');
  });
});
