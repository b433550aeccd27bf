import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../../shared/catalog/builtin-catalog';
import { planCarcass } from '../../../shared/planner/plan-carcass';
import { plannerForm, toPlanInput } from './planner-form';

describe('toPlanInput', () => {
  it('turns the starting form into a description the planner accepts', () => {
    const result = planCarcass(toPlanInput(plannerForm().getRawValue()), builtinCatalog());
    expect(result.ok && result.plan.doors.map((d) => d.panel)).toEqual(['wall-1-door-left', 'wall-1-door-right']);
  });

  it('carries the flap, grooved back and kickboard choices over with their numbers', () => {
    const form = plannerForm();
    form.patchValue({ fronts: 'flap', mechanisms: '1', handleMass: 0.3, back: 'grooved', mounting: 'kickboard', kickHeight: 120 });
    expect(toPlanInput(form.getRawValue())).toMatchObject({
      fronts: { type: 'flap', mechanisms: 1, handleMass: 0.3 },
      back: { type: 'grooved', material: 'plywood-18', setIn: 10, grooveDepth: 8 },
      mounting: { type: 'kickboard', height: 120, setBack: 50 },
    });
  });
});
