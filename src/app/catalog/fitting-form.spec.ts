import { TestBed } from '@angular/core/testing';
import { NonNullableFormBuilder } from '@angular/forms';
import { fitting } from '../../../shared/catalog/fitting';
import { shopHinge } from '../../../shared/testing/shop-fitting';
import { boreGroup, controlPath, fittingForm, fittingFromForm, fittingProblems, keepOutGroup, problemText, showServerProblems, type FittingForm } from './fitting-form';

const SOURCE = 'trade-reference §2: the 52/5.5 pattern (common practice)';

/** The form filled in as the shop's 52/5.5 hinge (shared/testing/shop-fitting.ts), with one source for all. */
function filledHinge(): FittingForm {
  const fb = TestBed.inject(NonNullableFormBuilder);
  const form = fittingForm(fb);
  form.controls.bores.push(boreGroup(fb, 'fix-1'));
  form.controls.bores.push(boreGroup(fb, 'fix-2'));
  form.controls.keepOuts.push(keepOutGroup(fb));
  form.patchValue({
    id: 'shop-hinge-52',
    name: 'Cup hinge, full overlay, 52/5.5',
    source: SOURCE,
    bores: [
      { x: 0, y: 0, diameter: 35, depth: 13 },
      { x: 5.5, y: -26, diameter: 8, depth: 11 },
      { x: 5.5, y: 26, diameter: 8, depth: 11 },
    ],
    keepOuts: [{ x: -17.5, y: -30, width: 35, height: 60 }],
    hinge: { cupBore: 'cup', overlay: 'full', constant: 13, boringDistance: { min: 3, max: 7 }, openingAngle: 110 },
  });
  return form;
}

/** The same fitting as the shared test's JSON, with the form's one source everywhere. */
function withSource(json: Record<string, unknown>): unknown {
  return JSON.parse(JSON.stringify(json, (key, value) => (key === 'source' ? SOURCE : value)));
}

describe('the fitting import form', () => {
  it('makes the catalog’s JSON of a filled-in hinge, which the catalog’s schema takes as is', () => {
    const form = filledHinge();
    expect(form.valid).toBe(true);
    const candidate = fittingFromForm(form.getRawValue());
    expect(fitting.parse(candidate)).toEqual(fitting.parse(withSource(shopHinge())));
  });

  it('puts each problem the schema finds beside its field, in the schema’s words, and lists it by its path', () => {
    const form = filledHinge();
    form.controls.bores.at(1).patchValue({ diameter: 0 });
    form.controls.bores.at(2).patchValue({ x: null });
    form.controls.hinge.controls.boringDistance.patchValue({ min: 7, max: 3 });

    expect(form.invalid).toBe(true);
    expect(problemText(form.get(['bores', 1, 'diameter']))).toBe('Must be greater than 0.');
    expect(problemText(form.get(['bores', 2, 'x']))).toBe('Required.');
    expect(problemText(form.get(['hinge', 'boringDistance', 'max']))).toBe('Min must not exceed max.');
    expect(problemText(form.get(['bores', 0, 'diameter']))).toBe('');
    expect(fittingProblems(fittingFromForm(form.getRawValue())).map((p) => `${p.path}: ${p.message}`)).toEqual([
      'bores[1].diameter: must be greater than 0',
      'bores[2].x: is required',
      'hinge.boringDistance.max: min must not exceed max',
    ]);

    // Mended, each message goes, and the form is whole again.
    form.controls.bores.at(1).patchValue({ diameter: 8 });
    expect(problemText(form.get(['bores', 1, 'diameter']))).toBe('');
    form.controls.bores.at(2).patchValue({ x: 5.5 });
    form.controls.hinge.controls.boringDistance.patchValue({ min: 3, max: 7 });
    expect(form.valid).toBe(true);
  });

  it('says of an empty new fitting what it needs, naming the one source field once', () => {
    const form = fittingForm(TestBed.inject(NonNullableFormBuilder));
    const lines = fittingProblems(fittingFromForm(form.getRawValue())).map((p) => `${p.path}: ${p.message}`);
    expect(lines).toContain('id: must be kebab-case: lower-case letters and digits joined by "-"');
    expect(lines).toContain('name: must not be empty');
    expect(lines).toContain('bores[0].x: is required');
    expect(lines).toContain('hinge.openingAngle: is required');
    expect(lines.filter((l) => l.startsWith('source:'))).toEqual(['source: must say where the numbers come from']);
    expect(problemText(form.controls.source)).toBe('Must say where the numbers come from.');
  });

  it('checks what only a whole fitting shows: the cup bore named must be a face bore of the fitting', () => {
    const form = filledHinge();
    form.controls.bores.at(0).patchValue({ id: 'bowl' });
    expect(problemText(form.get(['hinge', 'cupBore']))).toBe('No face bore with id "cup".');
    form.controls.hinge.patchValue({ cupBore: 'bowl' });
    expect(form.valid).toBe(true);
  });

  it('sends a depth keyword or an edge bore’s mid-thickness as the catalog writes them, and only the family of its kind', () => {
    const form = filledHinge();
    form.controls.bores.at(1).patchValue({ depthKind: 'system' });
    form.controls.bores.at(2).patchValue({ kind: 'edge', toward: 'y1', zKind: 'mid' });
    form.controls.purpose.setValue('construction');
    const candidate = fittingFromForm(form.getRawValue());
    expect(candidate['bores']).toEqual([
      expect.objectContaining({ id: 'cup', depth: 13 }),
      expect.objectContaining({ id: 'fix-1', kind: 'face', depth: 'system' }),
      { id: 'fix-2', kind: 'edge', x: 5.5, y: 26, toward: 'y1', z: 'mid', diameter: 8, source: SOURCE },
    ]);
    expect(candidate['hinge']).toBeUndefined();
    expect(form.valid).toBe(true);
  });

  it('shows the server’s word on a field, such as an id the catalog already has, until the field changes', () => {
    const form = filledHinge();
    form.controls.id.setValue('hinge-full-overlay-45');
    const message = '"hinge-full-overlay-45" is a built-in fitting (Cup hinge, full overlay, 45/9.5); a shop\'s fitting cannot replace it, give it an id of its own';
    expect(showServerProblems(form, { id: message })).toBe(true);
    expect(problemText(form.controls.id)).toBe(`${message.charAt(0).toUpperCase()}${message.slice(1)}.`);
    expect(form.invalid).toBe(true);
    form.controls.id.setValue('shop-hinge-52');
    expect(problemText(form.controls.id)).toBe('');
    expect(form.valid).toBe(true);
  });

  it('reads the API’s paths into form paths', () => {
    expect(controlPath('bores[12].diameter')).toEqual(['bores', 12, 'diameter']);
    expect(controlPath('hinge.boringDistance.max')).toEqual(['hinge', 'boringDistance', 'max']);
  });
});
