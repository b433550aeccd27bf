import { Component, computed, input } from '@angular/core';
import { PURPOSE_STYLES } from '../../../shared/export/palette';
import { sketchGeometry, type FittingSketch } from './fitting-sketch';

/**
 * A fitting drawn around its anchor (the cross), in its own frame as placed on face A: face bores as
 * circles, edge bores as channels running to their edge (the bar), keep-outs dashed, all in the colour
 * of the fitting's purpose. `labels` names each bore with its diameter, for the larger drawing of a form.
 */
@Component({
  selector: 'bw-fitting-drawing',
  templateUrl: './fitting-drawing.html',
  styleUrl: './fitting-drawing.scss',
})
export class FittingDrawing {
  readonly fitting = input.required<FittingSketch>();
  readonly labels = input(false);
  /** What a screen reader hears; the card or form around the drawing gives the numbers in words. */
  readonly description = input('');

  protected readonly style = computed(() => PURPOSE_STYLES[this.fitting().purpose ?? 'loose']);
  protected readonly geometry = computed(() => sketchGeometry(this.fitting()));
}
