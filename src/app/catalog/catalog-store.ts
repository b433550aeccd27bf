import { HttpClient, HttpEvent, httpResource } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import { firstValueFrom, Observable } from 'rxjs';
import { catalogList, fittingsImported, type CatalogEntry } from '../../../shared/api/catalog-contract';
import { builtinCatalog } from '../../../shared/catalog/builtin-catalog';
import type { Catalog } from '../../../shared/catalog/fitting';
import { catalogOf } from '../../../shared/catalog/parse-catalog';
import { describeError } from '../core/api-problem';

export const catalogUrl = '/api/catalog';
export const catalogFittingsUrl = `${catalogUrl}/fittings`;
export const catalogFittingUrl = (fittingId: string) => `${catalogFittingsUrl}/${encodeURIComponent(fittingId)}`;

const builtinEntries = (): CatalogEntry[] => [...builtinCatalog().values()].map((fitting) => ({ fitting, origin: 'built-in' }));

/**
 * The catalog the whole app draws and checks with: the built-in fittings and the shop's own, as the
 * server has them (GET /api/catalog), so the editor and the planner lay out a shop's fitting exactly as
 * the packs do. It is loaded once, when a screen that needs it first asks (`load`); until then, and if
 * loading fails, it is the built-in catalog, so a screen never waits on it to draw.
 */
@Injectable({ providedIn: 'root' })
export class CatalogStore {
  private readonly http = inject(HttpClient);

  private readonly wanted = signal(false);
  private readonly list = httpResource(() => (this.wanted() ? catalogUrl : undefined), { parse: (raw) => catalogList.parse(raw).fittings });

  /** Every fitting with where it comes from: built-in first, then the shop's in the order imported. */
  readonly entries = computed(() => (this.list.hasValue() ? this.list.value() : builtinEntries()));
  /** The fittings by id, for layout, checks and snapping. */
  readonly catalog = computed<Catalog>(() => (this.list.hasValue() ? catalogOf(this.list.value().map((e) => e.fitting)) : builtinCatalog()));
  readonly loading = this.list.isLoading;
  readonly loadError = computed(() => {
    const error = this.list.error();
    return error === undefined ? null : describeError(error);
  });

  /** Asks the server for the shop's catalog, the first time only. */
  load(): void {
    this.wanted.set(true);
  }

  reload(): void {
    if (this.wanted()) this.list.reload();
    else this.load();
  }

  /** Imports one fitting or a catalog file sent as JSON; the catalog is read again once it is in. */
  async importFittings(body: unknown): Promise<CatalogEntry[]> {
    const answer = fittingsImported.parse(await firstValueFrom(this.http.post(catalogFittingsUrl, body))).fittings;
    this.reload();
    return answer;
  }

  /** Uploads a catalog file; the events carry upload progress, the last one the fittings added. Call `reload` after. */
  uploadFile(file: File): Observable<HttpEvent<unknown>> {
    const form = new FormData();
    form.append('file', file, file.name);
    return this.http.post(catalogFittingsUrl, form, { reportProgress: true, observe: 'events' });
  }

  /** Deletes a shop fitting no job uses; a 409 names the jobs that still do. */
  async deleteFitting(fittingId: string): Promise<void> {
    await firstValueFrom(this.http.delete(catalogFittingUrl(fittingId)));
    this.reload();
  }
}
