import * as z from 'zod';
import type { ParseResult } from '../model/parse-job';
import { formatIssues } from '../model/validation-messages';
import { fitting, type Catalog, type Fitting } from './fitting';

/** A catalog file: one family of fittings, built in or a shop's own. */
export const fittingFile = z
  .object({ fittings: z.array(fitting).min(1, 'a catalog file needs at least one fitting').max(1000) })
  .superRefine((file, ctx) => {
    const seen = new Set<string>();
    file.fittings.forEach((f, i) => {
      if (seen.has(f.id)) ctx.addIssue({ code: 'custom', path: ['fittings', i, 'id'], message: `duplicate id "${f.id}"` });
      seen.add(f.id);
    });
  });

/**
 * Reads a catalog file and reports every problem by its path (`fittings[3].bores[1].diameter: must be
 * greater than 0`). Never throws on bad input.
 */
export function parseFittingFile(input: unknown): ParseResult<Fitting[]> {
  const result = fittingFile.safeParse(input);
  return result.success ? { ok: true, value: result.data.fittings } : { ok: false, errors: formatIssues(result.error) };
}

/** Indexes fittings by id. */
export function catalogOf(fittings: readonly Fitting[]): Catalog {
  return new Map(fittings.map((f) => [f.id, f]));
}

/**
 * Reads what a shop imports: one fitting, or a catalog file `{ fittings: [...] }`. Problems are led by
 * their path in what was sent (`bores[0].diameter` for one fitting, `fittings[2].bores[0].diameter` for
 * a file). Never throws on bad input.
 */
export function parseFittingImport(input: unknown): ParseResult<Fitting[]> {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    return { ok: false, errors: ['send one fitting as a JSON object, or a catalog file { "fittings": [...] }'] };
  }
  if ('fittings' in input) return parseFittingFile(input);
  const result = fitting.safeParse(input);
  return result.success ? { ok: true, value: [result.data] } : { ok: false, errors: formatIssues(result.error) };
}
