import * as z from 'zod';
import { machineSettings } from '../export/machine-settings';

/** PUT /api/settings/machine: the whole of the shop's machine conventions, replacing what was set. */
export const machineSettingsBody = machineSettings;

/** GET and PUT /api/settings/machine answer: the conventions in force, and who set them when (null: the defaults, never set). */
export const machineSettingsAnswer = z.object({
  machine: machineSettings,
  updatedAt: z.string().nullable(),
  updatedBy: z.string().nullable(),
});
export type MachineSettingsAnswer = z.output<typeof machineSettingsAnswer>;
