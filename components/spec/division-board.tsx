"use client";
import {
  closestCenter,
  closestCorners,
  DndContext,
  DragOverlay,
  PointerSensor,
  pointerWithin,
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
import { useLayoutEffect, useMemo, useRef, useState, type KeyboardEvent } from "react";
import type { EstimateWithoutMoney } from "@/lib/spec/estimate";

type DivisionEstimate = EstimateWithoutMoney["divisions"][number];
import type { SchemeDocument } from "@/lib/spec/document";
import { DivisionColumn } from "./division-column";
import { findStop, moveDivision, moveStop } from "./doc-ops";
import { CarryContext } from "./carry-context";
import { carryPlace, carryStep, isCarryKey, type Carried } from "./keyboard-carry";
import { pitchText } from "./format";
import { Pitch } from "./pitch";
import type { StopPipes } from "./stop-card";
import { Treatment } from "./treatment-mark";

/** A drag by the pointer (dnd-kit) or a carry by the keyboard (keyboard-carry.ts): the board shows `doc` meanwhile. */
type DragState = { type: "stop" | "division"; id: string; doc: SchemeDocument; by: "pointer" | "keyboard" };

const idOf = (dndId: UniqueIdentifier) => String(dndId).replace(/^(stop|div):/, "");
const typeOf = (dndId: UniqueIdentifier) => (String(dndId).startsWith("div:") ? "division" : "stop");

/** Divisions are sorted among themselves; a stop lands on a stop, or on an empty division. */
const collision: CollisionDetection = (args) => {
  if (typeOf(args.active.id) === "division") {
    return closestCenter({ ...args, droppableContainers: args.droppableContainers.filter((c) => typeOf(c.id) === "division") });
  }
  const within = pointerWithin(args);
  if (within.length) {
    const stops = within.filter((c) => typeOf(c.id) === "stop");
    return stops.length ? stops : within;
  }
  return closestCorners(args);
};

export function DivisionBoard({
  doc,
  divisionFigures,
  pipesById,
  editable,
  onChange,
  onEditDivision,
  onAddStop,
  onEditStop,
}: {
  doc: SchemeDocument;
  divisionFigures: Map<string, DivisionEstimate>;
  pipesById: Map<string, StopPipes>;
  editable: boolean;
  onChange: (doc: SchemeDocument, label: string) => void;
  onEditDivision: (divisionId: string) => void;
  onAddStop: (divisionId: string) => void;
  onEditStop: (stopId: string) => void;
}) {
  const [drag, setDragState] = useState<DragState | null>(null);
  // The latest state at once, so keys that arrive before React re-renders each build on the last.
  const dragRef = useRef<DragState | null>(null);
  const setDrag = (next: DragState | null) => {
    dragRef.current = next;
    setDragState(next);
  };
  const [spoken, setSpoken] = useState("");
  const boardRef = useRef<HTMLDivElement>(null);
  const focusAfter = useRef<string | null>(null);
  const shown = drag?.doc ?? doc;
  // The pointer only: the keyboard carries through onBoardKeyDown, which never loses a key.
  const sensors = useSensors(useSensor(PointerSensor, { activationConstraint: { distance: 4 } }));

  const nameOf = useMemo(() => {
    return (dndId: UniqueIdentifier | undefined): string => {
      if (dndId === undefined) return "";
      const id = idOf(dndId);
      if (typeOf(dndId) === "division") return `division ${shown.divisions.find((d) => d.id === id)?.name ?? ""}`;
      const found = findStop(shown, id);
      return found ? `${found.stop.name} ${pitchText(found.stop)} (${found.division.name})` : "";
    };
  }, [shown]);

  const announcements: Announcements = {
    onDragStart: ({ active }) => `Picked up ${nameOf(active.id)}. Arrow keys move it, Space drops it, Escape puts it back.`,
    onDragOver: ({ active, over }) => (over ? `${nameOf(active.id)} is over ${nameOf(over.id)}.` : `${nameOf(active.id)} is over no place.`),
    onDragEnd: ({ active, over }) => (over ? `Dropped ${nameOf(active.id)}.` : `${nameOf(active.id)} put back.`),
    onDragCancel: ({ active }) => `Moving ${nameOf(active.id)} cancelled; it is back where it was.`,
  };

  function target(d: SchemeDocument, overId: UniqueIdentifier): { divisionId: string; index: number } | null {
    const id = idOf(overId);
    if (typeOf(overId) === "division") {
      const division = d.divisions.find((x) => x.id === id);
      return division ? { divisionId: id, index: division.stops.length } : null;
    }
    const found = findStop(d, id);
    return found ? { divisionId: found.division.id, index: found.index } : null;
  }

  function onDragStart(e: DragStartEvent) {
    setDrag({ type: typeOf(e.active.id), id: idOf(e.active.id), doc, by: "pointer" });
  }

  /** Commits a finished move of a stop as one edit, labelled with where it went. */
  function commitStop(id: string, d: SchemeDocument) {
    const before = findStop(doc, id);
    const after = findStop(d, id);
    if (!before || !after) return;
    if (before.division.id === after.division.id && before.index === after.index) return;
    const label =
      before.division.id === after.division.id
        ? `Moved ${before.stop.name} ${pitchText(before.stop)} within the ${after.division.name}`
        : `Moved ${before.stop.name} ${pitchText(before.stop)} from the ${before.division.name} to the ${after.division.name}`;
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
      setSpoken(`Picked up ${nameOf(`${type === "division" ? "div" : "stop"}:${id}`)}. Up and down arrows move it within its division, left and right to the next division; Space drops it, Escape puts it back.`);
      return;
    }
    const dndId = `${carried.type === "division" ? "div" : "stop"}:${carried.id}`;
    if (isCarryKey(key)) {
      e.preventDefault();
      const next = carryStep(carried.doc, carried, key);
      if (next === carried.doc) {
        setSpoken(`${nameOf(dndId)} cannot go further that way.`);
        return;
      }
      focusAfter.current = carried.id;
      setDrag({ ...carried, doc: next });
      setSpoken(`${nameOf(dndId)}: ${carryPlace(next, carried)}.`);
    } else if (key === " " || key === "Enter") {
      e.preventDefault();
      focusAfter.current = carried.id;
      setDrag(null);
      setSpoken(`Dropped ${nameOf(dndId)}, ${carryPlace(carried.doc, carried)}.`);
      if (carried.type === "division") {
        const from = doc.divisions.findIndex((d) => d.id === carried.id);
        const to = carried.doc.divisions.findIndex((d) => d.id === carried.id);
        if (from >= 0 && to >= 0 && from !== to) onChange(moveDivision(doc, from, to), `Moved the ${doc.divisions[from].name}`);
      } else commitStop(carried.id, carried.doc);
    } else if (key === "Escape" || key === "Tab") {
      if (key === "Escape") e.preventDefault();
      focusAfter.current = key === "Escape" ? carried.id : null;
      setDrag(null);
      setSpoken(`Moving ${nameOf(dndId)} cancelled; it is back where it was.`);
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

  // Crossing into another division moves the stop there at once, so the columns make room for it.
  function onDragOver(e: DragOverEvent) {
    if (!drag || drag.type !== "stop" || !e.over) return;
    const from = findStop(drag.doc, drag.id);
    const to = target(drag.doc, e.over.id);
    if (!from || !to || from.division.id === to.divisionId) return;
    setDrag({ ...drag, doc: moveStop(drag.doc, drag.id, to.divisionId, to.index) });
  }

  function onDragEnd(e: DragEndEvent) {
    const state = drag;
    setDrag(null);
    if (!state || !e.over) return;
    if (state.type === "division") {
      const from = doc.divisions.findIndex((d) => d.id === state.id);
      const to = doc.divisions.findIndex((d) => d.id === idOf(e.over!.id));
      if (from >= 0 && to >= 0 && from !== to) onChange(moveDivision(doc, from, to), `Moved the ${doc.divisions[from].name}`);
      return;
    }
    let d = state.doc;
    const to = target(d, e.over.id);
    if (to && typeOf(e.over.id) === "stop") d = moveStop(d, state.id, to.divisionId, to.index);
    commitStop(state.id, d);
  }

  const activeStop = drag?.by === "pointer" && drag.type === "stop" ? findStop(shown, drag.id)?.stop : undefined;
  const activeDivision = drag?.by === "pointer" && drag.type === "division" ? shown.divisions.find((x) => x.id === drag.id) : undefined;
  const carriedBy = drag?.by === "keyboard" ? drag : null;
  const carriedType = carriedBy?.type;
  const carriedId = carriedBy?.id;
  // One object per carried item, not per step, so the cards re-render only when it changes.
  const carried = useMemo<Carried | null>(() => (carriedType && carriedId ? { type: carriedType, id: carriedId } : null), [carriedType, carriedId]);

  return (
    <DndContext
      id="scheme-board"
      sensors={sensors}
      collisionDetection={collision}
      onDragStart={onDragStart}
      onDragOver={onDragOver}
      onDragEnd={onDragEnd}
      onDragCancel={() => setDrag(null)}
      accessibility={{
        announcements,
        screenReaderInstructions: {
          draggable: "To move, press Space or Enter. Up and down arrows move it within its division, left and right to the next division; Space or Enter drops it; Escape puts it back.",
        },
      }}
    >
      <p className="sr-only" aria-live="assertive" data-testid="carry-status">{spoken}</p>
      <CarryContext.Provider value={carried}>
      <SortableContext items={shown.divisions.map((d) => `div:${d.id}`)} strategy={horizontalListSortingStrategy}>
        <div ref={boardRef} onKeyDown={onBoardKeyDown} className="flex items-start gap-3 overflow-x-auto pb-3" data-testid="board" data-carrying={carried ? carried.id : undefined}>
          {shown.divisions.map((division) => (
            <DivisionColumn
              key={division.id}
              division={division}
              figures={divisionFigures.get(division.id)}
              pipesById={pipesById}
              editable={editable}
              activeType={drag?.type ?? null}
              onEditDivision={() => onEditDivision(division.id)}
              onAddStop={() => onAddStop(division.id)}
              onEditStop={onEditStop}
            />
          ))}
        </div>
      </SortableContext>
      </CarryContext.Provider>
      <DragOverlay dropAnimation={null}>
        {activeStop ? (
          <div className="w-[17rem] rounded border border-brass bg-paper-card px-2 py-1.5 shadow-lg">
            <div className="flex items-baseline gap-2 font-serif text-[15px] font-semibold">
              {activeStop.name}
              <Pitch stop={activeStop} className="ml-auto" />
            </div>
            <div className="text-xs text-ink-soft"><Treatment stop={activeStop} /></div>
          </div>
        ) : activeDivision ? (
          <div className="w-72 rounded-md border border-brass bg-paper-deep px-3 py-2 shadow-lg">
            <span className="font-serif text-lg font-semibold">{activeDivision.name}</span>
            <span className="ml-2 text-xs text-tin">{activeDivision.stops.length} stops</span>
          </div>
        ) : null}
      </DragOverlay>
    </DndContext>
  );
}
