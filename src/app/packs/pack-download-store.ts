import { HttpEvent, HttpEventType } from '@angular/common/http';
import { computed, inject, Injectable } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { catchError, filter, map, Observable, of, startWith, Subject, switchMap } from 'rxjs';
import { PaperName } from '../../../shared/export/paper';
import { describeError } from '../core/api-problem';
import { attachmentName, PackApi } from './pack-api';

export type DownloadState =
  | { step: 'idle' }
  /** The server makes each file as the zip reaches it, so only the bytes so far are known. */
  | { step: 'downloading'; received: number }
  | { step: 'done'; fileName: string; blob: Blob }
  | { step: 'failed'; message: string };

const idle: DownloadState = { step: 'idle' };

/** One pack download at a time: starting another or cancelling drops the one under way. */
@Injectable()
export class PackDownloadStore {
  private readonly api = inject(PackApi);

  private readonly requests = new Subject<{ jobId: number; paper: PaperName } | null>();

  readonly state = toSignal(
    this.requests.pipe(switchMap((request) => (request === null ? of(idle) : this.download(request.jobId, request.paper)))),
    { initialValue: idle },
  );
  readonly busy = computed(() => this.state().step === 'downloading');

  start(jobId: number, paper: PaperName): void {
    this.requests.next({ jobId, paper });
  }

  cancel(): void {
    this.requests.next(null);
  }

  private download(jobId: number, paper: PaperName): Observable<DownloadState> {
    return this.api.downloadPack(jobId, paper).pipe(
      map(stateOf),
      filter((state): state is DownloadState => state !== null),
      startWith<DownloadState>({ step: 'downloading', received: 0 }),
      catchError((error: unknown) => of<DownloadState>({ step: 'failed', message: describeError(error) })),
    );
  }
}

function stateOf(event: HttpEvent<Blob>): DownloadState | null {
  if (event.type === HttpEventType.DownloadProgress) return { step: 'downloading', received: event.loaded };
  if (event.type === HttpEventType.Response && event.body) {
    return { step: 'done', fileName: attachmentName(event.headers.get('Content-Disposition'), 'bench pack.zip'), blob: event.body };
  }
  return null;
}
