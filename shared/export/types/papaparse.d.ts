// The part of papaparse that shared/ uses (writing CSV in export/, reading a cut list in cut-list/), for tsconfig.shared.json only. The package's own types begin
// with `/// <reference types="node" />`, which would bring Node's globals into shared/ and let a Node-only
// API pass the platform-free check unnoticed. tsconfig.server.json compiles the same calls against the
// package's own types, so a mismatch here still fails a type check.
export interface UnparseConfig {
  quotes?: boolean | boolean[];
  delimiter?: string;
  newline?: string;
  header?: boolean;
  escapeFormulae?: boolean | RegExp;
}

export interface UnparseObject {
  fields: string[];
  data: unknown[][];
}

export function unparse(data: unknown[][] | UnparseObject, config?: UnparseConfig): string;

export interface ParseConfig {
  delimiter?: string;
  skipEmptyLines?: boolean | 'greedy';
}

export interface ParseError {
  type: string;
  code: string;
  message: string;
  row?: number;
}

export interface ParseResult<T> {
  data: T[];
  errors: ParseError[];
}

/** Parsing a string only (cut-list import); every cell stays a string without `dynamicTyping`. */
export function parse<T>(input: string, config?: ParseConfig): ParseResult<T>;

declare const Papa: { unparse: typeof unparse; parse: typeof parse };
export default Papa;
