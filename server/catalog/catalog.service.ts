import type { CatalogEntry } from '../../shared/api/catalog-contract';
import { jsonTooDeep, TOO_DEEP_MESSAGE } from '../../shared/model/json-depth';
import type { User } from '../../shared/api/contract';
import { builtinCatalog } from '../../shared/catalog/builtin-catalog';
import type { Fitting } from '../../shared/catalog/fitting';
import { parseFittingImport } from '../../shared/catalog/parse-catalog';
import { recordActivity } from '../activity/activity.repository';
import type { Database } from '../db/client';
import { AppError, notFound } from '../http/app-error';
import { findNulText, NUL_MESSAGE } from '../http/nul-text';
import * as repo from './catalog.repository';
import { shopFittingsInUse } from './shop-catalog';

/** What a shop imports: its fittings, and whether it sent one fitting or a catalog file (for the paths of messages). */
export interface FittingImport {
  fittings: Fitting[];
  single: boolean;
}

/** Every fitting of the catalog: the built-in ones in catalog order, then the shop's in the order imported. */
export async function listCatalog(db: Database): Promise<CatalogEntry[]> {
  const builtin = [...builtinCatalog().values()].map((fitting): CatalogEntry => ({ fitting, origin: 'built-in' }));
  const shop = (await shopFittingsInUse(db)).map(
    (s): CatalogEntry => ({ fitting: s.fitting, origin: 'shop', imported: { by: s.importedBy, at: s.importedAt.toISOString() } }),
  );
  return [...builtin, ...shop];
}

/** Reads an uploaded file as JSON; what it holds is checked by `readFittingImport`. */
export function readFittingFile(bytes: Buffer): unknown {
  const text = bytes.toString('utf8').replace(/^\uFEFF/, '');
  if (jsonTooDeep(text)) throw invalidImport([`the file ${TOO_DEEP_MESSAGE}`]);
  try {
    return JSON.parse(text);
  } catch (err) {
    throw invalidImport([`the file is not JSON: ${(err as Error).message}`]);
  }
}

/**
 * Validates what was sent, one fitting or a catalog file, with the catalog's own schema. Every problem
 * comes back at once, one line each, led by its path, so the file or form can be mended in one go.
 */
export function readFittingImport(input: unknown): FittingImport {
  const result = parseFittingImport(input);
  if (!result.ok) throw invalidImport(result.errors);
  const nul = findNulText(result.value);
  if (nul !== undefined) throw invalidImport([`${nul}: ${NUL_MESSAGE}`]);
  const single = typeof input === 'object' && input !== null && !('fittings' in input);
  return { fittings: result.value, single };
}

/** The field messages of path-led lines (`bores[0].diameter: must be …`), the first for each path, for a form to show beside its fields. */
function fieldsOf(lines: readonly string[]): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const line of lines) {
    const match = /^([A-Za-z0-9_.[\]]+): (.*)$/s.exec(line);
    if (match) fields[match[1]] ??= match[2];
  }
  return fields;
}

function invalidImport(details: string[]): AppError {
  const count = details.length === 1 ? 'one problem' : `${details.length} problems`;
  return new AppError(400, 'invalid-fitting', `Not a valid fitting or catalog file (${count}); nothing was imported.`, { details, fields: fieldsOf(details) });
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/**
 * Adds the shop's fittings beside the built-in ones, all of them or, on any problem, none. An id that a
 * built-in fitting or an earlier shop fitting has is refused (409): a shop fitting never replaces one.
 */
export async function importFittings(db: Database, actor: User, { fittings, single }: FittingImport, fileName?: string): Promise<CatalogEntry[]> {
  const pathOf = (i: number) => (single ? 'id' : `fittings[${i}].id`);
  const builtin = builtinCatalog();
  return db.transaction(async (tx) => {
    const stored = new Map((await repo.findShopFittings(tx, fittings.map((f) => f.id))).map((r) => [r.fittingId, r]));
    const taken = fittings.flatMap((f, i) => {
      const other = builtin.get(f.id);
      if (other) return [`${pathOf(i)}: "${f.id}" is a built-in fitting (${other.name}); a shop's fitting cannot replace it, give it an id of its own`];
      const shop = stored.get(f.id);
      if (shop) return [`${pathOf(i)}: "${f.id}" is already a shop fitting (${shop.fitting.name}, imported ${shop.createdAt.toISOString().slice(0, 10)}); give this one an id of its own, or delete that one first`];
      return [];
    });
    if (taken.length > 0) {
      const message = taken.length === 1 ? `${taken[0]}. Nothing was imported.` : `${plural(taken.length, 'fitting id')} are already in the catalog; nothing was imported.`;
      throw new AppError(409, 'fitting-id-taken', message, { details: taken, fields: fieldsOf(taken) });
    }
    const rows = await repo.insertShopFittings(tx, fittings, actor.id);
    await recordActivity(tx, {
      userId: actor.id,
      action: 'catalog.imported',
      details: { fittings: fittings.map((f) => f.id), ...(fileName ? { file: fileName } : {}) },
    });
    return fittings.map((fitting, i): CatalogEntry => ({ fitting, origin: 'shop', imported: { by: actor.name, at: rows[i].createdAt.toISOString() } }));
  });
}

/**
 * Deletes a shop fitting that no job uses any more. A built-in fitting cannot be deleted; a fitting still
 * placed on a panel is refused (409), naming the jobs, so that no panel loses its drilling silently.
 */
export async function deleteFitting(db: Database, actor: User, fittingId: string): Promise<void> {
  const builtin = builtinCatalog().get(fittingId);
  if (builtin) throw new AppError(409, 'built-in-fitting', `"${fittingId}" (${builtin.name}) is a built-in fitting; built-in fittings cannot be deleted.`);
  await db.transaction(async (tx) => {
    const [row] = await repo.findShopFittings(tx, [fittingId]);
    if (!row) throw notFound(`Shop fitting "${fittingId}"`);
    const users = await repo.jobsUsingFitting(tx, fittingId);
    if (users.length > 0) {
      const names = users.map((j) => `${j.name}${j.archived ? ' (archived)' : ''}`);
      throw new AppError(
        409,
        'fitting-in-use',
        `"${row.fitting.name}" is still placed in ${plural(users.length, 'job')}: ${names.join(', ')}. Remove it from their panels first; nothing was deleted.`,
        { details: users.map((j, i) => `${names[i]}: ${plural(j.placements, 'placement')} on ${plural(j.panels, 'panel')}`) },
      );
    }
    await repo.deleteShopFitting(tx, fittingId);
    await recordActivity(tx, { userId: actor.id, action: 'catalog.deleted', details: { fitting: fittingId, name: row.fitting.name } });
  });
}
