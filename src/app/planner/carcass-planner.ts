import { Component, effect, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Router, RouterLink } from '@angular/router';
import { map } from 'rxjs';
import { Can } from '../auth/can';
import { describeError } from '../core/api-problem';
import { CarcassDrawing } from './carcass-drawing';
import { PlanResults } from './plan-results';
import { plannerForm, toPlanInput } from './planner-form';
import { PlannerStore } from './planner-store';

/**
 * The carcass planner: a box and how it opens typed on the left, its drawing and every worked-out number
 * on the right, live; "Add to job" stores the carcass with all its panels.
 */
@Component({
  selector: 'bw-carcass-planner',
  imports: [
    Can,
    CarcassDrawing,
    MatButtonModule,
    MatButtonToggleModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatSelectModule,
    PlanResults,
    ReactiveFormsModule,
    RouterLink,
  ],
  providers: [PlannerStore],
  templateUrl: './carcass-planner.html',
  styleUrl: './carcass-planner.scss',
})
export class CarcassPlanner {
  private readonly router = inject(Router);
  private readonly snackBar = inject(MatSnackBar);
  protected readonly store = inject(PlannerStore);

  protected readonly form = plannerForm();
  protected readonly value = toSignal(this.form.valueChanges.pipe(map(() => this.form.getRawValue())), { initialValue: this.form.getRawValue() });

  constructor() {
    effect(() => this.store.describe(toPlanInput(this.value())));
  }

  protected async addToJob(): Promise<void> {
    try {
      const added = await this.store.addToJob();
      const ref = this.snackBar.open(`Added “${added.carcass.name}” with ${added.panels.length} panels.`, 'Open the job', { duration: 8000 });
      ref.onAction().subscribe(() => void this.router.navigate(['/jobs', this.store.jobId()]));
    } catch (error) {
      this.snackBar.open(describeError(error), 'Close');
    }
  }
}
