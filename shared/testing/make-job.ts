import { jobDocument, type JobDocument, type JobDocumentInput } from '../model/job-document';

export type PanelInput = NonNullable<JobDocumentInput['panels']>[number];

/** Materials for examples and tests; the figures come from trade-reference §4. */
export const TEST_MATERIALS = [
  // Particleboard P2, 18 mm: about 650 kg/m³, MOE 1600 N/mm² (EN 312:2010, table 3).
  { id: 'pb18', name: 'Particleboard 18', thickness: 18, density: 650, modulus: 1600 },
  // MDF, 12 to 19 mm: about 700 kg/m³, MOE 2200 N/mm² (EN 622-5:2009).
  { id: 'mdf18', name: 'MDF 18', thickness: 18, density: 700, modulus: 2200 },
];

/** A panel with plain defaults (a 560 × 720 × 18 particleboard side, nothing drilled) and the given fields. */
export function makePanel(id: string, fields: Partial<PanelInput> = {}): PanelInput {
  return { id, name: id, role: 'side', width: 560, height: 720, thickness: 18, material: 'pb18', ...fields };
}

/** A valid job document holding these panels, with the schema's defaults filled in. Throws on a bad one. */
export function makeJob(panels: PanelInput[], fields: Partial<JobDocumentInput> = {}): JobDocument {
  return jobDocument.parse({ format: 'borewright.job/1', name: 'Test job', materials: TEST_MATERIALS, panels, ...fields });
}
