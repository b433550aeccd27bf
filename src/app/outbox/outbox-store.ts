import { httpResource } from '@angular/common/http';
import { computed, Injectable } from '@angular/core';
import { outboxList } from '../../../shared/api/pack-contract';
import { describeError } from '../core/api-problem';

export const outboxUrl = '/api/outbox';
export const outboxAttachmentUrl = (messageId: number, index: number) => `${outboxUrl}/${messageId}/attachments/${index}`;

/** The messages the local mail catcher received, newest first. */
@Injectable()
export class OutboxStore {
  private readonly list = httpResource(() => outboxUrl, { parse: (raw) => outboxList.parse(raw).messages });

  readonly messages = computed(() => (this.list.hasValue() ? this.list.value() : []));
  readonly loading = this.list.isLoading;
  readonly loadError = computed(() => {
    const error = this.list.error();
    return error === undefined ? null : describeError(error);
  });

  reload(): void {
    this.list.reload();
  }
}
