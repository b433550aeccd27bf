import { DecimalPipe } from '@angular/common';
import { Component, input } from '@angular/core';
import { MatExpansionModule } from '@angular/material/expansion';
import type { CarcassPlan } from '../../../shared/planner/plan-carcass';
import { MomentPlot } from './moment-plot';

/** What the planner worked out, each number with the reason the screen shows beside it. */
@Component({
  selector: 'bw-plan-results',
  imports: [DecimalPipe, MatExpansionModule, MomentPlot],
  templateUrl: './plan-results.html',
  styleUrl: './plan-results.scss',
})
export class PlanResults {
  readonly plan = input.required<CarcassPlan>();
}
