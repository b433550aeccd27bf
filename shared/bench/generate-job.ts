import type { Bore, JobDocument, Placement } from '../model/job-document';
import { makeJob, makePanel, type PanelInput } from '../testing/make-job';

const ROWS = [37, 261, 517];
const HOLES_PER_ROW = 22;

/** A line-bored side with plates, shelf pins, a runner and edge dowels: about 75 bores. */
function side(id: string): PanelInput {
  const bores: Bore[] = ROWS.flatMap((x) =>
    Array.from({ length: HOLES_PER_ROW }, (_, k) => ({ id: `r${x}-${k}`, x, y: 9 + 32 * k, face: 'A' as const, diameter: 5, depth: 12 })),
  );
  for (const at of [60, 400]) {
    bores.push({ id: `dowel-bottom-${at}`, edge: 'y0', at, z: 9, diameter: 8, depth: 21 });
    bores.push({ id: `dowel-top-${at}`, edge: 'y1', at, z: 9, diameter: 8, depth: 21 });
  }
  const placements: Placement[] = [
    { id: 'plate-low', fitting: 'plate-0', x: 37, y: 89, face: 'A', rotation: 0 },
    { id: 'plate-high', fitting: 'plate-0', x: 37, y: 633, face: 'A', rotation: 0 },
    { id: 'pin-1', fitting: 'shelf-pin-5', x: 261, y: 329, face: 'A', rotation: 0 },
    { id: 'pin-2', fitting: 'shelf-pin-5', x: 517, y: 329, face: 'A', rotation: 0 },
    { id: 'runner', fitting: 'runner-400', x: 37, y: 297, face: 'A', rotation: 0 },
  ];
  return makePanel(id, { carcass: 'c', bores, placements });
}

function door(id: string, on: string): PanelInput {
  return makePanel(id, {
    role: 'door',
    carcass: 'c',
    width: 496,
    height: 716,
    hang: { on: [on], dy: 2 },
    placements: [
      { id: 'hinge-low', fitting: 'hinge-full-overlay-45', x: 21.5, y: 87, face: 'A' },
      { id: 'hinge-high', fitting: 'hinge-full-overlay-45', x: 21.5, y: 631, face: 'A' },
    ],
    bores: [
      { id: 'handle-1', x: 460, y: 300, face: 'A', diameter: 5, depth: 18 },
      { id: 'handle-2', x: 460, y: 428, face: 'A', diameter: 5, depth: 18 },
    ],
  });
}

/** A job of `carcasses` boxes, each a left and right side and a door: three panels a box. */
export function generateJob(carcasses: number): JobDocument {
  const panels = Array.from({ length: carcasses }, (_, i) => [side(`c${i}-left`), side(`c${i}-right`), door(`c${i}-door`, `c${i}-left`)]).flat();
  return makeJob(panels, { carcasses: [{ id: 'c', name: 'Box', width: 600, height: 720, depth: 560, material: 'pb18' }] });
}

/** One perforated panel: a 100 × 50 grid of Ø5 holes 20 mm apart, with every 97th hole 16 mm off, so that some clash. */
export function perforatedJob(): JobDocument {
  const bores: Bore[] = [];
  for (let i = 0; i < 100; i++) {
    for (let j = 0; j < 50; j++) {
      const n = bores.length;
      bores.push({ id: `h${n}`, x: 10 + 20 * i + (n % 97 === 0 ? 16 : 0), y: 10 + 20 * j, face: 'A', diameter: 5, depth: 10 });
    }
  }
  return makeJob([makePanel('perforated', { role: 'back', width: 2010, height: 1010, bores })]);
}
