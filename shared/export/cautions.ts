import type { Catalog } from '../catalog/fitting';
import type { JobDocument } from '../model/job-document';

export type CautionId = 'wall-hung' | 'lift-mechanism' | 'tall-unit' | 'drilling';

export interface Caution {
  id: CautionId;
  text: string;
}

/** The cautions of design.md §8, word for word. */
export const CAUTIONS: Readonly<Record<CautionId, string>> = {
  'wall-hung':
    "Wall-hung and floating units: fixings into the wall carry the whole load and must be chosen from the fixing maker's load data for that wall; where in doubt, an engineer decides. Local building codes rule.",
  'lift-mechanism':
    'Lift mechanisms are spring-loaded: install and adjust them as their maker instructs; a mechanism too weak or too strong for its flap can drop or throw it.',
  'tall-unit': 'Tall units can tip: anchor them to the wall.',
  drilling: 'Drilling from printed templates: check the 100 mm bar on every page before drilling; eye and hearing protection at the machine.',
};

/**
 * The caution every drilling program carries in its header, and the cover sheet of a pack that holds
 * programs: a machine does what the program says, so a new one is tried where a mistake costs nothing.
 */
export const PROGRAM_CAUTION =
  "Prove every new drilling program in the air or on scrap first; the machine maker's instructions decide how the machine is set up, guarded and run. Check the zero point, the tools and the heights against the header before the first panel.";

/** What every caution defers to (design.md §8). */
export const CAUTION_DEFERRAL =
  "These notes do not replace them: the hardware maker's data, local building codes and licensed professionals decide.";

/**
 * A floor-standing unit from this height up is treated as able to tip: 27 in (686 mm), where the US rule
 * for clothing storage units begins (16 CFR 1261, trade-reference §9). Cautious on purpose.
 */
export const TIP_OVER_HEIGHT = 686;

/**
 * The cautions that apply to a job, in a fixed order: wall-hung units, lift mechanisms (a lift mechanism
 * placed, or a flap), tall floor units, and drilling from templates, which always applies to a pack.
 */
export function cautionsFor(job: JobDocument, catalog: Catalog): Caution[] {
  const applies: Record<CautionId, boolean> = {
    'wall-hung': job.carcasses.some((c) => c.mounting === 'wall'),
    'lift-mechanism': job.panels.some((p) => p.role === 'flap' || p.placements.some((pl) => catalog.get(pl.fitting)?.purpose === 'lift-mechanism')),
    'tall-unit': job.carcasses.some((c) => c.mounting === 'floor' && c.height >= TIP_OVER_HEIGHT),
    drilling: true,
  };
  return (Object.keys(CAUTIONS) as CautionId[]).filter((id) => applies[id]).map((id) => ({ id, text: CAUTIONS[id] }));
}
