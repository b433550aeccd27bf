import { ChangeDetectionStrategy, Component, effect, ElementRef, inject, input, viewChild } from '@angular/core';
import { Lengths } from '../../ui/lengths';
import { CanvasLine } from './canvas-line';
import type { PanelStage } from './panel-stage';

/**
 * Where the pointer is on the panel, in the member's unit. It changes on every pointer move, so it draws
 * itself from the stage's stream onto a canvas of its own: a move runs no change detection and lays out
 * nothing. It is for the eye alone (hidden from assistive technology, as a number that changes with every
 * move would only be noise there); the placements list and the properties form name every position.
 */
@Component({
  changeDetection: ChangeDetectionStrategy.OnPush,
  selector: 'bw-pointer-readout',
  template: '<canvas #line></canvas>',
  styles: `
    :host {
      display: block;
      // Room kept for the longest readout (inches with fractions), so that it never wraps the legend.
      width: 24ch;
      height: 1lh;
      margin-left: auto;
      color: var(--mat-sys-on-surface-variant);
    }

    canvas {
      display: block;
      width: 100%;
      height: 100%;
    }
  `,
  host: { 'aria-hidden': 'true' },
})
export class PointerReadout {
  private readonly lengths = inject(Lengths);
  private readonly canvas = viewChild.required<ElementRef<HTMLCanvasElement>>('line');
  readonly stage = input<PanelStage | undefined>();

  constructor() {
    effect((onCleanup) => {
      // Made again each time the pointer comes back onto the panel: the window's size or the screen's
      // resolution may have changed meanwhile.
      let line: CanvasLine | undefined;
      const subscription = this.stage()?.pointerAt.subscribe((at) => {
        if (!at) {
          line?.write('');
          line = undefined;
          return;
        }
        line ??= new CanvasLine(this.canvas().nativeElement);
        line.write(`x ${this.lengths.text(at.x)}  y ${this.lengths.text(at.y)}`);
      });
      onCleanup(() => subscription?.unsubscribe());
    });
  }
}
