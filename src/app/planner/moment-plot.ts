import { Component, computed, input } from '@angular/core';

const WIDTH = 320;
const HEIGHT = 170;
const LEFT = 44;
const BOTTOM = 28;

/** M(θ) of a flap about its hinge as a line, from closed (0°) to level (90°), with its largest value marked. */
@Component({
  selector: 'bw-moment-plot',
  template: `
    @let p = path();
    <svg [attr.viewBox]="'0 0 ' + width + ' ' + height" role="img" [attr.aria-label]="'Moment against opening angle, up to ' + p.max + ' N·m'">
      <line [attr.x1]="left" [attr.x2]="width - 8" [attr.y1]="height - bottom" [attr.y2]="height - bottom" class="axis" />
      <line [attr.x1]="left" [attr.x2]="left" y1="8" [attr.y2]="height - bottom" class="axis" />
      <polyline [attr.points]="p.points" class="curve" />
      <text [attr.x]="left - 6" y="16" text-anchor="end">{{ p.max }}</text>
      <text [attr.x]="left - 6" [attr.y]="height - bottom" text-anchor="end">0</text>
      <text [attr.x]="left" [attr.y]="height - 8">0°</text>
      <text [attr.x]="width - 8" [attr.y]="height - 8" text-anchor="end">90° (level)</text>
      <text [attr.x]="(left + width) / 2" [attr.y]="height - 8" text-anchor="middle">θ from closed</text>
      <text x="0" y="0" text-anchor="middle" transform="translate(12 75) rotate(-90)">M, N·m</text>
    </svg>
  `,
  styles: `
    svg { width: 100%; max-width: 420px; font: 11px Roboto, sans-serif; }
    .axis { stroke: var(--mat-sys-outline); }
    .curve { fill: none; stroke: var(--bw-bore-lift-mechanism); stroke-width: 2.5; }
    text { fill: var(--mat-sys-on-surface-variant); }
  `,
})
export class MomentPlot {
  readonly points = input.required<{ angle: number; moment: number }[]>();

  protected readonly width = WIDTH;
  protected readonly height = HEIGHT;
  protected readonly left = LEFT;
  protected readonly bottom = BOTTOM;

  protected readonly path = computed(() => {
    const pts = this.points();
    const max = Math.max(...pts.map((p) => p.moment), 1e-9);
    const x = (angle: number) => LEFT + ((WIDTH - 8 - LEFT) * angle) / 90;
    const y = (m: number) => HEIGHT - BOTTOM - ((HEIGHT - BOTTOM - 12) * m) / max;
    return { max: Math.round(max * 100) / 100, points: pts.map((p) => `${x(p.angle)},${y(p.moment)}`).join(' ') };
  });
}
