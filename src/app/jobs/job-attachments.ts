import { DatePipe } from '@angular/common';
import { Component, effect, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTooltipModule } from '@angular/material/tooltip';
import { ATTACHMENT_TYPES, AttachmentSummary } from '../../../shared/api/attachment-contract';
import { sizeInWords } from '../../../shared/api/file-size';
import { Can } from '../auth/can';
import { describeError } from '../core/api-problem';
import { ConfirmDialog } from '../ui/confirm-dialog';
import { attachmentUrl } from './attachments-api';
import { JobAttachmentsStore } from './job-attachments-store';
import { UploadStatus } from '../ui/upload-status';

/** The job's photos and PDFs: a list to download from, and for those who change jobs, upload and delete. */
@Component({
  selector: 'bw-job-attachments',
  imports: [Can, DatePipe, MatButtonModule, MatIconModule, MatTooltipModule, UploadStatus],
  providers: [JobAttachmentsStore],
  templateUrl: './job-attachments.html',
  styleUrl: './job-attachments.scss',
})
export class JobAttachments {
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  protected readonly store = inject(JobAttachmentsStore);

  readonly jobId = input.required<number>();

  protected readonly downloadUrl = attachmentUrl;
  protected readonly sizeInWords = sizeInWords;
  protected readonly typeNames = ATTACHMENT_TYPES;
  protected readonly accept = Object.keys(ATTACHMENT_TYPES).join(',');

  constructor() {
    effect(() => this.store.forJob(this.jobId()));
  }

  protected uploadChosenFile(input: HTMLInputElement): void {
    const file = input.files?.item(0);
    input.value = '';
    if (file) this.store.uploadFile(file);
  }

  protected async delete(attachment: AttachmentSummary): Promise<void> {
    const confirmed = await ConfirmDialog.ask(this.dialog, {
      title: `Delete “${attachment.filename}”?`,
      message: `“${attachment.filename}” is removed from this job for everyone. This cannot be undone.`,
      confirmLabel: 'Delete attachment',
    });
    if (!confirmed) return;
    try {
      await this.store.delete(attachment);
      this.snackBar.open(`Deleted “${attachment.filename}”.`, undefined, { duration: 4000 });
    } catch (error) {
      this.snackBar.open(describeError(error), 'Dismiss');
    }
  }
}
