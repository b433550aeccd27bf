import { describe, expect, it } from 'vitest';
import { panelMass, woodDensity } from './panel-mass';

describe('woodDensity', () => {
  it('gives yellow-poplar at 12 % about 470 kg/m³', () => {
    // Yellow-poplar G = 0.42, ρ = 1000·G·(1 + M/100) = 470 kg/m³:
    // USDA FPL Wood Handbook, FPL-GTR-282 (2021), Table 5-3a and ch. 4 (published).
    expect(Math.round(woodDensity(0.42, 12))).toBe(470);
  });
});

describe('panelMass', () => {
  it('weighs a board by its volume and density', () => {
    // Flap mass = width × height × thickness × density (trade-reference §3, common practice):
    // 1000 × 500 × 20 mm is 0.01 m³, so 650 kg/m³ particleboard weighs 6.5 kg.
    expect(panelMass({ width: 1000, height: 500, thickness: 20 }, 650)).toBeCloseTo(6.5, 10);
  });
});
