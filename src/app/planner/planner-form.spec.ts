import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../../shared/catalog/builtin-catalog';
import { planCarcass } from '../../../shared/planner/plan-carcass';
import { carcassPlanInput } from '../../../shared/planner/carcass-plan-input';
import { fromPlanInput, plannerForm, toPlanInput } from './planner-form';

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

describe('fromPlanInput', () => {
  it('fills the form back from a stored description, so that planning again gives the same carcass', () => {
    const stored = carcassPlanInput.parse({
      id: 'hall',
      name: 'Hall unit',
      width: 800,
      height: 755,
      depth: 350,
      material: 'mdf-19',
      back: { type: 'grooved', material: 'plywood-18', setIn: 12, grooveDepth: 6 },
      construction: 'screws',
      fronts: { type: 'flap', reveal: 2, mechanisms: 1, handleMass: 0.4 },
      shelves: { type: 'adjustable', count: 2, play: 1.5 },
      mounting: { type: 'kickboard', height: 110, setBack: 40 },
    });
    const form = plannerForm();
    form.patchValue(fromPlanInput(stored));
    const { materials: _m, system: _s, limits: _l, ...expected } = stored;
    expect(carcassPlanInput.parse(toPlanInput(form.getRawValue()))).toMatchObject(expected);
  });
});
