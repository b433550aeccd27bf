import { Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { describeError, isStaleVersion } from '../core/api-problem';
import { fieldMessage, FieldWording, notBlank, showFieldProblems } from '../core/form-messages';

/** What the form gives back: an empty client is null, notes only when the form shows them. */
export interface JobFormValues {
  name: string;
  client: string | null;
  notes?: string;
}

export interface JobFormRequest {
  title: string;
  saveLabel: string;
  job?: { name: string; client: string | null; notes?: string | null };
  /** Notes are edited on the job page; the jobs table only renames. */
  withNotes: boolean;
  save: (values: JobFormValues) => Promise<unknown>;
}

type JobField = 'name' | 'client' | 'notes';

const wording: Record<JobField, FieldWording> = {
  name: { label: 'job name' },
  client: { label: 'client' },
  notes: { label: 'notes' },
};

/**
 * Creates a job, or changes its name, client and notes. Closes with what `save` gave, or with `reload`
 * when, after a 409, the user asks for the job as it now is.
 */
@Component({
  selector: 'bw-job-form-dialog',
  imports: [
    ReactiveFormsModule,
    MatButtonModule,
    MatDialogModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
  ],
  templateUrl: './job-form-dialog.html',
  styleUrl: './job-form-dialog.scss',
})
export class JobFormDialog {
  private readonly dialogRef = inject<MatDialogRef<JobFormDialog, unknown>>(MatDialogRef);
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly request = inject<JobFormRequest>(MAT_DIALOG_DATA);

  protected readonly form = this.fb.group({
    name: [this.request.job?.name ?? '', [Validators.required, Validators.maxLength(200), notBlank]],
    client: [this.request.job?.client ?? '', Validators.maxLength(200)],
    notes: [this.request.job?.notes ?? '', Validators.maxLength(10_000)],
  });
  protected readonly saving = signal(false);
  protected readonly failure = signal<string | null>(null);
  /** Someone else changed the job since this form was filled from it (a 409): saving again would need their change first. */
  protected readonly stale = signal(false);

  protected message(field: JobField): string {
    return fieldMessage(this.form.controls[field], wording[field]);
  }

  protected async save(): Promise<void> {
    if (this.form.invalid || this.saving()) {
      this.form.markAllAsTouched();
      return;
    }
    this.saving.set(true);
    this.failure.set(null);
    const { name, client, notes } = this.form.getRawValue();
    try {
      const saved = await this.request.save({
        name: name.trim(),
        client: client.trim() === '' ? null : client.trim(),
        ...(this.request.withNotes ? { notes } : {}),
      });
      this.dialogRef.close(saved);
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
}
