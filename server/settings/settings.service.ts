import type { User } from '../../shared/api/contract';
import type { MachineSettingsAnswer } from '../../shared/api/settings-contract';
import { DEFAULT_MACHINE_SETTINGS, machineSettings, type MachineSettings } from '../../shared/export/machine-settings';
import type { Database } from '../db/client';
import { AppError } from '../http/app-error';
import { findShopSettings, saveMachineSettings } from './settings.repository';

/**
 * The machine conventions in force, with who set them and when: the defaults while no admin has saved
 * any. What is stored is read through the shared schema again, so a row written by an older version that
 * no longer passes it is said plainly rather than turned into programs.
 */
export async function machineSettingsAnswer(db: Database): Promise<MachineSettingsAnswer> {
  const row = await findShopSettings(db);
  if (!row) return { machine: DEFAULT_MACHINE_SETTINGS, updatedAt: null, updatedBy: null };
  const parsed = machineSettings.safeParse(row.machine);
  if (!parsed.success) throw new AppError(500, 'bad-machine-settings', "The shop's stored machine settings no longer pass their schema: an admin saves them again on the Machine page.");
  return { machine: parsed.data, updatedAt: row.updatedAt.toISOString(), updatedBy: row.updatedBy };
}

/** The conventions the drilling programs follow. */
export async function shopMachineSettings(db: Database): Promise<MachineSettings> {
  return (await machineSettingsAnswer(db)).machine;
}

/** Saves the shop's machine conventions (already validated) and answers them as now in force. */
export async function setMachineSettings(db: Database, user: User, machine: MachineSettings, now: Date): Promise<MachineSettingsAnswer> {
  await saveMachineSettings(db, machine, user.id, now);
  return machineSettingsAnswer(db);
}
