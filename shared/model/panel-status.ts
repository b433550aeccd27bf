import { panelStatus, type PanelStatus } from './job-document';

/**
 * How a panel moves through the bench (design.md §1: the bench marks panels drilled / checked). Forward
 * one step at a time: a panel is checked only once it is drilled, since a check looks at holes that exist.
 * Back any number of steps: a mark made by mistake is undone, or a remade panel starts again as planned;
 * the activity log keeps both the mark and its undoing.
 */
export type StatusStep = { ok: true; direction: 'forward' | 'back' } | { ok: false; reason: 'unchanged' | 'skips-a-step' };

const rank = (status: PanelStatus) => panelStatus.options.indexOf(status);

/** Whether a panel at `from` may be marked `to`, and which way that goes. */
export function statusStep(from: PanelStatus, to: PanelStatus): StatusStep {
  const steps = rank(to) - rank(from);
  if (steps === 0) return { ok: false, reason: 'unchanged' };
  if (steps > 1) return { ok: false, reason: 'skips-a-step' };
  return { ok: true, direction: steps > 0 ? 'forward' : 'back' };
}

/** The statuses a panel at `from` may be marked next, in the order of the bench. */
export function nextStatuses(from: PanelStatus): PanelStatus[] {
  return panelStatus.options.filter((to) => statusStep(from, to).ok);
}

export type StatusCounts = Record<PanelStatus, number> & { total: number };

/** How many panels are at each status, for a job's progress. */
export function statusCounts(panels: readonly { status: PanelStatus }[]): StatusCounts {
  const counts: StatusCounts = { planned: 0, drilled: 0, checked: 0, total: panels.length };
  for (const p of panels) counts[p.status]++;
  return counts;
}
