import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Subject } from 'rxjs';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { checkPanel } from '../../../shared/checks';
import { builtinCatalog } from '../../../shared/catalog/builtin-catalog';
import type { Catalog } from '../../../shared/catalog/fitting';
import type { JobDocument } from '../../../shared/model/job-document';
import type { Panel } from '../../../shared/model/job-document';
import type { LengthUnit } from '../../../shared/units/length-unit';
import { makeJob, makePanel } from '../../../shared/testing/make-job';
import { AuthStore } from '../auth/auth-store';
import { selectionOf } from './document/selection';
import { EditorSource } from './editor-source';
import { EditorStore, LISTS_FOLLOW_MS } from './editor-store';
import type { LiveCheckAnswer } from './live-check-request';
import { LiveChecks } from './live-checks';

const job = makeJob([makePanel('left', { placements: [{ id: 'plate-0-1', fitting: 'plate-0', x: 37, y: 121, face: 'A' }] })]);

const door = makeJob([makePanel('door', { role: 'door', width: 400, height: 700 })]);

/** Three mounting plates on one spot: one dragged away leaves two that still share their holes. */
const stacked = makeJob([makePanel('left', { placements: ['a', 'b', 'c'].map((id) => ({ id, fitting: 'plate-0', x: 37, y: 121, face: 'A' as const })) })]);

/** A worker that answers only when told, with whatever it is told: the store must show it only while a drag lasts. */
class HeldLiveChecks {
  private asked = 0;
  readonly answers = new Subject<LiveCheckAnswer>();
  readonly behind = signal(false);
  readonly panels: Panel[] = [];
  working(): boolean {
    return true;
  }
  lastAsked(): number {
    return this.asked;
  }
  ask(_job: JobDocument, panel: Panel, _catalog: Catalog): void {
    this.panels.push(panel);
    this.asked++;
  }
  answer(findings: LiveCheckAnswer['findings']): void {
    this.answers.next({ seq: this.asked, findings });
  }
}

function setUp(editor = true, { archived = false, of = job, units = signal<LengthUnit>('mm'), live = undefined as HeldLiveChecks | undefined } = {}) {
  const panel = signal<Panel | undefined>(of.panels[0]);
  const jobDetail = signal({ job: { archived } });
  TestBed.configureTestingModule({
    providers: [
      EditorStore,
      live ? { provide: LiveChecks, useValue: live } : LiveChecks,
      { provide: EditorSource, useValue: { panel, record: panel, job: signal(of), jobDetail } },
      { provide: AuthStore, useValue: { can: () => editor, units } },
    ],
  });
  return TestBed.inject(EditorStore);
}

/** Picks up plate c of `stacked` and drags it to y 384 on the stage (505 on the panel), the frame's effects run. */
function dragPlateC(store: EditorStore): void {
  store.select(selectionOf(['c']));
  store.startDrag();
  store.dragTo('c', { x: 0, y: 384 }, false);
  TestBed.tick();
}

describe('EditorStore', () => {
  beforeEach(() => TestBed.resetTestingModule());

  it("starts the step at the member's usual one and takes the new unit's when the units change", () => {
    const units = signal<LengthUnit>('mm');
    const store = setUp(true, { units });
    expect(store.step()).toBe(1);
    // 1/16 in = 25.4 / 16 = 1.5875 mm (the international inch, 25.4 mm: NIST SP 811, published).
    units.set('in-32');
    expect(store.step()).toBe(1.5875);
    store.step.set(3.175);
    expect(store.step()).toBe(3.175);
  });

  it('snaps a dragged plate from hole to hole and records the whole drag as one step', () => {
    const store = setUp();
    store.select(selectionOf(['plate-0-1']));
    store.startDrag();
    store.dragTo('plate-0-1', { x: 3, y: 10 }, false);
    expect(store.panel()?.placements[0]).toMatchObject({ x: 37, y: 121 });
    store.dragTo('plate-0-1', { x: 3, y: 20 }, false);
    expect(store.panel()?.placements[0]).toMatchObject({ x: 37, y: 153 });
    store.dragTo('plate-0-1', { x: 3.5, y: 20 }, true);
    expect(store.panel()?.placements[0]).toMatchObject({ x: 40.5, y: 141 });
    store.endDrag();
    store.undo();
    expect(store.panel()?.placements[0]).toMatchObject({ x: 37, y: 121 });
    expect(store.canUndo()).toBe(false);
  });

  it('leaves the panel as it was for a move that stays within one snap, and moves it at the next hole', () => {
    const store = setUp();
    store.select(selectionOf(['plate-0-1']));
    store.startDrag();
    store.dragTo('plate-0-1', { x: 0, y: 20 }, false);
    const first = store.panel();
    store.dragTo('plate-0-1', { x: 1, y: 24 }, false);
    expect(store.panel()).toBe(first);
    store.dragTo('plate-0-1', { x: 0, y: 52 }, false);
    expect(store.panel()?.placements[0]).toMatchObject({ x: 37, y: 185 });
  });

  it('goes back to where a drag began on Escape', () => {
    const store = setUp();
    store.select(selectionOf(['plate-0-1']));
    store.startDrag();
    store.dragTo('plate-0-1', { x: 0, y: 64 }, false);
    store.cancelDrag();
    expect(store.panel()?.placements[0].y).toBe(121);
    expect(store.dragging()).toBe(false);
    expect(store.canUndo()).toBe(false);
  });

  it('pastes one pitch up, selects the copies, and finds the clash while their bodies overlap', () => {
    const store = setUp();
    store.select(selectionOf(['plate-0-1']));
    store.copySelection();
    store.paste();
    expect(store.panel()?.placements.map((p) => [p.id, p.y])).toEqual([
      ['plate-0-1', 121],
      ['plate-0-1-2', 153],
    ]);
    expect([...store.selection().placements]).toEqual(['plate-0-1-2']);
    // A plate's body is 50 mm tall: one pitch apart the two overlap, three apart they are clear.
    const codes = () => store.findings().map((f) => f.code);
    expect(codes()).toContain('keepouts-overlap');
    store.nudge(0, 64);
    expect(codes()).not.toContain('keepouts-overlap');
    store.undo();
    expect(codes()).toContain('keepouts-overlap');
  });

  it('changes nothing for a role that may not edit', () => {
    const store = setUp(false);
    store.placeFitting('shelf-pin-5', { x: 40, y: 300 });
    store.select(selectionOf(['plate-0-1']));
    store.deleteSelection();
    expect(store.panel()).toBe(job.panels[0]);
  });

  it('changes nothing on an archived job, even for a designer', () => {
    const store = setUp(true, { archived: true });
    expect(store.editable()).toBe(false);
    store.placeFitting('shelf-pin-5', { x: 40, y: 300 });
    expect(store.panel()).toBe(job.panels[0]);
  });

  it('fills a dropped hinge cup\'s cup-boring distance from where it lands, and keeps B in the hinge\'s range', () => {
    // trade-reference §2: cup centre = B + 17.5 mm for a Ø35 cup (common practice); this hinge takes B 3 to 7 mm.
    const store = setUp(true, { of: door });
    store.placeFitting('hinge-full-overlay-45', { x: 21.2, y: 100 });
    expect(store.panel()?.placements[0]).toMatchObject({ x: 21, params: { boringDistance: 3.5 } });
    store.placeFitting('hinge-full-overlay-45', { x: 60, y: 600 });
    expect(store.panel()?.placements[1]).toMatchObject({ x: 24.5, params: { boringDistance: 7 } });
    store.setPlacement(store.panel()!.placements[1].id, { params: { boringDistance: 4.5 } });
    expect(store.panel()?.placements[1]).toMatchObject({ x: 22, params: { boringDistance: 4.5 } });
  });

  it('lets go of what an undo takes off the panel', () => {
    const store = setUp();
    store.placeFitting('shelf-pin-5', { x: 40, y: 300 });
    expect(store.selection().placements.size).toBe(1);
    store.undo();
    expect(store.hasSelection()).toBe(false);
    store.redo();
    expect(store.hasSelection()).toBe(false);
  });

  it('shows the worker\'s answer during a drag, marked pending while the worker is late, and the full check after the drop', () => {
    const live = new HeldLiveChecks();
    const store = setUp(true, { of: stacked, live });
    const full = () => checkPanel(stacked, store.panel()!, builtinCatalog(), { fixes: false, unit: 'mm' });
    const atRest = store.findings();
    expect(atRest).toEqual(full());
    dragPlateC(store);
    expect(live.panels.at(-1)?.placements.find((p) => p.id === 'c')?.y).toBe(505);
    expect(store.findingsPending(), 'not until the worker is late').toBe(false);
    expect(store.findings(), 'until the worker answers, the findings the drag began with').toBe(atRest);
    live.answer([]);
    expect(store.findings()).toEqual([]);
    store.dragTo('c', { x: 0, y: 416 }, false);
    TestBed.tick();
    live.behind.set(true);
    expect(store.findingsPending()).toBe(true);
    store.endDrag();
    // After the drop, whatever the worker said: the full check of the panel as dropped, with the two plates
    // left behind still sharing their holes.
    expect(store.findingsPending()).toBe(false);
    expect(store.findings()).toEqual(full());
    expect(store.findings().some((f) => f.code === 'hole-shared' && f.placements.every((id) => id === 'a' || id === 'b'))).toBe(true);
  });

  it('drops an answer of an earlier drag', () => {
    const live = new HeldLiveChecks();
    const store = setUp(true, { of: stacked, live });
    dragPlateC(store);
    store.endDrag();
    const dropped = store.findings();
    store.startDrag();
    live.answer([]);
    expect(store.findings()).toBe(dropped);
  });

  it('shows an answer equal to the findings a drag began with, when that drag is a later one', () => {
    const live = new HeldLiveChecks();
    const store = setUp(true, { of: stacked, live });
    dragPlateC(store);
    live.answer([]);
    store.endDrag();
    expect(store.findings().length, 'the dropped plate is clear, the two left behind still share their holes').toBeGreaterThan(0);
    store.startDrag();
    store.dragTo('c', { x: 0, y: 416 }, false);
    TestBed.tick();
    expect(store.findings().length, 'before this drag\'s first answer, the findings it began with').toBeGreaterThan(0);
    live.answer([]);
    expect(store.findings(), 'the same answer as the last drag\'s, but of this one').toEqual([]);
  });

  describe('the lists beside the stage during a drag', () => {
    beforeEach(() => vi.useFakeTimers());
    afterEach(() => vi.useRealTimers());

    it(`catch up with it at most every ${LISTS_FOLLOW_MS} ms, and at once on the drop`, () => {
      const store = setUp(true, { of: stacked });
      const listedY = () => store.listedPanel()?.placements.find((p) => p.id === 'c')?.y;
      store.select(selectionOf(['c']));
      store.startDrag();
      store.dragTo('c', { x: 0, y: 384 }, false);
      expect(store.panel()?.placements.find((p) => p.id === 'c')?.y).toBe(505);
      expect(listedY(), 'the drag has just begun').toBe(121);
      expect(store.selectedPlacements()[0].y).toBe(121);
      vi.advanceTimersByTime(LISTS_FOLLOW_MS / 2);
      store.dragTo('c', { x: 0, y: 416 }, false);
      expect(listedY()).toBe(121);
      vi.advanceTimersByTime(LISTS_FOLLOW_MS / 2);
      expect(listedY(), 'caught up with the newest move').toBe(537);
      store.dragTo('c', { x: 0, y: 448 }, false);
      expect(listedY()).toBe(537);
      store.endDrag();
      expect(listedY(), 'the drop').toBe(569);
      expect(store.selectedPlacements()[0].y).toBe(569);
    });

    it(`list the checks' answer within ${LISTS_FOLLOW_MS} ms, also one that comes after the last move, while the stage has it at once`, () => {
      const live = new HeldLiveChecks();
      const store = setUp(true, { of: stacked, live });
      const atRest = store.findings();
      expect(atRest.length, 'the three plates share their holes').toBeGreaterThan(0);
      dragPlateC(store);
      vi.advanceTimersByTime(LISTS_FOLLOW_MS);
      expect(store.listedFindings(), 'no answer yet: the findings the drag began with').toEqual(atRest);
      // The pointer rests; the worker answers afterwards.
      live.answer([]);
      expect(store.findings(), 'what the stage rings').toEqual([]);
      expect(store.listedFindings()).toEqual(atRest);
      vi.advanceTimersByTime(LISTS_FOLLOW_MS);
      expect(store.listedFindings(), 'caught up with the answer though nothing moved').toEqual([]);
      store.endDrag();
      expect(store.listedFindings(), 'the drop: the full check').toEqual(store.findings());
      expect(store.hasErrors()).toBe(store.findings().some((f) => f.severity === 'error'));
    });

    it('show where the panel went back to when a drag is called off', () => {
      const store = setUp(true, { of: stacked });
      store.select(selectionOf(['c']));
      store.startDrag();
      store.dragTo('c', { x: 0, y: 384 }, false);
      vi.advanceTimersByTime(LISTS_FOLLOW_MS);
      store.cancelDrag();
      expect(store.listedPanel()?.placements.find((p) => p.id === 'c')?.y).toBe(121);
    });
  });
});
