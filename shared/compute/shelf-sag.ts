/** One pound-force in newtons: 0.45359237 kg × 9.80665 m/s² (both exact by definition). */
const POUND_FORCE = 0.45359237 * 9.80665;
/** One square foot in mm² (1 ft = 304.8 mm exactly). */
const SQUARE_FOOT = 304.8 * 304.8;

/** Converts a load in lb/ft² to N/mm². */
export function poundsPerSquareFoot(load: number): number {
  return (load * POUND_FORCE) / SQUARE_FOOT;
}

/** Casework shelf load, general: 40 lb/ft² (AWS 1st ed. §1.2.21, trade-reference §5), in N/mm². */
export const SHELF_LOAD_GENERAL = poundsPerSquareFoot(40);
/** Casework shelf load for books: 50 lb/ft² (same source), in N/mm². */
export const SHELF_LOAD_BOOKS = poundsPerSquareFoot(50);

/** A shelf resting on supports at both ends. */
export interface ShelfSpan {
  /** Between the supports, mm: in a shelf's frame this is its height (design.md §3). */
  span: number;
  /** Front to back, mm. */
  depth: number;
  thickness: number;
  /** Modulus of elasticity, N/mm². */
  modulus: number;
  /** Uniform load over the shelf's area, N/mm²; the AWS general load by default. */
  load?: number;
}

/**
 * Mid-span sag in mm of a uniformly loaded, simply supported shelf: δ = 5wL⁴/(384EI) with w the load per
 * length and I = b·t³/12 (American Wood Council, Design Aid No. 6; trade-reference §5).
 */
export function shelfDeflection(shelf: ShelfSpan): number {
  const w = (shelf.load ?? SHELF_LOAD_GENERAL) * shelf.depth;
  const inertia = (shelf.depth * shelf.thickness ** 3) / 12;
  return (5 * w * shelf.span ** 4) / (384 * shelf.modulus * inertia);
}

/**
 * The longest span in mm whose sag stays within span/ratio (144 by default, AWS's L/144). The depth
 * cancels out of the formula, so only thickness, modulus and load matter.
 */
export function maxShelfSpan(shelf: Omit<ShelfSpan, 'span' | 'depth'>, ratio = 144): number {
  const load = shelf.load ?? SHELF_LOAD_GENERAL;
  return Math.cbrt((384 * shelf.modulus * shelf.thickness ** 3) / (12 * 5 * load * ratio));
}
