import { HttpClient, HttpEvent } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom, Observable } from 'rxjs';
import * as z from 'zod';
import {
  jobCreateBody,
  jobList,
  jobSummary,
  JobSummary,
  jobUpdateBody,
  panelFieldsBody,
  panelRecord,
  PanelRecord,
} from '../../../shared/api/contract';
import { PanelStatus } from '../../../shared/model/job-document';

export type JobCreate = z.input<typeof jobCreateBody>;
/** What the user changed; the API adds the version they saw. */
export type JobChanges = Omit<z.input<typeof jobUpdateBody>, 'version'>;
export type PanelFields = z.input<typeof panelFieldsBody>;

export const jobsUrl = '/api/jobs';
export const jobUrl = (jobId: number) => `/api/jobs/${jobId}`;
export const jobDocumentUrl = (jobId: number) => `/api/jobs/${jobId}/document`;
const panelUrl = (panel: Pick<PanelRecord, 'dbId'>) => `/api/panels/${panel.dbId}`;

/**
 * The changes the jobs screens send. Reads go through `httpResource` in the stores; every answer is
 * checked against the contract's schema before anyone sees it.
 */
@Injectable({ providedIn: 'root' })
export class JobsApi {
  private readonly http = inject(HttpClient);

  async createJob(body: JobCreate): Promise<JobSummary> {
    return jobSummary.parse(await firstValueFrom(this.http.post(jobsUrl, body)));
  }

  /** Sends the version the user saw; a job changed since answers 409. */
  async updateJob(job: Pick<JobSummary, 'id' | 'version'>, changes: JobChanges): Promise<JobSummary> {
    const body = { ...changes, version: job.version };
    return jobSummary.parse(await firstValueFrom(this.http.patch(jobUrl(job.id), body)));
  }

  /** Uploads a job document; the events carry upload progress, the last one the new job. */
  importDocument(file: File): Observable<HttpEvent<unknown>> {
    const form = new FormData();
    form.append('file', file, file.name);
    return this.http.post(`${jobsUrl}/import`, form, { reportProgress: true, observe: 'events' });
  }

  async addPanel(jobId: number, fields: PanelFields): Promise<PanelRecord> {
    return panelRecord.parse(await firstValueFrom(this.http.post(`${jobUrl(jobId)}/panels`, fields)));
  }

  /** Sends the version the user saw; a panel changed since answers 409. */
  async updatePanel(panel: PanelRecord, fields: PanelFields): Promise<PanelRecord> {
    const body = { ...fields, version: panel.version };
    return panelRecord.parse(await firstValueFrom(this.http.patch(panelUrl(panel), body)));
  }

  async deletePanel(panel: PanelRecord): Promise<void> {
    await firstValueFrom(this.http.delete(panelUrl(panel), { params: { version: panel.version } }));
  }

  /** Sends the version the mark was made on; a panel changed since answers 409. */
  async setPanelStatus(panel: Pick<PanelRecord, 'dbId' | 'version'>, status: PanelStatus): Promise<PanelRecord> {
    const body = { status, version: panel.version };
    return panelRecord.parse(await firstValueFrom(this.http.patch(`${panelUrl(panel)}/status`, body)));
  }
}
