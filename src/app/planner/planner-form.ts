import { FormArray, FormControl, FormGroup } from '@angular/forms';
import type { CarcassPlanInput, CarcassPlanInputData, SectionFrontInput } from '../../../shared/planner/carcass-plan-input';

const n = (value: number) => new FormControl(value, { nonNullable: true });
const s = <T extends string>(value: T) => new FormControl<T>(value, { nonNullable: true });

type FrontType = SectionFrontInput['type'];

/** How one front is described: the same fields for the carcass's one front and for each section's. Invented starting numbers. */
function frontControls(front: FrontType) {
  return {
    front: s<FrontType>(front),
    doorCount: s<'1' | '2'>('2'),
    overlay: s<'full' | 'half' | 'inset'>('full'),
    hingeSide: s<'left' | 'right'>('left'),
    reveal: n(3),
    handleMass: n(0),
    mechanisms: s<'1' | '2'>('2'),
    drawerCount: n(3),
  };
}

/** One section of a carcass in sections: its height (the last takes what is left) and its front. */
export function sectionGroup(front: FrontType = 'doors', height: number | null = null) {
  return new FormGroup({ height: new FormControl<number | null>(height), ...frontControls(front) });
}

export type SectionGroup = ReturnType<typeof sectionGroup>;
type FrontFields = ReturnType<SectionGroup['getRawValue']>;

/** The planner's form: every choice of the carcass description, flat, as the fields show them. Invented starting numbers. */
export function plannerForm() {
  const { front: _front, ...front } = frontControls('doors');
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
    fronts: s<FrontType | 'sections'>('doors'),
    ...front,
    /** From the bottom up, when the fronts are "Sections". */
    sections: new FormArray<SectionGroup>([]),
    shelves: s<'none' | 'fixed' | 'adjustable'>('adjustable'),
    shelfCount: n(1),
    play: n(1),
    mounting: s<'wall' | 'kickboard'>('wall'),
    kickHeight: n(100),
    kickSetBack: n(50),
  });
}

export type PlannerForm = ReturnType<typeof plannerForm>;
export type PlannerFormValue = ReturnType<PlannerForm['getRawValue']>;

/** One front as the planner takes it, from its fields. */
function frontInput(v: Omit<FrontFields, 'height'>): SectionFrontInput {
  switch (v.front) {
    case 'doors':
      return { type: 'doors', count: v.doorCount === '1' ? 1 : 2, overlay: v.overlay, reveal: v.reveal, hingeSide: v.hingeSide, handleMass: v.handleMass };
    case 'flap':
      return { type: 'flap', reveal: v.reveal, mechanisms: v.mechanisms === '1' ? 1 : 2, handleMass: v.handleMass };
    case 'drawers':
      return { type: 'drawers', count: v.drawerCount, reveal: v.reveal };
    case 'none':
      return { type: 'none' };
  }
}

/** The fields of one front, from the description it was planned from. */
function frontFields(front: SectionFrontInput): Partial<Omit<FrontFields, 'height'>> {
  switch (front.type) {
    case 'doors':
      return { front: 'doors', doorCount: front.count === 1 ? '1' : '2', overlay: front.overlay, hingeSide: front.hingeSide, reveal: front.reveal, handleMass: front.handleMass };
    case 'flap':
      return { front: 'flap', mechanisms: front.mechanisms === 1 ? '1' : '2', reveal: front.reveal, handleMass: front.handleMass };
    case 'drawers':
      return { front: 'drawers', drawerCount: front.count, reveal: front.reveal };
    case 'none':
      return { front: 'none' };
  }
}

/** The carcass description the planner and the server take, from the form's flat values. */
export function toPlanInput(v: PlannerFormValue): CarcassPlanInputData {
  const fronts: CarcassPlanInputData['fronts'] =
    v.fronts === 'sections'
      ? { type: 'sections', sections: v.sections.map(({ height, ...front }) => ({ ...(height === null ? {} : { height }), front: frontInput(front) })) }
      : frontInput({ ...v, front: v.fronts });
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
 * Fills the form from a description a carcass was planned from, to plan it again: a section each for a
 * carcass in sections; what the form does not show (a chosen hinge, a shelf range) keeps the form's own value.
 */
export function fillPlannerForm(form: PlannerForm, input: CarcassPlanInput): void {
  const { fronts, back, shelves, mounting } = input;
  form.controls.sections.clear();
  if (fronts.type === 'sections') {
    for (const section of fronts.sections) {
      const group = sectionGroup(section.front.type, section.height ?? null);
      group.patchValue(frontFields(section.front));
      form.controls.sections.push(group);
    }
  }
  const { front: _front, ...one } = fronts.type === 'sections' ? { front: undefined } : frontFields(fronts);
  form.patchValue({
    id: input.id,
    name: input.name,
    width: input.width,
    height: input.height,
    depth: input.depth,
    material: input.material,
    construction: input.construction,
    back: back.type,
    ...(back.type === 'grooved' ? { backMaterial: back.material, setIn: back.setIn, grooveDepth: back.grooveDepth } : {}),
    fronts: fronts.type,
    ...one,
    shelves: shelves.type,
    ...(shelves.type !== 'none' ? { shelfCount: shelves.count } : {}),
    ...(shelves.type === 'adjustable' ? { play: shelves.play } : {}),
    mounting: mounting.type,
    ...(mounting.type === 'kickboard' ? { kickHeight: mounting.height, kickSetBack: mounting.setBack } : {}),
  });
}

/**
 * Starts a carcass in sections, when the fronts become "Sections" with none described yet: two doors below
 * a lift-up flap, the lower section half the carcass's height (invented starting numbers, as the form's).
 */
export function startSections(form: PlannerForm): void {
  const { sections, height, shelves } = form.controls;
  if (sections.length === 0) {
    sections.push(sectionGroup('doors', Math.round(height.value / 2)));
    sections.push(sectionGroup('flap'));
  }
  // The planner takes no other shelves in a carcass in sections: the dividing shelves are its shelves.
  shelves.setValue('none');
}

/** The planner's messages about one section, by field: its height, and the rest of what it says about the section. */
export interface SectionProblems {
  height?: string;
  other: string[];
}

/**
 * The planner's messages led by a section's path (`fronts.sections[1].height: …`, `fronts.sections[1]: …`),
 * by section, so that each shows beside its section's fields; the shared validation words them.
 */
export function sectionProblems(errors: readonly string[]): Map<number, SectionProblems> {
  const out = new Map<number, SectionProblems>();
  for (const error of errors) {
    const match = /^fronts\.sections\[(\d+)\](\.[\w.[\]]+)?: (.*)$/.exec(error);
    if (!match) continue;
    const [, index, field, message] = match;
    const problems = out.get(Number(index)) ?? { other: [] };
    if (field === '.height') problems.height = message;
    else problems.other.push(field ? `${field.slice(1)}: ${message}` : message);
    out.set(Number(index), problems);
  }
  return out;
}
