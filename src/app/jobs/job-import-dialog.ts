import { Component, effect, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { JobSummary } from '../../../shared/api/contract';
import { JobImportStore } from './job-import-store';
import { UploadProblem } from '../ui/upload-problem';
import { UploadStatus } from '../ui/upload-status';

/** Uploads a job document (.json) and shows its progress, or every problem the server found in it. */
@Component({
  selector: 'bw-job-import-dialog',
  imports: [MatButtonModule, MatDialogModule, MatIconModule, UploadProblem, UploadStatus],
  providers: [JobImportStore],
  templateUrl: './job-import-dialog.html',
  styleUrl: './job-import-dialog.scss',
})
export class JobImportDialog {
  private readonly dialogRef = inject<MatDialogRef<JobImportDialog, JobSummary>>(MatDialogRef);
  protected readonly store = inject(JobImportStore);

  constructor() {
    effect(() => {
      const state = this.store.state();
      if (state.step === 'done') this.dialogRef.close(state.job);
    });
  }

  protected importChosenFile(input: HTMLInputElement): void {
    const file = input.files?.item(0);
    // Cleared so that choosing the same file again after fixing it starts a new upload.
    input.value = '';
    if (file) this.store.importFile(file);
  }

  protected cancel(): void {
    this.store.cancel();
    this.dialogRef.close();
  }
}
