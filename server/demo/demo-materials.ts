import { DEFAULT_MATERIALS } from '../../shared/model/default-materials';
import type { Material } from '../../shared/model/job-document';

/** One of the default materials every demo job carries, by id. */
export function defaultMaterial(id: string): Material {
  const found = DEFAULT_MATERIALS.find((m) => m.id === id);
  if (!found) throw new Error(`no default material "${id}"`);
  return found;
}
