import type { LengthWording } from '../checks/wording';
import { explain, type Explained } from './explained';
import type { OverlayKind } from './hinge-choice';
import type { Opening } from './plan-parts';

/** The outside of the box that fronts cover. */
export interface FrontOpening {
  width: number;
  height: number;
  /** Board thickness T of the sides, top and bottom. */
  thickness: number;
}

/** Sizes of each of `count` fronts side by side, and where they sit on the box. */
export interface FrontSizes {
  /** Across one front, edge to edge (in a door's frame its width: hinge edge to opening edge). */
  width: Explained;
  /** Top to bottom of a front. */
  height: Explained;
  /** The front's lower edge above the sides' lower edge: a door's `hang.dy`. */
  dy: Explained;
  /** How far a front reaches over the inside face of the side it hangs on (negative: set in from it). */
  overlay: Explained;
  /** How far the first front's left edge sits from the box's left outer face. */
  left: number;
}

/**
 * Front sizes from overlay and reveal. The reveal is the gap between neighbouring fronts, with half of it
 * at each outer edge so that the next carcass's front is a reveal away too. Full overlay covers the
 * sides' front edges, half overlay half of them (the other half for the next carcass's front on a shared
 * side), inset sits within the box with a reveal all round. Vertically full and half overlay both cover
 * top and bottom.
 */
export function frontSizes(words: LengthWording, kind: OverlayKind, count: number, reveal: number, box: FrontOpening): FrontSizes {
  const T = box.thickness;
  const r = reveal;
  const gaps = `${count - 1} gap${count === 2 ? '' : 's'} of ${words.length(r)} between fronts`;
  if (kind === 'inset') {
    const width = (box.width - 2 * T - (count + 1) * r) / count;
    return {
      width: explain(width, `the ${words.length(box.width - 2 * T)} between the sides less a ${words.length(r)} reveal at each side${count > 1 ? ` and ${gaps}` : ''}${count > 1 ? `, shared by ${count}` : ''}`),
      height: explain(box.height - 2 * T - 2 * r, `the ${words.length(box.height - 2 * T)} between top and bottom less a ${words.length(r)} reveal above and below`),
      dy: explain(T + r, `the ${words.length(T)} bottom plus the ${words.length(r)} reveal`),
      overlay: explain(-r, `inset: set ${words.length(r)} in from the side's inside face`),
      left: T + r,
    };
  }
  const covered = kind === 'full' ? T : T / 2;
  const lost = 2 * (T - covered) + r + (count - 1) * r;
  const what = kind === 'full' ? 'full overlay' : `half overlay: half of each ${words.length(T)} side left for the next carcass`;
  return {
    width: explain((box.width - lost) / count, `the ${words.length(box.width)} width less ${words.length(lost)} (${what}; half a ${words.length(r)} reveal at each outer edge${count > 1 ? `; ${gaps}` : ''})${count > 1 ? `, shared by ${count}` : ''}`),
    height: explain(box.height - r, `the ${words.length(box.height)} height less half a ${words.length(r)} reveal above and below`),
    dy: explain(r / 2, `half the ${words.length(r)} reveal above the sides' lower edge`),
    overlay: explain(covered - r / 2, `${kind} overlay: ${words.length(covered)} of the ${words.length(T)} side less half the ${words.length(r)} reveal`),
    left: T - covered + r / 2,
  };
}

/**
 * The height and lower edge of the fronts of one opening. For the whole carcass they are `frontSizes`' own.
 * In a section, full and half overlay fronts meet a dividing shelf as two carcasses' fronts meet a shared
 * side: each covers its half, half a reveal short of the shelf's centre; inset fronts sit a reveal inside
 * the faces of the boards around them.
 */
export function openingBand(words: LengthWording, kind: OverlayKind, reveal: number, opening: Opening, inside: { low: number; high: number }, whole: FrontSizes): Pick<FrontSizes, 'height' | 'dy'> {
  if (!opening.part) return { height: whole.height, dy: whole.dy };
  const r = reveal;
  const span = opening.to - opening.from;
  if (kind === 'inset') {
    return {
      height: explain(inside.high - inside.low - 2 * r, `the ${words.length(inside.high - inside.low)} between the boards above and below the section less a ${words.length(r)} reveal at each`),
      dy: explain(inside.low + r, `the board below the section's face at ${words.length(inside.low)} plus the ${words.length(r)} reveal`),
    };
  }
  return {
    height: explain(span - r, `the ${words.length(span)} section (to the dividing shelf's centre) less half a ${words.length(r)} reveal above and below`),
    dy: explain(opening.from + r / 2, `half the ${words.length(r)} reveal above the section's lower end at ${words.length(opening.from)}`),
  };
}
