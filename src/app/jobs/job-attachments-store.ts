import { httpResource } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { catchError, filter, map, Observable, of, startWith, Subject, switchMap, tap } from 'rxjs';
import { attachmentList, AttachmentSummary, attachmentSummary } from '../../../shared/api/attachment-contract';
import { sizeInWords } from '../../../shared/api/file-size';
import { describeError } from '../core/api-problem';
import { AttachmentsApi, jobAttachmentsUrl } from './attachments-api';
import { uploadStep } from './upload-progress';

export type AttachmentUpload =
  | { step: 'idle' }
  | { step: 'uploading'; fileName: string; percent: number | null }
  | { step: 'failed'; fileName: string; message: string };

const idle: AttachmentUpload = { step: 'idle' };

/** A job's attachments: the list, one upload at a time with its progress, and deleting. */
@Injectable()
export class JobAttachmentsStore {
  private readonly api = inject(AttachmentsApi);
  private readonly jobId = signal<number | undefined>(undefined);
  private readonly uploads = new Subject<File | null>();

  private readonly list = httpResource(() => {
    const id = this.jobId();
    return id === undefined ? undefined : jobAttachmentsUrl(id);
  }, { parse: (raw) => attachmentList.parse(raw) });

  readonly attachments = computed(() => (this.list.hasValue() ? this.list.value().attachments : []));
  /** The upload limit as the server states it, in words ("10 MB"); empty until the list has loaded. */
  readonly limit = computed(() => (this.list.hasValue() ? sizeInWords(this.list.value().maxBytes) : ''));
  readonly loading = this.list.isLoading;
  readonly loadError = computed(() => {
    const error = this.list.error();
    return error === undefined ? null : describeError(error);
  });
  readonly upload = toSignal(this.uploads.pipe(switchMap((file) => (file === null ? of(idle) : this.send(file)))), { initialValue: idle });

  forJob(jobId: number): void {
    this.jobId.set(jobId);
  }

  reload(): void {
    this.list.reload();
  }

  uploadFile(file: File): void {
    this.uploads.next(file);
  }

  dismissUpload(): void {
    this.uploads.next(null);
  }

  async delete(attachment: AttachmentSummary): Promise<void> {
    await this.api.delete(attachment.id);
    this.list.update((list) => list && { ...list, attachments: list.attachments.filter((a) => a.id !== attachment.id) });
  }

  private send(file: File): Observable<AttachmentUpload> {
    const fileName = file.name;
    return this.api.upload(this.jobId()!, file).pipe(
      map(uploadStep),
      filter((step) => step !== null),
      tap((step) => {
        if ('body' in step) this.added(attachmentSummary.parse(step.body));
      }),
      map((step): AttachmentUpload => ('body' in step ? idle : { step: 'uploading', fileName, percent: step.percent })),
      startWith<AttachmentUpload>({ step: 'uploading', fileName, percent: 0 }),
      catchError((error: unknown) => of<AttachmentUpload>({ step: 'failed', fileName, message: describeError(error) })),
    );
  }

  private added(attachment: AttachmentSummary): void {
    this.list.update((list) => list && { ...list, attachments: [...list.attachments, attachment] });
  }
}
