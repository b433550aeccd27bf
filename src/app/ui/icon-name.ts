import type { MaterialSymbol } from 'material-symbols';

/**
 * The name of a Material Symbols icon, for icons chosen in code rather than written in a template. The
 * icon font is cut to the icons the sources name (scripts/icon-font.mjs): it takes the names from the
 * literals of files that use this type, and the type refuses a name the font does not have.
 */
export type IconName = MaterialSymbol;
