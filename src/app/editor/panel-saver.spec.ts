import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { of } from 'rxjs';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { PanelRecord } from '../../../shared/api/contract';
import type { Panel } from '../../../shared/model/job-document';
import { makeJob, makePanel } from '../../../shared/testing/make-job';
import { AuthStore } from '../auth/auth-store';
import { ApiProblem } from '../core/api-problem';
import { selectionOf } from './document/selection';
import { EditorApi } from './editor-api';
import { EditorSource } from './editor-source';
import { EditorStore } from './editor-store';
import { LiveChecks } from './live-checks';
import { AUTOSAVE_MS, PanelSaver } from './panel-saver';

// A shelf pin on the front row of an 18 mm side (system holes at 9 + 32k): no finding until the test makes one.
const job = makeJob([makePanel('left', { placements: [{ id: 'pin-1', fitting: 'shelf-pin-5', x: 37, y: 105, face: 'A' }] })]);

function setUp(confirm: boolean) {
  const panel = signal<Panel | undefined>(job.panels[0]);
  const record = signal({ ...job.panels[0], dbId: 7, version: 3 } as unknown as PanelRecord);
  const saveDrilling = vi.fn(async (_id: number, version: number, drilling: Pick<Panel, 'placements' | 'bores'>) => ({ ...record(), ...drilling, version: version + 1 }));
  const reload = vi.fn();
  const open = vi.fn(() => ({ afterClosed: () => of(confirm) }));
  TestBed.configureTestingModule({
    providers: [
      EditorStore,
      LiveChecks,
      PanelSaver,
      { provide: EditorSource, useValue: { panel, record, job: signal(job), jobDetail: signal(undefined), reload } },
      { provide: AuthStore, useValue: { can: () => true, units: () => 'mm' } },
      { provide: EditorApi, useValue: { saveDrilling } },
      { provide: MatDialog, useValue: { open } },
    ],
  });
  return { store: TestBed.inject(EditorStore), saver: TestBed.inject(PanelSaver), saveDrilling, reload, open };
}

describe('PanelSaver', () => {
  beforeEach(() => TestBed.resetTestingModule());
  afterEach(() => vi.useRealTimers());

  it('saves with the version it loaded, then with the one the server gave back', async () => {
    const { store, saver, saveDrilling } = setUp(true);
    store.select(selectionOf(['pin-1']));
    store.nudge(0, 32);
    expect(store.errors()).toEqual([]);
    expect(saver.state()).toBe('unsaved');
    expect(await saver.saveNow()).toBe(true);
    expect(saveDrilling).toHaveBeenLastCalledWith(7, 3, store.panel());
    expect(saver.state()).toBe('saved');
    store.nudge(0, 32);
    await saver.saveNow();
    expect(saveDrilling).toHaveBeenLastCalledWith(7, 4, store.panel());
  });

  it('shows a 409 as stale, stops autosaving, and reloads on request', async () => {
    vi.useFakeTimers();
    const { store, saver, saveDrilling, reload } = setUp(true);
    saveDrilling.mockRejectedValueOnce(new ApiProblem(409, 'stale-version', 'Someone else changed this panel since you opened it.'));
    store.select(selectionOf(['pin-1']));
    store.nudge(0, 32);
    // toObservable reads the panel through an effect, which runs when the test's app ticks.
    TestBed.tick();
    await vi.advanceTimersByTimeAsync(AUTOSAVE_MS + 10);
    expect(saveDrilling).toHaveBeenCalledTimes(1);
    expect(saver.state()).toBe('stale');
    expect(saver.failure()).toMatch(/someone else changed/i);
    store.nudge(0, 32);
    TestBed.tick();
    await vi.advanceTimersByTimeAsync(AUTOSAVE_MS * 2);
    expect(saveDrilling).toHaveBeenCalledTimes(1);
    saver.reload();
    expect(reload).toHaveBeenCalled();
    expect(saver.state()).not.toBe('stale');
  });

  it('does not autosave with an error finding, and asks before saving it, naming the finding', async () => {
    vi.useFakeTimers();
    const { store, saver, saveDrilling, open } = setUp(false);
    // A copy of the pin, pasted a pitch up and brought down to 3 mm from it: two Ø5 bores that overlap.
    store.select(selectionOf(['pin-1']));
    store.copySelection();
    store.paste();
    store.nudge(0, -29);
    expect(store.errors().length).toBeGreaterThan(0);
    TestBed.tick();
    await vi.advanceTimersByTimeAsync(AUTOSAVE_MS * 2);
    expect(saveDrilling).not.toHaveBeenCalled();

    expect(await saver.saveNow()).toBe(false);
    const [, request] = open.mock.calls[0] as unknown as [unknown, { data: { message: string } }];
    expect(request.data.message).toContain(store.errors()[0].code);
    expect(saveDrilling).not.toHaveBeenCalled();
  });
});
