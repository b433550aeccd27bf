import { httpResource } from '@angular/common/http';
import { computed, inject, Injectable } from '@angular/core';
import { jobFindings } from '../../../shared/api/pack-contract';
import { jobFindingsUrl } from '../packs/pack-api';
import { AuthStore } from '../auth/auth-store';
import { JobStore } from './job-store';

/** Errors and warnings of one panel. */
export interface PanelFindingCounts {
  errors: number;
  warnings: number;
}

/**
 * The checks' findings of the job on the page, for the pack's verdict, the findings list and the panel table
 * alike: asked for again whenever the page's panels change (an edit, a status, a cut list), so they never
 * speak of panels as they were.
 */
@Injectable()
export class JobFindingsStore {
  private readonly job = inject(JobStore);
  private readonly auth = inject(AuthStore);
  private readonly resource = httpResource(
    () => {
      const job = this.job.job();
      this.job.panels();
      // The server words the messages in the user's units: a new choice asks again.
      this.auth.units();
      return job ? jobFindingsUrl(job.id) : undefined;
    },
    { parse: (raw) => jobFindings.parse(raw) },
  );

  readonly value = computed(() => (this.resource.hasValue() ? this.resource.value() : undefined));
  readonly loading = this.resource.isLoading;
  readonly byPanel = computed(() => {
    const counts = new Map<string, PanelFindingCounts>();
    for (const f of this.value()?.findings ?? []) {
      const c = counts.get(f.panel) ?? { errors: 0, warnings: 0 };
      if (f.severity === 'error') c.errors++;
      if (f.severity === 'warning') c.warnings++;
      counts.set(f.panel, c);
    }
    return counts;
  });
}
