import { computed, DestroyRef, inject, Injectable, signal } from '@angular/core';
import { Subject } from 'rxjs';
import { LIVE_EVENT_KINDS, type LiveEvent, type PresentMember } from '../../../shared/api/live-contract';
import { AuthStore } from '../auth/auth-store';

/** After the server refused or lost the stream for good (signed out, a restart), try again this much later. */
const RETRY_MS = 5000;

/**
 * The live stream of one job (GET /api/jobs/:jobId/events): who else has it open, and what others
 * change in it. The browser's EventSource reconnects by itself, sending the last event id so nothing
 * is lost; when the server closed it for good, it is opened again after a pause from that id.
 * One per page (provided by the page's component), closed with it.
 */
@Injectable()
export class JobLive {
  private readonly auth = inject(AuthStore);
  private readonly changes = new Subject<LiveEvent>();
  private source?: EventSource;
  private retry?: ReturnType<typeof setTimeout>;
  private target?: { jobId: number; panelId?: number };
  private lastId?: string;

  /** Everyone with the job open, as the last presence event named them. */
  readonly members = signal<PresentMember[]>([]);
  /** The others (not this member, in any of their tabs), one entry each, with the panels they have open. */
  readonly others = computed(() => {
    const me = this.auth.user()?.id;
    const byMember = new Map<number, { name: string; panelIds: number[] }>();
    for (const m of this.members()) {
      if (m.id === me) continue;
      const entry = byMember.get(m.id) ?? { name: m.name, panelIds: [] };
      if (m.panelId !== null) entry.panelIds.push(m.panelId);
      byMember.set(m.id, entry);
    }
    return [...byMember.values()];
  });
  /** Changes made by other members (never presence, never this member's own). */
  readonly othersChanges = this.changes.asObservable();

  constructor() {
    inject(DestroyRef).onDestroy(() => this.close());
  }

  /** Follows the job (and the panel open in the editor); following another, or none, closes the last. */
  follow(jobId: number | undefined, panelId?: number): void {
    if (this.target?.jobId === jobId && this.target?.panelId === panelId) return;
    this.close();
    if (jobId === undefined) return;
    this.target = { jobId, panelId };
    this.open();
  }

  private open(): void {
    const target = this.target;
    if (!target || typeof EventSource === 'undefined') return;
    const params = new URLSearchParams();
    if (target.panelId !== undefined) params.set('panel', String(target.panelId));
    if (this.lastId !== undefined) params.set('lastEventId', this.lastId);
    // The service worker leaves the stream alone: it could only hold it up.
    params.set('ngsw-bypass', 'true');
    const source = new EventSource(`/api/jobs/${target.jobId}/events?${params}`);
    this.source = source;
    for (const kind of LIVE_EVENT_KINDS) source.addEventListener(kind, (message) => this.take(kind, message as MessageEvent<string>));
    source.onerror = () => {
      if (source.readyState !== EventSource.CLOSED || this.source !== source) return;
      this.source = undefined;
      this.retry = setTimeout(() => this.open(), RETRY_MS);
    };
  }

  private take(kind: LiveEvent['kind'], message: MessageEvent<string>): void {
    this.lastId = message.lastEventId || this.lastId;
    const event = { id: Number(message.lastEventId), kind, data: JSON.parse(message.data) } as LiveEvent;
    if (event.kind === 'presence') this.members.set(event.data.members);
    else if (event.data.by.id !== this.auth.user()?.id) this.changes.next(event);
  }

  private close(): void {
    clearTimeout(this.retry);
    this.source?.close();
    this.source = undefined;
    this.target = undefined;
    this.lastId = undefined;
    this.members.set([]);
  }
}
