import type { CutListImported, CutListPreview } from '../../shared/api/cut-list-contract';
import type { User } from '../../shared/api/contract';
import { cutListPanels } from '../../shared/cut-list/cut-list-panels';
import { isImportable, parseCutList, type CutList } from '../../shared/cut-list/parse-cut-list';
import { MAX_JOB_PANELS } from '../../shared/model/job-document';
import { recordActivity } from '../activity/activity.repository';
import type { Database } from '../db/client';
import { panelDraft } from '../db/job-mapping';
import { AppError } from '../http/app-error';
import { nextDocumentId } from '../jobs/document-ids';
import { touchJob } from '../jobs/jobs.repository';
import { writableJob } from '../jobs/writable-job';
import { insertPanel, jobPanelRefs } from '../panels/panels.repository';

/** An uploaded cut list: its bytes and the name the client gave it. */
export interface CutListFile {
  bytes: Buffer;
  fileName: string;
}

/**
 * The file's text. Spreadsheets offer "CSV" in a legacy code page and "CSV UTF-8"; only the second
 * reads back the names as written, so anything else is refused rather than guessed at.
 */
function textOf(file: CutListFile): string {
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(file.bytes);
  } catch {
    throw new AppError(400, 'invalid-cut-list', 'The file is not UTF-8 text. Save the cut list from the spreadsheet as "CSV UTF-8" and try again.', {
      fields: { file: 'is not UTF-8 text' },
    });
  }
}

function preview(file: CutListFile, list: CutList): CutListPreview {
  return { fileName: file.fileName, ...list, rowsWithErrors: list.rows.filter((r) => r.errors.length > 0).length };
}

/** What importing the file would create, with every row's errors; writes nothing, but an archived job, which cannot import, is told so at once. */
export async function previewCutList(db: Database, jobId: number, file: CutListFile): Promise<CutListPreview> {
  const job = await writableJob(db, jobId);
  return preview(file, parseCutList(textOf(file), job.materials));
}

/**
 * Every problem of a list that cannot be imported, one line each: the file's first, then each bad row's
 * by its row number. The client shows the file's name before the message, so the message does not repeat it.
 */
function refusal(list: CutList): AppError {
  const bad = list.rows.filter((r) => r.errors.length > 0);
  const details = [...list.problems, ...bad.flatMap((r) => r.errors.map((e) => `row ${r.row}: ${e}`))];
  const what = bad.length > 0 ? `has errors in ${bad.length} of its ${list.rows.length} rows` : 'cannot be read as a cut list';
  return new AppError(400, 'invalid-cut-list', `The cut list ${what}; nothing was imported.`, { details });
}

/**
 * Creates the cut list's panels, every copy of every row, in one transaction with one activity entry:
 * a list with any error is refused whole, so a bad row never leaves half a cut list behind. Each panel
 * gets a fresh id from its role (`shelf-4`) and belongs to no carcass.
 */
export async function importCutList(db: Database, actor: User, jobId: number, file: CutListFile): Promise<CutListImported> {
  const text = textOf(file);
  return db.transaction(async (tx) => {
    const job = await writableJob(tx, jobId);
    const list = parseCutList(text, job.materials);
    if (!isImportable(list)) throw refusal(list);
    const panels = cutListPanels(list.rows);
    const taken = new Set((await jobPanelRefs(tx, jobId)).map((p) => p.key));
    if (taken.size + panels.length > MAX_JOB_PANELS) {
      throw new AppError(400, 'invalid-cut-list', `The job has ${taken.size} panels and a job may have at most ${MAX_JOB_PANELS}; this list would add ${panels.length}. Nothing was imported.`);
    }
    for (const fields of panels) {
      const key = nextDocumentId(fields.role, taken);
      taken.add(key);
      await insertPanel(tx, { ...panelDraft({ ...fields, id: key, status: 'planned', placements: [], bores: [] }), jobId, carcassId: null });
    }
    await touchJob(tx, jobId);
    await recordActivity(tx, { userId: actor.id, jobId, action: 'cut-list.imported', details: { file: file.fileName, rows: list.rows.length, panels: panels.length } });
    return { panelCount: panels.length };
  });
}
