import { AbstractControl, FormGroup, ValidationErrors } from '@angular/forms';
import { ApiProblem } from './api-problem';

/** How a field is named in its messages, and the unit its limits are given in. */
export interface FieldWording {
  label: string;
  unit?: string;
}

/** The message under a field: the first of its problems, in words that say what to do. */
export function fieldMessage(control: AbstractControl, { label, unit = '' }: FieldWording): string {
  const errors = control.errors ?? {};
  if (errors['required']) return `Enter the ${label}.`;
  // A length that does not read (ui/length-input.ts) says what to type instead.
  if (typeof errors['length'] === 'string') return errors['length'];
  // Limits sit under narrow number fields whose label is right above: keep them short.
  if (errors['min']) return `At least ${errors['min'].min}${unit}.`;
  if (errors['max']) return `At most ${errors['max'].max}${unit}.`;
  if (errors['maxlength']) return `The ${label} must be at most ${errors['maxlength'].requiredLength} characters.`;
  if (errors['whitespace']) return `The ${label} must not be blank.`;
  if (typeof errors['server'] === 'string') return serverMessage(label, errors['server']);
  return `Check the ${label}.`;
}

/** The contract's messages read as the end of a sentence ("must be at most 6000 mm"); others stand alone. */
function serverMessage(label: string, message: string): string {
  return /^[a-z]/.test(message) ? `The ${label} ${message}.` : message;
}

/** Text that is only spaces counts as empty, as the API trims names before checking them. */
export function notBlank(control: AbstractControl<string | null>): ValidationErrors | null {
  const value = control.value ?? '';
  return value !== '' && value.trim() === '' ? { whitespace: true } : null;
}

/**
 * Puts the server's field messages (a 400's `fields`, keyed by path) on the matching controls.
 * Returns true when at least one landed, so the caller knows whether a general message is still needed.
 */
export function showFieldProblems(form: FormGroup, error: unknown): boolean {
  if (!(error instanceof ApiProblem)) return false;
  let shown = false;
  for (const [path, message] of Object.entries(error.fields)) {
    const control = form.get(path);
    if (control === null) continue;
    control.setErrors({ ...control.errors, server: message });
    control.markAsTouched();
    shown = true;
  }
  return shown;
}
