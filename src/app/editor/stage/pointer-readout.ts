import { ChangeDetectionStrategy, Component, effect, ElementRef, inject, input } from '@angular/core';
import { Lengths } from '../../ui/lengths';
import type { PanelStage } from './panel-stage';

/**
 * Where the pointer is on the panel, in the member's unit. It changes on every pointer move, so it writes
 * its own text from the stage's stream: a move runs no change detection and, in a box of fixed size,
 * lays out nothing around it.
 */
@Component({
  changeDetection: ChangeDetectionStrategy.OnPush,
  selector: 'bw-pointer-readout',
  template: '',
  styles: `
    :host {
      display: block;
      // Room kept for the longest readout (inches with fractions), so that it never wraps the legend
      // mid-drag; its size its own, so that a new text is laid out inside it alone.
      width: 24ch;
      height: 1lh;
      contain: size layout;
      overflow: hidden;
      white-space: nowrap;
      text-align: right;
      margin-left: auto;
      font-variant-numeric: tabular-nums;
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  host: { 'aria-live': 'off' },
})
export class PointerReadout {
  private readonly lengths = inject(Lengths);
  private readonly host: HTMLElement = inject(ElementRef).nativeElement;
  readonly stage = input<PanelStage | undefined>();

  constructor() {
    effect((onCleanup) => {
      const subscription = this.stage()?.pointerAt.subscribe((at) => {
        this.host.textContent = at ? `x ${this.lengths.text(at.x)}  y ${this.lengths.text(at.y)}` : '';
      });
      onCleanup(() => subscription?.unsubscribe());
    });
  }
}
