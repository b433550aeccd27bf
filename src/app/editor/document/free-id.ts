/** Ids may be 64 characters; leave room for a suffix. */
const MAX_BASE = 58;

/**
 * The first id free in `taken` built on `base`: `base` itself, else `base-2`, `base-3` …, the pattern
 * copyPlacements uses, so pasted bores read like pasted placements. `numbered` always adds a number,
 * starting at 1, as new placements named after their fitting do (`plate-0-1`).
 */
export function freeId(base: string, taken: ReadonlySet<string>, numbered = false): string {
  const stem = base.slice(0, MAX_BASE);
  if (!numbered && !taken.has(stem)) return stem;
  let n = numbered ? 1 : 2;
  while (taken.has(`${stem}-${n}`)) n++;
  return `${stem}-${n}`;
}
