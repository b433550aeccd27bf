import { DestroyRef, inject, Injectable, signal } from '@angular/core';
import type { Catalog } from '../../../shared/catalog/fitting';
import type { JobDocument, Panel } from '../../../shared/model/job-document';
import type { LengthUnit } from '../../../shared/units/length-unit';
import { LiveCheckRequests, type LiveCheckAnswer } from './live-check-request';

/**
 * The full check of a panel run in a Web Worker while a drag lasts, so that the page's main thread only
 * posts the moved placements and shows what comes back. Answers are numbered; one older than an answer
 * already shown is dropped. Where there is no worker (a test's DOM) or it failed, `working` is false and
 * the editor checks on the main thread.
 */
@Injectable()
export class LiveChecks {
  private readonly worker = typeof Worker === 'undefined' ? undefined : new Worker(new URL('./live-checks.worker', import.meta.url), { type: 'module' });
  private readonly requests = new LiveCheckRequests();
  private readonly askedSeq = signal(0);
  private readonly latest = signal<LiveCheckAnswer | undefined>(undefined);
  private readonly failed = signal(false);

  /** The number of the last request sent. */
  readonly asked = this.askedSeq.asReadonly();
  /** The newest answer come back. */
  readonly answer = this.latest.asReadonly();

  constructor() {
    this.worker?.addEventListener('message', (e: MessageEvent<LiveCheckAnswer>) => {
      if (e.data.seq > (this.latest()?.seq ?? 0)) this.latest.set(e.data);
    });
    this.worker?.addEventListener('error', () => this.failed.set(true));
    inject(DestroyRef).onDestroy(() => this.worker?.terminate());
  }

  working(): boolean {
    return this.worker !== undefined && !this.failed();
  }

  /** Asks for the findings of `panel` as it is now in `job`. */
  ask(job: JobDocument, panel: Panel, catalog: Catalog, unit: LengthUnit): void {
    if (!this.worker) return;
    const request = this.requests.next(job, panel, catalog, unit);
    this.worker.postMessage(request);
    this.askedSeq.set(request.seq);
  }
}
