import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { Lengths } from '../../ui/lengths';
import type { PanelStage } from './panel-stage';

/**
 * Where the pointer is on the panel, in the member's unit. A component of its own, as it changes on every
 * pointer move: only this text is checked again for it, not the editor's page around the stage.
 */
@Component({
  changeDetection: ChangeDetectionStrategy.OnPush,
  selector: 'bw-pointer-readout',
  template: '{{ text() }}',
  host: { 'aria-live': 'off' },
})
export class PointerReadout {
  private readonly lengths = inject(Lengths);
  readonly stage = input<PanelStage | undefined>();

  protected readonly text = computed(() => {
    const at = this.stage()?.cursor();
    return at ? `x ${this.lengths.text(at.x)}  y ${this.lengths.text(at.y)}` : '';
  });
}
