import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { swapApplied, type SwapApplied, type SwapApplyBody } from '../../../shared/api/swap-contract';
import type { PaperName } from '../../../shared/export/paper';

export const swapUrl = (jobId: number) => `/api/jobs/${jobId}/swap`;

/** The retrofit pack is a plain download: the browser fetches it itself and shows its own progress. */
export function retrofitUrl(jobId: number, from: string, to: string, paper: PaperName): string {
  const query = new URLSearchParams({ from, to, paper });
  return `${swapUrl(jobId)}/retrofit.zip?${query}`;
}

/** Applying a swap; the report is read through `httpResource` in the store. */
@Injectable({ providedIn: 'root' })
export class SwapApi {
  private readonly http = inject(HttpClient);

  async apply(jobId: number, body: SwapApplyBody): Promise<SwapApplied> {
    return swapApplied.parse(await firstValueFrom(this.http.post(swapUrl(jobId), body)));
  }
}
