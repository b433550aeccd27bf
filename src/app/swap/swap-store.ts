import { httpResource } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { ActivatedRoute } from '@angular/router';
import { map } from 'rxjs';
import { catalogList } from '../../../shared/api/catalog-contract';
import { jobDetail } from '../../../shared/api/contract';
import { swapAnswer, type SwapApplied } from '../../../shared/api/swap-contract';
import type { FittingPurpose } from '../../../shared/catalog/fitting';
import { describeError } from '../core/api-problem';
import { jobUrl } from '../jobs/jobs-api';
import { SwapApi, swapUrl } from './swap-api';

/** A fitting the job places: its name (or its id, marked, when the catalog does not know it) and how often. */
export interface UsedFitting {
  id: string;
  name: string;
  purpose?: FittingPurpose;
  placements: number;
  panels: number;
}

/**
 * The swap check's state: the job and the catalog (built-in and the shop's own, as the server has them),
 * the fitting chosen from those the job uses, its replacement of the same kind, and the server's report.
 */
@Injectable()
export class SwapStore {
  private readonly api = inject(SwapApi);

  readonly jobId = toSignal(inject(ActivatedRoute).paramMap.pipe(map((params) => Number(params.get('jobId')))), { initialValue: 0 });
  private readonly detail = httpResource(() => (this.jobId() > 0 ? jobUrl(this.jobId()) : undefined), { parse: (raw) => jobDetail.parse(raw) });
  private readonly catalogAnswer = httpResource(() => '/api/catalog', { parse: (raw) => catalogList.parse(raw) });

  readonly from = signal<string | undefined>(undefined);
  readonly to = signal<string | undefined>(undefined);

  private readonly answer = httpResource(() => {
    const [from, to] = [this.from(), this.to()];
    return from && to && this.jobId() > 0 ? { url: swapUrl(this.jobId()), params: { from, to } } : undefined;
  }, { parse: (raw) => swapAnswer.parse(raw) });

  readonly job = computed(() => (this.detail.hasValue() ? this.detail.value().job : undefined));
  /** Until the job and the catalog are in, nothing can be chosen: the names of the fittings come from the catalog. */
  readonly loading = computed(() => !this.detail.hasValue() || !this.catalogAnswer.hasValue());
  readonly loadError = computed(() => {
    const error = this.detail.error() ?? this.catalogAnswer.error();
    return error ? describeError(error) : undefined;
  });
  private readonly fittings = computed(() => new Map((this.catalogAnswer.hasValue() ? this.catalogAnswer.value().fittings : []).map((e) => [e.fitting.id, e.fitting])));

  /** The fittings the job places, most used first: only these can be swapped. */
  readonly used = computed<UsedFitting[]>(() => {
    const counts = new Map<string, { placements: number; panels: number }>();
    for (const panel of this.detail.hasValue() ? this.detail.value().panels : []) {
      const ids = panel.placements.map((p) => p.fitting);
      for (const id of new Set(ids)) {
        const count = counts.get(id) ?? { placements: 0, panels: 0 };
        counts.set(id, { placements: count.placements + ids.filter((f) => f === id).length, panels: count.panels + 1 });
      }
    }
    return [...counts].map(([id, count]) => {
      const fitting = this.fittings().get(id);
      return { id, name: fitting?.name ?? `${id} (not in the catalog)`, purpose: fitting?.purpose, ...count };
    }).sort((a, b) => b.placements - a.placements || a.name.localeCompare(b.name));
  });

  /** The catalog's fittings of the same kind as the one chosen: a hinge for a hinge. */
  readonly candidates = computed(() => {
    const from = this.fittings().get(this.from() ?? '');
    if (!from) return [];
    return [...this.fittings().values()].filter((f) => f.purpose === from.purpose && f.id !== from.id);
  });

  readonly report = computed(() => (this.answer.hasValue() ? this.answer.value().report : undefined));
  readonly checking = computed(() => this.answer.isLoading());
  readonly reportError = computed(() => (this.answer.error() ? describeError(this.answer.error()) : undefined));
  /** Drilled panels whose verdict is to drill: what the retrofit pack holds. */
  readonly retrofitPanels = computed(() => this.report()?.panels.filter((p) => p.drilled && p.verdict === 'to-drill') ?? []);
  readonly applying = signal(false);

  chooseFrom(id: string): void {
    this.from.set(id);
    this.to.set(undefined);
  }

  chooseTo(id: string): void {
    this.to.set(id);
  }

  /**
   * Applies the swap at the panel versions the report was made from (a panel changed since answers 409),
   * then reloads the job: the fitting chosen is no longer in it.
   */
  async apply(): Promise<SwapApplied> {
    const [from, to] = [this.from(), this.to()];
    if (!from || !to || !this.answer.hasValue()) throw new Error('Choose a fitting and its replacement first.');
    this.applying.set(true);
    try {
      const applied = await this.api.apply(this.jobId(), { from, to, versions: this.answer.value().versions });
      this.from.set(undefined);
      this.to.set(undefined);
      this.detail.reload();
      return applied;
    } finally {
      this.applying.set(false);
    }
  }

  /** Asks the server again, after a refusal because the job changed. */
  recheck(): void {
    this.answer.reload();
  }
}
