import { httpResource } from '@angular/common/http';
import { computed, inject, Injectable } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { ActivatedRoute } from '@angular/router';
import { map } from 'rxjs';
import { jobDetail, PanelRecord } from '../../../shared/api/contract';
import { PanelStatus } from '../../../shared/model/job-document';
import { describeError } from '../core/api-problem';
import { jobDocumentOf } from '../ui/job-cautions';
import { JobChanges, JobsApi, jobUrl, PanelFields } from './jobs-api';

/** One job as its page shows it, following the `:jobId` of the route, and the changes made to its panels. */
@Injectable()
export class JobStore {
  private readonly api = inject(JobsApi);

  private readonly jobId = toSignal(inject(ActivatedRoute).paramMap.pipe(map((params) => Number(params.get('jobId')))));
  private readonly detail = httpResource(
    () => {
      const id = this.jobId();
      return id !== undefined && Number.isInteger(id) && id > 0 ? jobUrl(id) : undefined;
    },
    { parse: (raw) => jobDetail.parse(raw) },
  );
  private readonly loaded = computed(() => (this.detail.hasValue() ? this.detail.value() : undefined));
  private readonly materialNames = computed(() => new Map(this.materials().map((m) => [m.id, m.name])));

  readonly job = computed(() => this.loaded()?.job);
  readonly materials = computed(() => this.loaded()?.materials ?? []);
  readonly carcasses = computed(() => this.loaded()?.carcasses ?? []);
  readonly panels = computed(() => this.loaded()?.panels ?? []);
  /** The job as the shared rules read it (cautions). */
  readonly document = computed(() => {
    const detail = this.loaded();
    return detail && jobDocumentOf(detail);
  });
  readonly loading = this.detail.isLoading;
  readonly loadError = computed(() => {
    if (this.jobId() !== undefined && this.detail.status() === 'idle') return 'There is no job at this address.';
    const error = this.detail.error();
    return error === undefined ? null : describeError(error);
  });

  materialName(materialId: string): string {
    return this.materialNames().get(materialId) ?? materialId;
  }

  reload(): void {
    this.detail.reload();
  }

  /** Rejects with a 409 ApiProblem when someone else changed the job since it was loaded. */
  async updateJob(changes: JobChanges): Promise<void> {
    await this.api.updateJob(this.requireJob(), changes);
    this.detail.reload();
  }

  async addPanel(fields: PanelFields): Promise<PanelRecord> {
    const added = await this.api.addPanel(this.requireJob().id, fields);
    this.changePanels((panels) => [...panels, added]);
    return added;
  }

  /** Rejects with a 409 ApiProblem when someone else saved the panel since it was loaded. */
  async updatePanel(panel: PanelRecord, fields: PanelFields): Promise<PanelRecord> {
    return this.replacePanel(await this.api.updatePanel(panel, fields));
  }

  async setPanelStatus(panel: PanelRecord, status: PanelStatus): Promise<PanelRecord> {
    return this.replacePanel(await this.api.setPanelStatus(panel, status));
  }

  async deletePanel(panel: PanelRecord): Promise<void> {
    await this.api.deletePanel(panel);
    this.changePanels((panels) => panels.filter((p) => p.dbId !== panel.dbId));
  }

  private replacePanel(saved: PanelRecord): PanelRecord {
    this.changePanels((panels) => panels.map((p) => (p.dbId === saved.dbId ? saved : p)));
    return saved;
  }

  private changePanels(change: (panels: PanelRecord[]) => PanelRecord[]): void {
    this.detail.update((detail) => detail && { ...detail, panels: change(detail.panels) });
  }

  private requireJob() {
    const job = this.job();
    if (job === undefined) throw new Error('The job is not loaded yet.');
    return job;
  }
}
