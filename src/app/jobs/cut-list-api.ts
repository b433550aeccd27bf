import { HttpClient, HttpEvent } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';

export const cutListPreviewUrl = (jobId: number) => `/api/jobs/${jobId}/cut-list/preview`;
export const cutListImportUrl = (jobId: number) => `/api/jobs/${jobId}/cut-list`;

/** Sends a cut list (CSV) to be previewed or imported; the events carry upload progress, the last one the answer. */
@Injectable({ providedIn: 'root' })
export class CutListApi {
  private readonly http = inject(HttpClient);

  preview(jobId: number, file: File): Observable<HttpEvent<unknown>> {
    return this.send(cutListPreviewUrl(jobId), file);
  }

  import(jobId: number, file: File): Observable<HttpEvent<unknown>> {
    return this.send(cutListImportUrl(jobId), file);
  }

  private send(url: string, file: File): Observable<HttpEvent<unknown>> {
    const form = new FormData();
    form.append('file', file, file.name);
    return this.http.post(url, form, { reportProgress: true, observe: 'events' });
  }
}
