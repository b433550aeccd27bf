import { computed, inject, Injectable } from '@angular/core';
import { formatLength, formatSystemLength } from '../../../shared/units/format-length';
import { isInches } from '../../../shared/units/length-unit';
import { lengthInputHint, parseLength, type ParsedLength } from '../../../shared/units/parse-length';
import { AuthStore } from '../auth/auth-store';

/**
 * Lengths as the signed-in user reads and types them (shared/units), for every screen: what is stored
 * and sent stays in millimetres. Reading `unit()` in a template or computed makes it follow a new choice.
 */
@Injectable({ providedIn: 'root' })
export class Lengths {
  private readonly auth = inject(AuthStore);

  readonly unit = this.auth.units;
  /** The unit's short name for a field's label: `mm` or `in`. */
  readonly sign = computed(() => (isInches(this.unit()) ? 'in' : 'mm'));
  /** What follows a length field's text: `mm` after a bare number, nothing after inches, which carry their `"`. */
  readonly suffix = computed(() => (isInches(this.unit()) ? '' : 'mm'));
  /** What a length field says under it. */
  readonly hint = computed(() => lengthInputHint(this.unit()));

  /** A length with its unit sign: `314.33 mm`, `12.375"`, `12 3/8"`. */
  text(mm: number): string {
    return formatLength(mm, this.unit());
  }

  /** A board's sizes: `560 × 720 × 19 mm`, or `22 1/16" × 28 3/8" × 3/4"`. */
  size(...mm: number[]): string {
    return `${this.figures(...mm)}${isInches(this.unit()) ? '' : ' mm'}`;
  }

  /** Sizes for a column whose header names the unit: `560 × 720 × 19`, or `22 1/16" × 28 3/8" × 3/4"`. */
  figures(...mm: number[]): string {
    return mm.map((v) => this.field(v)).join(' × ');
  }

  /** The 32 mm system's own figures: `32 mm`, or `32 mm (1 17/64")` for an inch user. */
  system(mm: number): string {
    return formatSystemLength(mm, this.unit());
  }

  /** A length as a field shows it for editing: the bare number for mm (the label says mm), `12 3/8"` for inches. */
  field(mm: number): string {
    return isInches(this.unit()) ? formatLength(mm, this.unit()) : formatLength(mm, 'mm').replace(/ mm$/, '');
  }

  /** Reads what was typed in a length field: either unit, a bare number in the user's own. */
  parse(text: string): ParsedLength {
    return parseLength(text, this.unit());
  }
}
