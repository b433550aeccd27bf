import { Component, computed, effect, inject, untracked } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
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
import { filter, map } from 'rxjs';
import { Can } from '../auth/can';
import type { ChangedPanelChoice } from '../../../shared/planner/replan';
import { CatalogStore } from '../catalog/catalog-store';
import { ApiProblem, describeError } from '../core/api-problem';
import { Lengths } from '../ui/lengths';
import { LengthInput } from '../ui/length-input';
import { CarcassDrawing } from './carcass-drawing';
import { PlanResults } from './plan-results';
import { FrontFields } from './front-fields';
import { fillPlannerForm, plannerForm, sectionGroup, sectionProblems, startSections, toPlanInput } from './planner-form';
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
    FrontFields,
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
  /** The planner's messages about each section, shown beside its fields. */
  protected readonly sectionProblems = computed(() => {
    const result = this.store.result();
    return sectionProblems(result && !result.ok ? result.errors : []);
  });
  protected readonly hasFlap = computed(() => {
    const v = this.value();
    return v.fronts === 'flap' || (v.fronts === 'sections' && v.sections.some((section) => section.front === 'flap'));
  });

  constructor() {
    // The shop's own fittings, so that the plan shown is the plan the server stores.
    inject(CatalogStore).load();
    effect(() => this.store.describe(toPlanInput(this.value())));
    // Planning a carcass again starts from the description it was planned from, once, when it arrives.
    effect(() => {
      const again = this.store.againFrom();
      if (again) untracked(() => fillPlannerForm(this.form, again));
    });
    this.form.controls.fronts.valueChanges.pipe(filter((fronts) => fronts === 'sections'), takeUntilDestroyed()).subscribe(() => startSections(this.form));
  }

  /** A new section goes below the top one, which keeps its front (a flap can only be the top's); its height is asked for. */
  protected addSection(): void {
    const { sections } = this.form.controls;
    sections.insert(sections.length - 1, sectionGroup('doors'));
  }

  protected removeSection(index: number): void {
    this.form.controls.sections.removeAt(index);
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
