import { HttpClient, HttpEvent } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom, Observable } from 'rxjs';

export const jobAttachmentsUrl = (jobId: number) => `/api/jobs/${jobId}/attachments`;
export const attachmentUrl = (attachmentId: number) => `/api/attachments/${attachmentId}`;

/** Uploads and deletes a job's attachments; the list is read through `httpResource` in the store. */
@Injectable({ providedIn: 'root' })
export class AttachmentsApi {
  private readonly http = inject(HttpClient);

  /** The events carry upload progress; the last one is the stored attachment. */
  upload(jobId: number, file: File): Observable<HttpEvent<unknown>> {
    const form = new FormData();
    form.append('file', file, file.name);
    return this.http.post(jobAttachmentsUrl(jobId), form, { reportProgress: true, observe: 'events' });
  }

  async delete(attachmentId: number): Promise<void> {
    await firstValueFrom(this.http.delete(attachmentUrl(attachmentId)));
  }
}
