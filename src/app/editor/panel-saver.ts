import { computed, DestroyRef, inject, Injectable, linkedSignal, signal } from '@angular/core';
import { takeUntilDestroyed, toObservable } from '@angular/core/rxjs-interop';
import { MatDialog } from '@angular/material/dialog';
import { debounceTime, filter } from 'rxjs';
import type { PanelRecord } from '../../../shared/api/contract';
import { drillingForOppositeSide } from '../../../shared/layout/opposite-side';
import { describeError, isStaleVersion } from '../core/api-problem';
import { ConfirmDialog } from '../ui/confirm-dialog';
import { EditorApi } from './editor-api';
import { EditorSource, panelOf } from './editor-source';
import { EditorStore } from './editor-store';

export type SaveState = 'saved' | 'unsaved' | 'saving' | 'stale' | 'failed';

/** A pause this long after the last change saves it. */
export const AUTOSAVE_MS = 1500;

/**
 * Saving the edited panel: autosave after a pause (not while dragging, nor with an error finding, which
 * must be confirmed), with the version it was loaded at, so that someone else's save is never overwritten.
 */
@Injectable()
export class PanelSaver {
  private readonly api = inject(EditorApi);
  private readonly source = inject(EditorSource);
  private readonly store = inject(EditorStore);
  private readonly dialog = inject(MatDialog);

  /** The drilling as the server holds it, and the version it holds it at. */
  private readonly saved = linkedSignal(() => {
    const record = this.source.record();
    const panel = this.source.panel();
    return record && panel && { panel, version: record.version };
  });
  /** Versions of other panels this editor wrote to (applying to the opposite side). */
  private readonly otherVersions = signal(new Map<number, number>());
  private readonly busy = signal(false);
  private readonly problem = signal<{ stale: boolean; message: string; live?: true } | undefined>(undefined);

  readonly dirty = computed(() => this.store.panel() !== undefined && this.store.panel() !== this.saved()?.panel);
  readonly state = computed((): SaveState => {
    if (this.busy()) return 'saving';
    const problem = this.problem();
    if (problem) return problem.stale ? 'stale' : 'failed';
    return this.dirty() ? 'unsaved' : 'saved';
  });
  readonly failure = computed(() => this.problem()?.message);
  /** Who changed the panel, when the live stream told of it before any save was refused. */
  readonly changedElsewhereMessage = computed(() => (this.problem()?.live ? this.problem()?.message : undefined));

  /** The side panel across the carcass, where "apply to the opposite side" writes. */
  readonly opposite = computed(() => {
    const panel = this.store.panel();
    if (!panel || panel.role !== 'side' || panel.carcass === undefined) return undefined;
    return this.source.jobDetail()?.panels.find((p) => p.role === 'side' && p.carcass === panel.carcass && p.id !== panel.id);
  });

  constructor() {
    toObservable(this.store.panel)
      .pipe(
        debounceTime(AUTOSAVE_MS),
        filter(() => this.dirty() && !this.store.dragging() && this.store.errors().length === 0 && !this.problem()?.stale),
        takeUntilDestroyed(inject(DestroyRef)),
      )
      .subscribe(() => void this.save());
  }

  /** Saves now; with error findings it first asks, naming them. Resolves true once saved. */
  async saveNow(): Promise<boolean> {
    const errors = this.store.errors();
    if (errors.length > 0) {
      const confirmed = await ConfirmDialog.ask(this.dialog, {
        title: `Save with ${errors.length === 1 ? 'an error' : `${errors.length} errors`}?`,
        message: `${errors.map((f) => `${f.code}: ${f.message}`).join('\n')}\n\nA panel drilled like this may have to be remade.`,
        confirmLabel: 'Save anyway',
      });
      if (!confirmed) return false;
    }
    return this.save();
  }

  /**
   * The live stream says someone else changed the panel: saving stops (it would be refused), and the
   * editor says who, until it is reloaded.
   */
  changedElsewhere(message: string): void {
    this.problem.set({ stale: true, message, live: true });
  }

  /** Someone else saved: drop this editor's changes and load theirs. */
  reload(): void {
    this.problem.set(undefined);
    this.source.reload();
  }

  /** Gives the opposite side this panel's drilling (its own is replaced), after asking. */
  async applyToOpposite(): Promise<string | undefined> {
    const panel = this.store.panel();
    const target = this.opposite();
    if (!panel || !target) return undefined;
    const confirmed = await ConfirmDialog.ask(this.dialog, {
      title: `Apply to “${target.name}”?`,
      message: `The drilling of “${target.name}” is replaced by this panel's: ${panel.placements.length} placements and ${panel.bores.length} loose bores, at the same distances from its front edge and bottom.`,
      confirmLabel: 'Replace its drilling',
    });
    if (!confirmed) return undefined;
    const version = this.otherVersions().get(target.dbId) ?? target.version;
    try {
      const written = await this.api.saveDrilling(target.dbId, version, drillingForOppositeSide(panel, panelOf(target)));
      this.otherVersions.update((m) => new Map(m).set(target.dbId, written.version));
      return `Applied to “${target.name}”.`;
    } catch (error) {
      return isStaleVersion(error) ? `Someone else changed “${target.name}”. Reload the page and apply again.` : describeError(error);
    }
  }

  private async save(): Promise<boolean> {
    const record = this.source.record();
    const saved = this.saved();
    const panel = this.store.panel();
    if (!record || !saved || !panel || this.busy()) return false;
    this.busy.set(true);
    try {
      const written: PanelRecord = await this.api.saveDrilling(record.dbId, saved.version, panel);
      this.saved.set({ panel, version: written.version });
      this.problem.set(undefined);
      return true;
    } catch (error) {
      this.problem.set({ stale: isStaleVersion(error), message: describeError(error) });
      return false;
    } finally {
      this.busy.set(false);
    }
  }
}
