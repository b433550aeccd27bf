import { httpResource } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import { jobList, JobSummary } from '../../../shared/api/contract';
import { describeError } from '../core/api-problem';
import { JobChanges, JobCreate, JobsApi, jobsUrl } from './jobs-api';

/** The jobs table: which jobs are listed, and the changes made from it. */
@Injectable()
export class JobListStore {
  private readonly api = inject(JobsApi);

  private readonly archivedShown = signal(false);
  private readonly list = httpResource(
    () => ({ url: jobsUrl, params: { archived: this.archivedShown() } }),
    { parse: (raw) => jobList.parse(raw).jobs },
  );

  readonly showArchived = this.archivedShown.asReadonly();
  readonly jobs = computed<JobSummary[]>(() => (this.list.hasValue() ? this.list.value() : []));
  readonly loading = this.list.isLoading;
  readonly loadError = computed(() => {
    const error = this.list.error();
    return error === undefined ? null : describeError(error);
  });

  setShowArchived(shown: boolean): void {
    this.archivedShown.set(shown);
  }

  reload(): void {
    this.list.reload();
  }

  async createJob(body: JobCreate): Promise<JobSummary> {
    const job = await this.api.createJob(body);
    this.list.reload();
    return job;
  }

  async updateJob(job: JobSummary, changes: JobChanges): Promise<JobSummary> {
    const updated = await this.api.updateJob(job, changes);
    this.list.reload();
    return updated;
  }
}
