import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { machineSettingsAnswer, MachineSettingsAnswer } from '../../../shared/api/settings-contract';
import { MachineSettings } from '../../../shared/export/machine-settings';

export const machineSettingsUrl = '/api/settings/machine';

/** The shop's machine settings: read by anyone signed in, saved by the admin; each answer checked against the contract. */
@Injectable({ providedIn: 'root' })
export class SettingsApi {
  private readonly http = inject(HttpClient);

  async machine(): Promise<MachineSettingsAnswer> {
    return machineSettingsAnswer.parse(await firstValueFrom(this.http.get(machineSettingsUrl)));
  }

  async saveMachine(machine: MachineSettings): Promise<MachineSettingsAnswer> {
    return machineSettingsAnswer.parse(await firstValueFrom(this.http.put(machineSettingsUrl, machine)));
  }
}
