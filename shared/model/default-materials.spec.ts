import { describe, expect, it } from 'vitest';
import { material } from './job-document';
import { DEFAULT_MATERIALS } from './default-materials';

describe('DEFAULT_MATERIALS', () => {
  it('are valid materials with unique ids', () => {
    for (const m of DEFAULT_MATERIALS) expect(material.parse(m)).toEqual(m);
    expect(new Set(DEFAULT_MATERIALS.map((m) => m.id)).size).toBe(DEFAULT_MATERIALS.length);
  });

  it('carry the published values', () => {
    const byId = Object.fromEntries(DEFAULT_MATERIALS.map((m) => [m.id, m]));
    // EN 622-5:2009 (MDF) and EN 312:2010 table 3 (particleboard P2), as quoted in trade-reference.md §4.
    expect(byId['mdf-19']).toMatchObject({ thickness: 19, modulus: 2200, density: 700 });
    expect(byId['particleboard-18']).toMatchObject({ thickness: 18, modulus: 1600, density: 650 });
    // AWS 1st ed. §4.4.14.10: 950,000 psi; 1 psi = 6.894757e-3 N/mm².
    expect(byId['plywood-18'].modulus).toBeCloseTo(950_000 * 6.894757e-3, -2);
    // USDA FPL-GTR-282: ρ = 1000 · G · (1 + M/100) with G = 0.48, M = 12.
    expect(byId['plywood-18'].density).toBeCloseTo(1000 * 0.48 * 1.12, 0);
    // Akyıldız & Kol (2010): paulownia 317 kg/m³, 4281 N/mm².
    expect(byId['lightweight-18']).toMatchObject({ density: 317, modulus: 4281 });
  });
});
