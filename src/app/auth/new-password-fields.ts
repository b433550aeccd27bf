import { Component, input, signal } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { NewPasswordGroup, newPasswordMessage, RepeatErrorMatcher, repeatMessage } from './password-rules';

/** A new password typed twice, with a button that shows the typed characters of both. */
@Component({
  selector: 'bw-new-password-fields',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule],
  template: `
    <div class="fields" [formGroup]="group()">
      <mat-form-field appearance="outline">
        <mat-label>{{ label() }}</mat-label>
        <input matInput formControlName="password" [type]="shown() ? 'text' : 'password'" autocomplete="new-password" required />
        <button
          mat-icon-button
          matSuffix
          type="button"
          (click)="shown.set(!shown())"
          [attr.aria-label]="shown() ? 'Hide the typed characters' : 'Show the typed characters'"
        >
          <mat-icon>{{ shown() ? 'visibility_off' : 'visibility' }}</mat-icon>
        </button>
        <mat-hint>At least 8 characters.</mat-hint>
        @if (group().controls.password.invalid) {
          <mat-error>{{ passwordMessage() }}</mat-error>
        }
      </mat-form-field>

      <mat-form-field appearance="outline">
        <mat-label>The same password again</mat-label>
        <input matInput formControlName="repeat" [type]="shown() ? 'text' : 'password'" autocomplete="new-password" required [errorStateMatcher]="matcher" />
        <mat-error>{{ repeatMessage() }}</mat-error>
      </mat-form-field>
    </div>
  `,
  styles: `
    .fields {
      display: flex;
      flex-direction: column;
      gap: 4px;
    }
  `,
})
export class NewPasswordFields {
  readonly group = input.required<NewPasswordGroup>();
  readonly label = input('Password');

  protected readonly shown = signal(false);
  protected readonly matcher = new RepeatErrorMatcher();

  protected passwordMessage(): string {
    return newPasswordMessage(this.group().controls.password);
  }

  protected repeatMessage(): string {
    return repeatMessage(this.group());
  }
}
