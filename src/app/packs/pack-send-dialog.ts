import { COMMA, ENTER, SEMICOLON } from '@angular/cdk/keycodes';
import { httpResource } from '@angular/common/http';
import { Component, computed, inject, signal } from '@angular/core';
import { MatAutocompleteModule } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatChipInputEvent, MatChipsModule } from '@angular/material/chips';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { mailRecipients, MAX_RECIPIENTS, PackSent, recipientAddress } from '../../../shared/api/pack-contract';
import { PaperName } from '../../../shared/export/paper';
import { ApiProblem, describeError } from '../core/api-problem';
import { mailRecipientsUrl, PackApi } from './pack-api';

export interface PackSendRequest {
  jobId: number;
  jobName: string;
  paper: PaperName;
}

const MAX_MESSAGE = 2000;

/** Sends a job's bench pack by mail to the shop's people or typed addresses, with a message. */
@Component({
  selector: 'bw-pack-send-dialog',
  imports: [
    MatAutocompleteModule,
    MatButtonModule,
    MatButtonToggleModule,
    MatChipsModule,
    MatDialogModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
  ],
  templateUrl: './pack-send-dialog.html',
  styleUrl: './pack-send-dialog.scss',
})
export class PackSendDialog {
  private readonly api = inject(PackApi);
  private readonly dialogRef = inject<MatDialogRef<PackSendDialog, PackSent>>(MatDialogRef);
  protected readonly request = inject<PackSendRequest>(MAT_DIALOG_DATA);
  private readonly people = httpResource(() => mailRecipientsUrl, { parse: (raw) => mailRecipients.parse(raw).people });

  protected readonly separators = [ENTER, COMMA, SEMICOLON];
  protected readonly maxMessage = MAX_MESSAGE;
  protected readonly recipients = signal<string[]>([]);
  protected readonly draft = signal('');
  protected readonly paper = signal<PaperName>(this.request.paper);
  protected readonly message = signal('');
  protected readonly sending = signal(false);
  protected readonly failure = signal<string | null>(null);
  /** Set once the user tries to send: problems show from then on, not while the first address is typed. */
  protected readonly tried = signal(false);
  private readonly serverProblem = signal<string | null>(null);

  protected readonly suggestions = computed(() => {
    const query = this.draft().trim().toLowerCase();
    const chosen = new Set(this.recipients());
    const people = this.people.hasValue() ? this.people.value() : [];
    return people.filter((p) => !chosen.has(p.email) && `${p.name} ${p.email}`.toLowerCase().includes(query));
  });
  protected readonly recipientProblem = computed(() => {
    const bad = this.recipients().filter((r) => !isAddress(r));
    if (bad.length > 0) return `${bad.map((b) => `“${b}”`).join(', ')} ${bad.length === 1 ? 'is not an e-mail address' : 'are not e-mail addresses'}.`;
    if (this.recipients().length > MAX_RECIPIENTS) return `Send to at most ${MAX_RECIPIENTS} addresses at once.`;
    if (this.tried() && this.recipients().length === 0) return 'Add at least one recipient.';
    return this.serverProblem();
  });

  protected isAddress = isAddress;

  /** Adds what was typed: one address, or several separated by commas, semicolons or spaces. */
  protected add(text: string): void {
    const typed = text.split(/[\s,;]+/).map((t) => t.trim().toLowerCase()).filter((t) => t !== '');
    if (typed.length > 0) this.recipients.update((list) => [...new Set([...list, ...typed])]);
    this.draft.set('');
    this.serverProblem.set(null);
  }

  protected addTyped(event: MatChipInputEvent): void {
    this.add(event.value);
    event.chipInput.clear();
  }

  protected remove(address: string): void {
    this.recipients.update((list) => list.filter((r) => r !== address));
    this.serverProblem.set(null);
  }

  async send(): Promise<void> {
    this.add(this.draft());
    this.tried.set(true);
    if (this.recipientProblem() !== null) return;
    this.sending.set(true);
    this.failure.set(null);
    try {
      const message = this.message().trim();
      const sent = await this.api.sendPack(this.request.jobId, { to: this.recipients(), paper: this.paper(), ...(message ? { message } : {}) });
      this.dialogRef.close(sent);
    } catch (error) {
      this.showFailure(error);
    } finally {
      this.sending.set(false);
    }
  }

  /** A refused address is named under the recipients (the API names it `to[1]`); anything else above the buttons. */
  private showFailure(error: unknown): void {
    const field = error instanceof ApiProblem ? Object.entries(error.fields).find(([path]) => path === 'to' || path.startsWith('to[')) : undefined;
    if (!field) return this.failure.set(describeError(error));
    const index = /^to\[(\d+)\]$/.exec(field[0])?.[1];
    const address = index === undefined ? undefined : this.recipients()[Number(index)];
    this.serverProblem.set(address ? `“${address}” ${field[1]}.` : `The recipients ${field[1]}.`);
  }
}

function isAddress(text: string): boolean {
  return recipientAddress.safeParse(text).success;
}
