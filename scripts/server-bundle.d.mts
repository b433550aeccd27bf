/** The bundles scripts/server-bundle.mjs builds. */
export declare const ENTRIES: { main: string; cli: string };
/** Whether the bundle exists and no file it was made from is newer than it. */
export declare function isFresh(name: keyof typeof ENTRIES): boolean;
/** Builds one bundle and puts it in place. */
export declare function buildBundle(name: keyof typeof ENTRIES): Promise<void>;
/** The bundle's address to import, built first when it is missing or older than its sources. */
export declare function freshBundle(name: keyof typeof ENTRIES): Promise<string>;
