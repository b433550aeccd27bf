import { Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

/** Why an upload or import was refused: one sentence, then every problem the server found, led by its place in the file. */
@Component({
  selector: 'bw-upload-problem',
  imports: [MatIconModule],
  template: `
    <div class="bw-alert" role="alert">
      <mat-icon aria-hidden="true">error</mat-icon>
      <span class="bw-alert-text">{{ fileName() ? fileName() + ': ' : '' }}{{ message() }}</span>
    </div>
    @if (details().length > 0) {
      <ol class="details" [attr.aria-label]="listLabel()">
        @for (line of details(); track $index) {
          <li>{{ line }}</li>
        }
      </ol>
    }
  `,
  styles: `
    :host {
      display: block;
      align-self: stretch;
    }
    .details {
      max-height: 240px;
      overflow: auto;
      margin: 0 0 12px;
      padding: 8px 8px 8px 36px;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 8px;
      font: 13px / 20px ui-monospace, 'SFMono-Regular', Menlo, Consolas, monospace;
      color: var(--mat-sys-on-surface);
      background: var(--mat-sys-surface-container-low);
    }
  `,
})
export class UploadProblem {
  /** The file's name, when a file was sent. */
  readonly fileName = input<string>();
  readonly message = input.required<string>();
  readonly details = input<readonly string[]>([]);
  /** What the list is called for screen readers: "Problems in the cut list". */
  readonly listLabel = input.required<string>();
}
