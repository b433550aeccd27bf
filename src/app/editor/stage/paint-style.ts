import type { Severity } from '../../../../shared/checks';
import { tint } from '../../../../shared/export/bore-marks';
import { INK, MUTED } from '../../../../shared/export/palette';

export { PURPOSE_STYLES, PURPOSE_ORDER } from '../../../../shared/export/palette';
export { INK, MUTED, tint };

/** Finding rings (design.md §6): an error red, a warning orange, a note in muted ink. */
export const RING_COLORS: Readonly<Record<Severity, string>> = { error: '#D32F2F', warning: '#EF6C00', note: MUTED };
/** Face B bores are dashed on screen as on paper; in screen pixels, as strokes do not scale. */
export const FACE_B_DASH_PX = [4, 3];
/** The accent that marks the reference edge and the selection: the app's deep teal. */
export const ACCENT = '#0E6B66';
export const GRID_INK = '#C9C3BA';
export const BOARD_FILL = '#FBF8F3';
export const LABEL_FONT = 'Roboto, system-ui, sans-serif';
