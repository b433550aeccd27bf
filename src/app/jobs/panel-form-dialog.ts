import { Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { LengthInput } from '../ui/length-input';
import { Lengths } from '../ui/lengths';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { PanelRecord } from '../../../shared/api/contract';
import {
  Carcass,
  Material,
  MAX_PANEL_LENGTH,
  MAX_THICKNESS,
  PanelRole,
  panelRole,
} from '../../../shared/model/job-document';
import { describeError, isStaleVersion } from '../core/api-problem';
import { fieldMessage, FieldWording, notBlank, showFieldProblems } from '../core/form-messages';
import { PanelFields } from './jobs-api';
import { roleLabels } from './panel-labels';

export interface PanelFormRequest {
  /** The panel to edit; absent when adding one. */
  panel?: PanelRecord;
  carcasses: readonly Carcass[];
  materials: readonly Material[];
  save: (fields: PanelFields) => Promise<PanelRecord>;
}

/** The dialog closes with the saved panel, or with `reload` when the user asks for the current data after a 409. */
export type PanelFormResult = PanelRecord | 'reload';

/** The smallest size the form takes; the API only asks for more than zero, no real board is thinner. */
const MIN_SIZE = 1;

type Field = 'name' | 'role' | 'material' | 'width' | 'height' | 'thickness';

const wording: Record<Field, FieldWording> = {
  name: { label: 'panel name' },
  role: { label: 'role' },
  material: { label: 'material' },
  width: { label: 'width', unit: ' mm' },
  height: { label: 'height', unit: ' mm' },
  thickness: { label: 'thickness', unit: ' mm' },
};

/** Adds a panel to a job or edits its board data: name, role, carcass, size and material. */
@Component({
  selector: 'bw-panel-form-dialog',
  imports: [
    LengthInput,
    ReactiveFormsModule,
    MatButtonModule,
    MatDialogModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
  ],
  templateUrl: './panel-form-dialog.html',
  styleUrl: './panel-form-dialog.scss',
})
export class PanelFormDialog {
  private readonly dialogRef = inject<MatDialogRef<PanelFormDialog, PanelFormResult>>(MatDialogRef);
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly lengths = inject(Lengths);
  protected readonly request = inject<PanelFormRequest>(MAT_DIALOG_DATA);

  protected readonly roles = panelRole.options.map((role) => ({ role, label: roleLabels[role] }));
  protected readonly form = this.buildForm(this.request.panel);
  protected readonly saving = signal(false);
  protected readonly stale = signal(false);
  protected readonly failure = signal<string | null>(null);

  protected message(field: Field): string {
    return fieldMessage(this.form.controls[field], wording[field]);
  }

  /** Boards come in their material's thickness; take it unless the user has typed one. */
  protected takeMaterialThickness(materialId: string): void {
    const thickness = this.form.controls.thickness;
    const material = this.request.materials.find((m) => m.id === materialId);
    if (material && !thickness.dirty) thickness.setValue(material.thickness);
  }

  protected async save(): Promise<void> {
    if (this.form.invalid || this.saving()) {
      this.form.markAllAsTouched();
      return;
    }
    this.saving.set(true);
    this.failure.set(null);
    try {
      this.dialogRef.close(await this.request.save(this.fields()));
    } catch (error) {
      if (isStaleVersion(error)) this.stale.set(true);
      else if (!showFieldProblems(this.form, error)) this.failure.set(describeError(error));
    } finally {
      this.saving.set(false);
    }
  }

  protected reload(): void {
    this.dialogRef.close('reload');
  }

  private fields(): PanelFields {
    const value = this.form.getRawValue();
    return {
      name: value.name.trim(),
      role: value.role as PanelRole,
      carcass: value.carcass,
      width: value.width as number,
      height: value.height as number,
      thickness: value.thickness as number,
      material: value.material,
    };
  }

  /** A new panel starts as a side in the job's first material, the board most often added. */
  private buildForm(panel: PanelRecord | undefined) {
    const size = (max: number) => [Validators.required, Validators.min(MIN_SIZE), Validators.max(max)];
    const material = panel ? undefined : this.request.materials[0];
    return this.fb.group({
      name: [panel?.name ?? '', [Validators.required, Validators.maxLength(200), notBlank]],
      role: this.fb.control<PanelRole | null>(panel?.role ?? 'side', Validators.required),
      carcass: this.fb.control<string | null>(panel?.carcass ?? null),
      width: this.fb.control<number | null>(panel?.width ?? null, size(MAX_PANEL_LENGTH)),
      height: this.fb.control<number | null>(panel?.height ?? null, size(MAX_PANEL_LENGTH)),
      thickness: this.fb.control<number | null>(panel?.thickness ?? material?.thickness ?? null, size(MAX_THICKNESS)),
      material: [panel?.material ?? material?.id ?? '', Validators.required],
    });
  }
}
