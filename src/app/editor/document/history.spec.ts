import { describe, expect, it } from 'vitest';
import { bailToMark, commitMark, preview, record, redo, setMark, startHistory, undo, HISTORY_LIMIT } from './history';

describe('history', () => {
  it('undoes and redoes recorded steps, a new step dropping the redo', () => {
    let h = record(record(startHistory('a'), 'b'), 'c');
    h = undo(h);
    expect(h.present).toBe('b');
    expect(redo(h).present).toBe('c');
    h = record(h, 'd');
    expect(h.future).toEqual([]);
    expect(undo(undo(h)).present).toBe('a');
  });

  it('records a whole drag as one step from its mark', () => {
    let h = setMark(startHistory('start'));
    h = preview(preview(preview(h, 'm1'), 'm2'), 'end');
    expect(h.past).toEqual([]);
    h = commitMark(h);
    expect(h).toEqual({ past: ['start'], present: 'end', future: [] });
    expect(undo(h).present).toBe('start');
  });

  it('returns to the mark on Escape without recording anything', () => {
    const h = bailToMark(preview(setMark(record(startHistory('a'), 'b')), 'moved'));
    expect(h).toEqual({ past: ['a'], present: 'b', future: [] });
  });

  it('records nothing for a click that moved nothing, and keeps a bounded past', () => {
    expect(commitMark(setMark(startHistory('a'))).past).toEqual([]);
    let h = startHistory(0);
    for (let i = 1; i <= HISTORY_LIMIT + 10; i++) h = record(h, i);
    expect(h.past).toHaveLength(HISTORY_LIMIT);
  });
});
