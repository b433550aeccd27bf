import { HttpEvent, HttpEventType } from '@angular/common/http';

/**
 * What an upload's events say: the share sent so far, in percent (null once all is sent and the server
 * is reading it), or the answer's body at the end. Other events say nothing new.
 */
export type UploadStep = { percent: number | null } | { body: unknown } | null;

export function uploadStep(event: HttpEvent<unknown>): UploadStep {
  if (event.type === HttpEventType.UploadProgress) {
    const sent = event.total ? event.loaded / event.total : 0;
    return { percent: sent >= 1 ? null : Math.round(sent * 100) };
  }
  if (event.type === HttpEventType.Response) return { body: event.body };
  return null;
}
