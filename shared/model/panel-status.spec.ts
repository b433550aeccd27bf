import { describe, expect, it } from 'vitest';
import { nextStatuses, statusCounts, statusStep } from './panel-status';

describe('panel status', () => {
  it('goes forward one step at a time: checked only after drilled', () => {
    expect(statusStep('planned', 'drilled')).toEqual({ ok: true, direction: 'forward' });
    expect(statusStep('drilled', 'checked')).toEqual({ ok: true, direction: 'forward' });
    expect(statusStep('planned', 'checked')).toEqual({ ok: false, reason: 'skips-a-step' });
  });

  it('goes back any number of steps, and refuses a mark that changes nothing', () => {
    expect(statusStep('checked', 'drilled')).toEqual({ ok: true, direction: 'back' });
    expect(statusStep('drilled', 'planned')).toEqual({ ok: true, direction: 'back' });
    expect(statusStep('checked', 'planned')).toEqual({ ok: true, direction: 'back' });
    for (const s of ['planned', 'drilled', 'checked'] as const) expect(statusStep(s, s)).toEqual({ ok: false, reason: 'unchanged' });
  });

  it('lists what a panel may be marked next', () => {
    expect(nextStatuses('planned')).toEqual(['drilled']);
    expect(nextStatuses('drilled')).toEqual(['planned', 'checked']);
    expect(nextStatuses('checked')).toEqual(['planned', 'drilled']);
  });

  it('counts panels by status', () => {
    const counts = statusCounts([{ status: 'planned' }, { status: 'checked' }, { status: 'planned' }, { status: 'drilled' }]);
    expect(counts).toEqual({ planned: 2, drilled: 1, checked: 1, total: 4 });
    expect(statusCounts([])).toEqual({ planned: 0, drilled: 0, checked: 0, total: 0 });
  });
});
