import type { FittingPurpose } from '../catalog/fitting';
import type { Panel, Placement } from '../model/job-document';
import type { DraftFinding, Fix } from './finding';
import { otherSide } from './job-site';
import { report, type PanelSite } from './panel-site';
import { formatNumber } from './wording';

/** The fittings that pair across a carcass: a shelf sits on pins of both sides, a drawer on runners of both, the top and bottom on connectors of both. */
const PAIRED: readonly FittingPurpose[] = ['shelf-pin', 'runner', 'construction'];

const WORDS: Partial<Record<FittingPurpose, string>> = {
  'shelf-pin': 'shelf pins',
  runner: 'runners',
  construction: 'connectors',
  'mounting-plate': 'mounting plates',
};

/**
 * The purposes whose placements must mirror: plates too where fronts hang on both sides (a pair of
 * doors); a single door's plates are on its hinge side only and are no mismatch.
 */
function pairedPurposes(site: PanelSite, other: Panel): FittingPurpose[] {
  const hung = (p: Panel) => (site.job.hungOn.get(p.id) ?? []).length > 0;
  return hung(site.panel) && hung(other) ? [...PAIRED, 'mounting-plate'] : [...PAIRED];
}

/** A placement as its mirror image must repeat it: sides share one frame, so the same numbers (see opposite-side.ts). */
function key(p: Placement): string {
  return `${p.fitting} ${p.face} ${formatNumber(p.x)} ${formatNumber(p.y)} ${p.rotation} ${p.mirrored ? 'm' : ''}`;
}

/** The placements of one side, of a purpose, that the other side does not repeat. */
function unmatched(site: PanelSite, from: Panel, to: Panel, purpose: FittingPurpose): Placement[] {
  const ofPurpose = (p: Panel) => p.placements.filter((q) => site.job.catalog.get(q.fitting)?.purpose === purpose);
  const counts = new Map<string, number>();
  for (const q of ofPurpose(to)) counts.set(key(q), (counts.get(key(q)) ?? 0) + 1);
  return ofPurpose(from).filter((q) => {
    const n = counts.get(key(q)) ?? 0;
    counts.set(key(q), n - 1);
    return n <= 0;
  });
}

function heights(placements: readonly Placement[]): string {
  return [...new Set(placements.map((p) => formatNumber(p.y)))].sort((a, b) => Number(a) - Number(b)).join(', ');
}

function copyFix(from: Panel, to: Panel, purposes: FittingPurpose[]): Fix {
  const what = purposes.map((p) => WORDS[p]).join(', ');
  return { message: `Mirror ${from.name} (${from.id}) onto ${to.name} (${to.id}): its ${what} in place of the other's.`, edits: [{ kind: 'copy-side', from: from.id, to: to.id, purposes }] };
}

/**
 * sides-mismatched: a carcass's two sides are mirror images where their fittings pair: shelf pins, runners
 * and connectors at the same places, and plates too where doors hang on both (trade-reference §8a, common
 * practice: a shelf on uneven pins tilts, runners out of line bind). Each side reports what differs, with
 * the heights, and the fix mirrors the side the user chooses onto the other.
 */
export function checkSidesMismatched(site: PanelSite): DraftFinding[] {
  const other = otherSide(site.job, site.panel);
  if (!other) return [];
  const purposes = pairedPurposes(site, other);
  const differences = purposes.flatMap((purpose) => {
    const here = unmatched(site, site.panel, other, purpose);
    const there = unmatched(site, other, site.panel, purpose);
    if (here.length === 0 && there.length === 0) return [];
    const at = (list: Placement[], panel: Panel) => (list.length > 0 ? `at ${heights(list)} mm on ${panel.id}` : `none on ${panel.id}`);
    return [{ purpose, here, text: `${WORDS[purpose]} ${at(here, site.panel)} but ${at(there, other)}` }];
  });
  if (differences.length === 0) return [];
  const message = `The sides of carcass ${site.panel.carcass} are not mirror images: ${differences.map((d) => d.text).join('; ')}.`;
  const mismatched = differences.map((d) => d.purpose);
  const placements = differences.flatMap((d) => d.here.map((p) => p.id));
  return [
    report(site, 'sides-mismatched', 'warning', message, [], {
      candidates: () => [[copyFix(site.panel, other, mismatched)], [copyFix(other, site.panel, mismatched)]],
      advice: 'Decide which side is right and drill the other as its mirror image.',
    }, placements),
  ];
}
