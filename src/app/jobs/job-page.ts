import { DatePipe } from '@angular/common';
import { Component, computed, effect, inject } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Title } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { PanelRecord } from '../../../shared/api/contract';
import { labelsPath } from '../../../shared/api/label-contract';
import { AuthStore } from '../auth/auth-store';
import { CatalogStore } from '../catalog/catalog-store';
import { BenchPack } from '../packs/bench-pack';
import { describeError, isStaleVersion } from '../core/api-problem';
import { JobLive } from '../live/job-live';
import { PresentMembers } from '../live/present-members';
import { ConfirmDialog } from '../ui/confirm-dialog';
import { Lengths } from '../ui/lengths';
import { CautionList } from '../ui/caution-list';
import { cautionsOfUnits } from '../ui/job-cautions';
import { PanelProgress } from '../ui/panel-progress';
import { mountingWords, replannableOnScreen } from './carcass-card';
import { CutListImport } from './cut-list-import';
import { JobAttachments } from './job-attachments';
import { JobFormDialog, JobFormRequest } from './job-form-dialog';
import { JobFindings } from './job-findings';
import { JobFindingsStore } from './job-findings-store';
import { JobStore } from './job-store';
import { jobDocumentUrl, PanelFields } from './jobs-api';
import { PanelFormDialog, PanelFormRequest, PanelFormResult } from './panel-form-dialog';
import { PanelStatusChange, PanelTable } from './panel-table';

const STALE_MESSAGE = 'Someone else changed this panel since you opened it.';

/** One job: its header, carcasses and panels, the document export and the bench pack. */
@Component({
  selector: 'bw-job-page',
  imports: [BenchPack, CautionList, CutListImport, DatePipe, JobAttachments, JobFindings, MatButtonModule, MatIconModule, MatProgressBarModule, PanelProgress, PanelTable, PresentMembers, RouterLink],
  providers: [JobStore, JobFindingsStore, JobLive],
  templateUrl: './job-page.html',
  styleUrl: './job-page.scss',
})
export class JobPage {
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly title = inject(Title);
  private readonly auth = inject(AuthStore);
  private readonly catalog = inject(CatalogStore).catalog;
  protected readonly store = inject(JobStore);
  protected readonly lengths = inject(Lengths);
  private readonly live = inject(JobLive);
  /** Who else has the job open, and which panel, by its name. */
  protected readonly here = computed(() => {
    const names = new Map(this.store.panels().map((p) => [p.dbId, p.name]));
    return this.live.others().map((o) => ({ name: o.name, where: o.panelIds.map((id) => `editing “${names.get(id) ?? 'a panel'}”`).join(', ') }));
  });

  /** Editing for roles that may, while the job is not archived. */
  protected readonly canEdit = computed(() => this.auth.can('editJobs') && this.store.job()?.archived === false);
  /** The cautions of the job's units, for every role: the installer hangs what the designer drew. */
  protected readonly cautions = computed(() => {
    const job = this.store.document();
    return job ? cautionsOfUnits(job, this.catalog()) : [];
  });
  protected readonly mounting = mountingWords;
  protected readonly replannable = replannableOnScreen;

  protected readonly documentUrl = jobDocumentUrl;
  protected readonly labelsUrl = (jobId: number) => labelsPath(jobId);

  constructor() {
    effect(() => {
      const job = this.store.job();
      if (job) this.title.setTitle(`${job.name} · Borewright`);
    });
    effect(() => {
      const id = this.store.job()?.id;
      if (id !== undefined) this.live.follow(id);
    });
    // A panel saved, marked or planned by someone else: the rows as the server has them now.
    this.live.othersChanges.pipe(takeUntilDestroyed()).subscribe(() => this.store.reload());
  }

  protected labelsAsked(): void {
    const count = this.store.panels().length;
    this.snackBar.open(`Labels for ${count} ${count === 1 ? 'panel' : 'panels'}, 14 to an A4 sheet: the PDF is on its way to your downloads.`, undefined, { duration: 5000 });
  }

  protected async editDetails(): Promise<void> {
    const job = this.store.job();
    if (!job) return;
    const ref = this.dialog.open<JobFormDialog, JobFormRequest>(JobFormDialog, {
      data: { title: 'Job details', saveLabel: 'Save', job, withNotes: true, save: (values) => this.store.updateJob(values) },
      width: '520px',
      maxWidth: 'calc(100vw - 32px)',
    });
    if ((await firstValueFrom(ref.afterClosed())) === 'reload') this.store.reload();
  }

  protected async addPanel(): Promise<void> {
    const added = await this.openPanelForm(undefined, (fields) => this.store.addPanel(fields));
    if (added && added !== 'reload') this.snackBar.open(`Added “${added.name}”.`, undefined, { duration: 4000 });
  }

  protected async editPanel(panel: PanelRecord): Promise<void> {
    const result = await this.openPanelForm(panel, (fields) => this.store.updatePanel(panel, fields));
    if (result === 'reload') this.store.reload();
  }

  protected async deletePanel(panel: PanelRecord): Promise<void> {
    const confirmed = await ConfirmDialog.ask(this.dialog, {
      title: `Delete panel “${panel.name}”?`,
      message: `“${panel.name}” and every placement and bore on it leave this job. This cannot be undone.`,
      confirmLabel: 'Delete panel',
    });
    if (!confirmed) return;
    try {
      await this.store.deletePanel(panel);
      this.snackBar.open(`Deleted “${panel.name}”.`, undefined, { duration: 4000 });
    } catch (error) {
      this.reportPanelFailure(error);
    }
  }

  protected async changeStatus({ panel, status }: PanelStatusChange): Promise<void> {
    try {
      await this.store.setPanelStatus(panel, status);
    } catch (error) {
      this.reportPanelFailure(error);
    }
  }

  private openPanelForm(
    panel: PanelRecord | undefined,
    save: (fields: PanelFields) => Promise<PanelRecord>,
  ): Promise<PanelFormResult | undefined> {
    const ref = this.dialog.open<PanelFormDialog, PanelFormRequest, PanelFormResult>(PanelFormDialog, {
      data: { panel, carcasses: this.store.carcasses(), materials: this.store.materials(), save },
      width: '600px',
      maxWidth: 'calc(100vw - 32px)',
    });
    return firstValueFrom(ref.afterClosed());
  }

  /** A stale panel offers to reload the job; anything else is said and dismissed. */
  private reportPanelFailure(error: unknown): void {
    if (!isStaleVersion(error)) {
      this.snackBar.open(describeError(error), 'Dismiss');
      return;
    }
    this.snackBar
      .open(STALE_MESSAGE, 'Reload')
      .onAction()
      .subscribe(() => this.store.reload());
  }
}
