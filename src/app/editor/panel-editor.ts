import { ChangeDetectionStrategy, Component, computed, effect, inject, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatDialog } from '@angular/material/dialog';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTooltipModule } from '@angular/material/tooltip';
import { Title } from '@angular/platform-browser';
import { RouterLink } from '@angular/router';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { filter, fromEvent } from 'rxjs';
import { PURPOSE_ORDER, PURPOSE_STYLES } from '../../../shared/export/palette';
import { CatalogStore } from '../catalog/catalog-store';
import { CautionList } from '../ui/caution-list';
import { stepChoices } from '../../../shared/units/step-choices';
import { Lengths } from '../ui/lengths';
import { cautionsOfUnits } from '../ui/job-cautions';
import { panelFrame } from './panel-frame';
import { ConfirmDialog } from '../ui/confirm-dialog';
import { itemsArea } from './document/items-area';
import { NO_SELECTION, selectionOf } from './document/selection';
import { editorAction, type EditorAction } from './editor-keys';
import { EditorSource } from './editor-source';
import { EditorStore } from './editor-store';
import { JobLive } from '../live/job-live';
import { PresentMembers } from '../live/present-members';
import { PanelLive } from './panel-live';
import { PanelSaver } from './panel-saver';
import { RepeatDialog } from './repeat-dialog';
import { PanelDownloads } from '../packs/panel-downloads';
import { CatalogList } from './side/catalog-list';
import { LiveChecks } from './live-checks';
import { FindingsList } from './side/findings-list';
import { PlacementList } from './side/placement-list';
import { PropertiesForm } from './side/properties-form';
import { ShortcutList } from './side/shortcut-list';
import { PanelStage } from './stage/panel-stage';
import { PointerReadout } from './stage/pointer-readout';
import type { LeavesSafely } from './unsaved-changes-guard';

const SAVE_WORDS = { saved: 'All changes saved', unsaved: 'Unsaved changes', saving: 'Saving…', stale: 'Changed elsewhere', failed: 'Not saved' } as const;

/** The panel editor: the catalog, the stage and what is selected, found and placed, with saving. */
@Component({
  // A drag changes the panel on every pointer move: only the views whose signals changed are checked again.
  changeDetection: ChangeDetectionStrategy.OnPush,
  selector: 'bw-panel-editor',
  imports: [
    CatalogList,
    CautionList,
    FindingsList,
    MatButtonModule,
    MatButtonToggleModule,
    MatExpansionModule,
    MatIconModule,
    MatProgressBarModule,
    MatTooltipModule,
    PanelDownloads,
    PanelStage,
    PlacementList,
    PointerReadout,
    PresentMembers,
    PropertiesForm,
    RouterLink,
    ShortcutList,
  ],
  providers: [EditorSource, EditorStore, LiveChecks, PanelSaver, JobLive, PanelLive],
  templateUrl: './panel-editor.html',
  styleUrl: './panel-editor.scss',
  host: { '(keydown)': 'handleKey($event)', '(window:beforeunload)': 'warnBeforeUnload($event)' },
})
export class PanelEditor implements LeavesSafely {
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  protected readonly source = inject(EditorSource);
  protected readonly store = inject(EditorStore);
  protected readonly saver = inject(PanelSaver);
  protected readonly live = inject(PanelLive);
  protected readonly stage = viewChild(PanelStage);
  protected readonly lengths = inject(Lengths);

  protected readonly legend = PURPOSE_ORDER.map((purpose) => ({ purpose, ...PURPOSE_STYLES[purpose] }));
  protected readonly saveWords = SAVE_WORDS;
  /** The Step menu in the member's units: round mm, or the marks of an inch rule (the system rows stay metric). */
  protected readonly steps = computed(() => stepChoices(this.lengths.unit()).map((mm) => ({ mm, label: this.lengths.text(mm) })));
  /** The job's pitch, the system's own figure: `, 32 mm (1 17/64")` for an inch user. */
  protected readonly pitchText = computed(() => {
    const pitch = this.store.job()?.system?.pitch;
    return pitch === undefined ? '' : `, ${this.lengths.system(pitch)}`;
  });
  /**
   * What the page around the stage shows of the panel. A drag changes the panel on every snap but none of
   * this, so the page's own template is not checked again for it (only the stage, the properties and the
   * placements are).
   */
  protected readonly shown = computed(
    () => {
      const panel = this.store.panel();
      return panel && { name: panel.name, width: panel.width, height: panel.height, thickness: panel.thickness, placements: panel.placements.length };
    },
    { equal: (a, b) => a === b || (!!a && !!b && a.name === b.name && a.width === b.width && a.height === b.height && a.thickness === b.thickness && a.placements === b.placements) },
  );
  protected readonly frame = computed(() => panelFrame(this.store.panel()?.role ?? 'loose'), { equal: (a, b) => a.words === b.words });
  protected readonly canRepeat = computed(() => this.store.selectedPlacements().length > 0);
  /** The cautions of this panel's unit (a flap's, its sides'), for every role. */
  protected readonly cautions = computed(
    () => {
      const job = this.store.job();
      const panel = this.store.panel();
      return job && panel ? cautionsOfUnits(job, this.store.catalog(), panel) : [];
    },
    // The same list on every move of a drag: the list beside the stage is not drawn again for it.
    { equal: (a, b) => a.length === b.length && a.every((id, i) => id === b[i]) },
  );
  protected readonly zoomPercent = computed(() => {
    const view = this.stage()?.view();
    return view ? `${Math.round(view.scale * 100)} %` : '';
  });

  constructor() {
    // The shop's own fittings as they are now, so that a panel placing one draws and checks as its pack
    // will; read again whenever the tab comes back into view, as a fitting may have been imported meanwhile.
    const catalog = inject(CatalogStore);
    catalog.reload();
    fromEvent(document, 'visibilitychange')
      .pipe(
        filter(() => document.visibilityState === 'visible'),
        takeUntilDestroyed(),
      )
      .subscribe(() => catalog.reload());
    const title = inject(Title);
    // From a computed text, so that the title is written when it changes, not on every move of a drag.
    const pageTitle = computed(() => {
      const name = this.store.panel()?.name;
      return name === undefined ? undefined : `${name} · ${this.store.editable() ? 'Panel editor' : 'Panel'} · Borewright`;
    });
    effect(() => {
      const text = pageTitle();
      if (text !== undefined) title.setTitle(text);
    });
    this.showFocusOnOpen();
  }

  /** Opened from a finding on the job page: select what it concerns and show it, once the panel is drawn. */
  private showFocusOnOpen(): void {
    let shown = false;
    effect(() => {
      // Once shown, this reads no signal and so never runs again (not on every move of a drag).
      if (shown) return;
      const { bores, placements } = this.source.focus();
      const panel = this.store.panel();
      const layout = this.store.layout();
      const stage = this.stage();
      if (!panel || !layout || !stage || bores.length + placements.length === 0) return;
      shown = true;
      const loose = new Set(panel.bores.map((b) => b.id));
      this.store.select(selectionOf(placements.filter((id) => panel.placements.some((p) => p.id === id)), bores.filter((id) => loose.has(id))));
      const area = itemsArea(panel, layout, bores, placements);
      if (area) stage.zoomTo(area);
    });
  }

  async confirmLeave(): Promise<boolean> {
    if (!this.saver.dirty()) return true;
    return ConfirmDialog.ask(this.dialog, {
      title: 'Leave without saving?',
      message: 'This panel has changes that are not saved yet. Leaving now loses them.',
      confirmLabel: 'Leave',
    });
  }

  protected warnBeforeUnload(e: BeforeUnloadEvent): void {
    if (this.saver.dirty()) e.preventDefault();
  }

  protected handleKey(e: KeyboardEvent): void {
    const target = e.target as HTMLElement;
    if (target.closest('input, textarea, select, mat-select, [contenteditable]')) return;
    const action = editorAction(e);
    if (!action) return;
    e.preventDefault();
    this.run(action);
  }

  protected run(action: EditorAction): void {
    const { store } = this;
    const pitch = this.source.job()?.system.pitch ?? 32;
    switch (action.kind) {
      case 'nudge': {
        const step = action.pitches ? pitch : 1;
        return store.nudge(action.dx * step, action.dy * step);
      }
      case 'rotate':
        return store.rotateSelection();
      case 'mirror':
        return store.mirrorSelection();
      case 'delete':
        return store.deleteSelection();
      case 'select-all':
        return store.selectAll();
      case 'copy':
        return store.copySelection();
      case 'paste':
        return store.paste();
      case 'undo':
        return store.undo();
      case 'redo':
        return store.redo();
      case 'escape':
        return store.dragging() ? store.cancelDrag() : store.select(NO_SELECTION);
      case 'save':
        return void this.saver.saveNow();
      case 'fit':
        return this.stage()?.fitToPanel();
      case 'zoom-in':
        return this.stage()?.zoomBy(1.25);
      case 'zoom-out':
        return this.stage()?.zoomBy(0.8);
    }
  }

  protected async repeatAlongTheRow(): Promise<void> {
    const panel = this.store.panel();
    const ys = this.store.selectedPlacements().map((p) => p.y);
    if (!panel || ys.length === 0) return;
    const pitch = this.source.job()?.system.pitch ?? 32;
    const choice = await RepeatDialog.ask(this.dialog, { pitch, lowest: Math.min(...ys), highest: Math.max(...ys), panelHeight: panel.height });
    if (choice) this.store.repeatSelection(choice.count, choice.step);
  }

  protected async applyToOpposite(): Promise<void> {
    const message = await this.saver.applyToOpposite();
    if (message) this.snackBar.open(message, undefined, { duration: 5000 });
  }
}
