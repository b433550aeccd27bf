import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../../../shared/catalog/builtin-catalog';
import { planCarcass } from '../../../shared/planner/plan-carcass';
import { carcassPlanInput } from '../../../shared/planner/carcass-plan-input';
import { fillPlannerForm, plannerForm, sectionGroup, sectionProblems, startSections, toPlanInput } from './planner-form';

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

describe('fillPlannerForm', () => {
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
    fillPlannerForm(form, stored);
    const { materials: _m, system: _s, limits: _l, ...expected } = stored;
    expect(carcassPlanInput.parse(toPlanInput(form.getRawValue()))).toMatchObject(expected);
  });
});

/** The desk hutch of the loft study demo: two doors below a lift-up flap (invented demo numbers). */
const HUTCH = {
  id: 'hutch',
  name: 'Desk hutch',
  width: 700,
  height: 1011,
  depth: 350,
  material: 'mdf-19',
  back: { type: 'inset' },
  construction: 'cams',
  mounting: { type: 'wall' },
  shelves: { type: 'none' },
  fronts: {
    type: 'sections',
    sections: [
      { height: 600, front: { type: 'doors', count: 2, overlay: 'full', reveal: 3, hingeSide: 'left', handleMass: 0.2 } },
      { front: { type: 'flap', reveal: 3, mechanisms: 2, handleMass: 0.2 } },
    ],
  },
} as const;

describe('a carcass in sections on the form', () => {
  it('starts two doors below a flap with no other shelves, and the planner accepts it', () => {
    const form = plannerForm();
    form.controls.fronts.setValue('sections');
    startSections(form);
    const input = toPlanInput(form.getRawValue());
    expect(input.shelves).toEqual({ type: 'none' });
    expect(input.fronts).toMatchObject({ type: 'sections', sections: [{ height: 362, front: { type: 'doors', count: 2 } }, { front: { type: 'flap' } }] });
    const result = planCarcass(input, builtinCatalog());
    expect(result.ok && result.plan.sections.map((s) => s.front)).toEqual(['doors', 'flap']);
  });

  it('fills a section per section from a stored description, so that planning again gives the same carcass', () => {
    const stored = carcassPlanInput.parse(HUTCH);
    const form = plannerForm();
    fillPlannerForm(form, stored);
    expect(form.controls.sections.length).toBe(2);
    const { materials: _m, system: _s, limits: _l, ...again } = carcassPlanInput.parse(toPlanInput(form.getRawValue()));
    const { materials: _m2, system: _s2, limits: _l2, ...expected } = stored;
    expect(again).toEqual(expected);
  });

  it("puts the shared planner's messages beside the section they concern", () => {
    const form = plannerForm();
    fillPlannerForm(form, carcassPlanInput.parse(HUTCH));
    // A section added below the top one, with no height yet and a flap, which only the top section may have.
    form.controls.sections.insert(1, sectionGroup('flap'));
    const noHeight = planCarcass(toPlanInput(form.getRawValue()), builtinCatalog());
    expect(noHeight.ok).toBe(false);
    expect(sectionProblems(noHeight.ok ? [] : noHeight.errors).get(1)?.height).toMatch(/give the height of every section but the last/);
    form.controls.sections.at(1).controls.height.setValue(200);
    const flapBelow = planCarcass(toPlanInput(form.getRawValue()), builtinCatalog());
    expect(sectionProblems(flapBelow.ok ? [] : flapBelow.errors).get(1)?.other.join(' ')).toMatch(/only the top section can have one/);
  });
});
