/** The material-symbols package's variable font, whole. */
export declare const FULL_FONT: string;
/** The font the app ships, cut to the icons its sources name. */
export declare const SUBSET_FONT: string;
/** The icon names a template's `<mat-icon>` elements hold. */
export declare function iconsInTemplate(template: string): string[];
/** Every icon the app's sources name, with the files naming it. */
export declare function iconsInSources(known: ReadonlySet<string>): Map<string, string[]>;
/** Every icon name the full font knows. */
export declare function knownIcons(): Set<string>;
/** The icons that a font (woff2 bytes) cannot draw, each as "name (files)". */
export declare function missingIcons(fontBytes: Uint8Array, used: Iterable<[string, string[]]>): string[];
/** Writes the subset when it changed. */
export declare function makeIconFont(): Promise<{ names: string[]; bytes: number; changed: boolean }>;
