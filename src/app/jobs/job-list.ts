import { DatePipe } from '@angular/common';
import { Component, computed, effect, inject, signal, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatMenuModule } from '@angular/material/menu';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatSort, MatSortModule } from '@angular/material/sort';
import { MatTableDataSource, MatTableModule } from '@angular/material/table';
import { Router, RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { JobSummary } from '../../../shared/api/contract';
import { AuthStore } from '../auth/auth-store';
import { Can } from '../auth/can';
import { describeError, isStaleVersion } from '../core/api-problem';
import { JobFormDialog, JobFormRequest } from './job-form-dialog';
import { JobImportDialog } from './job-import-dialog';
import { JobListStore } from './job-list-store';

const readColumns = ['name', 'client', 'carcassCount', 'panelCount', 'updatedAt'];

/** Names sort as people read them (case-blind); counts as numbers; ISO dates as text. */
function sortKey(job: JobSummary, column: string): string | number {
  if (column === 'name') return job.name.toLocaleLowerCase();
  if (column === 'client') return (job.client ?? '').toLocaleLowerCase();
  if (column === 'carcassCount') return job.carcassCount;
  if (column === 'panelCount') return job.panelCount;
  return job.updatedAt;
}

/** Every job of the shop in a sortable, filterable table, with the changes a designer makes from here. */
@Component({
  selector: 'bw-job-list',
  imports: [
    Can,
    DatePipe,
    MatButtonModule,
    MatButtonToggleModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatMenuModule,
    MatProgressBarModule,
    MatSortModule,
    MatTableModule,
    RouterLink,
  ],
  providers: [JobListStore],
  templateUrl: './job-list.html',
  styleUrl: './job-list.scss',
})
export class JobList {
  private readonly auth = inject(AuthStore);
  private readonly dialog = inject(MatDialog);
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  protected readonly store = inject(JobListStore);

  private readonly sort = viewChild(MatSort);

  protected readonly filter = signal('');
  protected readonly rows = new MatTableDataSource<JobSummary>([]);
  protected readonly columns = computed(() =>
    this.auth.can('editJobs') ? [...readColumns, 'actions'] : readColumns,
  );

  constructor() {
    this.rows.filterPredicate = (job, text) => `${job.name} ${job.client ?? ''}`.toLowerCase().includes(text);
    this.rows.sortingDataAccessor = (job, column) => sortKey(job, column);
    effect(() => (this.rows.data = this.store.jobs()));
    effect(() => (this.rows.sort = this.sort() ?? null));
    effect(() => (this.rows.filter = this.filter().trim().toLowerCase()));
  }

  protected async createJob(): Promise<void> {
    const job = await this.openJobForm({
      title: 'New job',
      saveLabel: 'Create',
      withNotes: true,
      save: ({ name, client, notes }) => this.store.createJob({ name, client: client ?? undefined, notes }),
    });
    if (job && job !== 'reload') this.offerToOpen(job, `Created “${job.name}”.`);
  }

  protected async renameJob(job: JobSummary): Promise<void> {
    const renamed = await this.openJobForm({
      title: 'Rename job',
      saveLabel: 'Save',
      job,
      withNotes: false,
      save: (values) => this.store.updateJob(job, values),
    });
    if (renamed === 'reload') this.store.reload();
    else if (renamed) this.snackBar.open(`Renamed to “${renamed.name}”.`, undefined, { duration: 4000 });
  }

  protected async setArchived(job: JobSummary, archived: boolean): Promise<void> {
    try {
      await this.store.updateJob(job, { archived });
      const done = archived ? 'archived' : 'back among the current jobs';
      this.snackBar.open(`“${job.name}” is ${done}.`, undefined, { duration: 4000 });
    } catch (error) {
      this.snackBar.open(describeError(error), 'Dismiss');
      // The list shows the job as it was; after a 409 it shows it as it now is.
      if (isStaleVersion(error)) this.store.reload();
    }
  }

  protected async importDocument(): Promise<void> {
    const ref = this.dialog.open<JobImportDialog, void, JobSummary>(JobImportDialog, {
      width: '560px',
      maxWidth: 'calc(100vw - 32px)',
      disableClose: true,
    });
    const job = await firstValueFrom(ref.afterClosed());
    if (!job) return;
    this.store.reload();
    this.offerToOpen(job, `Imported “${job.name}”.`);
  }

  /** The new job appears in the list; the note beside it opens it directly. */
  private offerToOpen(job: JobSummary, message: string): void {
    this.snackBar
      .open(message, 'Open', { duration: 6000 })
      .onAction()
      .subscribe(() => void this.router.navigate(['/jobs', job.id]));
  }

  private async openJobForm(request: JobFormRequest): Promise<JobSummary | 'reload' | undefined> {
    const ref = this.dialog.open<JobFormDialog, JobFormRequest, JobSummary | 'reload'>(JobFormDialog, {
      data: request,
      width: '480px',
      maxWidth: 'calc(100vw - 32px)',
    });
    return firstValueFrom(ref.afterClosed());
  }
}
