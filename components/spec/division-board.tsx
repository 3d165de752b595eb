"use client";
import {
  closestCenter,
  closestCorners,
  DndContext,
  DragOverlay,
  KeyboardSensor,
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
import { horizontalListSortingStrategy, SortableContext, sortableKeyboardCoordinates } from "@dnd-kit/sortable";
import { useMemo, useState } from "react";
import type { DivisionEstimate } from "@/lib/estimate";
import type { SchemeDocument } from "@/lib/spec/document";
import { DivisionColumn } from "./division-column";
import { findStop, moveDivision, moveStop } from "./doc-ops";
import { pitchText } from "./format";
import { Pitch } from "./pitch";
import type { StopPipes } from "./stop-card";
import { Treatment } from "./treatment-mark";

type DragState = { type: "stop" | "division"; id: string; doc: SchemeDocument };

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
  const [drag, setDrag] = useState<DragState | null>(null);
  const shown = drag?.doc ?? doc;
  const sensors = useSensors(
    useSensor(PointerSensor, { activationConstraint: { distance: 4 } }),
    useSensor(KeyboardSensor, { coordinateGetter: sortableKeyboardCoordinates }),
  );

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
    setDrag({ type: typeOf(e.active.id), id: idOf(e.active.id), doc });
  }

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
    const before = findStop(doc, state.id);
    const after = findStop(d, state.id);
    if (!before || !after) return;
    if (before.division.id === after.division.id && before.index === after.index) return;
    const label =
      before.division.id === after.division.id
        ? `Moved ${before.stop.name} ${pitchText(before.stop)} within the ${after.division.name}`
        : `Moved ${before.stop.name} ${pitchText(before.stop)} from the ${before.division.name} to the ${after.division.name}`;
    onChange(d, label);
  }

  const activeStop = drag?.type === "stop" ? findStop(shown, drag.id)?.stop : undefined;
  const activeDivision = drag?.type === "division" ? shown.divisions.find((x) => x.id === drag.id) : undefined;

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
          draggable: "To move, press Space or Enter. Arrow keys carry it between stops and divisions; Space or Enter drops it; Escape cancels.",
        },
      }}
    >
      <SortableContext items={shown.divisions.map((d) => `div:${d.id}`)} strategy={horizontalListSortingStrategy}>
        <div className="flex items-start gap-3 overflow-x-auto pb-3" data-testid="board">
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
      <DragOverlay dropAnimation={null}>
        {activeStop ? (
          <div className="w-[17rem] rounded border border-brass bg-paper-card px-2 py-1.5 shadow-lg">
            <div className="flex items-baseline gap-2 font-serif text-[15px] font-semibold">
              {activeStop.name}
              <Pitch stop={activeStop} className="ml-auto" />
            </div>
            <div className="text-xs text-ink-soft"><Treatment treatment={activeStop.treatment} /></div>
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
