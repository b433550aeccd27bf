import { describe, expect, it } from 'vitest';
import { builtinCatalog } from '../catalog/builtin-catalog';
import { expandPlacement } from './expand-placement';

const catalog = builtinCatalog();
const system = { pitch: 32, setback: 37, holeDepth: 12, holeDiameter: 5 };
const door = { width: 496, height: 720, thickness: 19 };
const at = (fitting: string, x: number, y: number, more: object = {}) => ({ id: 'p1', fitting, x, y, face: 'A' as const, rotation: 0 as const, ...more });

describe('expandPlacement', () => {
  it('puts a hinge cup at B + 17.5 from the door edge with its 45/9.5 fixing holes further in', () => {
    // Cup centre = B + 17.5 and the 45/9.5 pattern (trade-reference §2, common practice).
    const bores = expandPlacement(at('hinge-full-overlay-45', 4 + 17.5, 100), catalog.get('hinge-full-overlay-45')!, door, system);
    expect(bores.map((b) => b.id)).toEqual(['p1/cup', 'p1/fix-1', 'p1/fix-2']);
    expect(bores[0]).toMatchObject({ kind: 'face', x: 21.5, y: 100, diameter: 35, depth: 13, face: 'A', purpose: 'hinge-cup', placement: 'p1' });
    expect(bores[1]).toMatchObject({ x: 31, y: 77.5 });
    expect(bores[2]).toMatchObject({ x: 31, y: 122.5 });
  });

  it('lands a placement on face B mirrored in x as seen from face A', () => {
    const bores = expandPlacement(at('hinge-full-overlay-45', 100, 100, { face: 'B' }), catalog.get('hinge-full-overlay-45')!, door, system);
    expect(bores[1]).toMatchObject({ x: 90.5, y: 77.5, face: 'B' });
  });

  it('takes the job\'s system hole depth and the board for a through bore', () => {
    const [hole] = expandPlacement(at('shelf-pin-5', 37, 73), catalog.get('shelf-pin-5')!, door, system);
    expect(hole).toMatchObject({ depth: 12, through: false });
    const [clearance] = expandPlacement(at('connector-screw-7-face', 37, 9.5), catalog.get('connector-screw-7-face')!, door, system);
    expect(clearance).toMatchObject({ depth: 19, through: true });
  });

  it('runs a cam\'s edge bore from the edge to the cam, turned with the placement', () => {
    const cam = catalog.get('cam-15')!;
    const [, bolt] = expandPlacement(at('cam-15', 50, 24), cam, door, system);
    expect(bolt).toEqual({ id: 'p1/bolt', kind: 'edge', edge: 'y0', at: 50, z: 9.5, diameter: 8, depth: 24, purpose: 'construction', placement: 'p1' });
    const [, turned] = expandPlacement(at('cam-15', 496 - 24, 300, { rotation: 90 }), cam, door, system);
    expect(turned).toMatchObject({ edge: 'x1', at: 300, depth: 24 });
  });

  it('measures an edge bore\'s z from the face its fitting sits on', () => {
    const pilot = catalog.get('connector-screw-7-edge')!;
    const shifted = { ...pilot, bores: pilot.bores.map((b) => ({ ...b, z: 5 })) };
    expect(expandPlacement(at('x', 40, 0), shifted, door, system)[0]).toMatchObject({ z: 5, depth: 50 });
    expect(expandPlacement(at('x', 40, 0, { face: 'B' }), shifted, door, system)[0]).toMatchObject({ z: 14 });
  });
});
