import type { Carcass } from '../../../shared/model/job-document';

/** One field of the description the carcass was planned from: its `type`, if it has one. */
function planned(carcass: Pick<Carcass, 'plannedFrom'>, key: 'mounting'): string | undefined {
  const value = carcass.plannedFrom?.[key];
  return typeof value === 'object' && value !== null && 'type' in value && typeof value.type === 'string' ? value.type : undefined;
}

/**
 * How a carcass stands, in the planner's words: a planned carcass keeps its description, so one on a
 * kickboard says so (the job document's `mounting` only tells wall from floor).
 */
export function mountingWords(carcass: Pick<Carcass, 'mounting' | 'plannedFrom'>): string {
  if (planned(carcass, 'mounting') === 'kickboard') return 'On a kickboard';
  return carcass.mounting === 'wall' ? 'Wall-hung' : 'Floor-standing';
}

/** Whether the planner screen can plan the carcass again: it was planned, and keeps the description it was planned from. */
export function replannableOnScreen(carcass: Pick<Carcass, 'plannedFrom'>): boolean {
  return carcass.plannedFrom !== undefined;
}
