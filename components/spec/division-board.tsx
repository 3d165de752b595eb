"use client";
import {
  closestCenter,
  closestCorners,
  DndContext,
  DragOverlay,
  PointerSensor,
  pointerWithin,
  useDraggable,
  useSensor,
  useSensors,
  type Announcements,
  type CollisionDetection,
  type DragEndEvent,
  type DragOverEvent,
  type DragStartEvent,
  type UniqueIdentifier,
} from "@dnd-kit/core";
import { horizontalListSortingStrategy, SortableContext } from "@dnd-kit/sortable";
import { memo, useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState, type KeyboardEvent, type PointerEvent as ReactPointerEvent, type RefObject } from "react";
import type { SchemeDocument } from "@/lib/spec/document";
import type { ColumnFigures } from "./board-figures";
import { BOARD_ID, CarryContext, StopPressContext } from "./carry-context";
import { DivisionColumn } from "./division-column";
import { DivisionPicker } from "./division-picker";
import { findStop, moveDivision, moveStop } from "./doc-ops";
import { stopTitle } from "./format";
import { carryPlace, carryStep, isCarryKey, type Carried } from "./keyboard-carry";
import { Pitch } from "./pitch";
import { Treatment } from "./treatment-mark";

/** A drag by the pointer (dnd-kit) or a carry by the keyboard (keyboard-carry.ts): the board shows `doc` meanwhile. */
type DragState = { type: "stop" | "division"; id: string; doc: SchemeDocument; by: "pointer" | "keyboard" };

/** dnd-kit's id for whichever stop is dragged: the stop itself is the one the board was handed (StopDragSource). */
const STOP_DRAG_ID = "stop";
const idOf = (dndId: UniqueIdentifier) => String(dndId).replace(/^div:/, "");
const typeOf = (dndId: UniqueIdentifier) => (String(dndId).startsWith("div:") ? "division" : "stop");

/** The board's one stop draggable, as dnd-kit hands it out. */
type DragSource = Pick<ReturnType<typeof useDraggable>, "listeners" | "setNodeRef" | "setActivatorNodeRef">;

/**
 * The one draggable dnd-kit knows for stops. A grip pressed by the pointer points it at its card and
 * hands it the press (pressStop), so dnd-kit drags that card as it would a card with its own hook,
 * while the 150 grips read no dnd-kit context and draw nothing when a drag starts or ends.
 */
function StopDragSource({ sourceRef }: { sourceRef: RefObject<DragSource | null> }) {
  const { listeners, setNodeRef, setActivatorNodeRef } = useDraggable({ id: STOP_DRAG_ID, data: { type: "stop" } });
  useLayoutEffect(() => {
    sourceRef.current = { listeners, setNodeRef, setActivatorNodeRef };
  }, [sourceRef, listeners, setNodeRef, setActivatorNodeRef]);
  return null;
}

/**
 * The pointer sensor's options, one object for the page: a new object would make new sensors on every
 * draw of the board, and with them new listeners for every grip, so each of 150 grips drew again on a drop.
 */
const pointerSensorOptions = { activationConstraint: { distance: 4 } };

/** Where a stop dragged by the pointer would land: a division and an index in its list as shown (the dragged card counted). */
type DropAt = { divisionId: string; index: number };

/** The document with stop `stopId` dropped at `at`; moveStop counts the target's stops without the moved one. */
function landed(doc: SchemeDocument, stopId: string, at: DropAt): SchemeDocument | null {
  const from = findStop(doc, stopId);
  if (!from) return null;
  const index = from.division.id === at.divisionId && from.index < at.index ? at.index - 1 : at.index;
  return moveStop(doc, stopId, at.divisionId, index);
}

/**
 * Divisions are sorted among themselves; a stop is over the column under the pointer (or the
 * nearest). Only the columns are drop targets, so crossing stops changes nothing dnd-kit tracks.
 */
const collision: CollisionDetection = (args) => {
  const columns = args.droppableContainers.filter((c) => typeOf(c.id) === "division");
  if (typeOf(args.active.id) === "division") return closestCenter({ ...args, droppableContainers: columns });
  const within = pointerWithin({ ...args, droppableContainers: columns });
  return within.length ? within : closestCorners({ ...args, droppableContainers: columns });
};

/** The index in `divisionId`'s list as shown before which a card dropped at `clientY` goes. */
function dropIndexAt(board: HTMLElement, divisionId: string, clientY: number): number {
  const list = board.querySelector(`[data-division-id="${CSS.escape(divisionId)}"] ol`);
  if (!list) return 0;
  const cards = list.querySelectorAll<HTMLElement>(":scope > li[data-stop-id]");
  let i = 0;
  for (const card of cards) {
    const r = card.getBoundingClientRect();
    if (clientY < r.top + r.height / 2) break;
    i++;
  }
  return i;
}

/**
 * The board of divisions and stops. Memoised: the editor draws again for its own state (a notice, the
 * save badge, new figures), which reaches the board only when the document or the column figures change.
 */
export const DivisionBoard = memo(function DivisionBoard({
  doc,
  columnFigures,
  editable,
  onChange,
  onGuess,
  onEditDivision,
  onAddStop,
  onOpenStop,
}: {
  doc: SchemeDocument;
  columnFigures: Map<string, ColumnFigures>;
  editable: boolean;
  onChange: (doc: SchemeDocument, label: string) => void;
  /**
   * Told of the document a drop would make, while the stop is still carried, so its figures can be
   * worked out before the drop; the drop then hands over that very document. Stable.
   */
  onGuess: (doc: SchemeDocument) => void;
  /** Stable callbacks (the columns are memoised on them). */
  onEditDivision: (divisionId: string) => void;
  onAddStop: (divisionId: string) => void;
  onOpenStop: (stopId: string) => void;
}) {
  const [drag, setDragState] = useState<DragState | null>(null);
  // The latest state at once, so keys that arrive before React re-renders each build on the last.
  const dragRef = useRef<DragState | null>(null);
  const setDrag = (next: DragState | null) => {
    dragRef.current = next;
    setDragState(next);
  };
  const [dropAt, setDropAtState] = useState<DropAt | null>(null);
  const dropRef = useRef<DropAt | null>(null);
  const setDropAt = useCallback((next: DropAt | null) => {
    const prev = dropRef.current;
    if (prev === next || (prev && next && prev.divisionId === next.divisionId && prev.index === next.index)) return;
    dropRef.current = next;
    setDropAtState(next);
  }, []);
  const [spoken, setSpoken] = useState("");
  const [picked, setPicked] = useState<string | null>(null);
  const boardRef = useRef<HTMLDivElement>(null);
  const focusAfter = useRef<string | null>(null);
  const dragSource = useRef<DragSource | null>(null);
  /** The stop whose grip was pressed last, and its card: what the stop draggable stands for. */
  const pressed = useRef<{ id: string; card: HTMLElement | null }>({ id: "", card: null });
  const pressStop = useCallback((e: ReactPointerEvent<HTMLButtonElement>) => {
    const source = dragSource.current;
    const id = e.currentTarget.dataset.carryId;
    if (!source?.listeners || !id) return;
    const card = e.currentTarget.closest<HTMLElement>("li[data-stop-id]");
    pressed.current = { id, card };
    source.setNodeRef(card);
    source.setActivatorNodeRef(e.currentTarget);
    (source.listeners.onPointerDown as ((e: ReactPointerEvent) => void) | undefined)?.(e);
  }, []);
  /** What a dnd-kit id stands for on this board. */
  const draggedOf = (dndId: UniqueIdentifier): { type: "stop" | "division"; id: string } =>
    dndId === STOP_DRAG_ID ? { type: "stop", id: pressed.current.id } : { type: typeOf(dndId), id: idOf(dndId) };
  const shown = drag?.doc ?? doc;
  const pickedId = shown.divisions.some((d) => d.id === picked) ? picked : (shown.divisions[0]?.id ?? null);
  // The pointer only: the keyboard carries through onBoardKeyDown, which never loses a key.
  const sensors = useSensors(useSensor(PointerSensor, pointerSensorOptions));

  // The document the last place under the pointer would make (its figures are being worked out).
  const guessRef = useRef<{ base: SchemeDocument; stopId: string; at: DropAt; doc: SchemeDocument } | null>(null);
  /** The guess for stop `stopId` dropped at `at` on `base`, if that is the one made. */
  const guessFor = (base: SchemeDocument, stopId: string, at: DropAt) => {
    const g = guessRef.current;
    return g && g.base === base && g.stopId === stopId && g.at.divisionId === at.divisionId && g.at.index === at.index ? g.doc : null;
  };
  // While a stop is dragged, where it would land follows the pointer: read once a frame from the
  // cards of the column under it, set only when it changes (one column redraws its drop line).
  const pointer = useRef<{ y: number; over: string | null; frame: number }>({ y: 0, over: null, frame: 0 });
  const place = useCallback(() => {
    pointer.current.frame = 0;
    const d = dragRef.current;
    const board = boardRef.current;
    const over = pointer.current.over;
    if (!d || d.by !== "pointer" || d.type !== "stop" || !board || !over) return setDropAt(null);
    let index = dropIndexAt(board, over, pointer.current.y);
    const from = findStop(d.doc, d.id);
    // Just before or after itself is where it already is: no line.
    if (from && from.division.id === over && (index === from.index || index === from.index + 1)) index = -1;
    const at = index < 0 ? { divisionId: over, index: -1 } : { divisionId: over, index };
    setDropAt(at);
    if (index >= 0 && !guessFor(d.doc, d.id, at)) {
      const doc = landed(d.doc, d.id, at);
      if (doc) {
        guessRef.current = { base: d.doc, stopId: d.id, at, doc };
        onGuess(doc);
      }
    }
  }, [setDropAt, onGuess]);
  const schedule = useCallback(() => {
    if (!pointer.current.frame) pointer.current.frame = requestAnimationFrame(place);
  }, [place]);
  const draggingStop = drag?.by === "pointer" && drag.type === "stop";
  useEffect(() => {
    if (!draggingStop) return;
    const onMove = (e: PointerEvent) => {
      pointer.current.y = e.clientY;
      schedule();
    };
    window.addEventListener("pointermove", onMove, { passive: true, capture: true });
    window.addEventListener("scroll", schedule, { passive: true, capture: true });
    return () => {
      window.removeEventListener("pointermove", onMove, { capture: true });
      window.removeEventListener("scroll", schedule, { capture: true });
      if (pointer.current.frame) cancelAnimationFrame(pointer.current.frame);
      pointer.current.frame = 0;
    };
  }, [draggingStop, schedule]);

  /** A stop or division as the announcements name it. */
  function nameOfItem(type: "stop" | "division", id: string): string {
    if (type === "division") return `division ${shown.divisions.find((d) => d.id === id)?.name ?? ""}`;
    const found = findStop(shown, id);
    return found ? `${stopTitle(found.stop)} (${found.division.name})` : "";
  }
  const nameOf = (dndId: UniqueIdentifier | undefined): string => {
    if (dndId === undefined) return "";
    const { type, id } = draggedOf(dndId);
    return nameOfItem(type, id);
  };

  const announcements: Announcements = {
    onDragStart: ({ active }) => `Picked up ${nameOf(active.id)}. Arrow keys move it, Space drops it, Escape puts it back.`,
    onDragOver: ({ active, over }) => (over ? `${nameOf(active.id)} is over ${nameOf(over.id)}.` : `${nameOf(active.id)} is over no place.`),
    onDragEnd: ({ active, over }) => (over ? `Dropped ${nameOf(active.id)}.` : `${nameOf(active.id)} put back.`),
    onDragCancel: ({ active }) => `Moving ${nameOf(active.id)} cancelled; it is back where it was.`,
  };

  function onDragStart(e: DragStartEvent) {
    const start = e.activatorEvent as PointerEvent | null;
    pointer.current = { y: start?.clientY ?? 0, over: null, frame: 0 };
    const dragged = draggedOf(e.active.id);
    // The card left behind shows as a dashed ghost: one attribute, no redraw.
    if (dragged.type === "stop") pressed.current.card?.toggleAttribute("data-dragging", true);
    setDrag({ ...dragged, doc, by: "pointer" });
  }

  /** Commits a finished move of a stop as one edit, labelled with where it went. */
  function commitStop(id: string, d: SchemeDocument) {
    const before = findStop(doc, id);
    const after = findStop(d, id);
    if (!before || !after) return;
    if (before.division.id === after.division.id && before.index === after.index) return;
    const label =
      before.division.id === after.division.id
        ? `Moved ${stopTitle(before.stop)} within the ${after.division.name}`
        : `Moved ${stopTitle(before.stop)} from the ${before.division.name} to the ${after.division.name}`;
    onChange(d, label);
  }

  // Space or Enter on a handle picks the item up; arrows carry it; Space or Enter drops; Escape puts it back.
  function onBoardKeyDown(e: KeyboardEvent<HTMLDivElement>) {
    const handle = e.target instanceof HTMLElement ? e.target.closest<HTMLElement>("[data-carry-id]") : null;
    if (!handle || !editable) return;
    const carried = dragRef.current?.by === "keyboard" ? dragRef.current : null;
    const key = e.key;
    if (!carried) {
      if (key !== " " && key !== "Enter") return;
      e.preventDefault();
      const type = handle.dataset.carryType === "division" ? "division" : "stop";
      const id = handle.dataset.carryId!;
      setDrag({ type, id, doc, by: "keyboard" });
      setSpoken(`Picked up ${nameOfItem(type, id)}. Up and down arrows move it within its division, left and right to the next division; Space drops it, Escape puts it back.`);
      return;
    }
    const name = nameOfItem(carried.type, carried.id);
    if (isCarryKey(key)) {
      e.preventDefault();
      const next = carryStep(carried.doc, carried, key);
      if (next === carried.doc) {
        setSpoken(`${name} cannot go further that way.`);
        return;
      }
      focusAfter.current = carried.id;
      setDrag({ ...carried, doc: next });
      onGuess(next);
      // On a phone the board shows one division: it follows a stop carried to another.
      const now = carried.type === "stop" ? findStop(next, carried.id)?.division.id : null;
      if (now) setPicked(now);
      setSpoken(`${name}: ${carryPlace(next, carried)}.`);
    } else if (key === " " || key === "Enter") {
      e.preventDefault();
      focusAfter.current = carried.id;
      setDrag(null);
      setSpoken(`Dropped ${name}, ${carryPlace(carried.doc, carried)}.`);
      if (carried.type === "division") {
        const from = doc.divisions.findIndex((d) => d.id === carried.id);
        const to = carried.doc.divisions.findIndex((d) => d.id === carried.id);
        // The carried document itself, as for a stop: its figures were guessed while it was carried.
        if (from >= 0 && to >= 0 && from !== to) onChange(carried.doc, `Moved the ${doc.divisions[from].name}`);
      } else commitStop(carried.id, carried.doc);
    } else if (key === "Escape" || key === "Tab") {
      if (key === "Escape") e.preventDefault();
      focusAfter.current = key === "Escape" ? carried.id : null;
      setDrag(null);
      setSpoken(`Moving ${name} cancelled; it is back where it was.`);
    }
  }

  // A carried card may re-mount in another column: its handle keeps the focus.
  useLayoutEffect(() => {
    const id = focusAfter.current;
    if (!id) return;
    const el = boardRef.current?.querySelector<HTMLElement>(`[data-carry-id="${CSS.escape(id)}"]`);
    if (el && document.activeElement !== el) el.focus({ preventScroll: false });
    if (!dragRef.current) focusAfter.current = null;
  });

  function onDragOver(e: DragOverEvent) {
    if (dragRef.current?.type !== "stop") return;
    pointer.current.over = e.over ? idOf(e.over.id) : null;
    schedule();
  }

  function endPointerDrag() {
    pressed.current.card?.toggleAttribute("data-dragging", false);
    setDrag(null);
    setDropAt(null);
    pointer.current.over = null;
  }

  function onDragEnd(e: DragEndEvent) {
    const state = dragRef.current;
    // The last pointer position counts, even if its frame has not come yet.
    if (state?.type === "stop" && pointer.current.frame) {
      cancelAnimationFrame(pointer.current.frame);
      place();
    }
    const at = dropRef.current;
    endPointerDrag();
    if (!state || !e.over) return;
    if (state.type === "division") {
      const from = doc.divisions.findIndex((d) => d.id === state.id);
      const to = doc.divisions.findIndex((d) => d.id === idOf(e.over!.id));
      if (from >= 0 && to >= 0 && from !== to) onChange(moveDivision(doc, from, to), `Moved the ${doc.divisions[from].name}`);
      return;
    }
    if (!at || at.index < 0) return;
    // The very document guessed for this place, whose figures may be ready already.
    const next = guessFor(doc, state.id, at) ?? landed(doc, state.id, at);
    if (next) commitStop(state.id, next);
  }

  const activeStop = drag?.by === "pointer" && drag.type === "stop" ? findStop(shown, drag.id)?.stop : undefined;
  const activeDivision = drag?.by === "pointer" && drag.type === "division" ? shown.divisions.find((x) => x.id === drag.id) : undefined;
  const carriedBy = drag?.by === "keyboard" ? drag : null;
  const carriedType = carriedBy?.type;
  const carriedId = carriedBy?.id;
  // One object per carried item, not per step, so the cards re-render only when it changes.
  const carried = useMemo<Carried | null>(() => (carriedType && carriedId ? { type: carriedType, id: carriedId } : null), [carriedType, carriedId]);
  // The same list while the order of divisions is the same: a move of a stop makes a new divisions
  // array, which would otherwise make every column's sortable hook run again on the drop.
  const divisionOrder = shown.divisions.map((d) => d.id).join("\n");
  const sortableIds = useMemo(() => (divisionOrder ? divisionOrder.split("\n").map((id) => `div:${id}`) : []), [divisionOrder]);

  return (
    <DndContext
      id={BOARD_ID}
      sensors={sensors}
      collisionDetection={collision}
      onDragStart={onDragStart}
      onDragOver={onDragOver}
      onDragEnd={onDragEnd}
      onDragCancel={endPointerDrag}
      accessibility={{
        announcements,
        screenReaderInstructions: {
          draggable: "To move, press Space or Enter. Up and down arrows move it within its division, left and right to the next division; Space or Enter drops it; Escape puts it back.",
        },
      }}
    >
      <p className="sr-only" aria-live="assertive" data-testid="carry-status">{spoken}</p>
      {editable && <StopDragSource sourceRef={dragSource} />}
      <DivisionPicker divisions={shown.divisions} columnFigures={columnFigures} picked={pickedId} onPick={setPicked} boardRef={boardRef} />
      <StopPressContext.Provider value={editable ? pressStop : null}>
      <CarryContext.Provider value={carried}>
      <SortableContext items={sortableIds} strategy={horizontalListSortingStrategy}>
        <div
          ref={boardRef}
          onKeyDown={onBoardKeyDown}
          className="board-scroll flex flex-col gap-3 pb-3 md:grid md:auto-cols-[minmax(15rem,20rem)] md:grid-flow-col md:items-start md:overflow-x-auto"
          data-testid="board"
          data-carrying={carried ? carried.id : undefined}
        >
          {shown.divisions.map((division) => (
            <DivisionColumn
              key={division.id}
              division={division}
              figures={columnFigures.get(division.id)}
              editable={editable}
              dropIndex={dropAt?.divisionId === division.id ? dropAt.index : null}
              picked={division.id === pickedId}
              onEditDivision={onEditDivision}
              onAddStop={onAddStop}
              onOpenStop={onOpenStop}
            />
          ))}
        </div>
      </SortableContext>
      </CarryContext.Provider>
      </StopPressContext.Provider>
      <DragOverlay dropAnimation={null}>
        {activeStop ? (
          <div className="w-[15rem] rounded border border-brass bg-paper-card px-2 py-1.5 shadow-lg">
            <div className="flex items-baseline gap-2 font-serif text-[15px] font-semibold">
              {activeStop.name}
              <Pitch stop={activeStop} className="ml-auto" />
            </div>
            <div className="text-xs text-ink-soft"><Treatment stop={activeStop} /></div>
          </div>
        ) : activeDivision ? (
          <div className="w-60 rounded-md border border-brass bg-paper-deep px-3 py-2 shadow-lg">
            <span className="font-serif text-lg font-semibold">{activeDivision.name}</span>
            <span className="ml-2 text-xs text-tin">{activeDivision.stops.length} stops</span>
          </div>
        ) : null}
      </DragOverlay>
    </DndContext>
  );
});
