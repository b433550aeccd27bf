import { Component, computed, effect, inject } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { Title } from '@angular/platform-browser';
import type { CautionId } from '../../../shared/export/cautions';
import { AuthStore } from '../auth/auth-store';
import { statusLabels } from '../jobs/panel-labels';
import { CatalogStore } from '../catalog/catalog-store';
import { JobLive } from '../live/job-live';
import { CautionList } from '../ui/caution-list';
import { cautionsOfUnits } from '../ui/job-cautions';
import { PanelProgress } from '../ui/panel-progress';
import { BenchPanelCard } from './bench-panel-card';
import { BenchStore } from './bench-store';

/**
 * The bench (design.md §6): pick a job, see its panels still to drill, by carcass and material, with
 * their files, and mark each drilled, then checked; the last marks can be undone.
 */
@Component({
  selector: 'bw-bench-page',
  imports: [
    BenchPanelCard,
    CautionList,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatProgressBarModule,
    MatSelectModule,
    MatSlideToggleModule,
    PanelProgress,
  ],
  providers: [BenchStore, JobLive],
  templateUrl: './bench-page.html',
  styleUrl: './bench-page.scss',
})
export class BenchPage {
  private readonly auth = inject(AuthStore);
  private readonly title = inject(Title);
  protected readonly store = inject(BenchStore);

  private readonly catalog = inject(CatalogStore).catalog;
  /** Drilling from printed templates always (design.md §8), and the cautions of the chosen job's units: the bench assembles them too. */
  protected readonly cautions = computed((): CautionId[] => {
    const job = this.store.document();
    return ['drilling', ...(job ? cautionsOfUnits(job, this.catalog()) : [])];
  });
  protected readonly statusLabels = statusLabels;
  /** The offline worker runs this page (production builds): it can keep the panels' files. */
  protected readonly offlineWorker = typeof navigator !== 'undefined' && !!navigator.serviceWorker?.controller;
  protected readonly canMark = computed(() => this.auth.can('markPanels'));
  protected readonly carcassNames = computed(() => new Map(this.store.carcasses().map((c) => [c.id, c.name])));
  protected readonly materialNames = computed(() => new Map(this.store.materials().map((m) => [m.id, m.name])));
  /** What the progress counts, in words. */
  protected readonly selectionName = computed(() => {
    const carcass = this.store.carcass();
    const material = this.store.material();
    const parts = [carcass !== undefined && (this.carcassNames().get(carcass) ?? carcass), material !== undefined && (this.materialNames().get(material) ?? material)];
    return parts.filter(Boolean).join(', ') || 'this job';
  });

  /** How many marks wait on this device, in words. */
  protected readonly waitingText = computed(() => {
    const count = this.store.queue.waiting().length;
    return count === 0 ? 'No marks waiting to send.' : `${count} mark${count === 1 ? '' : 's'} waiting to send.`;
  });

  constructor() {
    effect(() => {
      const job = this.store.job();
      this.title.setTitle(job ? `Bench: ${job.name} · Borewright` : 'Bench · Borewright');
    });
    // Panels marked, saved or planned by someone else: the cards as the server has them now.
    const live = inject(JobLive);
    effect(() => live.follow(this.store.jobId()));
    live.othersChanges.pipe(takeUntilDestroyed()).subscribe(() => this.store.refresh());
  }

  protected carcassOf(carcass: string | undefined): string {
    return carcass === undefined ? 'No carcass' : (this.carcassNames().get(carcass) ?? carcass);
  }

  protected materialOf(material: string): string {
    return this.materialNames().get(material) ?? material;
  }
}
