import { DecimalPipe } from '@angular/common';
import { Component, computed, input } from '@angular/core';
import { PanelStatus } from '../../../shared/model/job-document';
import { statusCounts } from '../../../shared/model/panel-status';

/**
 * How far the bench has got with a set of panels: how many are planned, drilled and checked, as words
 * and as one bar (checked, then drilled, then planned). Used by the job page and the bench page.
 */
@Component({
  selector: 'bw-panel-progress',
  imports: [DecimalPipe],
  templateUrl: './panel-progress.html',
  styleUrl: './panel-progress.scss',
})
export class PanelProgress {
  readonly panels = input.required<readonly { status: PanelStatus }[]>();
  /** What the panels are, for the heading and the screen reader: "this job", "Sink base". */
  readonly label = input('this job');

  protected readonly counts = computed(() => statusCounts(this.panels()));
  /** Each status's share of the bar, in per cent. */
  protected readonly shares = computed(() => {
    const { total, planned, drilled, checked } = this.counts();
    const share = (n: number) => (total === 0 ? 0 : (100 * n) / total);
    return { checked: share(checked), drilled: share(drilled), planned: share(planned) };
  });
  protected readonly summary = computed(() => {
    const { total, planned, drilled, checked } = this.counts();
    if (total === 0) return `No panels in ${this.label()} yet.`;
    return `Panels of ${this.label()}: ${checked} of ${total} checked, ${drilled} drilled and waiting to be checked, ${planned} still to drill.`;
  });
}
