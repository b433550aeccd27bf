import { DecimalPipe } from '@angular/common';
import { Component, computed, effect, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { firstValueFrom } from 'rxjs';
import { PackSent } from '../../../shared/api/pack-contract';
import { PaperName } from '../../../shared/export/paper';
import { Can } from '../auth/can';
import { JobFindingsStore } from '../jobs/job-findings-store';
import { ConfirmDialog } from '../ui/confirm-dialog';
import type { IconName } from '../ui/icon-name';
import { PackDownloadStore } from './pack-download-store';
import { PackSendDialog, PackSendRequest } from './pack-send-dialog';
import { saveBlob } from './save-blob';

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** The job page's bench pack: the checks' verdict, the paper, downloading the pack with its progress, sending it. */
@Component({
  selector: 'bw-bench-pack',
  imports: [Can, DecimalPipe, MatButtonModule, MatButtonToggleModule, MatIconModule, MatProgressBarModule],
  providers: [PackDownloadStore],
  templateUrl: './bench-pack.html',
  styleUrl: './bench-pack.scss',
})
export class BenchPack {
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  protected readonly download = inject(PackDownloadStore);

  readonly jobId = input.required<number>();
  readonly jobName = input.required<string>();

  protected readonly paper = signal<PaperName>('a4');
  protected readonly findings = inject(JobFindingsStore);
  protected readonly errors = computed(() => this.findings.value()?.errors ?? 0);
  protected readonly verdictIcon = computed((): IconName | null => {
    const findings = this.findings.value();
    if (!findings) return null;
    const { errors, warnings } = findings;
    return errors > 0 ? 'error' : warnings > 0 ? 'warning' : 'check_circle';
  });
  protected readonly verdict = computed(() => {
    const findings = this.findings.value();
    if (!findings) return null;
    const { errors, warnings } = findings;
    if (errors + warnings === 0) return 'The checks found no errors or warnings.';
    return `The checks found ${[errors > 0 && plural(errors, 'error'), warnings > 0 && plural(warnings, 'warning')].filter(Boolean).join(' and ')}.`;
  });

  constructor() {
    effect(() => {
      const state = this.download.state();
      if (state.step === 'done') saveBlob(state.blob, state.fileName);
    });
  }

  protected async downloadPack(): Promise<void> {
    if (await this.confirmErrors('Download anyway')) this.download.start(this.jobId(), this.paper());
  }

  protected async sendPack(): Promise<void> {
    if (!(await this.confirmErrors('Send anyway'))) return;
    const ref = this.dialog.open<PackSendDialog, PackSendRequest, PackSent>(PackSendDialog, {
      data: { jobId: this.jobId(), jobName: this.jobName(), paper: this.paper() },
      width: '560px',
      maxWidth: 'calc(100vw - 32px)',
    });
    const sent = await firstValueFrom(ref.afterClosed());
    if (sent) this.snackBar.open(sentMessage(sent), undefined, { duration: 6000 });
  }

  /**
   * A job with errors can still be packed (the bench may need it), but only after the user has agreed: the
   * cover sheet and manifest carry the findings and each panel they concern says "has errors".
   */
  private async confirmErrors(confirmLabel: string): Promise<boolean> {
    const errors = this.errors();
    if (errors === 0) return true;
    const panels = new Set((this.findings.value()?.findings ?? []).filter((f) => f.severity === 'error').map((f) => f.panel)).size;
    return ConfirmDialog.ask(this.dialog, {
      title: `This job has ${plural(errors, 'error')}`,
      message:
        `The checks found ${plural(errors, 'error')} on ${plural(panels, 'panel')} of “${this.jobName()}”. The pack is still made: its cover sheet and manifest list the findings, ` +
        `and the files of each panel concerned say “has errors” in the title block. Nobody should drill what they concern until they are put right.`,
      confirmLabel,
    });
  }
}

function sentMessage(sent: PackSent): string {
  const who = sent.to.length === 1 ? sent.to[0] : `${sent.to.length} recipients`;
  return sent.delivery === 'attached'
    ? `Sent to ${who}, with the pack attached.`
    : `Sent to ${who} as a download link that works until ${sent.expiresAt?.slice(0, 10)}.`;
}
