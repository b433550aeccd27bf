import { HttpClient, HttpEvent } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { catchError, firstValueFrom, map, Observable, of, throwError } from 'rxjs';
import { PanelRecord } from '../../../shared/api/contract';
import { packProgress, PackProgressAnswer, PackSendBody, packSent, PackSent } from '../../../shared/api/pack-contract';
import { PaperName } from '../../../shared/export/paper';
import { isEdgeBore } from '../../../shared/model/job-document';

export const jobFindingsUrl = (jobId: number) => `/api/jobs/${jobId}/findings`;
export const mailRecipientsUrl = '/api/mail/recipients';
const packUrl = (jobId: number) => `/api/jobs/${jobId}/pack.zip`;

/** Whether a panel has a drilling map of face B: when it has bores there, loose or from a fitting. */
export function hasFaceB(panel: PanelRecord): boolean {
  return panel.bores.some((b) => !isEdgeBore(b) && b.face === 'B') || panel.placements.some((p) => p.face === 'B');
}

/** Whether a panel has holes to drill, loose or from a fitting: only then has it drilling programs. */
export function hasHoles(panel: PanelRecord): boolean {
  return panel.bores.length + panel.placements.length > 0;
}

/** A panel's downloads; the browser fetches them itself (plain links), as they are small and quick. */
export const panelFileUrls = (panelDbId: number) => ({
  svg: (face: 'A' | 'B') => `/api/panels/${panelDbId}/drilling-map.svg?face=${face}`,
  dxf: `/api/panels/${panelDbId}/drilling-map.dxf`,
  programs: `/api/panels/${panelDbId}/drilling-programs.zip`,
  pdf: (paper: PaperName) => `/api/panels/${panelDbId}/template.pdf?paper=${paper}`,
});

/** The file name a Content-Disposition header offers, the UTF-8 form first. */
export function attachmentName(header: string | null, fallback: string): string {
  const encoded = header && /filename\*=UTF-8''([^;]+)/i.exec(header)?.[1];
  if (encoded) return decodeURIComponent(encoded);
  return (header && /filename="([^"]*)"/i.exec(header)?.[1]) || fallback;
}

/** The bench pack's calls: the whole pack with its download progress, and sending it by mail. */
@Injectable({ providedIn: 'root' })
export class PackApi {
  private readonly http = inject(HttpClient);

  /**
   * The pack as a Blob; the events carry the bytes received so far (the total is not known while it streams).
   * `ticket` names the pack for `packProgress` while the server makes it.
   */
  downloadPack(jobId: number, paper: PaperName, ticket: string): Observable<HttpEvent<Blob>> {
    return this.http.get(packUrl(jobId), { params: { paper, progress: ticket }, responseType: 'blob', reportProgress: true, observe: 'events' });
  }

  /** How far the server has got with the pack of `ticket`; null before it starts and once it is done. */
  packProgress(ticket: string): Observable<PackProgressAnswer | null> {
    return this.http.get(`/api/pack-progress/${ticket}`).pipe(
      map((body) => packProgress.parse(body)),
      // 404 (an ApiProblem past the error interceptor): no pack of this ticket is being made now.
      catchError((error: unknown) => ((error as { status?: number }).status === 404 ? of(null) : throwError(() => error))),
    );
  }

  async sendPack(jobId: number, body: PackSendBody): Promise<PackSent> {
    return packSent.parse(await firstValueFrom(this.http.post(`/api/jobs/${jobId}/pack/send`, body)));
  }
}
