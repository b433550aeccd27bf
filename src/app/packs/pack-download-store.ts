import { HttpEvent, HttpEventType } from '@angular/common/http';
import { computed, inject, Injectable } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { catchError, endWith, exhaustMap, filter, ignoreElements, map, merge, Observable, of, scan, share, startWith, Subject, switchMap, takeUntil, timer } from 'rxjs';
import { PackProgressAnswer, PROGRESS_POLL_MS } from '../../../shared/api/pack-contract';
import { PaperName } from '../../../shared/export/paper';
import { describeError } from '../core/api-problem';
import { attachmentName, PackApi } from './pack-api';

export type DownloadState =
  | { step: 'idle' }
  /**
   * The server makes each file as the zip reaches it, so only the bytes so far are known, and, once the
   * server says, the panel it has reached.
   */
  | { step: 'downloading'; received: number; packed?: PackProgressAnswer }
  | { step: 'done'; fileName: string; blob: Blob }
  | { step: 'failed'; message: string };

const idle: DownloadState = { step: 'idle' };
const starting: DownloadState = { step: 'downloading', received: 0 };

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
    const ticket = crypto.randomUUID();
    const download = this.api.downloadPack(jobId, paper, ticket).pipe(
      map(stateOf),
      filter((state): state is DownloadState => state !== null),
      share(),
    );
    // Asked one at a time (a slow answer is not asked again over), until the download ends.
    const packed = timer(PROGRESS_POLL_MS, PROGRESS_POLL_MS).pipe(
      exhaustMap(() => this.api.packProgress(ticket)),
      filter((progress): progress is PackProgressAnswer => progress !== null),
      takeUntil(download.pipe(ignoreElements(), endWith(true))),
    );
    return merge(download, packed).pipe(
      scan((state: DownloadState, next: DownloadState | PackProgressAnswer): DownloadState => {
        if (!('step' in next)) return state.step === 'downloading' ? { ...state, packed: next } : state;
        return next.step === 'downloading' && state.step === 'downloading' && state.packed ? { ...next, packed: state.packed } : next;
      }, starting),
      startWith(starting),
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
