import * as z from 'zod';

/**
 * Finding codes (design.md §2), stable in the API, the CLI and tests. `unknown-fitting` marks a placement
 * whose fitting is not in the catalog.
 */
export const findingCode = z.enum([
  'bores-overlap',
  'edge-too-close',
  'bore-through',
  'faces-clash',
  'edge-bore-clash',
  'keepouts-overlap',
  'off-grid',
  'outside-panel',
  'hinge-count',
  'hinge-unpaired',
  'lift-out-of-range',
  'shelf-sag',
  'unknown-fitting',
]);

/** How bad a finding is: an error stops the panel being drilled as planned. */
export const severity = z.enum(['error', 'warning', 'note']);

/** What a check reports: plain words for the bench, the bores and placements concerned, a fix where known. */
export const finding = z.object({
  code: findingCode,
  severity,
  message: z.string(),
  panel: z.string(),
  bores: z.array(z.string()),
  placements: z.array(z.string()),
  fix: z
    .object({
      message: z.string(),
      /** Where to move the bore or placement: in the panel's frame, seen on face A. */
      at: z.object({ x: z.number(), y: z.number() }).optional(),
    })
    .optional(),
});

export type FindingCode = z.output<typeof findingCode>;
export type Severity = z.output<typeof severity>;
export type Finding = z.output<typeof finding>;

const SEVERITY_RANK: Record<Severity, number> = { error: 0, warning: 1, note: 2 };

function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** A fixed order for one panel's findings, worst first, that does not depend on the order of the bores. */
export function compareFindings(a: Finding, b: Finding): number {
  return (
    SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity] ||
    compareText(a.code, b.code) ||
    compareText(a.bores.join(' '), b.bores.join(' ')) ||
    compareText(a.placements.join(' '), b.placements.join(' ')) ||
    compareText(a.message, b.message)
  );
}
