import { DatePipe, DecimalPipe } from '@angular/common';
import { Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { outboxAttachmentUrl, OutboxStore } from './outbox-store';
import { textParts } from './text-links';

/** What the local mail catcher received (design.md §5): for admins, to see what left and to fetch attachments. */
@Component({
  selector: 'bw-outbox-page',
  imports: [DatePipe, DecimalPipe, MatButtonModule, MatExpansionModule, MatIconModule, MatProgressBarModule],
  providers: [OutboxStore],
  templateUrl: './outbox-page.html',
  styleUrl: './outbox-page.scss',
})
export class OutboxPage {
  protected readonly store = inject(OutboxStore);
  protected readonly attachmentUrl = outboxAttachmentUrl;
  protected readonly parts = textParts;
}
