import { Component, inject, input } from '@angular/core';
import { FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { SectionFrontInput } from '../../../shared/planner/carcass-plan-input';
import { LengthInput } from '../ui/length-input';
import { Lengths } from '../ui/lengths';

/**
 * The fields of one front (how many doors and their overlay, the flap's mechanisms, how many drawers, the
 * reveal and the handle), for the carcass's one front and for each section's alike.
 */
@Component({
  selector: 'bw-front-fields',
  imports: [LengthInput, MatFormFieldModule, MatInputModule, MatSelectModule, ReactiveFormsModule],
  templateUrl: './front-fields.html',
  styleUrl: './carcass-planner.scss',
})
export class FrontFields {
  /** A group holding the controls of `frontControls` (planner-form.ts). */
  readonly group = input.required<FormGroup>();
  readonly type = input.required<SectionFrontInput['type']>();
  /** One door: it asks which side it hangs on. */
  readonly single = input(false);
  protected readonly lengths = inject(Lengths);
}
