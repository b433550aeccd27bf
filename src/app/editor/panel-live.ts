import { computed, effect, inject, Injectable } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatSnackBar } from '@angular/material/snack-bar';
import type { LiveEvent } from '../../../shared/api/live-contract';
import { JobLive } from '../live/job-live';
import { EditorSource } from './editor-source';
import { PanelSaver } from './panel-saver';

/** What another member's change did to this panel, in words; undefined when it left it alone or is one this editor has already loaded. */
export function changeToPanel(event: LiveEvent, dbId: number, loadedVersion: number): string | undefined {
  switch (event.kind) {
    case 'panel-saved':
      return event.data.panelId === dbId && event.data.version > loadedVersion ? 'changed' : undefined;
    case 'panel-marked':
      return event.data.panelId === dbId && event.data.version > loadedVersion ? `marked ${event.data.status}` : undefined;
    case 'panel-deleted':
      return event.data.panelId === dbId ? 'deleted' : undefined;
    case 'job-planned':
      return event.data.panelIds.includes(dbId) ? 'planned again' : undefined;
    default:
      return undefined;
  }
}

/**
 * The editor's side of the job's live stream: who else has this panel open, and, the moment someone
 * else changes it, a stop to autosaving (the save would be refused) and an offer to reload theirs.
 */
@Injectable()
export class PanelLive {
  private readonly live = inject(JobLive);
  private readonly source = inject(EditorSource);
  private readonly saver = inject(PanelSaver);
  private readonly snackBar = inject(MatSnackBar);

  /** The other members with this panel open. */
  readonly here = computed(() => {
    const dbId = this.source.panelDbId();
    return this.live
      .others()
      .filter((o) => dbId !== undefined && o.panelIds.includes(dbId))
      .map((o) => ({ name: o.name }));
  });

  constructor() {
    effect(() => {
      const jobId = this.source.jobId();
      const panelId = this.source.panelDbId();
      if (jobId !== undefined && panelId !== undefined) this.live.follow(jobId, panelId);
    });
    this.live.othersChanges.pipe(takeUntilDestroyed()).subscribe((event) => {
      const record = this.source.record();
      if (event.kind === 'presence' || !record) return;
      const change = changeToPanel(event, record.dbId, record.version);
      if (!change) return;
      const message = `This panel was ${change} by ${event.data.by.name}.`;
      this.saver.changedElsewhere(message);
      this.snackBar
        .open(message, 'Reload')
        .onAction()
        .subscribe(() => this.saver.reload());
    });
  }
}
