import { DatePipe } from '@angular/common';
import { Component, inject, OnInit, signal } from '@angular/core';
import { FormArray, FormGroup, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MachineSettingsAnswer } from '../../../shared/api/settings-contract';
import { PROGRAM_CAUTION } from '../../../shared/export/cautions';
import { PECK_RATIO } from '../../../shared/export/drilling-program';
import { DEFAULT_MACHINE_SETTINGS, machineSettings, MachineSettings, MachineTool, OriginCorner, ZZero } from '../../../shared/export/machine-settings';
import { describeError } from '../core/api-problem';
import { fieldMessage, showFieldProblems } from '../core/form-messages';
import { SettingsApi } from './settings-api';

const ORIGINS: { value: OriginCorner; label: string }[] = [
  { value: 'front-left', label: 'Front left' },
  { value: 'front-right', label: 'Front right' },
  { value: 'back-left', label: 'Back left' },
  { value: 'back-right', label: 'Back right' },
];
const Z_ZEROS: { value: ZZero; label: string }[] = [
  { value: 'top', label: 'On the face up' },
  { value: 'table', label: 'On the machine table' },
];

/**
 * The admin's Machine page: the conventions every drilling program follows, set once for the shop (zero
 * corner, Z zero, heights, spoilboard allowance, a tool per diameter for blind and for through holes),
 * checked by the same schema the server uses before they are sent.
 */
@Component({
  selector: 'bw-machine-settings-page',
  imports: [DatePipe, ReactiveFormsModule, MatButtonModule, MatCheckboxModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, MatSelectModule],
  templateUrl: './machine-settings-page.html',
  styleUrl: './machine-settings-page.scss',
})
export class MachineSettingsPage implements OnInit {
  private readonly api = inject(SettingsApi);
  private readonly fb = inject(NonNullableFormBuilder);

  protected readonly origins = ORIGINS;
  protected readonly zZeros = Z_ZEROS;
  protected readonly caution = PROGRAM_CAUTION;
  protected readonly peckRatio = PECK_RATIO;
  protected readonly loading = signal(true);
  protected readonly saving = signal(false);
  protected readonly failure = signal<string | null>(null);
  protected readonly problems = signal<string[]>([]);
  protected readonly saved = signal<MachineSettingsAnswer | null>(null);

  protected readonly form = this.fb.group({
    origin: this.fb.control<OriginCorner>('front-left'),
    zZero: this.fb.control<ZZero>('top'),
    retract: [5, [Validators.required, Validators.min(1), Validators.max(100)]],
    clearance: [25, [Validators.required, Validators.min(1), Validators.max(300)]],
    spoilboard: false,
    breakthrough: [1, [Validators.required, Validators.min(0), Validators.max(5)]],
    tools: this.fb.array<FormGroup>([]),
  });

  get tools(): FormArray<FormGroup> {
    return this.form.controls.tools;
  }

  async ngOnInit(): Promise<void> {
    try {
      const answer = await this.api.machine();
      this.saved.set(answer);
      this.fill(answer.machine);
    } catch (error) {
      this.failure.set(`The machine settings could not be loaded. ${describeError(error)}`);
    } finally {
      this.loading.set(false);
    }
  }

  protected message(path: string, label: string, unit = ''): string {
    return fieldMessage(this.form.get(path)!, { label, unit });
  }

  protected addTool(): void {
    const used = this.tools.controls.map((c) => Number(c.value['tool']) || 0);
    this.tools.push(this.toolGroup({ diameter: 5, through: false, tool: Math.max(0, ...used) + 1, feed: 1500, speed: 4000 }));
  }

  protected removeTool(index: number): void {
    this.tools.removeAt(index);
  }

  protected restoreDefaults(): void {
    this.fill(DEFAULT_MACHINE_SETTINGS);
    this.form.markAsDirty();
  }

  protected async save(): Promise<void> {
    if (this.saving()) return;
    this.failure.set(null);
    this.problems.set([]);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    // The shared schema's own rules (a tool given twice, clearance below the R plane) before the server says them.
    const parsed = machineSettings.safeParse(this.settings());
    if (!parsed.success) {
      this.problems.set(parsed.error.issues.map((i) => i.message));
      return;
    }
    this.saving.set(true);
    try {
      const answer = await this.api.saveMachine(parsed.data);
      this.saved.set(answer);
      this.form.markAsPristine();
    } catch (error) {
      if (!showFieldProblems(this.form, error)) this.failure.set(`The settings were not saved. ${describeError(error)}`);
    } finally {
      this.saving.set(false);
    }
  }

  private settings(): MachineSettings {
    const v = this.form.getRawValue();
    return {
      origin: v.origin,
      zZero: v.zZero,
      retract: Number(v.retract),
      clearance: Number(v.clearance),
      breakthrough: v.spoilboard ? Number(v.breakthrough) : null,
      tools: this.tools.controls.map((c) => {
        const t = c.getRawValue();
        return { diameter: Number(t.diameter), through: t.through === true, tool: Number(t.tool), feed: Number(t.feed), speed: Number(t.speed) };
      }),
    };
  }

  private fill(machine: MachineSettings): void {
    this.form.patchValue({ origin: machine.origin, zZero: machine.zZero, retract: machine.retract, clearance: machine.clearance, spoilboard: machine.breakthrough !== null, breakthrough: machine.breakthrough ?? 1 });
    this.tools.clear();
    for (const tool of machine.tools) this.tools.push(this.toolGroup(tool));
  }

  private toolGroup(tool: MachineTool): FormGroup {
    return this.fb.group({
      diameter: [tool.diameter, [Validators.required, Validators.min(0.5), Validators.max(100)]],
      through: tool.through,
      tool: [tool.tool, [Validators.required, Validators.min(1), Validators.max(999)]],
      feed: [tool.feed, [Validators.required, Validators.min(1), Validators.max(20000)]],
      speed: [tool.speed, [Validators.required, Validators.min(1), Validators.max(30000)]],
    });
  }
}
