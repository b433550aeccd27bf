/**
 * Panels in the order the bench meets them: carcass by carcass as the job lists its carcasses, panels of
 * no carcass (or of one the job does not list) last; within each, the order they came in.
 */
export function carcassOrder<T extends { carcass?: string }>(carcasses: readonly { id: string }[], panels: readonly T[]): T[] {
  const rank = new Map(carcasses.map((c, i) => [c.id, i]));
  const of = (p: T) => (p.carcass === undefined ? undefined : rank.get(p.carcass)) ?? carcasses.length;
  // Array.prototype.sort is stable (ES2019), so each carcass keeps its panels' order.
  return [...panels].sort((a, b) => of(a) - of(b));
}
