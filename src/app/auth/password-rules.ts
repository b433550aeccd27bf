import { AbstractControl, FormControl, FormGroupDirective, NgForm, NonNullableFormBuilder, ValidationErrors, ValidatorFn, Validators } from '@angular/forms';
import { ErrorStateMatcher } from '@angular/material/core';
import { password } from '../../../shared/api/contract';

/** The contract's password rule (8 to 72 bytes, what bcrypt reads), checked as the user types. */
export function passwordRule(control: AbstractControl<string>): ValidationErrors | null {
  if (!control.value) return null;
  const result = password.safeParse(control.value);
  return result.success ? null : { password: result.error.issues[0].message };
}

/** On the group: the password typed twice alike. */
export const samePasswords: ValidatorFn = (group) =>
  group.get('password')?.value === group.get('repeat')?.value ? null : { mismatch: true };

/** A new password and its repetition, as the accept and reset pages ask for it. */
export function newPasswordGroup(fb: NonNullableFormBuilder) {
  return fb.group({ password: ['', [Validators.required, passwordRule]], repeat: ['', Validators.required] }, { validators: samePasswords });
}
export type NewPasswordGroup = ReturnType<typeof newPasswordGroup>;

/** The repeat field shows the group's mismatch as its own error, once touched. */
export class RepeatErrorMatcher implements ErrorStateMatcher {
  isErrorState(control: FormControl | null, form: FormGroupDirective | NgForm | null): boolean {
    if (!control) return false;
    const wrong = control.invalid || control.parent?.hasError('mismatch') === true;
    return wrong && (control.touched || form?.submitted === true);
  }
}

export function newPasswordMessage(control: AbstractControl): string {
  if (control.hasError('required')) return 'Choose a password.';
  const server = control.getError('server');
  if (typeof server === 'string') return `The password ${server}.`;
  const problem = String(control.getError('password') ?? '');
  if (problem.includes('at least')) return 'Use at least 8 characters.';
  if (problem.includes('at most')) return 'This is too long: at most 72 bytes (72 plain letters, fewer with accents).';
  return 'Check the password.';
}

export function repeatMessage(group: NewPasswordGroup): string {
  return group.controls.repeat.hasError('required') ? 'Type the password again.' : 'The two passwords differ.';
}
