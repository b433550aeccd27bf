/** What a key press asks of the editor. */
export type EditorAction =
  | { kind: 'nudge'; dx: number; dy: number; pitches: boolean }
  | { kind: 'rotate' | 'mirror' | 'delete' | 'select-all' | 'copy' | 'paste' | 'undo' | 'redo' | 'escape' | 'save' | 'fit' | 'zoom-in' | 'zoom-out' };

const ARROWS: Record<string, [number, number]> = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, 1], ArrowDown: [0, -1] };

/**
 * The editor's keys (listed for users in shortcut-list.ts). Arrows move in the panel's frame: up is
 * +y, as the panel is drawn with its lower edge at the bottom. Ctrl and Cmd are one.
 */
export function editorAction(e: Pick<KeyboardEvent, 'key' | 'ctrlKey' | 'metaKey' | 'shiftKey' | 'altKey'>): EditorAction | undefined {
  const mod = e.ctrlKey || e.metaKey;
  const arrow = ARROWS[e.key];
  if (arrow && !mod) return { kind: 'nudge', dx: arrow[0], dy: arrow[1], pitches: e.shiftKey };
  const key = e.key.toLowerCase();
  if (mod) {
    if (key === 'z') return { kind: e.shiftKey ? 'redo' : 'undo' };
    if (key === 'y') return { kind: 'redo' };
    if (key === 'c') return { kind: 'copy' };
    if (key === 'v') return { kind: 'paste' };
    if (key === 'a') return { kind: 'select-all' };
    if (key === 's') return { kind: 'save' };
    return undefined;
  }
  if (e.altKey) return undefined;
  if (key === 'r') return { kind: 'rotate' };
  if (key === 'm') return { kind: 'mirror' };
  if (e.key === 'Delete' || e.key === 'Backspace') return { kind: 'delete' };
  if (e.key === 'Escape') return { kind: 'escape' };
  if (e.key === '0') return { kind: 'fit' };
  if (e.key === '+' || e.key === '=') return { kind: 'zoom-in' };
  if (e.key === '-') return { kind: 'zoom-out' };
  return undefined;
}
