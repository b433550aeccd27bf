import { Component, input } from '@angular/core';
import { MatProgressBarModule } from '@angular/material/progress-bar';

/** A file on its way: the share sent so far, then, once it is all sent, what the server is doing with it. */
@Component({
  selector: 'bw-upload-status',
  imports: [MatProgressBarModule],
  host: { 'aria-live': 'polite' },
  template: `
    <span>
      @if (percent() === null) {
        {{ working() }} {{ fileName() }}…
      } @else {
        Uploading {{ fileName() }}: {{ percent() }} %
      }
    </span>
    <mat-progress-bar [mode]="percent() === null ? 'indeterminate' : 'determinate'" [value]="percent() ?? 0" [attr.aria-label]="label()" />
  `,
  styles: `
    :host {
      display: flex;
      flex-direction: column;
      gap: 8px;
      font-variant-numeric: tabular-nums;
    }
  `,
})
export class UploadStatus {
  readonly fileName = input.required<string>();
  /** Percent sent, or null once sent (or before the size is known). */
  readonly percent = input.required<number | null>();
  /** What the server does once the file is sent: "Checking", "Reading". */
  readonly working = input('Checking');
  /** The bar's name for screen readers. */
  readonly label = input.required<string>();
}
