import { Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom, map } from 'rxjs';

export interface RepeatRequest {
  /** The system's pitch, mm. */
  pitch: number;
  /** The lowest and highest y of the selected placements' anchors, and the panel's height (mm). */
  lowest: number;
  highest: number;
  panelHeight: number;
}

export interface RepeatChoice {
  count: number;
  /** The rise between copies, mm: a whole number of pitches, negative down the row. */
  step: number;
}

/** Asks how many copies of the selection to lay along the row, how many pitches apart and which way. */
@Component({
  selector: 'bw-repeat-dialog',
  imports: [MatButtonModule, MatButtonToggleModule, MatDialogModule, MatFormFieldModule, MatInputModule, ReactiveFormsModule],
  template: `
    <h2 mat-dialog-title>Repeat along the row</h2>
    <form [formGroup]="form" (ngSubmit)="done()">
      <mat-dialog-content class="fields">
        <mat-form-field>
          <mat-label>Copies</mat-label>
          <input matInput type="number" formControlName="count" min="1" max="50" cdkFocusInitial />
          <mat-error>From 1 to 50 copies.</mat-error>
        </mat-form-field>
        <mat-form-field>
          <mat-label>Apart</mat-label>
          <input matInput type="number" formControlName="pitches" min="1" max="20" />
          <span matTextSuffix>× {{ request.pitch }} mm</span>
          <mat-error>From 1 to 20 pitches.</mat-error>
        </mat-form-field>
        <mat-button-toggle-group formControlName="direction" aria-label="Direction">
          <mat-button-toggle value="up">Up the row</mat-button-toggle>
          <mat-button-toggle value="down">Down the row</mat-button-toggle>
        </mat-button-toggle-group>
        <p class="outcome" [class.error]="!fits()" role="status">{{ outcome() }}</p>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="form.invalid || !fits()">Repeat</button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `
    .fields {
      display: grid;
      gap: 8px;
    }
    .outcome {
      margin: 0;
      font: var(--mat-sys-body-small);
    }
    .error {
      color: var(--mat-sys-error);
    }
  `,
})
export class RepeatDialog {
  protected readonly request = inject<RepeatRequest>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<RepeatDialog, RepeatChoice>>(MatDialogRef);

  protected readonly form = new FormGroup({
    count: new FormControl(1, { nonNullable: true, validators: [Validators.required, Validators.min(1), Validators.max(50), Validators.pattern(/^\d+$/)] }),
    pitches: new FormControl(1, { nonNullable: true, validators: [Validators.required, Validators.min(1), Validators.max(20), Validators.pattern(/^\d+$/)] }),
    direction: new FormControl<'up' | 'down'>('up', { nonNullable: true }),
  });
  private readonly value = toSignal(this.form.valueChanges.pipe(map(() => this.form.getRawValue())), { initialValue: this.form.getRawValue() });
  private readonly choice = computed((): RepeatChoice => {
    const { count, pitches, direction } = this.value();
    return { count, step: (direction === 'up' ? 1 : -1) * pitches * this.request.pitch };
  });
  /** Where the last copy's anchors land: the copies must stay on the panel. */
  private readonly reach = computed(() => {
    const { count, step } = this.choice();
    return step > 0 ? this.request.highest + count * step : this.request.lowest + count * step;
  });
  protected readonly fits = computed(() => this.reach() >= 0 && this.reach() <= this.request.panelHeight);
  protected readonly outcome = computed(() => {
    const { count, step } = this.choice();
    const where = `the last copy at y ${this.reach()} mm`;
    return this.fits()
      ? `${count} ${count === 1 ? 'copy' : 'copies'}, ${Math.abs(step)} mm apart; ${where}.`
      : `That runs off the panel: ${where}, but the panel is ${this.request.panelHeight} mm high. Fewer copies or fewer pitches.`;
  });

  protected done(): void {
    if (this.form.valid && this.fits()) this.ref.close(this.choice());
  }

  static async ask(dialog: MatDialog, request: RepeatRequest): Promise<RepeatChoice | undefined> {
    const ref = dialog.open<RepeatDialog, RepeatRequest, RepeatChoice>(RepeatDialog, { data: request, width: '380px', maxWidth: 'calc(100vw - 32px)' });
    return firstValueFrom(ref.afterClosed());
  }
}
