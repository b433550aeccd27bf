import { Directive, effect, ElementRef, inject, untracked } from '@angular/core';
import { NG_VALIDATORS, NG_VALUE_ACCESSOR, type ControlValueAccessor, type ValidationErrors, type Validator } from '@angular/forms';
import { Lengths } from './lengths';

/**
 * A text input for a length of a reactive form: the control holds millimetres, the input shows them in the
 * user's unit and reads either unit (`12 3/8"`, `314.3 mm`, a bare number in the user's own) through the
 * shared parser. What does not read as a length leaves the control NaN with the error `length: message`;
 * an empty field leaves it null.
 */
@Directive({
  selector: 'input[bwLength]',
  providers: [
    { provide: NG_VALUE_ACCESSOR, useExisting: LengthInput, multi: true },
    { provide: NG_VALIDATORS, useExisting: LengthInput, multi: true },
  ],
  host: { '(input)': 'read($any($event.target).value)', '(blur)': 'leave()', autocomplete: 'off', spellcheck: 'false' },
})
export class LengthInput implements ControlValueAccessor, Validator {
  private readonly input: HTMLInputElement = inject(ElementRef).nativeElement;
  private readonly lengths = inject(Lengths);
  private value: number | null = null;
  private problem: string | null = null;
  private changed: (mm: number | null) => void = () => undefined;
  private touched: () => void = () => undefined;

  constructor() {
    // A new choice of units shows the same length in the new unit, unless the user is typing in the field.
    effect(() => {
      this.lengths.unit();
      untracked(() => {
        if (this.problem === null && document.activeElement !== this.input) this.show();
      });
    });
  }

  writeValue(mm: number | null): void {
    this.value = mm;
    this.problem = null;
    this.show();
  }

  registerOnChange(fn: (mm: number | null) => void): void {
    this.changed = fn;
  }

  registerOnTouched(fn: () => void): void {
    this.touched = fn;
  }

  setDisabledState(disabled: boolean): void {
    this.input.disabled = disabled;
  }

  validate(): ValidationErrors | null {
    return this.problem === null ? null : { length: this.problem };
  }

  protected read(text: string): void {
    // An empty field is no length at all: the control's own `required` says so.
    if (text.trim() === '') {
      this.problem = null;
      this.value = null;
      this.changed(null);
      return;
    }
    const parsed = this.lengths.parse(text);
    this.problem = parsed.ok ? null : parsed.error;
    this.value = parsed.ok ? parsed.mm : Number.NaN;
    this.changed(this.value);
  }

  /** Leaving the field shows what was read in the user's own form (`12.375"` becomes `12 3/8"`). */
  protected leave(): void {
    if (this.problem === null) this.show();
    this.touched();
  }

  private show(): void {
    const mm = this.value;
    this.input.value = mm === null || !Number.isFinite(mm) ? '' : this.lengths.field(mm);
  }
}
