import type { Panel } from '../../../../shared/model/job-document';
import { makeJob, makePanel } from '../../../../shared/testing/make-job';

/** A 560 × 720 side with two placements and a face and an edge loose bore, for the command specs. */
export function sidePanel(): Panel {
  return makeJob([
    makePanel('left', {
      placements: [
        { id: 'plate-0-1', fitting: 'plate-0', x: 37, y: 105, face: 'A' },
        { id: 'pin-1', fitting: 'shelf-pin-5', x: 37, y: 329, face: 'A', rotation: 90 },
      ],
      bores: [
        { id: 'b1', x: 100, y: 100, face: 'A', diameter: 5, depth: 13 },
        { id: 'e1', edge: 'x0', at: 200, z: 9, diameter: 8, depth: 30 },
      ],
    }),
  ]).panels[0];
}
