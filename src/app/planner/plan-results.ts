import { DecimalPipe } from '@angular/common';
import { Component, inject, input } from '@angular/core';
import { MatExpansionModule } from '@angular/material/expansion';
import type { CarcassPlan } from '../../../shared/planner/plan-carcass';
import { Lengths } from '../ui/lengths';
import { MomentPlot } from './moment-plot';

/** What the planner worked out, each number with the reason the screen shows beside it. */
@Component({
  selector: 'bw-plan-results',
  imports: [DecimalPipe, MatExpansionModule, MomentPlot],
  templateUrl: './plan-results.html',
  styleUrl: './plan-results.scss',
})
export class PlanResults {
  protected readonly lengths = inject(Lengths);
  readonly plan = input.required<CarcassPlan>();
}
