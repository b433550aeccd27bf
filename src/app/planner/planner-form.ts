import { FormControl, FormGroup } from '@angular/forms';
import type { CarcassPlanInput, CarcassPlanInputData } from '../../../shared/planner/carcass-plan-input';

const n = (value: number) => new FormControl(value, { nonNullable: true });
const s = <T extends string>(value: T) => new FormControl<T>(value, { nonNullable: true });

/** The planner's form: every choice of the carcass description, flat, as the fields show them. Invented starting numbers. */
export function plannerForm() {
  return new FormGroup({
    id: s<string>('wall-1'),
    name: s<string>('Wall unit'),
    width: n(600),
    height: n(723),
    depth: n(320),
    material: s<string>('mdf-19'),
    back: s<'none' | 'inset' | 'grooved'>('none'),
    backMaterial: s<string>('plywood-18'),
    setIn: n(10),
    grooveDepth: n(8),
    construction: s<'dowels' | 'cams' | 'screws'>('cams'),
    fronts: s<'none' | 'doors' | 'flap' | 'drawers'>('doors'),
    doorCount: s<'1' | '2'>('2'),
    overlay: s<'full' | 'half' | 'inset'>('full'),
    hingeSide: s<'left' | 'right'>('left'),
    reveal: n(3),
    handleMass: n(0),
    mechanisms: s<'1' | '2'>('2'),
    drawerCount: n(3),
    shelves: s<'none' | 'fixed' | 'adjustable'>('adjustable'),
    shelfCount: n(1),
    play: n(1),
    mounting: s<'wall' | 'kickboard'>('wall'),
    kickHeight: n(100),
    kickSetBack: n(50),
  });
}

export type PlannerFormValue = ReturnType<ReturnType<typeof plannerForm>['getRawValue']>;

/** The carcass description the planner and the server take, from the form's flat values. */
export function toPlanInput(v: PlannerFormValue): CarcassPlanInputData {
  const fronts: CarcassPlanInputData['fronts'] =
    v.fronts === 'doors'
      ? { type: 'doors', count: v.doorCount === '1' ? 1 : 2, overlay: v.overlay, reveal: v.reveal, hingeSide: v.hingeSide, handleMass: v.handleMass }
      : v.fronts === 'flap'
        ? { type: 'flap', reveal: v.reveal, mechanisms: v.mechanisms === '1' ? 1 : 2, handleMass: v.handleMass }
        : v.fronts === 'drawers'
          ? { type: 'drawers', count: v.drawerCount, reveal: v.reveal }
          : { type: 'none' };
  return {
    id: v.id,
    name: v.name,
    width: v.width,
    height: v.height,
    depth: v.depth,
    material: v.material,
    back: v.back === 'grooved' ? { type: 'grooved', material: v.backMaterial, setIn: v.setIn, grooveDepth: v.grooveDepth } : { type: v.back },
    construction: v.construction,
    fronts,
    shelves: v.shelves === 'none' ? { type: 'none' } : v.shelves === 'fixed' ? { type: 'fixed', count: v.shelfCount } : { type: 'adjustable', count: v.shelfCount, play: v.play },
    mounting: v.mounting === 'wall' ? { type: 'wall' } : { type: 'kickboard', height: v.kickHeight, setBack: v.kickSetBack },
  };
}

/**
 * The form's values for a description a carcass was planned from, to plan it again; what the form
 * does not show (a chosen hinge, a shelf range) keeps the form's own value.
 */
export function fromPlanInput(input: CarcassPlanInput): Partial<PlannerFormValue> {
  const { fronts, back, shelves, mounting } = input;
  return {
    id: input.id,
    name: input.name,
    width: input.width,
    height: input.height,
    depth: input.depth,
    material: input.material,
    construction: input.construction,
    back: back.type,
    ...(back.type === 'grooved' ? { backMaterial: back.material, setIn: back.setIn, grooveDepth: back.grooveDepth } : {}),
    // The form holds one kind of front: a carcass in sections is planned again from its description file.
    ...(fronts.type !== 'sections' ? { fronts: fronts.type } : {}),
    ...(fronts.type === 'doors' ? { doorCount: fronts.count === 1 ? '1' : '2', overlay: fronts.overlay, hingeSide: fronts.hingeSide, reveal: fronts.reveal, handleMass: fronts.handleMass } : {}),
    ...(fronts.type === 'flap' ? { mechanisms: fronts.mechanisms === 1 ? '1' : '2', reveal: fronts.reveal, handleMass: fronts.handleMass } : {}),
    ...(fronts.type === 'drawers' ? { drawerCount: fronts.count, reveal: fronts.reveal } : {}),
    shelves: shelves.type,
    ...(shelves.type !== 'none' ? { shelfCount: shelves.count } : {}),
    ...(shelves.type === 'adjustable' ? { play: shelves.play } : {}),
    mounting: mounting.type,
    ...(mounting.type === 'kickboard' ? { kickHeight: mounting.height, kickSetBack: mounting.setBack } : {}),
  };
}
