import { httpResource } from '@angular/common/http';
import { computed, inject, Injectable } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { ActivatedRoute } from '@angular/router';
import { map } from 'rxjs';
import { jobDetail, type PanelRecord } from '../../../shared/api/contract';
import { jobDocument, type Panel } from '../../../shared/model/job-document';
import { describeError } from '../core/api-problem';
import { jobDocumentUrl, jobUrl } from '../jobs/jobs-api';

/** A panel record without what only the database knows. */
export function panelOf({ dbId: _dbId, version: _version, updatedAt: _updatedAt, statusBy: _statusBy, statusAt: _statusAt, ...panel }: PanelRecord): Panel {
  return panel;
}

const idList = (value: string | null): string[] => (value ? value.split(',').filter(Boolean) : []);

const positiveId = (value: string | null) => {
  const n = Number(value);
  return Number.isInteger(n) && n > 0 ? n : undefined;
};

/**
 * What the editor loads for the `:jobId/panels/:panelId` in its route: the job with its panels' versions,
 * and the job document, whose system and shop limits the checks need.
 */
@Injectable()
export class EditorSource {
  private readonly params = toSignal(inject(ActivatedRoute).paramMap.pipe(map((p) => ({ jobId: positiveId(p.get('jobId')), panelId: positiveId(p.get('panelId')) }))));
  /** What to show on opening: the bores and placements a finding on the job page concerns (`?bores=…&placements=…`). */
  readonly focus = toSignal(
    inject(ActivatedRoute).queryParamMap.pipe(map((q) => ({ bores: idList(q.get('bores')), placements: idList(q.get('placements')) }))),
    { initialValue: { bores: [], placements: [] } },
  );
  readonly jobId = computed(() => this.params()?.jobId);
  readonly panelDbId = computed(() => this.params()?.panelId);

  private readonly detail = httpResource(() => (this.jobId() ? jobUrl(this.jobId()!) : undefined), { parse: (raw) => jobDetail.parse(raw) });
  private readonly document = httpResource(() => (this.jobId() ? jobDocumentUrl(this.jobId()!) : undefined), {
    parse: (raw) => jobDocument.parse(raw),
  });

  readonly jobDetail = computed(() => (this.detail.hasValue() ? this.detail.value() : undefined));
  readonly job = computed(() => (this.document.hasValue() ? this.document.value() : undefined));
  /** The panel as last loaded: the editor's history starts over whenever this changes. */
  readonly record = computed(() => this.jobDetail()?.panels.find((p) => p.dbId === this.panelDbId()));
  /** That panel as a document panel: the editor's history starts from it, and saving compares with it. */
  readonly panel = computed(() => {
    const record = this.record();
    return record && panelOf(record);
  });
  readonly loading = computed(() => this.detail.isLoading() || this.document.isLoading());
  readonly loadError = computed(() => {
    const error = this.detail.error() ?? this.document.error();
    if (error !== undefined) return describeError(error);
    if (this.jobDetail() && !this.record()) return 'This job has no panel at this address. It may have been deleted.';
    if (this.params() && (!this.jobId() || !this.panelDbId())) return 'There is no panel at this address.';
    return null;
  });

  reload(): void {
    this.detail.reload();
    this.document.reload();
  }
}
