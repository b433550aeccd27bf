import { builtinCatalog } from '../catalog/builtin-catalog';
import type { ExportContext } from '../export/export-context';
import type { JobDocument, JobDocumentInput } from '../model/job-document';
import { makeJob, makePanel, type PanelInput } from './make-job';

/** A job with every kind of bore the exports draw: system rows, fittings, face B, through, all four edges. */
export function exportJob(fields: Partial<JobDocumentInput> = {}, extraPanels: PanelInput[] = []): JobDocument {
  const rows = [37, 517].flatMap((x) =>
    Array.from({ length: 22 }, (_, k) => ({ id: `r${x}-${k}`, x, y: 9 + 32 * k, face: 'A' as const, diameter: 5, depth: 13 })),
  );
  return makeJob(
    [
      makePanel('side-l', {
        name: 'Base unit, left side',
        carcass: 'base',
        bores: [
          ...rows,
          { id: 'face-b', x: 300, y: 200, face: 'B', diameter: 8, depth: 11 },
          { id: 'through', x: 280, y: 400, face: 'A', diameter: 7, depth: 18 },
          { id: 'dowel-y0', edge: 'y0', at: 60, z: 9, diameter: 8, depth: 21 },
          { id: 'dowel-y1', edge: 'y1', at: 60, z: 9, diameter: 8, depth: 21 },
          { id: 'pilot-x1', edge: 'x1', at: 345, z: 9, diameter: 5, depth: 50 },
        ],
        placements: [
          { id: 'plate-low', fitting: 'plate-0', x: 37, y: 89, face: 'A' },
          { id: 'plate-high', fitting: 'plate-0', x: 37, y: 633, face: 'A' },
          { id: 'pin', fitting: 'shelf-pin-5', x: 517, y: 329, face: 'A' },
          { id: 'runner', fitting: 'runner-400', x: 37, y: 297, face: 'A' },
        ],
      }),
      makePanel('bottom', { name: 'Base unit, bottom', role: 'bottom', carcass: 'base', height: 564, placements: [{ id: 'cam', fitting: 'cam-15', x: 100, y: 24, face: 'A' }] }),
      makePanel('door', {
        name: 'Base unit, door',
        role: 'door',
        carcass: 'base',
        width: 496,
        height: 716,
        hang: { on: ['side-l'], dy: 2 },
        placements: [
          { id: 'hinge-low', fitting: 'hinge-full-overlay-45', x: 21.5, y: 87, face: 'A' },
          { id: 'hinge-high', fitting: 'hinge-full-overlay-45', x: 21.5, y: 631, face: 'A' },
        ],
      }),
      makePanel('loose-back', { name: 'Back', role: 'back', width: 300, height: 200, bores: [{ id: 'x0', edge: 'x0', at: 100, z: 9, diameter: 8, depth: 30 }] }),
      ...extraPanels,
    ],
    { name: 'Larch Lane kitchen', carcasses: [{ id: 'base', name: 'Base unit', width: 600, height: 720, depth: 560, material: 'pb18' }], ...fields },
  );
}

/** An export context for tests: the built-in catalog, a fixed date and version, so files come out the same every run. */
export function exportContext(job: JobDocument = exportJob()): ExportContext {
  return { job, catalog: builtinCatalog(), date: new Date('2026-03-14T09:30:00Z'), generator: { name: 'Borewright', version: '0.0.0-test' } };
}

/** A panel whose two bores overlap: a `bores-overlap` error, for a job the checks find errors in. */
export function clashPanel(): PanelInput {
  return makePanel('clash', {
    name: 'Clash',
    role: 'loose',
    width: 200,
    height: 200,
    bores: [
      { id: 'a', x: 50, y: 50, face: 'A', diameter: 10, depth: 10 },
      { id: 'b', x: 52, y: 50, face: 'A', diameter: 10, depth: 10 },
    ],
  });
}
