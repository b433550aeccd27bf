import { computed, DestroyRef, effect, inject, Injectable, linkedSignal, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { checkPanel, fixesFor, type Finding } from '../../../shared/checks';
import { findingKey, type Fix } from '../../../shared/checks/finding';
import { layoutPanel } from '../../../shared/layout/panel-layout';
import type { Face, JobDocument, Panel } from '../../../shared/model/job-document';
import { usualStep } from '../../../shared/units/step-choices';
import { addPlacement } from './document/commands/add-placement';
import { applyFindingFix } from './document/commands/apply-finding-fix';
import { deleteItems } from './document/commands/delete-items';
import { mirrorItems } from './document/commands/mirror-items';
import { moveItems } from './document/commands/move-items';
import { pasteItems, type Clipboard } from './document/commands/paste-items';
import { repeatAlongRow } from './document/commands/repeat-along-row';
import { rotateItems } from './document/commands/rotate-items';
import { setProperties, type PlacementChanges } from './document/commands/set-properties';
import * as history from './document/history';
import { isEmptySelection, NO_SELECTION, selectionOf, type Selection } from './document/selection';
import { cupXForBoringDistance, hingeCupX, syncBoringDistances } from './document/hinge-distance';
import { panelGrid, snapPlacement } from './document/snap-placement';
import { AuthStore } from '../auth/auth-store';
import { CatalogStore } from '../catalog/catalog-store';
import { EditorSource } from './editor-source';
import { LiveChecks } from './live-checks';

type Command<P> = (panel: Panel, params: P) => Panel;
export interface Point {
  x: number;
  y: number;
}

/** Live checks can be switched off with `?checks=off`, for the frame-time bench's baseline. */
function checksWanted(): boolean {
  return typeof location === 'undefined' || new URLSearchParams(location.search).get('checks') !== 'off';
}

/**
 * Whether two lists of findings say the same, so that a check giving what was already shown (most moves of
 * a drag, and every answer of the worker, a copy) repaints no ring and renders no list.
 */
function sameFindings(a: readonly Finding[], b: readonly Finding[]): boolean {
  return a.length === b.length && a.every((f, i) => f.severity === b[i].severity && f.message === b[i].message && f.advice === b[i].advice && findingKey(f) === findingKey(b[i]));
}

/**
 * While a drag lasts, the properties, the placements list and the findings list catch up with it at most
 * this often: the stage shows every move (with the plate's position and the finding rings), and text
 * redrawn on every snap cost the page more than the stage did.
 */
export const LISTS_FOLLOW_MS = 200;

/**
 * The panel being edited: its history of drilling (each edit a command, a drag one step), what is
 * selected, and what the shared layout and checks make of it on every change.
 */
@Injectable()
export class EditorStore {
  private readonly source = inject(EditorSource);
  private readonly auth = inject(AuthStore);
  private readonly live = inject(LiveChecks);
  /** The shop's catalog (built-in fittings and the shop's own); the built-in one until it has loaded. */
  readonly catalog = inject(CatalogStore).catalog;

  private readonly history = linkedSignal(() => {
    const panel = this.source.panel();
    return panel && history.startHistory(panel);
  });
  private readonly clipboard = signal<Clipboard | undefined>(undefined);

  /** Starts empty with every (re)loaded panel. */
  readonly selection = linkedSignal<Selection>(() => (this.source.record(), NO_SELECTION));
  readonly face = signal<Face>('A');
  /** Where fittings off the system rows land, in mm: the member's usual step (1 mm, 1/16"), again when the units change. */
  readonly step = linkedSignal(() => usualStep(this.auth.units()));
  readonly checksOn = signal(checksWanted());

  readonly panel = computed(() => this.history()?.present);
  /** Bench and viewer roles see the drilling but change nothing; nor does anyone on an archived job. */
  readonly editable = computed(() => this.auth.can('editJobs') && this.source.jobDetail()?.job.archived !== true);
  readonly canUndo = computed(() => (this.history()?.past.length ?? 0) > 0);
  readonly canRedo = computed(() => (this.history()?.future.length ?? 0) > 0);
  readonly dragging = computed(() => this.history()?.mark !== undefined);
  readonly hasSelection = computed(() => !isEmptySelection(this.selection()));
  readonly canPaste = computed(() => this.clipboard() !== undefined);

  /** The job with the edited panel in it, as the checks and the grid read it. */
  readonly job = computed((): JobDocument | undefined => {
    const job = this.source.job();
    const panel = this.panel();
    return job && panel && { ...job, panels: job.panels.map((p) => (p.id === panel.id ? panel : p)) };
  });
  readonly layout = computed(() => {
    const job = this.source.job();
    const panel = this.panel();
    return job && panel ? layoutPanel(panel, this.catalog(), job.system) : undefined;
  });
  /** Equal by value, so that an edit that leaves the board alone does not redraw the rows. */
  readonly grid = computed(
    () => {
      const job = this.job();
      const panel = this.panel();
      return job && panel ? panelGrid(job, panel) : undefined;
    },
    { equal: (a, b) => JSON.stringify(a) === JSON.stringify(b) },
  );
  /** The panel outside a drag; while one lasts, the panel as it was when the drag began. */
  private readonly restingPanel = computed(() => {
    const h = this.history();
    return h && (h.mark ?? h.present);
  });
  /** The full check of the resting panel, on the main thread: what every edit but a drag's moves shows. */
  private readonly restingFindings = computed(() => {
    const job = this.source.job();
    const panel = this.restingPanel();
    // Live checks only report; the fixes of a finding are tried when the user opens it (fixesFor).
    return job && panel && this.checksOn() ? checkPanel(job, panel, this.catalog(), { fixes: false, unit: this.auth.units() }) : [];
  });
  /** How far the drag under way last moved the selection from where it began. */
  private dragOffset: { dx: number; dy: number } | undefined;
  /** The number of the last request before the drag under way: answers up to it are of an earlier drag. */
  private dragAskedFrom = 0;
  /**
   * The findings of the worker's newest answer for the drag under way, once one has come. An answer that
   * says what is shown already sets nothing, so most answers of a drag make the page do no work at all.
   */
  private readonly dragFindings = signal<readonly Finding[] | undefined>(undefined, { equal: (a, b) => a === b || (!!a && !!b && sameFindings(a, b)) });
  /**
   * The full check's findings. During a drag the worker checks the moved panel once a frame and the newest
   * answer is shown (until the first comes, the findings the drag began with); on the drop, the panel is
   * checked here again, so what stays on screen is always the full check of the panel as it is.
   */
  readonly findings = computed(
    () => {
      if (!this.checksOn()) return [];
      return (this.dragging() && this.live.working() ? this.dragFindings() : undefined) ?? this.restingFindings();
    },
    { equal: sameFindings },
  );
  /** The findings shown are of an earlier position of the drag: the worker has been late with the latest. */
  readonly findingsPending = computed(() => this.checksOn() && this.dragging() && this.live.working() && this.live.behind());
  /** During a drag, the panel and its findings as the lists beside the stage last caught up with them (LISTS_FOLLOW_MS). */
  private readonly dragListed = signal<{ panel: Panel | undefined; findings: readonly Finding[] }>({ panel: undefined, findings: [] }, {
    equal: (a, b) => a.panel === b.panel && sameFindings(a.findings, b.findings),
  });
  private listsFollow: ReturnType<typeof setTimeout> | undefined;
  /**
   * The panel as the properties and the placements list show it: the panel, but during a drag as it was
   * at most LISTS_FOLLOW_MS ago.
   */
  readonly listedPanel = computed(() => (this.dragging() ? this.dragListed().panel : this.panel()));
  /** The findings as the findings list shows them: during a drag, as they were at most LISTS_FOLLOW_MS ago (the stage rings them at once). */
  readonly listedFindings = computed(() => (this.dragging() ? this.dragListed().findings : this.findings()), { equal: sameFindings });
  readonly errors = computed(() => this.findings().filter((f) => f.severity === 'error'));
  /** A boolean of its own, so that the page around the stage is not checked again each time the errors change. */
  readonly hasErrors = computed(() => this.errors().length > 0);
  /** The selected placements, as listed (listedPanel). */
  readonly selectedPlacements = computed(() => {
    const ids = this.selection().placements;
    return this.listedPanel()?.placements.filter((p) => ids.has(p.id)) ?? [];
  });

  constructor() {
    this.live.answers.pipe(takeUntilDestroyed()).subscribe((answer) => {
      if (!this.dragging() || answer.seq <= this.dragAskedFrom) return;
      this.dragFindings.set(answer.findings);
      this.followLists();
    });
    inject(DestroyRef).onDestroy(() => this.stopListsFollowing());
    // Effects run once a frame at most, so a burst of pointer moves asks the worker once, for where it ended.
    effect(() => {
      const job = this.source.job();
      const panel = this.panel();
      if (job && panel && this.checksOn() && this.dragging() && panel !== this.restingPanel() && this.live.working())
        this.live.ask(job, panel, this.catalog(), this.auth.units());
    });
  }

  select(selection: Selection): void {
    this.selection.set(selection);
  }

  selectAll(): void {
    const panel = this.panel();
    if (panel) this.select(selectionOf(panel.placements.map((p) => p.id), panel.bores.map((b) => b.id)));
  }

  undo(): void {
    this.history.update((h) => h && history.undo(h));
    this.keepSelectionOnPanel();
  }

  redo(): void {
    this.history.update((h) => h && history.redo(h));
    this.keepSelectionOnPanel();
  }

  /** What undo or redo took off the panel leaves the selection too. */
  private keepSelectionOnPanel(): void {
    const panel = this.panel();
    if (!panel) return;
    const { placements, bores } = this.selection();
    this.select(selectionOf(panel.placements.filter((p) => placements.has(p.id)).map((p) => p.id), panel.bores.filter((b) => bores.has(b.id)).map((b) => b.id)));
  }

  /** Puts a fitting where the pointer or the user says, snapped as the fitting wants; selects it. */
  placeFitting(fittingId: string, at: Point, free = false): void {
    const grid = this.grid();
    if (!grid) return;
    const fitting = this.catalog().get(fittingId);
    const snapped = snapPlacement(at, { rotation: 0, face: this.face() }, fitting, { grid, step: this.step(), free });
    const spot = free ? snapped : { ...snapped, x: hingeCupX(snapped.x, { rotation: 0 }, fitting).x };
    const before = new Set(this.panel()?.placements.map((p) => p.id));
    this.apply(addPlacement, { fitting: fittingId, x: spot.x, y: spot.y, face: this.face() });
    const added = this.panel()?.placements.find((p) => !before.has(p.id));
    if (added) this.select(selectionOf([added.id]));
  }

  nudge(dx: number, dy: number): void {
    if (this.hasSelection()) this.apply(moveItems, { selection: this.selection(), dx, dy });
  }

  rotateSelection(): void {
    this.apply(rotateItems, { selection: this.selection() });
  }

  mirrorSelection(): void {
    this.apply(mirrorItems, { selection: this.selection() });
  }

  deleteSelection(): void {
    this.apply(deleteItems, { selection: this.selection() });
    this.select(NO_SELECTION);
  }

  repeatSelection(count: number, step: number): void {
    this.apply(repeatAlongRow, { selection: this.selection(), count, step });
  }

  /** A finding of this panel with its fixes tried on a copy of the job; undefined once the panel no longer has it. */
  fixesFor(finding: Finding): Finding | undefined {
    const job = this.job();
    const panel = this.panel();
    return job && panel ? fixesFor(job, panel, this.catalog(), finding, { unit: this.auth.units() }) : undefined;
  }

  /** Applies a finding's fix as one undoable step and selects what it moved. */
  applyFix(fix: Fix): void {
    const job = this.job();
    if (!job) return;
    this.apply(applyFindingFix, { fix, job, catalog: this.catalog() });
    const moved = fix.edits.flatMap((e) => (e.kind === 'move-placement' || e.kind === 'set-fitting' ? [e.placement] : []));
    const bores = fix.edits.flatMap((e) => (e.kind === 'move-bore' ? [e.bore] : []));
    this.select(selectionOf(moved, bores));
  }

  /** A typed cup-boring distance moves its cup across the door: x and B are one number seen two ways. */
  setPlacement(id: string, changes: PlacementChanges): void {
    const placement = this.panel()?.placements.find((p) => p.id === id);
    const b = changes.params?.['boringDistance'];
    const x = placement && b !== undefined && b !== placement.params?.['boringDistance'] ? cupXForBoringDistance(b, placement, this.catalog().get(placement.fitting)) : undefined;
    this.apply(setProperties, { id, changes: x === undefined ? changes : { ...changes, x } });
  }

  copySelection(): void {
    const panel = this.panel();
    const { placements, bores } = this.selection();
    if (panel && this.hasSelection())
      this.clipboard.set({ placements: panel.placements.filter((p) => placements.has(p.id)), bores: panel.bores.filter((b) => bores.has(b.id)) });
  }

  /** Pastes one pitch above the originals, so the copy is seen and still on the rows; selects the copies. */
  paste(): void {
    const clipboard = this.clipboard();
    const panel = this.panel();
    if (!clipboard || !panel) return;
    const offset = { x: 0, y: this.source.job()?.system.pitch ?? 32 };
    if (!this.editable()) return;
    const next = pasteItems(panel, { clipboard, offset });
    this.history.update((h) => h && history.record(h, next));
    const placements = new Set(panel.placements.map((p) => p.id));
    const bores = new Set(panel.bores.map((b) => b.id));
    this.select(selectionOf(next.placements.filter((p) => !placements.has(p.id)).map((p) => p.id), next.bores.filter((b) => !bores.has(b.id)).map((b) => b.id)));
    this.clipboard.set({ placements: next.placements.filter((p) => !placements.has(p.id)), bores: next.bores.filter((b) => !bores.has(b.id)) });
  }

  /** A drag begins: the history remembers where. */
  startDrag(): void {
    if (!this.editable()) return;
    this.dragAskedFrom = this.live.lastAsked();
    this.dragFindings.set(undefined);
    this.dragOffset = undefined;
    this.history.update((h) => h && history.setMark(h));
    this.listNow();
  }

  /**
   * A drag moves on: the selection moves from where the drag began by the pointer's travel, the lead
   * item (the one grabbed) snapping and the others keeping their distance to it.
   */
  dragTo(leadId: string, travel: Point, free: boolean): void {
    const h = this.history();
    const grid = this.grid();
    if (!h?.mark || !grid) return;
    const lead = h.mark.placements.find((p) => p.id === leadId);
    const start = lead ?? { x: 0, y: 0, rotation: 0 as const, face: this.face() };
    const wanted = { x: start.x + travel.x, y: start.y + travel.y };
    const fitting = lead && this.catalog().get(lead.fitting);
    const snapped = snapPlacement(wanted, start, fitting, { grid, step: this.step(), free: free || !lead });
    const spot = free || !lead ? snapped : { ...snapped, x: hingeCupX(snapped.x, lead, fitting).x };
    const offset = { dx: spot.x - start.x, dy: spot.y - start.y };
    // Most moves of a pointer stay within one snap: the panel is then as it was, and nothing is laid out,
    // checked or drawn again.
    if (h.present !== h.mark && this.dragOffset?.dx === offset.dx && this.dragOffset.dy === offset.dy) return;
    this.dragOffset = offset;
    const next = moveItems(h.mark, { selection: this.selection(), ...offset });
    this.history.set(history.preview(h, syncBoringDistances(next, this.catalog())));
    this.followLists();
  }

  /** The lists beside the stage catch up with the drag within LISTS_FOLLOW_MS: a move or an answer of the checks. */
  private followLists(): void {
    this.listsFollow ??= setTimeout(() => {
      this.listsFollow = undefined;
      this.listNow();
    }, LISTS_FOLLOW_MS);
  }

  /** The lists beside the stage show the panel and its findings as they are now. */
  private listNow(): void {
    this.dragListed.set({ panel: this.panel(), findings: this.findings() });
  }

  endDrag(): void {
    this.history.update((h) => h && history.commitMark(h));
    this.stopListsFollowing();
  }

  /** Escape mid-drag: back to where it began. */
  cancelDrag(): void {
    this.history.update((h) => h && history.bailToMark(h));
    this.stopListsFollowing();
  }

  private stopListsFollowing(): void {
    clearTimeout(this.listsFollow);
    this.listsFollow = undefined;
  }

  /** Replaces the drilling from outside the commands (applying another panel's); one undoable step. */
  private apply<P>(command: Command<P>, params: P): void {
    if (!this.editable()) return;
    this.history.update((h) => h && history.record(h, syncBoringDistances(command(h.present, params), this.catalog())));
  }
}
