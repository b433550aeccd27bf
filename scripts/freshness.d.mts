/** The newest modification time under a file or folder, the folder's own included. */
export declare function newest(path: string): number;
/** Whether `built` exists and nothing of `inputs` (files or folders under `root`) has changed since it was written. */
export declare function builtAfter(built: string, inputs: readonly string[], root: string): boolean;
/** npm's record of the installed packages, rewritten by every install. */
export declare const INSTALLED_PACKAGES: string;
/** What a bundle's freshness is judged by, from esbuild's list of the files it read. */
export declare function bundleInputs(files: readonly string[]): string[];
