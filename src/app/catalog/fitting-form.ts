import { AbstractControl, FormArray, FormGroup, NonNullableFormBuilder, ValidatorFn } from '@angular/forms';
import type { z } from 'zod';
import { fitting, fittingPurpose, hingeData, type FittingPurpose } from '../../../shared/catalog/fitting';
import type { Edge } from '../../../shared/model/job-document';
import { formatPath, listIssues } from '../../../shared/model/validation-messages';
import type { FittingSketch } from './fitting-sketch';

/**
 * The import form of a fitting (design.md §4): its id, name and kind, whether it sits on a system row,
 * its bores and keep-outs, and the family data of its kind. The form mirrors the catalog's schema so
 * that the schema's own messages land beside the fields they concern; where it differs (a depth that
 * is a length or a keyword, one source for all the numbers) `fittingFromForm` says how.
 */

export type DepthKind = 'mm' | 'system' | 'through';
export type ZKind = 'mid' | 'mm';
export type Overlay = z.output<typeof hingeData>['overlay'];

/** The kinds in the catalog's order, with the words the form uses for them. */
export const PURPOSES: readonly FittingPurpose[] = fittingPurpose.options;
export const OVERLAYS: readonly Overlay[] = hingeData.shape.overlay.options;
export const EDGES: readonly { edge: Edge; label: string }[] = [
  { edge: 'x0', label: 'x0 (the reference edge side)' },
  { edge: 'x1', label: 'x1 (away from the reference edge)' },
  { edge: 'y0', label: 'y0 (down)' },
  { edge: 'y1', label: 'y1 (up)' },
];

type Num = number | null;

export function boreGroup(fb: NonNullableFormBuilder, id = '') {
  return fb.group({
    id: fb.control(id),
    kind: fb.control<'face' | 'edge'>('face'),
    x: fb.control<Num>(null),
    y: fb.control<Num>(null),
    diameter: fb.control<Num>(null),
    depthKind: fb.control<DepthKind>('mm'),
    depth: fb.control<Num>(null),
    toward: fb.control<Edge>('y0'),
    zKind: fb.control<ZKind>('mid'),
    z: fb.control<Num>(null),
  });
}
export type BoreGroup = ReturnType<typeof boreGroup>;

export function keepOutGroup(fb: NonNullableFormBuilder) {
  return fb.group({ x: fb.control<Num>(null), y: fb.control<Num>(null), width: fb.control<Num>(null), height: fb.control<Num>(null) });
}
export type KeepOutGroup = ReturnType<typeof keepOutGroup>;

const range = (fb: NonNullableFormBuilder) => fb.group({ min: fb.control<Num>(null), max: fb.control<Num>(null) });

/** A new fitting's form: a hinge with one face bore, the cup, to start from; checked by the schema on every change. */
export function fittingForm(fb: NonNullableFormBuilder) {
  const form = fb.group({
    id: fb.control(''),
    name: fb.control(''),
    purpose: fb.control<FittingPurpose>('hinge-cup'),
    onSystemRow: fb.control(false),
    /** Where the numbers come from: the catalog asks it of every bore, keep-out and family. */
    source: fb.control(''),
    bores: fb.array([boreGroup(fb, 'cup')]),
    keepOuts: fb.array<KeepOutGroup>([]),
    hinge: fb.group({
      cupBore: fb.control('cup'),
      overlay: fb.control<Overlay>('full'),
      constant: fb.control<Num>(null),
      boringDistance: range(fb),
      openingAngle: fb.control<Num>(null),
    }),
    plate: fb.group({ height: fb.control<Num>(null) }),
    // Left unchosen: makers print both ways, so the one importing must say which (trade-reference §8a).
    lift: fb.group({ powerFactor: range(fb), rangeFor: fb.control<'mechanism' | 'pair' | null>(null) }),
    runner: fb.group({ length: fb.control<Num>(null) }),
  });
  form.addValidators(schemaValidator());
  form.updateValueAndValidity();
  return form;
}
export type FittingForm = ReturnType<typeof fittingForm>;
export type FittingFormValue = ReturnType<FittingForm['getRawValue']>;

/** A number field left empty is a value not given, which the schema reports as required. */
const given = (n: Num) => (n === null || Number.isNaN(n) ? undefined : n);

/** What the form would import, as the catalog's JSON; not yet validated. Its numbers may be missing. */
export function fittingFromForm(value: FittingFormValue): FittingSketch & Record<string, unknown> {
  const source = value.source;
  const bores = value.bores.map((b) =>
    b.kind === 'face'
      ? { id: b.id.trim(), kind: 'face' as const, x: given(b.x), y: given(b.y), diameter: given(b.diameter), depth: b.depthKind === 'mm' ? given(b.depth) : b.depthKind, source }
      : { id: b.id.trim(), kind: 'edge' as const, x: given(b.x), y: given(b.y), toward: b.toward, z: b.zKind === 'mid' ? 'mid' : given(b.z), diameter: given(b.diameter), source },
  );
  const keepOuts = value.keepOuts.map((k) => ({ x: given(k.x), y: given(k.y), width: given(k.width), height: given(k.height), source }));
  const family: Record<string, unknown> = {};
  const r = (v: { min: Num; max: Num }) => ({ min: given(v.min), max: given(v.max) });
  if (value.purpose === 'hinge-cup') {
    const h = value.hinge;
    family['hinge'] = { cupBore: h.cupBore, overlay: h.overlay, constant: given(h.constant), boringDistance: r(h.boringDistance), openingAngle: given(h.openingAngle), source };
  }
  if (value.purpose === 'mounting-plate') family['plate'] = { height: given(value.plate.height), source };
  if (value.purpose === 'lift-mechanism') family['lift'] = { powerFactor: r(value.lift.powerFactor), rangeFor: value.lift.rangeFor ?? undefined, source };
  if (value.purpose === 'runner') family['runner'] = { length: given(value.runner.length), source };
  return { id: value.id.trim(), name: value.name, purpose: value.purpose, onSystemRow: value.onSystemRow, bores, keepOuts, ...family } as FittingSketch & Record<string, unknown>;
}

/** One problem of the form: where it is in the fitting (as a file would say it), which field shows it, and what is wrong. */
export interface FormProblem {
  /** As in a catalog file: `bores[1].diameter`. */
  path: string;
  /** The form control it belongs beside; empty for a problem of the whole fitting. */
  control: (string | number)[];
  message: string;
}

function valueAt(value: unknown, path: readonly PropertyKey[]): unknown {
  return path.reduce<unknown>((v, key) => (typeof v === 'object' && v !== null ? (v as Record<PropertyKey, unknown>)[key] : undefined), value);
}

/**
 * The schema's problems with what the form would import, each once. A number left empty is "is
 * required" rather than the schema's word for a missing value; every source problem belongs to the
 * one source field, so it is listed once.
 */
export function fittingProblems(candidate: unknown): FormProblem[] {
  const result = fitting.safeParse(candidate);
  if (result.success) return [];
  const seen = new Set<string>();
  return listIssues(result.error).flatMap(({ path, message }): FormProblem[] => {
    const keys = path.filter((k): k is string | number => typeof k !== 'symbol');
    const text = path.length > 0 && valueAt(candidate, path) === undefined ? 'is required' : message;
    const isSource = keys.at(-1) === 'source';
    const problem = isSource ? { path: 'source', control: ['source'], message: text } : { path: formatPath(keys), control: keys, message: text };
    const key = `${problem.path}: ${problem.message}`;
    if (seen.has(key)) return [];
    seen.add(key);
    return [problem];
  });
}

/** The form's own schema check: it puts each problem on its field as `schema`, and the list on the form. */
function schemaValidator(): ValidatorFn {
  let marked: AbstractControl[] = [];
  return (form) => {
    const problems = fittingProblems(fittingFromForm((form as FittingForm).getRawValue()));
    for (const control of marked) setProblem(control, 'schema', undefined);
    marked = [];
    for (const p of problems) {
      const control = p.control.length > 0 ? form.get(p.control) : null;
      if (control && control !== form && !marked.includes(control)) {
        setProblem(control, 'schema', p.message);
        marked.push(control);
      }
    }
    return problems.length > 0 ? { schema: problems } : null;
  };
}

function setProblem(control: AbstractControl, key: string, message: string | undefined): void {
  const { [key]: _old, ...rest } = control.errors ?? {};
  const errors = message === undefined ? rest : { ...rest, [key]: message };
  control.setErrors(Object.keys(errors).length > 0 ? errors : null, { emitEvent: false });
}

/**
 * The message beside a field: the schema's words ("must be greater than 0") as a sentence, or what the
 * server said of it (a taken id).
 */
export function problemText(control: AbstractControl | null): string {
  const message = (control?.errors?.['server'] ?? control?.errors?.['schema']) as string | undefined;
  if (message === undefined) return '';
  if (message === 'is required') return 'Required.';
  const sentence = message.charAt(0).toUpperCase() + message.slice(1);
  return /[.!?]$/.test(sentence) ? sentence : `${sentence}.`;
}

/** Reads a path as the API writes it (`bores[0].diameter`) into the keys of a form control. */
export function controlPath(path: string): (string | number)[] {
  return [...path.matchAll(/([^.[\]]+)/g)].map(([key]) => (/^\d+$/.test(key) ? Number(key) : key));
}

/** Puts the server's field messages (a 409's taken id) on the fields, until they are changed; true when one landed. */
export function showServerProblems(form: FormGroup, fields: Readonly<Record<string, string>>): boolean {
  let shown = false;
  for (const [path, message] of Object.entries(fields)) {
    const control = form.get(controlPath(path));
    if (!control || control === form) continue;
    setProblem(control, 'server', message);
    control.markAsTouched();
    shown = true;
  }
  return shown;
}

/** The face bores' ids, for choosing which one is a hinge's cup. */
export function faceBoreIds(bores: FormArray<BoreGroup>): string[] {
  return bores.getRawValue().flatMap((b) => (b.kind === 'face' && b.id.trim() !== '' ? [b.id.trim()] : []));
}
