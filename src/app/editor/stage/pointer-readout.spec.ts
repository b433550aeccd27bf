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

/** What the readout's canvas shows: the text of its last fillText since its last clearRect. */
function fakeContext() {
  const drawn = { text: '', contexts: 0 };
  const context = {
    scale: () => undefined,
    clearRect: () => (drawn.text = ''),
    fillText: (text: string) => (drawn.text = text),
  };
  vi.spyOn(HTMLCanvasElement.prototype, 'getContext').mockImplementation(() => {
    drawn.contexts++;
    return context as unknown as CanvasRenderingContext2D;
  });
  return drawn;
}

describe('PointerReadout', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows where the pointer is in the member’s unit on each move, and nothing once it leaves the panel', async () => {
    const drawn = fakeContext();
    TestBed.configureTestingModule({ providers: [{ provide: Lengths, useValue: { text: (mm: number) => `${mm} mm` } }] });
    const fixture = TestBed.createComponent(Host);
    const moves = new Subject<Point | undefined>();
    fixture.componentInstance.stage.set({ pointerAt: moves } as unknown as PanelStage);
    await fixture.whenStable();

    moves.next({ x: 37, y: 105 });
    expect(drawn.text).toBe('x 37 mm  y 105 mm');
    moves.next({ x: 69, y: 137 });
    expect(drawn.text).toBe('x 69 mm  y 137 mm');
    moves.next(undefined);
    expect(drawn.text).toBe('');
    // Back on the panel, the canvas is measured and styled again.
    moves.next({ x: 101, y: 169 });
    expect(drawn.text).toBe('x 101 mm  y 169 mm');
    expect(drawn.contexts).toBe(2);
  });

  it('is hidden from assistive technology and holds no text of its own', async () => {
    fakeContext();
    const fixture = TestBed.createComponent(Host);
    await fixture.whenStable();
    const readout: HTMLElement = fixture.nativeElement.querySelector('bw-pointer-readout');
    expect(readout.getAttribute('aria-hidden')).toBe('true');
    expect(readout.textContent).toBe('');
    expect(readout.querySelector('canvas')).not.toBeNull();
  });
});
