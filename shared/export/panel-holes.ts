import { isSameHole, type PanelBore, type PanelFaceBore } from '../layout/bore';
import { roundTo } from './units';

/**
 * One hole as the bench drills it: the bore that stands for it, a key that names it in every file of the
 * pack, and the ids of every bore it drills at once (a plate screw in a line-bored system hole is one).
 */
export type PanelHole = PanelBore & {
  /** `A:37:361.5:5` (face, x, y, diameter) or `x0:100:9:8` (edge, along, from face A, diameter). */
  key: string;
  bores: string[];
};

/** What names a hole: where it is drilled and its bit, the same in every run of the same panel. */
function holeKey(bore: PanelBore): string {
  const n = (value: number) => roundTo(value, 0.01);
  return bore.kind === 'face' ? `${bore.face}:${n(bore.x)}:${n(bore.y)}:${n(bore.diameter)}` : `${bore.edge}:${n(bore.at)}:${n(bore.z)}:${n(bore.diameter)}`;
}

/**
 * A bucket of face holes 0.01 mm wide, so that `isSameHole`'s tolerance needs only the neighbouring buckets,
 * as one number: a panel's coordinates stay within ±6000 mm, 1.2 million steps each way.
 */
const bucket = (face: string, i: number, j: number) => ((face === 'A' ? 0 : 1) * 2_000_000 + i + 1_000_000) * 2_000_000 + j + 1_000_000;

/**
 * A panel's holes, each drilled once whoever needs it: face bores that are one hole by the checks' rule
 * (`isSameHole`: same face, centre within 0.01 mm, same diameter) become one hole, kept as the fitting's
 * rather than a loose bore's, as deep as the deepest of them and through when any of them is. Edge bores
 * are holes of their own. In the order the bores first name them; every file of the pack draws this list.
 */
export function panelHoles(bores: readonly PanelBore[]): PanelHole[] {
  const holes: PanelHole[] = [];
  const buckets = new Map<number, number[]>();
  const keys = new Map<string, number>();
  const keyOf = (bore: PanelBore) => {
    const key = holeKey(bore);
    const seen = keys.get(key) ?? 0;
    keys.set(key, seen + 1);
    // Only two edge bores alike (or a hand-drawn pair the checks report) share a key: number the second.
    return seen === 0 ? key : `${key}#${seen + 1}`;
  };
  for (const bore of bores) {
    if (bore.kind === 'edge') {
      holes.push({ ...bore, key: keyOf(bore), bores: [bore.id] });
      continue;
    }
    const i = Math.round(bore.x * 100);
    const j = Math.round(bore.y * 100);
    let same = -1;
    for (let di = -1; di <= 1 && same < 0; di++) {
      for (let dj = -1; dj <= 1 && same < 0; dj++) {
        same = buckets.get(bucket(bore.face, i + di, j + dj))?.find((k) => isSameHole(bore, holes[k] as PanelFaceBore)) ?? -1;
      }
    }
    if (same < 0) {
      const at = bucket(bore.face, i, j);
      const inBucket = buckets.get(at);
      if (inBucket) inBucket.push(holes.length);
      else buckets.set(at, [holes.length]);
      holes.push({ ...bore, key: keyOf(bore), bores: [bore.id] });
      continue;
    }
    const seen = holes[same] as PanelFaceBore & PanelHole;
    const named = seen.purpose === 'loose' && bore.purpose !== 'loose' ? bore : seen;
    holes[same] = { ...named, key: seen.key, bores: [...seen.bores, bore.id], depth: Math.max(seen.depth, bore.depth), through: seen.through || bore.through };
  }
  return holes;
}
