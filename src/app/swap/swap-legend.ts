import { Component } from '@angular/core';

/** What the swap drawings' marks mean: shape and line as well as colour, so colour never carries the meaning alone. */
@Component({
  selector: 'bw-swap-legend',
  template: `
    <ul class="legend" aria-label="Drawing legend">
      <li><svg viewBox="-6 -6 12 12" aria-hidden="true"><circle r="4.5" class="ghost" /></svg>Hole there now</li>
      <li><svg viewBox="-6 -6 12 12" aria-hidden="true"><circle r="4.5" class="reused" /></svg>Reused as it is (outlined)</li>
      <li><svg viewBox="-6 -6 12 12" aria-hidden="true"><circle r="4.5" class="new" /></svg>New hole to drill (filled)</li>
      <li><svg viewBox="-6 -6 12 12" aria-hidden="true"><circle r="3.5" class="new" /><circle r="5.2" class="ring" /></svg>New hole that clashes (ringed red)</li>
      <li><svg viewBox="-6 -6 12 12" aria-hidden="true"><circle r="4.5" class="ghost" /><path d="M-3 -3L3 3M-3 3L3 -3" class="cross" /></svg>Old hole left unused (crossed)</li>
      <li><svg viewBox="-6 -6 12 12" aria-hidden="true"><circle r="4.5" class="ghost face-b" /></svg>Face B (dashed)</li>
    </ul>
  `,
  styleUrl: './swap-marks.scss',
})
export class SwapLegend {}
