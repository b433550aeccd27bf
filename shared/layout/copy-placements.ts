import type { Panel, Placement } from '../model/job-document';

/** Ids may be 64 characters; leave room for a suffix. */
const MAX_BASE = 58;

function freeId(id: string, taken: Set<string>): string {
  if (!taken.has(id)) return id;
  const base = id.slice(0, MAX_BASE);
  let n = 2;
  while (taken.has(`${base}-${n}`)) n++;
  return `${base}-${n}`;
}

/**
 * Copies placements onto another panel, moved by an offset (none by default). A copied placement keeps
 * its id unless the target already uses it; then it gets the first free `${id}-2`, `${id}-3` ….
 */
export function copyPlacements(
  placements: readonly Placement[],
  target: Panel,
  offset: { x: number; y: number } = { x: 0, y: 0 },
): Panel {
  const taken = new Set(target.placements.map((p) => p.id));
  const copies = placements.map((p) => {
    const id = freeId(p.id, taken);
    taken.add(id);
    return { ...p, id, x: p.x + offset.x, y: p.y + offset.y, params: p.params && { ...p.params } };
  });
  return { ...target, placements: [...target.placements, ...copies] };
}
