import { filter, finalize, fromEvent, ignoreElements, map, merge, Observable, switchMap, takeUntil, tap } from 'rxjs';
import type { EditorStore } from '../editor-store';
import { selectionOf, unionSelection, type Selection } from '../document/selection';
import type { Hit } from './hit-index';
import { pinchView, toPanel, type Point, type View } from './view';

/** What the pointer tool reads and changes besides the document. */
export interface ToolContext {
  store: EditorStore;
  view(): View | undefined;
  setView(view: View): void;
  pick(at: Point): Hit | undefined;
  inside(a: Point, b: Point): Hit[];
  setBand(band: { a: Point; b: Point } | undefined): void;
  spaceHeld(): boolean;
}

/** Travel in px below which a press is a click, not a drag. */
const DRAG_SLOP = 3;

function selectionOfHits(hits: readonly Hit[]): Selection {
  return selectionOf(hits.filter((h) => h.kind === 'placement').map((h) => h.id), hits.filter((h) => h.kind === 'bore').map((h) => h.id));
}

export function localPoint(el: HTMLElement, e: { clientX: number; clientY: number }): Point {
  const r = el.getBoundingClientRect();
  return { x: e.clientX - r.left, y: e.clientY - r.top };
}

/** A gesture from press to release: a state of the tool (idle → pointing → dragging, panning, banding, pinching). */
interface Gesture {
  move(at: Point, e: PointerEvent): void;
  end(): void;
  /** A second finger turned the gesture into a pinch: undo what it did so far; `end` then does nothing. */
  cancel?(): void;
}

function panning(ctx: ToolContext, from: Point): Gesture {
  const start = ctx.view();
  return {
    move: (at) => start && ctx.setView({ ...start, x: start.x + at.x - from.x, y: start.y + at.y - from.y }),
    end: () => undefined,
  };
}

function banding(ctx: ToolContext, from: Point, addingToSelection: boolean): Gesture {
  let adding = addingToSelection;
  const before = ctx.store.selection();
  let to = from;
  return {
    move: (at) => {
      to = at;
      ctx.setBand({ a: from, b: at });
    },
    end: () => {
      ctx.setBand(undefined);
      const picked = selectionOfHits(ctx.inside(from, to));
      ctx.store.select(adding ? unionSelection(before, picked) : picked);
    },
    cancel: () => {
      ctx.setBand(undefined);
      to = from;
      adding = true;
    },
  };
}

function dragging(ctx: ToolContext, from: Point, lead: Hit): Gesture {
  const view = ctx.view();
  let started = false;
  return {
    move: (at, e) => {
      if (!view) return;
      if (!started && Math.hypot(at.x - from.x, at.y - from.y) < DRAG_SLOP) return;
      if (!started) ctx.store.startDrag();
      started = true;
      const a = toPanel(view, from);
      const b = toPanel(view, at);
      ctx.store.dragTo(lead.kind === 'placement' ? lead.id : '', { x: b.x - a.x, y: b.y - a.y }, e.altKey);
    },
    end: () => started && ctx.store.endDrag(),
    cancel: () => {
      if (started) ctx.store.cancelDrag();
      started = false;
    },
  };
}

/** Two fingers on a touch screen zoom and pan the view; `touches` holds where each finger is now. */
function pinching(ctx: ToolContext, touches: ReadonlyMap<number, Point>): Gesture {
  const start = ctx.view();
  const [a, b] = [...touches.keys()];
  const from = [touches.get(a)!, touches.get(b)!] as const;
  return {
    move: () => {
      const now = [touches.get(a), touches.get(b)] as const;
      if (start && now[0] && now[1]) ctx.setView(pinchView(start, from, [now[0], now[1]]));
    },
    end: () => undefined,
  };
}

function begin(ctx: ToolContext, el: HTMLElement, down: PointerEvent): Gesture {
  const from = localPoint(el, down);
  if (down.button === 1 || ctx.spaceHeld()) return panning(ctx, from);
  const view = ctx.view();
  const hit = view && ctx.pick(from);
  if (!hit) return banding(ctx, from, down.shiftKey);
  const { selection, store } = { selection: ctx.store.selection(), store: ctx.store };
  const held = hit.kind === 'placement' ? selection.placements.has(hit.id) : selection.bores.has(hit.id);
  const only = selectionOfHits([hit]);
  if (down.shiftKey) store.select(unionSelection(selection, only));
  else if (!held) store.select(only);
  return dragging(ctx, from, hit);
}

/**
 * The stage's pointer tool: each press on the stage becomes one gesture (drag the item under it, draw
 * a selection band on empty board, or pan with the middle button or Space held), fed by the moves
 * until the release. A second finger on a touch screen turns whatever the first began into a pinch.
 */
export function pointerTool(el: HTMLElement, ctx: ToolContext): Observable<unknown> {
  const moves = fromEvent<PointerEvent>(el, 'pointermove');
  const ups = merge(fromEvent<PointerEvent>(el, 'pointerup'), fromEvent<PointerEvent>(el, 'pointercancel'));
  const touches = new Map<number, Point>();
  const track = (e: PointerEvent) => e.pointerType === 'touch' && touches.has(e.pointerId) && touches.set(e.pointerId, localPoint(el, e));
  let current: Gesture | undefined;
  const gestures = fromEvent<PointerEvent>(el, 'pointerdown').pipe(
    filter((e) => e.button === 0 || e.button === 1),
    switchMap((down) => {
      down.preventDefault();
      el.setPointerCapture(down.pointerId);
      el.focus();
      if (down.pointerType === 'touch') touches.set(down.pointerId, localPoint(el, down));
      const pinch = touches.size >= 2;
      if (pinch) current?.cancel?.();
      const gesture = pinch ? pinching(ctx, touches) : begin(ctx, el, down);
      current = gesture;
      // The stage does not move under a pressed pointer: where it is is read once a gesture, not on every move.
      const box = el.getBoundingClientRect();
      return moves.pipe(
        takeUntil(ups),
        tap(track),
        map((e) => ({ e, at: { x: e.clientX - box.left, y: e.clientY - box.top } })),
        tap(({ e, at }) => gesture.move(at, e)),
        finalize(() => gesture.end()),
      );
    }),
  );
  const lifted = ups.pipe(
    tap((e) => touches.delete(e.pointerId)),
    ignoreElements(),
  );
  return merge(gestures, lifted);
}
