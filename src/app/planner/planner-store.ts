import { HttpClient, httpResource } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { ActivatedRoute } from '@angular/router';
import { firstValueFrom, map } from 'rxjs';
import { jobDetail } from '../../../shared/api/contract';
import { plannedCarcass, type PlannedCarcass } from '../../../shared/api/plan-contract';
import { builtinCatalog } from '../../../shared/catalog/builtin-catalog';
import type { CarcassPlanInputData } from '../../../shared/planner/carcass-plan-input';
import { planCarcass } from '../../../shared/planner/plan-carcass';
import { jobUrl } from '../jobs/jobs-api';

/**
 * The planner's state: the job it plans for (its materials, system and limits go into every plan, as
 * the server puts them), the description being typed, the plan the shared planner makes of it, and
 * the carcass once added.
 */
@Injectable()
export class PlannerStore {
  private readonly http = inject(HttpClient);

  readonly jobId = toSignal(inject(ActivatedRoute).paramMap.pipe(map((params) => Number(params.get('jobId')))), { initialValue: 0 });
  private readonly detail = httpResource(() => (this.jobId() > 0 ? jobUrl(this.jobId()) : undefined), { parse: (raw) => jobDetail.parse(raw) });
  private readonly description = signal<CarcassPlanInputData | undefined>(undefined);

  readonly job = computed(() => (this.detail.hasValue() ? this.detail.value().job : undefined));
  readonly materials = computed(() => (this.detail.hasValue() ? this.detail.value().materials : []));
  readonly usedIds = computed(() => new Set(this.detail.hasValue() ? this.detail.value().carcasses.map((c) => c.id) : []));
  readonly result = computed(() => {
    const input = this.description();
    const materials = this.materials();
    if (!input || materials.length === 0) return undefined;
    return planCarcass({ ...input, materials }, builtinCatalog());
  });
  readonly plan = computed(() => {
    const result = this.result();
    return result?.ok ? result.plan : undefined;
  });
  readonly adding = signal(false);
  readonly added = signal<PlannedCarcass | undefined>(undefined);

  describe(input: CarcassPlanInputData): void {
    this.description.set(input);
  }

  /** Adds the planned carcass with all its panels to the job, in one request: all of it or none. */
  async addToJob(): Promise<PlannedCarcass> {
    const input = this.description();
    if (!input) throw new Error('Nothing to add: describe the carcass first.');
    this.adding.set(true);
    try {
      const answer = plannedCarcass.parse(await firstValueFrom(this.http.post(`${jobUrl(this.jobId())}/plan`, input)));
      this.added.set(answer);
      this.detail.reload();
      return answer;
    } finally {
      this.adding.set(false);
    }
  }
}
