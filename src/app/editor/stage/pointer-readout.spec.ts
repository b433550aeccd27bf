import { Component, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Subject } from 'rxjs';
import { Lengths } from '../../ui/lengths';
import type { PanelStage } from './panel-stage';
import { PointerReadout } from './pointer-readout';
import type { Point } from './view';

@Component({
  imports: [PointerReadout],
  template: '<bw-pointer-readout [stage]="stage()" />',
})
class Host {
  readonly stage = signal<PanelStage | undefined>(undefined);
}

describe('PointerReadout', () => {
  it('writes where the pointer is in the member’s unit on each move, and nothing once it leaves the panel', async () => {
    TestBed.configureTestingModule({ providers: [{ provide: Lengths, useValue: { text: (mm: number) => `${mm} mm` } }] });
    const fixture = TestBed.createComponent(Host);
    const moves = new Subject<Point | undefined>();
    fixture.componentInstance.stage.set({ pointerAt: moves } as unknown as PanelStage);
    await fixture.whenStable();
    const readout: HTMLElement = fixture.nativeElement.querySelector('bw-pointer-readout');

    moves.next({ x: 37, y: 105 });
    expect(readout.textContent).toBe('x 37 mm  y 105 mm');
    moves.next({ x: 69, y: 137 });
    expect(readout.textContent).toBe('x 69 mm  y 137 mm');
    moves.next(undefined);
    expect(readout.textContent).toBe('');
  });
});
