import type { Material } from './job-document';

/**
 * The board a new job starts with; a shop edits its own list later. Densities in kg/m³, moduli of
 * elasticity in bending in N/mm², each from the source named beside it (trade-reference.md §4).
 */
export const DEFAULT_MATERIALS: readonly Material[] = [
  {
    id: 'mdf-19',
    name: 'MDF 19',
    thickness: 19,
    // EN 622-5:2009, general purpose dry MDF over 12 to 19 mm: MOE 2200 N/mm², density about 700 kg/m³ and up.
    density: 700,
    modulus: 2200,
  },
  {
    id: 'particleboard-18',
    name: 'Particleboard 18',
    thickness: 18,
    // EN 312:2010, table 3, type P2 over 13 to 20 mm: MOE 1600 N/mm²; an 18 mm board weighs about 650 kg/m³.
    density: 650,
    modulus: 1600,
  },
  {
    id: 'plywood-18',
    name: 'Softwood plywood 18',
    thickness: 18,
    // Density from coast Douglas-fir veneer, USDA FPL Wood Handbook FPL-GTR-282 (2021), Table 5-3a: SG 0.48 at 12 %
    // moisture, ρ = 1000 · 0.48 · 1.12 = 538 kg/m³. Modulus: AWS 1st ed. (2009) §4.4.14.10, plywood with a softwood
    // core, 950,000 psi = 6.55 GPa.
    density: 538,
    modulus: 6550,
  },
  {
    id: 'lightweight-18',
    name: 'Lightweight core board 18',
    thickness: 18,
    // The core wood's values, paulownia air-dry: 317 kg/m³, MOE 4281 N/mm² (Akyıldız & Kol, J. Environ. Biol. 31
    // (2010) 351-355). Faced boards weigh a little more; the planner errs light, so treat sag results with care.
    density: 317,
    modulus: 4281,
  },
];
