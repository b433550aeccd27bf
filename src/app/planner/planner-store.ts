import { HttpClient, httpResource } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { ActivatedRoute } from '@angular/router';
import { firstValueFrom, map } from 'rxjs';
import { jobDetail } from '../../../shared/api/contract';
import { plannedCarcass, type PlannedCarcass } from '../../../shared/api/plan-contract';
import { carcassPlanInput, type CarcassPlanInputData } from '../../../shared/planner/carcass-plan-input';
import { planCarcass } from '../../../shared/planner/plan-carcass';
import type { ChangedPanelChoice } from '../../../shared/planner/replan';
import { CatalogStore } from '../catalog/catalog-store';
import { Lengths } from '../ui/lengths';
import { jobUrl } from '../jobs/jobs-api';

/**
 * The planner's state: the job it plans for (its materials, system and limits go into every plan, as
 * the server puts them), the description being typed, the plan the shared planner makes of it, and
 * the carcass once added.
 */
@Injectable()
export class PlannerStore {
  private readonly http = inject(HttpClient);
  /** The shop's catalog, as the server plans with it: a shop's own hinge or lift mechanism can be chosen. */
  private readonly catalog = inject(CatalogStore).catalog;
  /** The reasons the plan gives are worded in the member's units, as its figures are shown. */
  private readonly unit = inject(Lengths).unit;

  private readonly route = inject(ActivatedRoute);
  readonly jobId = toSignal(this.route.paramMap.pipe(map((params) => Number(params.get('jobId')))), { initialValue: 0 });
  /** `?carcass=` names a carcass of the job to plan again from the description it was planned from. */
  private readonly againId = toSignal(this.route.queryParamMap.pipe(map((params) => params.get('carcass'))), { initialValue: null });
  private readonly detail = httpResource(() => (this.jobId() > 0 ? jobUrl(this.jobId()) : undefined), { parse: (raw) => jobDetail.parse(raw) });
  private readonly description = signal<CarcassPlanInputData | undefined>(undefined);

  readonly job = computed(() => (this.detail.hasValue() ? this.detail.value().job : undefined));
  private readonly settings = computed(() => (this.detail.hasValue() ? this.detail.value() : undefined));
  readonly materials = computed(() => this.settings()?.materials ?? []);
  /** The description of the carcass to plan again, once the job has loaded; undefined when there is none to read. */
  readonly againFrom = computed(() => {
    const carcass = this.detail.hasValue() ? this.detail.value().carcasses.find((c) => c.id === this.againId()) : undefined;
    const parsed = carcass?.plannedFrom && carcassPlanInput.safeParse(carcass.plannedFrom);
    return parsed && parsed.success ? parsed.data : undefined;
  });
  readonly usedIds = computed(() => new Set(this.detail.hasValue() ? this.detail.value().carcasses.map((c) => c.id) : []));
  readonly result = computed(() => {
    const input = this.description();
    const settings = this.settings();
    if (!input || !settings) return undefined;
    return planCarcass({ ...input, materials: settings.materials, system: settings.system, limits: settings.limits }, this.catalog(), { unit: this.unit() });
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

  /**
   * Adds the planned carcass with all its panels to the job, or plans a carcass of the same id again,
   * in one request: all of it or none. `changed` says what to do with panels changed by hand since
   * they were planned; without it the server refuses (409 replan-changed) and names them.
   */
  async addToJob(changed?: ChangedPanelChoice): Promise<PlannedCarcass> {
    const input = this.description();
    if (!input) throw new Error('Nothing to add: describe the carcass first.');
    this.adding.set(true);
    try {
      const params = changed ? { changed } : undefined;
      const answer = plannedCarcass.parse(await firstValueFrom(this.http.post(`${jobUrl(this.jobId())}/plan`, input, { params })));
      this.added.set(answer);
      this.detail.reload();
      return answer;
    } finally {
      this.adding.set(false);
    }
  }
}
