import { afterNextRender, ChangeDetectionStrategy, Component, computed, DestroyRef, effect, ElementRef, inject, linkedSignal, signal, untracked, viewChild } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import Konva from 'konva';
import { fromEvent, map, type Observable } from 'rxjs';
import type { Box } from '../../../../shared/layout/bore';
import { Lengths } from '../../ui/lengths';
import { EditorStore } from '../editor-store';
import { panelFrame } from '../panel-frame';
import { HitIndex, hitItems } from './hit-index';
import { BorePainter } from './paint-bores';
import { paintGrid } from './paint-grid';
import { OverlayPainter } from './paint-overlay';
import { localPoint, pointerTool } from './pointer-tool';
import { fitView, toPanel, viewOfBox, zoomAt, type Point, type View } from './view';

/** What the grid is drawn from: it is redrawn when these change, not on every edit. */
interface Board {
  id: string;
  width: number;
  height: number;
  thickness: number;
  /** The name of the edge at x = 0. */
  reference: string;
}

/** The MIME type a catalog entry carries when dragged onto the stage. */
export const FITTING_DRAG_TYPE = 'application/x-borewright-fitting';

/**
 * The panel at scale on a Konva stage. The document lives in the store; this draws it (the grid and the
 * bores on one layer, and on one above them what a drag moves with the overlay: two canvases, none
 * listening, as picking goes through a spatial index) and turns pointer gestures into the store's commands.
 */
@Component({
  changeDetection: ChangeDetectionStrategy.OnPush,
  selector: 'bw-panel-stage',
  templateUrl: './panel-stage.html',
  styleUrl: './panel-stage.scss',
  host: {
    tabindex: '0',
    role: 'application',
    'aria-label': 'Panel drawing. Arrow keys move the selection; the placements list beside it names every placement.',
    '[class.panning]': 'spaceHeld()',
    '(wheel)': 'zoomWithWheel($event)',
    '(dragover)': 'allowDrop($event)',
    '(drop)': 'dropFitting($event)',
    '(keydown.space)': 'holdSpace($event)',
    '(keyup.space)': 'spaceHeld.set(false)',
    '(blur)': 'spaceHeld.set(false)',
  },
})
export class PanelStage {
  private readonly store = inject(EditorStore);
  private readonly unit = inject(Lengths).unit;
  private readonly host: HTMLElement = inject(ElementRef).nativeElement;
  private readonly canvasHost = viewChild.required<ElementRef<HTMLDivElement>>('canvas');

  private readonly size = signal({ width: 0, height: 0 });
  /** Fitted whenever the stage's size, the board or the face shown changes; panned and zoomed in between. */
  private readonly viewState = linkedSignal<{ size: { width: number; height: number }; board: Board | undefined; back: boolean }, View | undefined>({
    source: () => ({ size: this.size(), board: this.board(), back: this.store.face() === 'B' }),
    computation: ({ size, board, back }, previous) => {
      // Never under a dragging pointer: the view it started with holds until the drag ends.
      if (previous?.value && untracked(() => this.store.dragging())) return previous.value;
      return board && size.width > 0 ? fitView(board, size, back) : undefined;
    },
  });
  private readonly band = signal<{ a: Point; b: Point } | undefined>(undefined);
  protected readonly spaceHeld = signal(false);
  private readonly konva = signal<{ board: Konva.Layer; grid: Konva.Group; live: Konva.Layer; painter: BorePainter; overlayPainter: OverlayPainter } | undefined>(undefined);
  private readonly items = computed(() => {
    const panel = this.store.panel();
    const layout = this.store.layout();
    return panel && layout ? hitItems(panel, layout) : [];
  });
  private readonly index = computed(() => new HitIndex(this.items()));
  private readonly selected = computed(() => {
    const panel = this.store.panel();
    const layout = this.store.layout();
    return panel && layout ? hitItems(panel, layout, this.store.selection()) : [];
  });
  /** The first selected item's anchor, dimensioned from the reference and lower edges. */
  private readonly anchor = computed((): Point | undefined => {
    const placement = this.store.selectedPlacements()[0];
    if (placement) return placement;
    const ids = this.store.selection().bores;
    const bore = this.store.panel()?.bores.find((b) => ids.has(b.id) && !('edge' in b));
    return bore && !('edge' in bore) ? bore : undefined;
  });
  /** The board's size and thickness alone: the grid is redrawn when these change, not on every edit. */
  private readonly board = computed(
    (): Board | undefined => {
      const panel = this.store.panel();
      return panel && { id: panel.id, width: panel.width, height: panel.height, thickness: panel.thickness, reference: panelFrame(panel.role).reference };
    },
    { equal: (a, b) => a?.id === b?.id && a?.width === b?.width && a?.height === b?.height && a?.thickness === b?.thickness && a?.reference === b?.reference },
  );

  /** The pointer's position on the panel in mm, for the readout: a stream, not a signal, so that a move schedules no change detection. */
  readonly pointerAt: Observable<Point | undefined> = fromEvent<PointerEvent>(this.host, 'pointermove').pipe(
    map((e) => {
      const view = this.viewState();
      return view && toPanel(view, localPoint(this.host, e));
    }),
  );
  readonly view = this.viewState.asReadonly();

  constructor() {
    const destroyRef = inject(DestroyRef);
    afterNextRender(() => {
      const container = this.canvasHost().nativeElement;
      const stage = new Konva.Stage({ container, width: container.clientWidth, height: container.clientHeight });
      const quiet = () => new Konva.Layer({ listening: false });
      // Every canvas costs the browser each frame, drawn or not: what rarely changes (the grid, the bores
      // at rest) shares one, and what a drag changes (the lifted selection, the rings, the dimensions)
      // the other, so that a move clears and draws one canvas.
      const board = quiet();
      const live = quiet();
      const grid = new Konva.Group();
      board.add(grid);
      stage.add(board, live);
      const resize = new ResizeObserver(() => {
        stage.size({ width: container.clientWidth, height: container.clientHeight });
        this.size.set({ width: container.clientWidth, height: container.clientHeight });
      });
      resize.observe(container);
      destroyRef.onDestroy(() => {
        resize.disconnect();
        stage.destroy();
      });
      // The lifted selection first, so that the overlay's rings and dimensions lie above it.
      this.konva.set({ board, grid, live, painter: new BorePainter(board, live), overlayPainter: new OverlayPainter(live) });
    });
    pointerTool(this.host, {
      store: this.store,
      view: () => this.viewState(),
      setView: (view) => this.viewState.set(view),
      pick: (at) => this.pick(at),
      inside: (a, b) => this.inside(a, b),
      setBand: (band) => this.band.set(band),
      spaceHeld: () => this.spaceHeld(),
    })
      .pipe(takeUntilDestroyed())
      .subscribe();
    this.paintLayers();
  }

  fitToPanel(): void {
    const panel = this.store.panel();
    if (panel) this.viewState.set(fitView(panel, this.size(), this.store.face() === 'B'));
  }

  zoomBy(factor: number): void {
    const view = this.viewState();
    const { width, height } = this.size();
    if (view) this.viewState.set(zoomAt(view, { x: width / 2, y: height / 2 }, factor));
  }

  /** Shows a box of the panel (mm) large in the middle: a finding's bores. */
  zoomTo(box: Box): void {
    this.viewState.set(viewOfBox(box, this.size(), this.store.face() === 'B'));
  }

  protected zoomWithWheel(e: WheelEvent): void {
    const view = this.viewState();
    if (!view) return;
    e.preventDefault();
    this.viewState.set(zoomAt(view, localPoint(this.host, e), Math.exp(-e.deltaY * 0.0015)));
  }

  /** Space held: the next press pans. */
  protected holdSpace(e: Event): void {
    e.preventDefault();
    this.spaceHeld.set(true);
  }

  protected allowDrop(e: DragEvent): void {
    if (e.dataTransfer?.types.includes(FITTING_DRAG_TYPE)) e.preventDefault();
  }

  protected dropFitting(e: DragEvent): void {
    const fitting = e.dataTransfer?.getData(FITTING_DRAG_TYPE);
    const view = this.viewState();
    if (!fitting || !view) return;
    e.preventDefault();
    this.store.placeFitting(fitting, toPanel(view, localPoint(this.host, e)), e.altKey);
  }

  private pick(at: Point) {
    const view = this.viewState();
    if (!view) return undefined;
    const p = toPanel(view, at);
    // A few pixels of reach, so that a 5 mm hole is easy to take at any zoom.
    return this.index().pick(p.x, p.y, 4 / view.scale, this.store.face());
  }

  private inside(a: Point, b: Point) {
    const view = this.viewState();
    if (!view) return [];
    const p = toPanel(view, a);
    const q = toPanel(view, b);
    return this.index().inside(Math.min(p.x, q.x), Math.min(p.y, q.y), Math.max(p.x, q.x), Math.max(p.y, q.y));
  }

  /** One effect per painter, so that a drag redraws neither grid nor resting bores. */
  private paintLayers(): void {
    effect(() => {
      const konva = this.konva();
      const board = this.board();
      const view = this.viewState();
      if (!konva || !board || !view) return;
      paintGrid(konva.grid, board, this.store.grid(), view);
      konva.board.batchDraw();
    });
    let paintedView: View | undefined;
    effect(() => {
      const konva = this.konva();
      const panel = this.store.panel();
      const layout = this.store.layout();
      const view = this.viewState();
      if (!konva || !panel || !layout || !view) return;
      konva.painter.setView(view);
      const changed = konva.painter.paint(panel, layout, this.store.face(), this.store.selection());
      const moved = view !== paintedView;
      paintedView = view;
      if (changed.bores || moved) konva.board.batchDraw();
      if (changed.drag || moved) konva.live.batchDraw();
    });
    effect(() => {
      const konva = this.konva();
      const layout = this.store.layout();
      const loose = this.store.panel()?.bores;
      const view = this.viewState();
      if (!konva || !layout || !loose || !view) return;
      konva.overlayPainter.paint({ view, layout, loose, findings: this.store.findings(), selected: this.selected(), anchor: this.anchor(), band: this.band(), unit: this.unit() });
      konva.live.batchDraw();
    });
  }
}
