import { HttpClient } from '@angular/common/http';
import { computed, DestroyRef, effect, inject, Injectable, signal, untracked } from '@angular/core';
import { firstValueFrom, Subject } from 'rxjs';
import { PanelRecord } from '../../../shared/api/contract';
import { AuthStore } from '../auth/auth-store';
import { ApiProblem, describeError } from '../core/api-problem';
import { JobsApi } from '../jobs/jobs-api';
import { MARK_STORE, NewMark, QueuedMark } from './mark-store';

/** What became of a mark once the server answered. */
export type MarkOutcome = { mark: QueuedMark; saved: PanelRecord } | { mark: QueuedMark; refused: true };

/** The first wait before trying again after a failed send; it doubles with each failure up to the last. */
export const RETRY_FIRST_MS = 2_000;
export const RETRY_LAST_MS = 60_000;

/**
 * What a failed send means: the server refused the mark (it will refuse it again, so the member must
 * know), the session ended (the marks wait for the member to sign in again), or the server could not be
 * reached or failed (try again later). The offline worker answers 504 when the network is gone.
 */
function verdictOf(error: unknown): 'refused' | 'signed-out' | 'unreachable' | 'retry' {
  if (!(error instanceof ApiProblem)) return 'retry';
  if (error.status === 401) return 'signed-out';
  if (error.status === 0 || error.status === 502 || error.status === 503 || error.status === 504) return 'unreachable';
  if (error.status === 408 || error.status === 429 || error.status >= 500) return 'retry';
  return 'refused';
}

/**
 * The bench's marks on their way to the server. Every mark is kept on this device first (IndexedDB),
 * shown as waiting, then sent one at a time in the order made: at once when the server can be reached,
 * else when the browser says it is online again, or after a wait that doubles with each failure. A mark
 * the server refuses stays, with the reason, until the member has read it; nothing is dropped unseen.
 * Marks belong to the member who made them: another member signed in on the same device neither sees
 * nor sends them.
 */
@Injectable({ providedIn: 'root' })
export class MarkQueue {
  private readonly store = inject(MARK_STORE);
  private readonly http = inject(HttpClient);
  private readonly api = inject(JobsApi);
  private readonly auth = inject(AuthStore);
  private readonly userId = computed(() => this.auth.user()?.id);

  private readonly kept = signal<QueuedMark[]>([]);
  private readonly browserOnline = signal(navigator.onLine);
  private readonly unreachable = signal(false);
  private readonly inFlight = signal<QueuedMark | undefined>(undefined);
  private readonly lastFailure = signal<string | null>(null);
  private sending: Promise<void> | undefined;
  private retryTimer: ReturnType<typeof setTimeout> | undefined;
  private failures = 0;
  /** Whether the server has been asked, or has answered a mark, since this page opened. */
  private reachTried = false;

  /** No network, or the server did not answer the last try. */
  readonly offline = computed(() => !this.browserOnline() || this.unreachable());
  readonly waiting = computed(() => this.kept().filter((m) => !m.refused));
  readonly refused = computed(() => this.kept().filter((m) => m.refused));
  readonly sendingMark = this.inFlight.asReadonly();
  /** Why the last try failed, while marks wait for another. */
  readonly failure = this.lastFailure.asReadonly();
  /** Each mark the server took, with the panel as saved (before it leaves `waiting`), and each it refused (once in `refused` with those held back). */
  readonly outcomes = new Subject<MarkOutcome>();

  constructor() {
    const online = () => {
      this.browserOnline.set(true);
      this.failures = 0;
      void this.send();
    };
    const offline = () => this.browserOnline.set(false);
    window.addEventListener('online', online);
    window.addEventListener('offline', offline);
    inject(DestroyRef).onDestroy(() => {
      window.removeEventListener('online', online);
      window.removeEventListener('offline', offline);
      clearTimeout(this.retryTimer);
    });
    // The member's own marks, sent as soon as they are signed in (again).
    effect(() => {
      this.userId();
      untracked(() => void this.load().then(() => this.send()));
    });
  }

  /** Keeps a mark and sends it as soon as it can; resolves with its `seq` once it is kept. */
  async add(mark: Omit<NewMark, 'userId' | 'madeAt'>): Promise<number | undefined> {
    const userId = this.userId();
    if (userId === undefined) return undefined;
    const seq = await this.store.add({ ...mark, userId, madeAt: new Date().toISOString() });
    await this.load();
    void this.send();
    return seq;
  }

  /** The member has read why a mark was refused: it goes. */
  async acknowledge(mark: QueuedMark): Promise<void> {
    await this.store.remove(mark.seq);
    await this.load();
  }

  /** Sends what waits, in order; a call while a pass runs joins it (the pass takes marks added meanwhile). */
  send(): Promise<void> {
    this.sending ??= this.exclusively(() => this.sendWaiting()).finally(() => (this.sending = undefined));
    return this.sending;
  }

  /**
   * One tab of the app sends at a time (the Web Locks API, where the browser has it): a pass reads the
   * queue afresh before each mark, so a mark another tab has sent is not sent twice.
   */
  private exclusively(pass: () => Promise<void>): Promise<void> {
    if (typeof navigator.locks === 'undefined') return pass();
    return navigator.locks.request('borewright-bench-marks', pass).then(() => undefined);
  }

  private async sendWaiting(): Promise<void> {
    clearTimeout(this.retryTimer);
    for (;;) {
      const userId = this.userId();
      if (userId === undefined || !this.browserOnline()) return;
      const next = (await this.store.list(userId)).find((m) => !m.refused);
      if (!next) {
        if (!this.reachTried || this.unreachable()) await this.askServer();
        return;
      }
      this.inFlight.set(next);
      const answer = await this.api.setPanelStatus({ dbId: next.panelDbId, version: next.version }, next.to).then(
        (saved) => ({ saved }),
        (error: unknown) => ({ error }),
      );
      this.inFlight.set(undefined);
      if ('saved' in answer) {
        await this.accepted(next, answer.saved);
        continue;
      }
      const verdict = verdictOf(answer.error);
      if (verdict === 'refused') {
        await this.refuse(next, answer.error);
        continue;
      }
      this.lastFailure.set(describeError(answer.error));
      this.unreachable.set(verdict === 'unreachable');
      if (verdict !== 'signed-out') this.retryLater();
      return;
    }
  }

  /**
   * With no mark to send, the server is asked whether it answers: the browser's word that it is online
   * only means a network is there (a workshop's Wi-Fi can lead nowhere, and a page opened from the
   * offline worker is told it is online), so the bench says it is offline once the server fails to
   * answer, and asks again later until it does.
   */
  private async askServer(): Promise<void> {
    this.reachTried = true;
    const error = await firstValueFrom(this.http.get('/api/health')).then(
      () => undefined,
      (failure: unknown) => failure,
    );
    if (error === undefined) return this.answered();
    if (verdictOf(error) !== 'unreachable') return;
    this.unreachable.set(true);
    this.retryLater();
  }

  private async accepted(mark: QueuedMark, saved: PanelRecord): Promise<void> {
    await this.store.remove(mark.seq);
    // Marks made on top of this one on the same panel go with the version it gave the panel.
    for (const later of await this.laterOnPanel(mark)) await this.store.put({ ...later, version: saved.version });
    this.answered();
    this.outcomes.next({ mark, saved });
    await this.load();
  }

  private async refuse(mark: QueuedMark, error: unknown): Promise<void> {
    const code = error instanceof ApiProblem ? error.code : 'refused';
    await this.store.put({ ...mark, refused: { code, reason: describeError(error) } });
    // A mark made on top of a refused one cannot stand either: it is held back, with its reason.
    for (const later of await this.laterOnPanel(mark)) {
      await this.store.put({ ...later, refused: { code: 'earlier-refused', reason: `Not sent: the mark before it on “${mark.name}” was refused.` } });
    }
    this.answered();
    await this.load();
    this.outcomes.next({ mark, refused: true });
  }

  private async laterOnPanel(mark: QueuedMark): Promise<QueuedMark[]> {
    return (await this.store.list(mark.userId)).filter((m) => !m.refused && m.seq > mark.seq && m.panelDbId === mark.panelDbId);
  }

  /** The server answered: it can be reached, and the waits start short again. */
  private answered(): void {
    this.reachTried = true;
    this.failures = 0;
    this.unreachable.set(false);
    this.lastFailure.set(null);
  }

  private retryLater(): void {
    const wait = Math.min(RETRY_FIRST_MS * 2 ** this.failures, RETRY_LAST_MS);
    this.failures++;
    this.retryTimer = setTimeout(() => void this.send(), wait);
  }

  private async load(): Promise<void> {
    const userId = this.userId();
    this.kept.set(userId === undefined ? [] : await this.store.list(userId));
  }
}
