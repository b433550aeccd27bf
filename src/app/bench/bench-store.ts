import { httpResource } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { ActivatedRoute, Params, Router } from '@angular/router';
import { jobDetail, jobList, PanelRecord } from '../../../shared/api/contract';
import { labelsPath } from '../../../shared/api/label-contract';
import { jobFindings } from '../../../shared/api/pack-contract';
import { PanelStatus } from '../../../shared/model/job-document';
import { carcassOrder } from '../../../shared/model/panel-order';
import { describeError } from '../core/api-problem';
import { jobsUrl, jobUrl } from '../jobs/jobs-api';
import { hasFaceB, jobFindingsUrl, panelFileUrls } from '../packs/pack-api';
import { jobDocumentOf } from '../ui/job-cautions';
import { MarkQueue } from './mark-queue';

/** A mark made on this page, kept so that it can be undone. */
export interface BenchMark {
  /** The mark in the queue (mark-store.ts). */
  seq: number;
  jobId: number;
  panelDbId: number;
  name: string;
  from: PanelStatus;
  to: PanelStatus;
}

/** The findings of the checks on one panel, by severity. */
export interface PanelFindings {
  errors: number;
  warnings: number;
  notes: number;
}

/** What the bench page's address holds, so that a reload (or a label's QR code) opens the same view. */
export interface BenchView {
  job?: number | null;
  carcass?: string | null;
  material?: string | null;
  /** `show` lists drilled and checked panels too. */
  done?: 'show' | null;
  /** One panel alone, as a label's QR code opens it. */
  panel?: number | null;
}

const positive = (value: string | null) => (value !== null && /^[1-9][0-9]{0,9}$/.test(value) ? Number(value) : undefined);

/**
 * The bench page: which job and which of its panels are shown (all in the address), the panels with their
 * findings, and marking them drilled or checked with an undo of the marks made here. Marks go through the
 * queue (mark-queue.ts), online or not; the panels are shown as the marks waiting to send will make them.
 */
@Injectable()
export class BenchStore {
  readonly queue = inject(MarkQueue);
  private readonly router = inject(Router);
  private readonly route = inject(ActivatedRoute);
  private readonly query = toSignal(this.route.queryParamMap, { requireSync: true });

  readonly jobId = computed(() => positive(this.query().get('job')));
  readonly carcass = computed(() => this.query().get('carcass') ?? undefined);
  readonly material = computed(() => this.query().get('material') ?? undefined);
  readonly showDone = computed(() => this.query().get('done') === 'show');
  readonly focus = computed(() => positive(this.query().get('panel')));

  private readonly jobList = httpResource(() => ({ url: jobsUrl, params: { archived: false } }), { parse: (raw) => jobList.parse(raw).jobs });
  private readonly detail = httpResource(
    () => {
      const id = this.jobId();
      return id === undefined ? undefined : jobUrl(id);
    },
    { parse: (raw) => jobDetail.parse(raw) },
  );
  private readonly findingList = httpResource(
    () => {
      const id = this.jobId();
      return id === undefined ? undefined : jobFindingsUrl(id);
    },
    { parse: (raw) => jobFindings.parse(raw).findings },
  );
  private readonly loaded = computed(() => (this.detail.hasValue() ? this.detail.value() : undefined));

  private readonly marks = signal<BenchMark[]>([]);
  /** Panels marked on this page stay listed until the view changes, so a row never jumps away under a finger. */
  private readonly touched = signal<ReadonlySet<number>>(new Set());

  readonly jobs = computed(() => (this.jobList.hasValue() ? this.jobList.value() : []));
  readonly jobsLoading = this.jobList.isLoading;
  readonly job = computed(() => this.loaded()?.job);
  readonly loading = this.detail.isLoading;
  readonly loadError = computed(() => {
    const error = this.detail.error() ?? this.jobList.error();
    return error === undefined ? null : describeError(error);
  });
  readonly carcasses = computed(() => this.loaded()?.carcasses ?? []);
  /** The job as the shared rules read it (cautions). */
  readonly document = computed(() => {
    const detail = this.loaded();
    return detail && jobDocumentOf(detail);
  });
  /** The job's materials that its panels use. */
  readonly materials = computed(() => {
    const used = new Set(this.panels().map((p) => p.material));
    return (this.loaded()?.materials ?? []).filter((m) => used.has(m.id));
  });
  /** Every panel of the job, carcass by carcass, at the status its last mark waiting to send gives it. */
  readonly panels = computed(() => {
    const waiting = this.queue.waiting();
    const panels = (this.loaded()?.panels ?? []).map((p) => {
      const last = waiting.filter((m) => m.panelDbId === p.dbId).at(-1);
      return last ? { ...p, status: last.to } : p;
    });
    return carcassOrder(this.carcasses(), panels);
  });
  /** The panels of the chosen carcass and material, whatever their status: what the progress counts. */
  readonly selection = computed(() => {
    const carcass = this.carcass();
    const material = this.material();
    return this.panels().filter((p) => (carcass === undefined || p.carcass === carcass) && (material === undefined || p.material === material));
  });
  /** The panels listed: those still to drill (or all), those marked here or waiting to send, or the one a label opened. */
  readonly listed = computed(() => {
    const focus = this.focus();
    if (focus !== undefined) return this.panels().filter((p) => p.dbId === focus);
    const touched = this.touched();
    const waiting = new Set(this.queue.waiting().map((m) => m.panelDbId));
    return this.selection().filter((p) => this.showDone() || p.status === 'planned' || touched.has(p.dbId) || waiting.has(p.dbId));
  });
  readonly findings = computed(() => {
    const byPanel = new Map<string, PanelFindings>();
    for (const f of this.findingList.hasValue() ? this.findingList.value() : []) {
      const counts = byPanel.get(f.panel) ?? { errors: 0, warnings: 0, notes: 0 };
      counts[f.severity === 'error' ? 'errors' : f.severity === 'warning' ? 'warnings' : 'notes']++;
      byPanel.set(f.panel, counts);
    }
    return byPanel;
  });
  /** The last mark made here on this job, which Undo takes back. */
  readonly lastMark = computed(() => this.marks().filter((m) => m.jobId === this.jobId()).at(-1));
  private readonly problemText = signal<string | null>(null);
  /** Why the last mark or undo did not go through, in words the user can act on. */
  readonly problem = this.problemText.asReadonly();
  /** The label sheets of what is shown: the one panel, the chosen carcass, or the panels of the chosen material. */
  readonly labelsUrl = computed(() => {
    const jobId = this.jobId();
    if (jobId === undefined || this.selection().length === 0) return undefined;
    const focus = this.focus();
    if (focus !== undefined) return labelsPath(jobId, { panels: [focus] });
    if (this.material() !== undefined) return labelsPath(jobId, { panels: this.selection().map((p) => p.dbId) });
    return labelsPath(jobId, { carcass: this.carcass() });
  });

  private readonly keptFiles = signal<{ done: number; total: number } | null>(null);
  /** How far keeping the listed panels' files for offline use has come. */
  readonly filesKept = this.keptFiles.asReadonly();

  constructor() {
    this.queue.outcomes.pipe(takeUntilDestroyed()).subscribe((outcome) => {
      if ('saved' in outcome) {
        const saved = outcome.saved;
        // Listed while its mark waited (after a reload too), it stays listed now that the mark is sent.
        this.touched.update((ids) => new Set(ids).add(saved.dbId));
        this.detail.update((detail) => detail && { ...detail, panels: detail.panels.map((p) => (p.dbId === saved.dbId ? saved : p)) });
        return;
      }
      // Refused marks (and those held back with them) are not there to undo, and the panel is not as this
      // page thought: show it as it is now.
      const refused = new Set(this.queue.refused().map((m) => m.seq));
      this.marks.update((marks) => marks.filter((m) => !refused.has(m.seq)));
      if (outcome.mark.jobId === this.jobId()) this.detail.reload();
    });
  }

  /**
   * Reads each listed panel's template (A4) and drilling maps once, one file at a time to spare the
   * server, so that the offline worker keeps them (ngsw-config.json `panel-files`) for when the
   * connection drops. A file that fails is left; the worker keeps what came.
   */
  async keepFilesOffline(): Promise<void> {
    const panels = this.listed();
    this.keptFiles.set({ done: 0, total: panels.length });
    for (const [i, panel] of panels.entries()) {
      const files = panelFileUrls(panel.dbId);
      for (const url of [files.pdf('a4'), files.svg('A'), ...(hasFaceB(panel) ? [files.svg('B')] : [])]) {
        await fetch(url).then((res) => res.arrayBuffer()).catch(() => undefined);
      }
      this.keptFiles.set({ done: i + 1, total: panels.length });
    }
  }

  /** A mark of this panel is on its way to the server now. */
  isSaving(panel: PanelRecord): boolean {
    return this.queue.sendingMark()?.panelDbId === panel.dbId;
  }

  /** A mark of this panel waits to be sent. */
  isWaiting(panel: PanelRecord): boolean {
    return this.queue.waiting().some((m) => m.panelDbId === panel.dbId);
  }

  /** Changes what the page shows; the address keeps it, so a reload shows the same. */
  show(view: BenchView): void {
    // Another job starts unfiltered: its carcasses and materials are not this one's.
    const changes: Params = view.job !== undefined ? { carcass: null, material: null, panel: null, ...view } : view;
    this.touched.set(new Set());
    this.keptFiles.set(null);
    this.problemText.set(null);
    void this.router.navigate([], { relativeTo: this.route, queryParams: changes, queryParamsHandling: 'merge', replaceUrl: true });
  }

  /** Marks a panel drilled or checked; the mark can be undone from this page. */
  async mark(panel: PanelRecord, status: PanelStatus): Promise<void> {
    const jobId = this.jobId();
    if (jobId === undefined) return;
    this.problemText.set(null);
    const mark = { jobId, panelDbId: panel.dbId, name: panel.name, from: panel.status, to: status };
    const seq = await this.queue.add({ ...mark, version: panel.version });
    if (seq === undefined) return;
    this.touched.update((ids) => new Set(ids).add(panel.dbId));
    this.marks.update((marks) => [...marks, { seq, ...mark }]);
  }

  /** Takes back the last mark made here by a mark back to the status the panel had (the activity log keeps both). */
  async undo(): Promise<void> {
    const mark = this.lastMark();
    if (!mark) return;
    this.marks.update((marks) => marks.filter((m) => m !== mark));
    const panel = this.panels().find((p) => p.dbId === mark.panelDbId);
    if (panel?.status !== mark.to) {
      // Someone marked it again since (or deleted it): undoing now would take back their mark too.
      this.problemText.set(`Nothing undone: “${mark.name}” is no longer as this page marked it.`);
      return;
    }
    this.problemText.set(null);
    await this.queue.add({ jobId: mark.jobId, panelDbId: panel.dbId, name: panel.name, from: mark.to, to: mark.from, version: panel.version });
  }

  dismissProblem(): void {
    this.problemText.set(null);
  }

  reload(): void {
    this.problemText.set(null);
    this.refresh();
  }

  /** The panels and findings as the server has them now, leaving what the page says alone (someone else changed them). */
  refresh(): void {
    this.detail.reload();
    this.findingList.reload();
  }
}
