import { DestroyRef, inject, Injectable, signal } from '@angular/core';
import { Subject } from 'rxjs';
import type { Catalog } from '../../../shared/catalog/fitting';
import type { JobDocument, Panel } from '../../../shared/model/job-document';
import type { LengthUnit } from '../../../shared/units/length-unit';
import { LiveCheckRequests, type LiveCheckAnswer } from './live-check-request';

/**
 * How long the newest request may wait for its answer before the page says that the findings shown are of
 * an earlier position: a worker that answers within a frame or two, as it does on most panels, never makes
 * the page say so, and nothing on the page changes twice a move.
 */
export const LATE_AFTER_MS = 250;

/**
 * The full check of a panel run in a Web Worker while a drag lasts, so that the page's main thread only
 * posts the moved placements and shows what comes back. Answers are numbered and come back in order.
 * Where there is no worker (a test's DOM) or it failed, `working` is false and the editor checks on the
 * main thread.
 */
@Injectable()
export class LiveChecks {
  private readonly worker = typeof Worker === 'undefined' ? undefined : new Worker(new URL('./live-checks.worker', import.meta.url), { type: 'module' });
  private readonly requests = new LiveCheckRequests();
  private readonly answered = new Subject<LiveCheckAnswer>();
  private readonly late = signal(false);
  private readonly failed = signal(false);
  private asked = 0;
  /** Runs out LATE_AFTER_MS after the first request still unanswered. */
  private lateTimer: ReturnType<typeof setTimeout> | undefined;

  /** Every answer as it comes back: not a signal, so that an answer saying what is shown already changes nothing. */
  readonly answers = this.answered.asObservable();
  /** The newest request has waited more than LATE_AFTER_MS for its answer. */
  readonly behind = this.late.asReadonly();

  constructor() {
    this.worker?.addEventListener('message', (e: MessageEvent<LiveCheckAnswer>) => {
      if (e.data.seq === this.asked) {
        clearTimeout(this.lateTimer);
        this.lateTimer = undefined;
        this.late.set(false);
      }
      this.answered.next(e.data);
    });
    this.worker?.addEventListener('error', () => this.failed.set(true));
    inject(DestroyRef).onDestroy(() => {
      clearTimeout(this.lateTimer);
      this.worker?.terminate();
    });
  }

  working(): boolean {
    return this.worker !== undefined && !this.failed();
  }

  /** The number of the last request sent: answers up to it are of what was asked before now. */
  lastAsked(): number {
    return this.asked;
  }

  /** Asks for the findings of `panel` as it is now in `job`. */
  ask(job: JobDocument, panel: Panel, catalog: Catalog, unit: LengthUnit): void {
    if (!this.worker) return;
    const request = this.requests.next(job, panel, catalog, unit);
    this.worker.postMessage(request);
    this.asked = request.seq;
    this.lateTimer ??= setTimeout(() => this.late.set(true), LATE_AFTER_MS);
  }
}
