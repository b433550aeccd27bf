import { holeTool, planProgram, programText, type NotDrilled, type ProgramPlan } from './drilling-program';
import type { ExportContext } from './export-context';
import type { MachineSettings } from './machine-settings';
import type { PanelDrilling } from './panel-drilling';
import type { ExportFile } from './panel-files';
import { programViews } from './program-views';
import { utf8Bytes } from './utf8';

/** A program's file name: the panel's base name, the side, `.nc`, e.g. `Left side.face-a.nc`. */
export const programFileName = (base: string, plan: ProgramPlan) => `${base}.${plan.view.side}.nc`;

/** The programs a panel's holes need, worked out but not written: one per face and edge with holes. */
export function panelProgramPlans(drilling: PanelDrilling, machine: MachineSettings): ProgramPlan[] {
  return programViews(drilling).map((view) => planProgram(view, drilling.panel.thickness, machine));
}

/** Every hole of a panel that its programs leave out, with the reason, in the hole list's order: what the pack's notes list. */
export function notDrilled(drilling: Pick<PanelDrilling, 'holes'>, machine: MachineSettings): NotDrilled[] {
  return drilling.holes.flatMap((hole) => {
    const found = holeTool(hole, machine);
    return 'why' in found ? [{ key: hole.key, why: found.why }] : [];
  });
}

/** A panel's drilling programs as files of an export, each written when asked for; none for a panel without holes. */
export function drillingPrograms(ctx: ExportContext, drilling: PanelDrilling, base: string, machine: MachineSettings): ExportFile[] {
  const plans = panelProgramPlans(drilling, machine);
  const names = plans.map((plan) => programFileName(base, plan));
  return plans.map((plan, i) => ({
    name: names[i],
    label: `${drilling.panel.name}: drilling program, ${plan.view.up}`,
    compress: true,
    produce: async () => utf8Bytes(programText(ctx, drilling, plan, machine, { self: names[i], others: names.filter((_, j) => j !== i) })),
  }));
}
