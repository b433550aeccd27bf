import { describe, expect, it } from 'vitest';
import { editorAction } from './editor-keys';

const press = (key: string, more: Partial<Record<'ctrlKey' | 'metaKey' | 'shiftKey' | 'altKey', boolean>> = {}) =>
  editorAction({ key, ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...more });

describe('editorAction', () => {
  it('nudges with the arrows, up being +y, a pitch with Shift', () => {
    expect(press('ArrowUp')).toEqual({ kind: 'nudge', dx: 0, dy: 1, pitches: false });
    expect(press('ArrowLeft', { shiftKey: true })).toEqual({ kind: 'nudge', dx: -1, dy: 0, pitches: true });
  });

  it('undoes with Ctrl+Z or Cmd+Z and redoes with Shift or Y', () => {
    expect(press('z', { ctrlKey: true })).toEqual({ kind: 'undo' });
    expect(press('Z', { metaKey: true, shiftKey: true })).toEqual({ kind: 'redo' });
    expect(press('y', { ctrlKey: true })).toEqual({ kind: 'redo' });
  });

  it('maps the letters and leaves other keys to the browser', () => {
    expect(press('R')).toEqual({ kind: 'rotate' });
    expect(press('m')).toEqual({ kind: 'mirror' });
    expect(press('Delete')).toEqual({ kind: 'delete' });
    expect(press('c', { ctrlKey: true })).toEqual({ kind: 'copy' });
    expect(press('Tab')).toBeUndefined();
    expect(press('r', { altKey: true })).toBeUndefined();
  });
});
