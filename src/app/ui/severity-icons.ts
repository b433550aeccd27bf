import type { Severity } from '../../../shared/checks';

/** The Material Symbols icon of each finding severity, alike wherever findings are listed. */
export const SEVERITY_ICONS: Record<Severity, string> = { error: 'error', warning: 'warning', note: 'info' };
