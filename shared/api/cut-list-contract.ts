import * as z from 'zod';
import { panelRole } from '../model/job-document';
import { CUT_LIST_COLUMNS } from '../cut-list/cut-list-columns';

/**
 * The cut list's part of the HTTP API. POST /api/jobs/:jobId/cut-list/preview takes the CSV as the
 * multipart field "file" and answers what it would create, writing nothing; POST /api/jobs/:jobId/cut-list
 * takes the same file and creates its panels, all or none. The import reads the file again rather than
 * trusting rows a client sends back, so what is stored is what the server's own reading of the file gives.
 */

const cellNumber = z.number().nullable();

export const cutListRow = z.object({
  row: z.number().int(),
  name: z.string(),
  width: cellNumber,
  height: cellNumber,
  thickness: cellNumber,
  material: z.string().nullable(),
  quantity: cellNumber,
  role: panelRole,
  cells: z.record(z.enum(CUT_LIST_COLUMNS), z.string()),
  errors: z.array(z.string()),
});
export type CutListRowAnswer = z.output<typeof cutListRow>;

export const cutListPreview = z.object({
  fileName: z.string(),
  rows: z.array(cutListRow),
  problems: z.array(z.string()),
  /** Panels the valid rows would create. */
  panelCount: z.number().int(),
  /** Rows with at least one error. */
  rowsWithErrors: z.number().int(),
});
export type CutListPreview = z.output<typeof cutListPreview>;

export const cutListImported = z.object({ panelCount: z.number().int() });
export type CutListImported = z.output<typeof cutListImported>;
