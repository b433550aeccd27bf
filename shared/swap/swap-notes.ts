import type { Catalog, Fitting } from '../catalog/fitting';
import { formatNumber, mm } from '../checks/wording';
import type { JobDocument, Panel } from '../model/job-document';

type Of<P extends Fitting['purpose']> = Extract<Fitting, { purpose: P }>;

/** Signed, for a change: `+3 mm`, `−2 mm`. */
function change(value: number): string {
  return `${value > 0 ? '+' : value < 0 ? '−' : ''}${mm(Math.abs(value))}`;
}

function list(ids: readonly string[]): string {
  return ids.length <= 6 ? ids.join(', ') : `${ids.slice(0, 6).join(', ')} and ${ids.length - 6} more`;
}

/**
 * Pairing: a swap changes only the fitting it names. The plates that meet the swapped cups stay as they
 * are, on the panels the fronts hang on, unless those are swapped too (design.md §3: hang.on).
 */
function platesLeft(job: JobDocument, catalog: Catalog, fronts: readonly Panel[]): string | undefined {
  const on = [...new Set(fronts.flatMap((f) => f.hang?.on ?? []))];
  const plates = new Map<string, number>();
  for (const id of on) {
    for (const p of job.panels.find((panel) => panel.id === id)?.placements ?? []) {
      if (catalog.get(p.fitting)?.purpose === 'mounting-plate') plates.set(p.fitting, (plates.get(p.fitting) ?? 0) + 1);
    }
  }
  if (plates.size === 0) return undefined;
  const which = [...plates].map(([id, n]) => `${n} × ${id}`).join(', ');
  return `The mounting plates the swapped cups meet stay as they are (${which} on ${list(on.sort())}): a swap changes only the fitting it names. Swap the plates too if the new hinge needs others.`;
}

function hingeNotes(job: JobDocument, catalog: Catalog, from: Of<'hinge-cup'>, to: Of<'hinge-cup'>, fronts: readonly Panel[]): string[] {
  const notes: string[] = [];
  if (from.hinge.overlay !== to.hinge.overlay) {
    notes.push(`${to.name} is made for ${to.hinge.overlay} overlay, ${from.name} for ${from.hinge.overlay} overlay: the fronts will sit differently on the carcass.`);
  }
  const delta = to.hinge.constant - from.hinge.constant;
  if (delta !== 0) {
    notes.push(
      `Overlay = hinge constant + B − plate height (trade-reference §2, common practice): the constant goes from ${mm(from.hinge.constant)} to ${mm(to.hinge.constant)}, so each front's overlay changes by ${change(delta)}.`,
    );
  }
  const { min, max } = to.hinge.boringDistance;
  const outside = fronts.flatMap((panel) =>
    panel.placements
      .filter((p) => p.fitting === from.id && p.params?.['boringDistance'] !== undefined)
      .filter((p) => p.params!['boringDistance'] < min || p.params!['boringDistance'] > max)
      .map((p) => `${panel.id}/${p.id} (B ${formatNumber(p.params!['boringDistance'])})`),
  );
  if (outside.length > 0) notes.push(`The cup-boring distance B of ${list(outside)} lies outside the ${mm(min)} to ${mm(max)} of ${to.name}.`);
  const plates = platesLeft(job, catalog, fronts);
  if (plates) notes.push(plates);
  return notes;
}

/**
 * What a cabinetmaker should know beyond the holes: a different overlay, plates left as they are, a
 * cup-boring distance outside the new hinge's range, a plate of another height, a runner of another length.
 */
export function swapNotes(job: JobDocument, catalog: Catalog, from: Fitting, to: Fitting, affected: readonly Panel[]): string[] {
  if (affected.length === 0) return [`The job has no placement of ${from.id}: the swap changes nothing.`];
  if (from.purpose === 'hinge-cup' && to.purpose === 'hinge-cup') return hingeNotes(job, catalog, from, to, affected);
  if (from.purpose === 'mounting-plate' && to.purpose === 'mounting-plate') {
    const delta = to.plate.height - from.plate.height;
    if (delta === 0) return [];
    return [
      `The plate height goes from ${mm(from.plate.height)} to ${mm(to.plate.height)}: overlay = hinge constant + B − plate height (trade-reference §2, common practice), so the fronts hung on these plates change overlay by ${change(-delta)}. The cups on the fronts stay as they are.`,
    ];
  }
  if (from.purpose === 'lift-mechanism' && to.purpose === 'lift-mechanism') {
    const [a, b] = [from.lift.powerFactor, to.lift.powerFactor];
    if (a.min === b.min && a.max === b.max) return [];
    return [`${to.name} covers power factors ${b.min} to ${b.max}, ${from.name} ${a.min} to ${a.max}: the checks below say whether each flap is still in range.`];
  }
  if (from.purpose === 'runner' && to.purpose === 'runner' && from.runner.length !== to.runner.length) {
    return [`The new runner is ${mm(to.runner.length)} long, the old one ${mm(from.runner.length)}: check the drawer boxes' length and the carcass depth.`];
  }
  return [];
}
