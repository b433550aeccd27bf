import { Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatSnackBar } from '@angular/material/snack-bar';
import { firstValueFrom } from 'rxjs';
import { Can } from '../auth/can';
import { CutListDialog, CutListRequest, CutListResult } from './cut-list-dialog';
import { JobStore } from './job-store';

/** The job page's "Import cut list" button: opens the dialog and, after an import, shows the new panels. */
@Component({
  selector: 'bw-cut-list-import',
  imports: [Can, MatButtonModule, MatIconModule],
  template: `<button *bwCan="'editJobs'" mat-stroked-button type="button" (click)="open()"><mat-icon>table_view</mat-icon>Import cut list</button>`,
})
export class CutListImport {
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly store = inject(JobStore);

  protected async open(): Promise<void> {
    const job = this.store.job();
    if (!job) return;
    const ref = this.dialog.open<CutListDialog, CutListRequest, CutListResult>(CutListDialog, {
      data: { jobId: job.id },
      width: '1040px',
      maxWidth: 'calc(100vw - 32px)',
    });
    const result = await firstValueFrom(ref.afterClosed());
    if (!result) return;
    this.store.reload();
    this.snackBar.open(`Created ${result.panelCount} ${result.panelCount === 1 ? 'panel' : 'panels'} from ${result.fileName}.`, undefined, { duration: 5000 });
  }
}
