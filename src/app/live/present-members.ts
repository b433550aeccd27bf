import { Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

/** One other member on the job, and where (a panel's name) when they have a panel open. */
export interface PresentOther {
  name: string;
  where?: string;
}

/** "Also here: …": the other members the live stream says have this job or panel open; inline, so it can sit in a title's line. */
@Component({
  selector: 'bw-present-members',
  imports: [MatIconModule],
  template: `
    @if (others().length > 0) {
      <span class="present" role="status">
        <mat-icon aria-hidden="true">group</mat-icon>
        <span class="label">{{ label() }}</span>
        @for (other of others(); track other.name) {
          <span class="who">{{ other.name }}@if (other.where) {<span class="where"> · {{ other.where }}</span>}</span>
        }
      </span>
    }
  `,
  styles: `
    :host { margin-left: 8px; }
    .present { display: inline-flex; flex-wrap: wrap; align-items: center; gap: 6px 8px; vertical-align: middle; font: var(--mat-sys-body-medium); }
    .present mat-icon { color: var(--mat-sys-primary); }
    .label { color: var(--mat-sys-on-surface-variant); }
    .who { padding: 2px 10px; border-radius: 12px; background: var(--mat-sys-secondary-container); color: var(--mat-sys-on-secondary-container); }
    .where { color: var(--mat-sys-on-surface-variant); }
  `,
})
export class PresentMembers {
  readonly others = input.required<PresentOther[]>();
  readonly label = input('Also here:');
}
