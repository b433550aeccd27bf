import type { Fitting, FittingBore } from '../../../shared/catalog/fitting';
import { rangeForWords } from '../../../shared/compute/power-factor';

const mm = (n: number) => String(Math.round(n * 100) / 100);

function boreWords(b: FittingBore): string {
  if (b.kind === 'edge') return `Ø${mm(b.diameter)} edge bore toward ${b.toward}`;
  const depth = b.depth === 'system' ? 'system depth' : b.depth === 'through' ? 'through' : `${mm(b.depth)} deep`;
  return `Ø${mm(b.diameter)} ${depth}`;
}

/** A fitting's bores in words, alike ones counted: "Ø35 13 deep, 2 × Ø8 11 deep". */
export function boreSummary(f: Fitting): string {
  const counts = new Map<string, number>();
  for (const b of f.bores) counts.set(boreWords(b), (counts.get(boreWords(b)) ?? 0) + 1);
  return [...counts].map(([words, n]) => (n > 1 ? `${n} × ${words}` : words)).join(', ');
}

/** The fitting's family data (design.md §4) in words, one line per fact, for its card in the catalog. */
export function familyFacts(f: Fitting): string[] {
  switch (f.purpose) {
    case 'hinge-cup': {
      const cup = f.bores.find((b) => b.id === f.hinge.cupBore);
      const { min, max } = f.hinge.boringDistance;
      return [
        cup && cup.kind === 'face' ? `Cup ${boreWords(cup)}` : '',
        `Cup-boring distance ${mm(min)} to ${mm(max)} mm`,
        `${f.hinge.overlay.charAt(0).toUpperCase()}${f.hinge.overlay.slice(1)} overlay, hinge constant ${mm(f.hinge.constant)} mm`,
        `Opens ${mm(f.hinge.openingAngle)}°`,
      ].filter(Boolean);
    }
    case 'mounting-plate':
      return [`Plate height ${mm(f.plate.height)} mm`];
    case 'lift-mechanism':
      return [`Power factor ${mm(f.lift.powerFactor.min)} to ${mm(f.lift.powerFactor.max)}, ${rangeForWords(f.lift.rangeFor)}`];
    case 'runner':
      return [`Runner length ${mm(f.runner.length)} mm`];
    default:
      return [];
  }
}

/** Its keep-outs' sizes: "Keep-out 35 × 53 mm". */
export function keepOutSummary(f: Fitting): string {
  if (f.keepOuts.length === 0) return '';
  const sizes = f.keepOuts.map((k) => `${mm(k.width)} × ${mm(k.height)}`).join(', ');
  return `Keep-out${f.keepOuts.length > 1 ? 's' : ''} ${sizes} mm`;
}
