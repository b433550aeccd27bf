import { describe, expect, it } from 'vitest';
import { changedSincePlanned, replacement, type StoredPanel } from './replan';
import { planned } from '../testing/planned-carcass';

const doors = { type: 'doors', count: 2, overlay: 'full', reveal: 3 } as const;

describe('re-planning a carcass', () => {
  const first = planned({ fronts: doors }).panels;
  const asStored = (overrides: Partial<Record<string, Partial<StoredPanel>>> = {}): StoredPanel[] =>
    first.map((panel) => ({ panel, version: 1, status: 'planned' as const, ...overrides[panel.id] }));

  it('asks about nothing when no panel was touched since it was planned', () => {
    const taller = planned({ fronts: doors, height: 755 }).panels;
    expect(changedSincePlanned(asStored(), taller)).toEqual([]);
  });

  it('asks about nothing when a saved panel is exactly what the new plan gives', () => {
    expect(changedSincePlanned(asStored({ 'wall-left': { version: 3 } }), first)).toEqual([]);
  });

  it('names a panel moved by hand, and one the new plan drops', () => {
    const door = first.find((p) => p.id === 'wall-door-left')!;
    const moved = { ...door, placements: door.placements.map((p, i) => (i === 0 ? { ...p, y: p.y + 32 } : p)) };
    const stored = asStored({ 'wall-door-left': { panel: moved, version: 2 }, 'wall-door-right': { version: 2, status: 'drilled' } });
    const oneDoor = planned({ fronts: { ...doors, count: 1 } }).panels;
    const changed = changedSincePlanned(stored, oneDoor);
    // One door is planned as "wall-door": both stored doors are dropped by the new plan.
    expect(changed.map((c) => [c.id, c.status, c.dropped])).toEqual([
      ['wall-door-left', 'planned', true],
      ['wall-door-right', 'drilled', true],
    ]);
  });

  it('keeps the changed panels as they are, or writes the plan over them', () => {
    const door = first.find((p) => p.id === 'wall-door-left')!;
    const moved = { ...door, placements: door.placements.map((p) => ({ ...p, y: p.y + 32 })) };
    const stored = asStored({ 'wall-door-left': { panel: moved, version: 2 } });
    const keep = replacement(stored, first, 'keep');
    expect(keep.keep).toEqual(['wall-door-left']);
    expect(keep.update.map((p) => p.id)).not.toContain('wall-door-left');
    expect(keep.update).toHaveLength(first.length - 1);
    const replace = replacement(stored, first, 'replace');
    expect(replace.keep).toEqual([]);
    expect(replace.update.map((p) => p.id)).toContain('wall-door-left');
    expect(replace.insert).toEqual([]);
    expect(replace.remove).toEqual([]);
  });

  it('adds the panels a new front needs and removes those the carcass no longer has', () => {
    const flap = planned({ fronts: { type: 'flap', reveal: 3 } }).panels;
    const r = replacement(asStored(), flap, 'replace');
    const ids = (list: { id: string }[]) => list.map((p) => p.id).sort();
    expect(ids(r.insert)).toEqual(ids(flap.filter((p) => !first.some((f) => f.id === p.id))));
    expect(r.remove.sort()).toEqual(first.filter((f) => !flap.some((p) => p.id === f.id)).map((p) => p.id).sort());
  });
});
