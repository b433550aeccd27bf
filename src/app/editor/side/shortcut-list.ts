import { ChangeDetectionStrategy, Component } from '@angular/core';

/** The editor's keys, in one place, so that every action can be found without a mouse. */
export const SHORTCUTS: readonly { keys: string; action: string }[] = [
  { keys: 'Arrow keys', action: 'Move the selection 1 mm' },
  { keys: 'Shift + arrow keys', action: 'Move the selection one pitch (32 mm)' },
  { keys: 'R', action: 'Rotate a quarter turn' },
  { keys: 'M', action: 'Mirror' },
  { keys: 'Delete', action: 'Delete the selection' },
  { keys: 'Ctrl + A', action: 'Select everything' },
  { keys: 'Ctrl + C, Ctrl + V', action: 'Copy, paste one pitch higher' },
  { keys: 'Ctrl + Z, Ctrl + Shift + Z', action: 'Undo, redo' },
  { keys: 'Escape', action: 'Cancel a drag; else clear the selection' },
  { keys: 'Alt while dragging', action: 'Move freely, without snapping' },
  { keys: 'Space + drag, middle button', action: 'Pan' },
  { keys: 'Wheel, + and −', action: 'Zoom; 0 fits the panel' },
  { keys: 'Ctrl + S', action: 'Save now' },
];

@Component({
  changeDetection: ChangeDetectionStrategy.OnPush,
  selector: 'bw-shortcut-list',
  templateUrl: './shortcut-list.html',
  styleUrl: './shortcut-list.scss',
})
export class ShortcutList {
  protected readonly shortcuts = SHORTCUTS;
}
