import { checkPanel, type Finding } from '../../../shared/checks';
import type { Catalog } from '../../../shared/catalog/fitting';
import type { JobDocument, Panel } from '../../../shared/model/job-document';
import type { LengthUnit } from '../../../shared/units/length-unit';

/**
 * One ask of the live checks in the worker: the panel as a drag has it now. What a drag leaves alone
 * (the job, the catalog, the panel's loose bores, thousands on a perforated back) is sent only when it
 * differs from what the worker was last sent, so that a move copies a few placements, not the panel.
 */
export interface LiveCheckRequest {
  seq: number;
  job?: JobDocument;
  catalog?: Catalog;
  bores?: Panel['bores'];
  panel: Omit<Panel, 'bores'>;
  unit: LengthUnit;
}

/** The findings of the request numbered `seq`. */
export interface LiveCheckAnswer {
  seq: number;
  findings: Finding[];
}

/** What the worker holds between requests. */
export interface LiveCheckState {
  job?: JobDocument;
  catalog?: Catalog;
  bores?: Panel['bores'];
}

/** The worker's state once a request has arrived: what it carries replaces what was held. */
export function receive(state: LiveCheckState, request: LiveCheckRequest): LiveCheckState {
  return { job: request.job ?? state.job, catalog: request.catalog ?? state.catalog, bores: request.bores ?? state.bores };
}

/** The full check of the requested panel (the same `checkPanel` the editor runs at rest), without fixes. */
export function answer(state: LiveCheckState, request: LiveCheckRequest): LiveCheckAnswer {
  const { job, catalog, bores } = state;
  if (!job || !catalog || !bores) throw new Error('Live checks: the first request must carry the job, the catalog and the bores.');
  return { seq: request.seq, findings: checkPanel(job, { ...request.panel, bores }, catalog, { fixes: false, unit: request.unit }) };
}

/**
 * Builds requests for one worker, leaving out what it already holds (compared by reference: the editor's
 * documents are immutable, so an unchanged part is the same object).
 */
export class LiveCheckRequests {
  private sent: LiveCheckState = {};
  private seq = 0;

  next(job: JobDocument, panel: Panel, catalog: Catalog, unit: LengthUnit): LiveCheckRequest {
    const { bores, ...rest } = panel;
    const request: LiveCheckRequest = { seq: ++this.seq, panel: rest, unit };
    if (job !== this.sent.job) request.job = job;
    if (catalog !== this.sent.catalog) request.catalog = catalog;
    if (bores !== this.sent.bores) request.bores = bores;
    this.sent = { job, catalog, bores };
    return request;
  }
}
