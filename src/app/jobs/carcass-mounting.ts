import type { Carcass } from '../../../shared/model/job-document';

/**
 * How a carcass stands, in the planner's words: a planned carcass keeps its description, so one on a
 * kickboard says so (the job document's `mounting` only tells wall from floor).
 */
export function mountingWords(carcass: Pick<Carcass, 'mounting' | 'plannedFrom'>): string {
  const planned = carcass.plannedFrom?.['mounting'];
  const type = typeof planned === 'object' && planned !== null && 'type' in planned ? planned.type : undefined;
  if (type === 'kickboard') return 'On a kickboard';
  return carcass.mounting === 'wall' ? 'Wall-hung' : 'Floor-standing';
}
