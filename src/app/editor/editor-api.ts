import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { panelRecord, type PanelRecord } from '../../../shared/api/contract';
import type { Panel } from '../../../shared/model/job-document';

export const drillingUrl = (panelDbId: number) => `/api/panels/${panelDbId}/drilling`;

/** The editor's one change: a panel's whole drilling, sent with the version it was loaded at. */
@Injectable({ providedIn: 'root' })
export class EditorApi {
  private readonly http = inject(HttpClient);

  /** Rejects with a 409 ApiProblem when someone else saved the panel since `version`. */
  async saveDrilling(panelDbId: number, version: number, drilling: Pick<Panel, 'placements' | 'bores'>): Promise<PanelRecord> {
    const body = { version, placements: drilling.placements, bores: drilling.bores };
    return panelRecord.parse(await firstValueFrom(this.http.put(drillingUrl(panelDbId), body)));
  }
}
