import type { Severity } from '../../../shared/checks';
import type { IconName } from './icon-name';

/** The Material Symbols icon of each finding severity, alike wherever findings are listed. */
export const SEVERITY_ICONS: Record<Severity, IconName> = { error: 'error', warning: 'warning', note: 'info' };
