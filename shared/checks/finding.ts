import * as z from 'zod';
import { fittingId, fittingPurpose } from '../catalog/fitting';

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
  'hinge-end-distance',
  'hole-shared',
  'sides-mismatched',
  'lift-out-of-range',
  'shelf-sag',
  'unknown-fitting',
]);

/** How bad a finding is: an error stops the panel being drilled as planned. */
export const severity = z.enum(['error', 'warning', 'note']);

const point = { x: z.number(), y: z.number() };

/**
 * One change a fix makes to the job document, in the frame of the panel it names (seen on face A): a
 * placement's anchor or a loose face bore's centre moved to (x, y), a placement given another fitting, or
 * one side's fittings of some purposes copied onto the other side of its carcass in place of its own.
 */
export const fixEdit = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('move-placement'), panel: z.string(), placement: z.string(), ...point }),
  z.object({ kind: z.literal('move-bore'), panel: z.string(), bore: z.string(), ...point }),
  z.object({ kind: z.literal('set-fitting'), panel: z.string(), placement: z.string(), fitting: fittingId }),
  z.object({ kind: z.literal('copy-side'), from: z.string(), to: z.string(), purposes: z.array(fittingPurpose).min(1) }),
]);

/** A fix the checks applied to a copy of the job and found to remove its finding without adding an error or a warning. */
export const fix = z.object({ message: z.string(), edits: z.array(fixEdit).min(1) });

/**
 * What a check reports: plain words for the bench, the bores and placements concerned, the fixes that were
 * checked before they were offered (design.md §2), and advice for what only the user can decide.
 */
export const finding = z.object({
  code: findingCode,
  severity,
  message: z.string(),
  panel: z.string(),
  bores: z.array(z.string()),
  placements: z.array(z.string()),
  fixes: z.array(fix),
  /** What to do when no fix could be checked: a decision the user must make, in plain words. */
  advice: z.string().optional(),
});

export type FindingCode = z.output<typeof findingCode>;
export type Severity = z.output<typeof severity>;
export type FixEdit = z.output<typeof fixEdit>;
export type Fix = z.output<typeof fix>;
export type Finding = z.output<typeof finding>;

/**
 * A finding as a check first makes it: the fixes it proposes, in groups of alternatives (move the hinge;
 * move the plate), each group's candidates in order of preference (the nearest clear hole, the next …).
 * The checks' runner keeps the first candidate of each group that passes, and the advice when none does.
 * Candidates are made only when asked for: the checks of a fix's trial run never need their own.
 */
export interface DraftFinding extends Omit<Finding, 'fixes'> {
  candidates: () => Fix[][];
}

const SEVERITY_RANK: Record<Severity, number> = { error: 0, warning: 1, note: 2 };

function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** A fixed order for one panel's findings, worst first, that does not depend on the order of the bores. */
export function compareFindings(a: Omit<Finding, 'fixes'>, b: Omit<Finding, 'fixes'>): number {
  return (
    SEVERITY_RANK[a.severity] - SEVERITY_RANK[b.severity] ||
    compareText(a.code, b.code) ||
    compareText(a.bores.join(' '), b.bores.join(' ')) ||
    compareText(a.placements.join(' '), b.placements.join(' ')) ||
    compareText(a.message, b.message)
  );
}

/** What a finding is about, whatever its words: the same key before and after a fix means it is still there. */
export function findingKey(f: Pick<Finding, 'code' | 'panel' | 'bores' | 'placements'>): string {
  return `${f.code}|${f.panel}|${f.bores.join(' ')}|${f.placements.join(' ')}`;
}
