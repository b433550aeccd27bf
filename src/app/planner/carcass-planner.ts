import { Component, effect, inject, untracked } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatDialog } from '@angular/material/dialog';
import { Router, RouterLink } from '@angular/router';
import { map } from 'rxjs';
import { Can } from '../auth/can';
import type { ChangedPanelChoice } from '../../../shared/planner/replan';
import { CatalogStore } from '../catalog/catalog-store';
import { ApiProblem, describeError } from '../core/api-problem';
import { Lengths } from '../ui/lengths';
import { LengthInput } from '../ui/length-input';
import { CarcassDrawing } from './carcass-drawing';
import { PlanResults } from './plan-results';
import { fromPlanInput, plannerForm, toPlanInput } from './planner-form';
import { PlannerStore } from './planner-store';
import { ReplanDialog } from './replan-dialog';

/**
 * The carcass planner: a box and how it opens typed on the left, its drawing and every worked-out number
 * on the right, live; "Add to job" stores the carcass with all its panels.
 */
@Component({
  selector: 'bw-carcass-planner',
  imports: [
    LengthInput,
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
  private readonly dialog = inject(MatDialog);
  protected readonly store = inject(PlannerStore);
  protected readonly lengths = inject(Lengths);

  protected readonly form = plannerForm();
  protected readonly value = toSignal(this.form.valueChanges.pipe(map(() => this.form.getRawValue())), { initialValue: this.form.getRawValue() });

  constructor() {
    // The shop's own fittings, so that the plan shown is the plan the server stores.
    inject(CatalogStore).load();
    effect(() => this.store.describe(toPlanInput(this.value())));
    // Planning a carcass again starts from the description it was planned from, once, when it arrives.
    effect(() => {
      const again = this.store.againFrom();
      if (again) untracked(() => this.form.patchValue(fromPlanInput(again)));
    });
  }

  protected async addToJob(changed?: ChangedPanelChoice): Promise<void> {
    const replanning = this.store.usedIds().has(this.store.plan()?.carcass.id ?? '');
    try {
      const added = await this.store.addToJob(changed);
      const kept = added.kept.length > 0 ? `; kept ${added.kept.length} changed panel${added.kept.length === 1 ? '' : 's'} as they were` : '';
      const done = `${replanning ? 'Planned' : 'Added'} “${added.carcass.name}” with ${added.panels.length} panels${kept}.`;
      const ref = this.snackBar.open(done, 'Open the job', { duration: 8000 });
      ref.onAction().subscribe(() => void this.router.navigate(['/jobs', this.store.jobId()]));
    } catch (error) {
      if (changed === undefined && error instanceof ApiProblem && error.code === 'replan-changed') {
        const choice = await ReplanDialog.ask(this.dialog, error);
        if (choice) await this.addToJob(choice);
        return;
      }
      this.snackBar.open(describeError(error), 'Close');
    }
  }
}
