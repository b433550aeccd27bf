import { Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule } from '@angular/material/dialog';
import { firstValueFrom } from 'rxjs';
import type { ChangedPanelChoice } from '../../../shared/planner/replan';
import type { ApiProblem } from '../core/api-problem';

/**
 * Planning a carcass again would write over panels someone changed by hand: the server names them,
 * and this asks whether to keep them as they are or replace them with the new plan.
 */
@Component({
  selector: 'bw-replan-dialog',
  imports: [MatButtonModule, MatDialogModule],
  template: `
    <h2 mat-dialog-title>Panels changed since planned</h2>
    <mat-dialog-content>
      <p>{{ problem.message }}</p>
      <ul>
        @for (line of problem.details; track $index) {
          <li>{{ line }}</li>
        }
      </ul>
      <p class="hint">Kept panels stay exactly as they are; the findings then show whether they still meet the new plan (for example a door whose cups no longer meet its plates).</p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button [mat-dialog-close]="undefined" cdkFocusInitial>Cancel</button>
      <button mat-stroked-button [mat-dialog-close]="'replace'">Replace with the new plan</button>
      <button mat-flat-button [mat-dialog-close]="'keep'">Keep as changed</button>
    </mat-dialog-actions>
  `,
  styles: `
    .hint {
      color: var(--mat-sys-on-surface-variant);
      font: var(--mat-sys-body-small);
    }
  `,
})
export class ReplanDialog {
  protected readonly problem = inject<ApiProblem>(MAT_DIALOG_DATA);

  /** The designer's choice, or undefined when they cancel. */
  static async ask(dialog: MatDialog, problem: ApiProblem): Promise<ChangedPanelChoice | undefined> {
    const ref = dialog.open<ReplanDialog, ApiProblem, ChangedPanelChoice | undefined>(ReplanDialog, {
      data: problem,
      width: '520px',
      maxWidth: 'calc(100vw - 32px)',
      role: 'alertdialog',
    });
    return firstValueFrom(ref.afterClosed());
  }
}
