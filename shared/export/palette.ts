import { fittingPurpose } from '../catalog/fitting';
import type { BorePurpose } from '../layout/bore';

/** How a purpose is drawn: its colour, and a letter so that colour never carries the meaning alone. */
export interface PurposeStyle {
  color: string;
  letter: string;
  label: string;
}

/**
 * The bore palette of design.md §6, shared by every drawing so that screens, maps and labels agree.
 * Each purpose also has its own letter, for colour-blind readers and black-and-white prints.
 */
export const PURPOSE_STYLES: Readonly<Record<BorePurpose, PurposeStyle>> = {
  construction: { color: '#5B6770', letter: 'C', label: 'construction' },
  'hinge-cup': { color: '#00897B', letter: 'H', label: 'hinge cup' },
  'mounting-plate': { color: '#3949AB', letter: 'M', label: 'mounting plate' },
  'shelf-pin': { color: '#C77C02', letter: 'S', label: 'shelf pin' },
  'lift-mechanism': { color: '#AD1457', letter: 'L', label: 'lift mechanism' },
  runner: { color: '#2E7D32', letter: 'R', label: 'runner' },
  loose: { color: '#757575', letter: 'B', label: 'loose bore (drawn by hand)' },
};

/** Purposes in the order a legend lists them: the catalog's order, then bores drawn by hand. */
export const PURPOSE_ORDER: readonly BorePurpose[] = [...fittingPurpose.options, 'loose'];

/** Ink for lines and text that carry no purpose. */
export const INK = '#222222';
/** Secondary ink: dimensions, captions, table rules. */
export const MUTED = '#666666';
/** A finding that is an error (design.md §6). */
export const ERROR_RED = '#D32F2F';
