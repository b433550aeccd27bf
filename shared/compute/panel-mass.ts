/**
 * Mass of a board in kilograms from its size in millimetres and its density in kg/m³:
 * width × height × thickness × density (trade-reference §3, flap mass).
 */
export function panelMass(size: { width: number; height: number; thickness: number }, density: number): number {
  return size.width * size.height * size.thickness * 1e-9 * density;
}

/**
 * Density of solid wood in kg/m³ from its specific gravity (oven-dry mass, volume at that moisture) and its
 * moisture content in percent: ρ = 1000·G·(1 + M/100), the Wood Handbook's relation (trade-reference §4).
 */
export function woodDensity(specificGravity: number, moisturePercent: number): number {
  return 1000 * specificGravity * (1 + moisturePercent / 100);
}
