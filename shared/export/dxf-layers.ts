import type { Edge, Face } from '../model/job-document';
import { lengthText } from './units';

/**
 * Our layer names: upper-case letters, digits, `_` and `.` only. DXF writers drop other characters from
 * layer names without a word, which could merge two layers' bores, so every name is checked here.
 */
const LAYER_NAME = /^[A-Z0-9_.]{1,255}$/;

/** The panel's outline. */
export const OUTLINE_LAYER = 'PANEL_OUTLINE';
/** The reference edge (x = 0), drawn over the outline and named. */
export const REFERENCE_LAYER = 'REFERENCE_EDGE';
/** What the file is and how to read it. */
export const NOTES_LAYER = 'NOTES';

/** A layer name checked against our naming; throws on one that a DXF reader could not keep as it is. */
export function checkedLayerName(name: string): string {
  if (!LAYER_NAME.test(name)) throw new Error(`DXF layer name "${name}" is not one of ours: use A-Z, 0-9, "_" and "." only`);
  return name;
}

/** A face bore's layer by face, diameter and depth: `BORE_A_D5_Z13`, `BORE_B_D7_THRU`. */
export function faceBoreLayer(face: Face, diameter: number, depth: number | 'through'): string {
  const z = depth === 'through' ? 'THRU' : `Z${lengthText(depth)}`;
  return checkedLayerName(`BORE_${face}_D${lengthText(diameter)}_${z}`);
}

/** An edge bore's layer by edge, diameter and depth: `EDGE_X0_D8_Z30`. */
export function edgeBoreLayer(edge: Edge, diameter: number, depth: number): string {
  return checkedLayerName(`EDGE_${edge.toUpperCase()}_D${lengthText(diameter)}_Z${lengthText(depth)}`);
}
