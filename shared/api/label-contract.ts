import * as z from 'zod';

/**
 * Panel labels (design.md §6, the bench): the label sheet's query, and the page a label's QR code opens.
 * Shared by the server (which validates the query and prints the links) and the client (which builds both).
 */

/** The most panels one request may name: a large job, a few times over. */
export const MAX_LABELLED_PANELS = 2000;

const panelIdList = z
  .string('must be one comma-separated list: panels=12,13,14')
  .regex(/^[1-9][0-9]{0,9}(,[1-9][0-9]{0,9})*$/, 'must be panel ids separated by commas, as in panels=12,13,14')
  .transform((list) => [...new Set(list.split(',').map(Number))])
  .refine((ids) => ids.length <= MAX_LABELLED_PANELS, `must name at most ${MAX_LABELLED_PANELS} panels`);

/** Which of a job's panels get a label: every one, or those named by database id, or of one carcass, or both at once. */
export const labelsQuery = z.object({
  panels: panelIdList.optional(),
  carcass: z.string('must be one carcass id').min(1, 'must not be empty').max(64).optional(),
});
export type LabelsFilter = z.output<typeof labelsQuery>;

/** The path of a job's label sheets, for these panels or this carcass when given. */
export function labelsPath(jobId: number, filter: { panels?: readonly number[]; carcass?: string } = {}): string {
  const params = [
    ...(filter.panels ? [`panels=${filter.panels.join(',')}`] : []),
    ...(filter.carcass !== undefined ? [`carcass=${encodeURIComponent(filter.carcass)}`] : []),
  ];
  return `/api/jobs/${jobId}/labels.pdf${params.length > 0 ? `?${params.join('&')}` : ''}`;
}

/**
 * The bench page showing one panel, which a label's QR code opens: its drilling map, its files and its
 * status buttons (the page signs the user in first when needed).
 */
export const benchPanelPath = (jobId: number, panelDbId: number) => `/bench?job=${jobId}&panel=${panelDbId}`;
