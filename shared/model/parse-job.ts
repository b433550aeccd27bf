import * as z from 'zod';
import { JOB_FORMAT, jobDocument, type JobDocument } from './job-document';
import { formatIssues } from './validation-messages';

export type ParseResult<T> = { ok: true; value: T } | { ok: false; errors: string[] };

/**
 * Older formats and how to bring them to the current one. Each step takes a document of one
 * format and returns the next; none exist yet because `borewright.job/1` is the first.
 */
const migrations: Record<string, (doc: Record<string, unknown>) => Record<string, unknown>> = {};

/**
 * Reads a job document of any known format: migrates it to `borewright.job/1`, validates it
 * and reports every problem by its path. Never throws on bad input.
 */
export function parseJobDocument(input: unknown): ParseResult<JobDocument> {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    return { ok: false, errors: ['a job document must be a JSON object'] };
  }
  let doc = input as Record<string, unknown>;
  const seen = new Set<unknown>();
  while (typeof doc['format'] === 'string' && doc['format'] !== JOB_FORMAT && migrations[doc['format']]) {
    if (seen.has(doc['format'])) break;
    seen.add(doc['format']);
    doc = migrations[doc['format']](doc);
  }
  if (doc['format'] !== JOB_FORMAT) {
    return { ok: false, errors: [`format: expected "${JOB_FORMAT}", found ${JSON.stringify(doc['format'] ?? null)}`] };
  }
  const result = jobDocument.safeParse(doc);
  return result.success ? { ok: true, value: result.data } : { ok: false, errors: formatIssues(result.error) };
}

/** The JSON Schema (draft 2020-12) of the job document, for users and other tools. Refinements (unique ids, references) are not expressible there. */
export function jobDocumentJsonSchema(): Record<string, unknown> {
  return z.toJSONSchema(jobDocument, { io: 'input', unrepresentable: 'any' }) as Record<string, unknown>;
}
