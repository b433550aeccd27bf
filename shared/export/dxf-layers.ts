import type { BorePurpose } from '../layout/bore';
import type { Edge, Face } from '../model/job-document';
import { lengthText } from './units';

/**
 * Our layer names: upper-case letters, digits, `_`, `.` and `-` only. DXF writers drop other characters
 * from layer names without a word, which could merge two layers' holes, so every name is checked here.
 */
const LAYER_NAME = /^[A-Z0-9_.-]{1,255}$/;

/** The panel's outline. */
export const OUTLINE_LAYER = 'PANEL';
/** The reference edge (x = 0), drawn over the outline and named: design.md's own term. */
export const REFERENCE_LAYER = 'REFERENCE_EDGE';
/** What the file is and how to read it. */
export const NOTES_LAYER = 'NOTES';

/**
 * How our hole layers are named, for the README sheet, the manifest and the DXF's own notes: four fields
 * in design.md's words, joined by `-`, each a word and its value joined by `_`, so that a shop maps each
 * layer to a tool and a depth once in its own machine software.
 */
export const DXF_LAYER_SCHEME = {
  pattern: '<where>-DIA_<diameter mm>-<DEPTH_<depth mm> | THROUGH>-<purpose>',
  fields: {
    where: 'FACE_A or FACE_B for a face hole (drawn seen from face A, x from the reference edge, y from the lower edge); EDGE_X0, EDGE_X1, EDGE_Y0 or EDGE_Y1 for an edge hole',
    diameter: 'the bit, in mm, up to two decimals (DIA_5, DIA_7.5, DIA_35)',
    depth: 'how deep, in mm (DEPTH_13), or THROUGH for a hole meant to come out on the other face',
    purpose: 'what the hole is for: CONSTRUCTION, HINGE_CUP, MOUNTING_PLATE, SHELF_PIN, LIFT_MECHANISM, RUNNER, or LOOSE for a hole drawn by hand',
  },
  examples: ['FACE_A-DIA_5-DEPTH_13-SHELF_PIN', 'FACE_A-DIA_35-DEPTH_13-HINGE_CUP', 'FACE_B-DIA_8-THROUGH-LOOSE', 'EDGE_Y0-DIA_8-DEPTH_21-CONSTRUCTION'],
  other: {
    [OUTLINE_LAYER]: "the panel's outline, x from 0 to its width, y from 0 to its height",
    [REFERENCE_LAYER]: 'the reference edge, x = 0 (the front edge of a carcass part, the hinge edge of a door or flap)',
    [NOTES_LAYER]: 'what the file is: job, carcass, panel, size, side, checks, how to read it',
  },
} as const;

/** A layer name checked against our naming; throws on one that a DXF reader could not keep as it is. */
export function checkedLayerName(name: string): string {
  if (!LAYER_NAME.test(name)) throw new Error(`DXF layer name "${name}" is not one of ours: use A-Z, 0-9, "_", "." and "-" only`);
  return name;
}

const word = (purpose: BorePurpose) => purpose.toUpperCase().replace(/-/g, '_');

/** A hole's layer by where it is drilled from, its diameter, its depth and its purpose: `FACE_A-DIA_5-DEPTH_13-SHELF_PIN`. */
export function holeLayer(where: Face | Edge, diameter: number, depth: number | 'through', purpose: BorePurpose): string {
  const at = where === 'A' || where === 'B' ? `FACE_${where}` : `EDGE_${where.toUpperCase()}`;
  const deep = depth === 'through' ? 'THROUGH' : `DEPTH_${lengthText(depth)}`;
  return checkedLayerName(`${at}-DIA_${lengthText(diameter)}-${deep}-${word(purpose)}`);
}
