import * as z from 'zod';
import { fitting, fittingId } from '../catalog/fitting';

/**
 * The catalog's part of the HTTP API (design.md §4): the fittings everyone works with, the shop's own
 * imported beside the built-in ones, and their import and removal by the admin. Shared by the server
 * (which validates what comes in) and the client (which validates answers).
 */

/** Where a fitting comes from: shipped with Borewright, or imported by the shop. */
export const fittingOrigin = z.enum(['built-in', 'shop']);
export type FittingOrigin = z.output<typeof fittingOrigin>;

/** One fitting of the catalog with where it comes from; a shop's fitting also says who imported it and when. */
export const catalogEntry = z.object({
  fitting,
  origin: fittingOrigin,
  /** Only for a shop's fitting: who imported it (null once that account is gone) and when. */
  imported: z.object({ by: z.string().nullable(), at: z.string() }).optional(),
});
export type CatalogEntry = z.output<typeof catalogEntry>;

/** GET /api/catalog: the built-in fittings in catalog order, then the shop's in the order they were imported. */
export const catalogList = z.object({ fittings: z.array(catalogEntry) });

/** POST /api/catalog/fittings answers with the fittings it added. */
export const fittingsImported = z.object({ fittings: z.array(catalogEntry) });
export type FittingsImported = z.output<typeof fittingsImported>;

export const fittingParams = z.object({ fittingId });
