import { TestBed } from '@angular/core/testing';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { builtinCatalog } from '../../../shared/catalog/builtin-catalog';
import { makeJob, makePanel } from '../../../shared/testing/make-job';
import type { LiveCheckAnswer, LiveCheckRequest } from './live-check-request';
import { LATE_AFTER_MS, LiveChecks } from './live-checks';

/** A worker that keeps what it is sent and answers when the test says. */
class HeldWorker extends EventTarget {
  static last: HeldWorker | undefined;
  readonly sent: LiveCheckRequest[] = [];
  constructor() {
    super();
    HeldWorker.last = this;
  }
  postMessage(request: LiveCheckRequest): void {
    this.sent.push(request);
  }
  answer(seq: number): void {
    this.dispatchEvent(new MessageEvent<LiveCheckAnswer>('message', { data: { seq, findings: [] } }));
  }
  terminate(): void {}
}

const job = makeJob([makePanel('left')]);
const catalog = builtinCatalog();

describe('LiveChecks', () => {
  beforeEach(() => {
    vi.useFakeTimers();
    vi.stubGlobal('Worker', HeldWorker);
    TestBed.configureTestingModule({ providers: [LiveChecks] });
  });
  afterEach(() => {
    TestBed.resetTestingModule();
    vi.unstubAllGlobals();
    vi.useRealTimers();
  });

  it(`says it is behind only once the newest request has waited over ${LATE_AFTER_MS} ms, until that one is answered`, () => {
    const live = TestBed.inject(LiveChecks);
    const worker = HeldWorker.last!;
    const answers: number[] = [];
    live.answers.subscribe((a) => answers.push(a.seq));
    const ask = () => live.ask(job, job.panels[0], catalog, 'mm');

    // A worker that answers each move within the frame: never behind, however long the drag.
    for (let move = 0; move < 30; move++) {
      ask();
      vi.advanceTimersByTime(10);
      worker.answer(live.lastAsked());
      vi.advanceTimersByTime(7);
    }
    expect(live.behind()).toBe(false);

    // A worker always a move behind: answered, but never the newest request.
    for (let move = 0; move < 20; move++) {
      ask();
      if (move > 0) worker.answer(live.lastAsked() - 1);
      expect(live.behind(), `move ${move}`).toBe(move * 17 >= LATE_AFTER_MS);
      vi.advanceTimersByTime(17);
    }
    expect(live.behind()).toBe(true);
    worker.answer(live.lastAsked());
    expect(live.behind(), 'caught up').toBe(false);
    expect(answers.length, 'every answer is passed on').toBe(30 + 19 + 1);
  });
});
