import { Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import type { PaperName } from '../../../shared/export/paper';
import { VISIBLE_FACE_RULE } from '../../../shared/swap/visible-face';
import { Can } from '../auth/can';
import { ApiProblem, describeError } from '../core/api-problem';
import { ConfirmDialog } from '../ui/confirm-dialog';
import { retrofitUrl } from './swap-api';
import { SwapLegend } from './swap-legend';
import { SwapPanel } from './swap-panel';
import { SwapStore } from './swap-store';

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/**
 * The swap check of a job: a fitting it uses and a replacement of the same kind in, and out what that does
 * to each panel: the summary, a table and drawings per panel, the retrofit pack, and applying the swap.
 */
@Component({
  selector: 'bw-swap-check',
  imports: [Can, MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatIconModule, MatProgressBarModule, MatSelectModule, RouterLink, SwapLegend, SwapPanel],
  providers: [SwapStore],
  templateUrl: './swap-check.html',
  styleUrl: './swap-check.scss',
})
export class SwapCheck {
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  protected readonly store = inject(SwapStore);

  protected readonly visibleFaceRule = VISIBLE_FACE_RULE;
  protected readonly paper = signal<PaperName>('a4');
  protected readonly retrofitHref = computed(() => {
    const [from, to] = [this.store.from(), this.store.to()];
    return from && to ? retrofitUrl(this.store.jobId(), from, to, this.paper()) : undefined;
  });

  protected async applySwap(): Promise<void> {
    const report = this.store.report();
    if (!report) return;
    const s = report.summary;
    const back = report.panels.filter((p) => p.drilled && p.verdict !== 'fine').length;
    const confirmed = await ConfirmDialog.ask(this.dialog, {
      title: `Replace ${report.from.name}?`,
      message:
        `${plural(s.placements, 'placement')} on ${plural(s.panels, 'panel')} become ${report.to.name}. ` +
        `Drilled panels: ${s.fine} fine, ${s.toDrill} to drill, ${s.toRemake} to remake; ${s.notDrilled} not drilled yet get the new plan. ` +
        (back > 0 ? `${plural(back, 'drilled panel')} go${back === 1 ? 'es' : ''} back to planned, so the bench finds ${back === 1 ? 'it' : 'them'} again. ` : '') +
        'The swap is recorded in the activity log.',
      confirmLabel: 'Apply swap',
    });
    if (!confirmed) return;
    try {
      const applied = await this.store.apply();
      const backText = applied.backToPlanned.length > 0 ? `; ${plural(applied.backToPlanned.length, 'panel')} back to planned` : '';
      this.snackBar.open(`Swapped ${plural(applied.placements, 'placement')} on ${plural(applied.panels, 'panel')}${backText}.`, undefined, { duration: 6000 });
    } catch (error) {
      const again = error instanceof ApiProblem && error.status === 409;
      const ref = this.snackBar.open(describeError(error), again ? 'Check again' : 'Close');
      if (again) ref.onAction().subscribe(() => this.store.recheck());
    }
  }
}
