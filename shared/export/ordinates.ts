import { roundTo } from './units';

/** The distinct values of a list, rounded to 0.01 mm and sorted: equal dimensions are written once. */
export function distinctValues(values: Iterable<number>): number[] {
  const set = new Set<number>();
  for (const v of values) if (Number.isFinite(v)) set.add(roundTo(v, 0.01));
  return [...set].sort((a, b) => a - b);
}

/**
 * Where to write labels that belong at sorted positions along a line when each needs `spacing` of room:
 * as close to its own position as the others allow (least squares), in the same order. Labels that would
 * collide are gathered into runs centred on their positions, the way a draughtsman jogs crowded leaders.
 */
export function spreadLabels(positions: readonly number[], spacing: number): number[] {
  // Each run holds consecutive labels packed `spacing` apart; `offsetSum` is the sum of p_i − k·spacing
  // over its members, so the run's best start is that sum's mean. Runs merge while they overlap.
  const runs: { first: number; count: number; offsetSum: number }[] = [];
  const start = (r: (typeof runs)[number]) => r.offsetSum / r.count;
  positions.forEach((p, i) => {
    runs.push({ first: i, count: 1, offsetSum: p });
    while (runs.length > 1) {
      const last = runs[runs.length - 1];
      const prev = runs[runs.length - 2];
      if (start(prev) + prev.count * spacing <= start(last)) break;
      runs.pop();
      prev.offsetSum += last.offsetSum - prev.count * spacing * last.count;
      prev.count += last.count;
    }
  });
  const placed: number[] = [];
  for (const run of runs) for (let k = 0; k < run.count; k++) placed.push(start(run) + k * spacing);
  return placed;
}
