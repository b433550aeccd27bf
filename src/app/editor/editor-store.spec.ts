import { signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { beforeEach, describe, expect, it } from 'vitest';
import type { Panel } from '../../../shared/model/job-document';
import { makeJob, makePanel } from '../../../shared/testing/make-job';
import { AuthStore } from '../auth/auth-store';
import { selectionOf } from './document/selection';
import { EditorSource } from './editor-source';
import { EditorStore } from './editor-store';

const job = makeJob([makePanel('left', { placements: [{ id: 'plate-0-1', fitting: 'plate-0', x: 37, y: 121, face: 'A' }] })]);

function setUp(editor = true) {
  const panel = signal<Panel | undefined>(job.panels[0]);
  TestBed.configureTestingModule({
    providers: [
      EditorStore,
      { provide: EditorSource, useValue: { panel, record: panel, job: signal(job) } },
      { provide: AuthStore, useValue: { can: () => editor } },
    ],
  });
  return TestBed.inject(EditorStore);
}

describe('EditorStore', () => {
  beforeEach(() => TestBed.resetTestingModule());

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
});
