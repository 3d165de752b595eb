"use client";
import { useSortable } from "@dnd-kit/sortable";
import { memo, useContext } from "react";
import { CSS } from "@dnd-kit/utilities";
import type { DocStop } from "@/lib/spec/document";
import { pitchText } from "./format";
import { CarryContext } from "./carry-context";
import { Pitch } from "./pitch";
import { Treatment } from "./treatment-mark";

export type StopPipes = { total: number; prepared: number; kind: string } | undefined;

export function pipesWords(p: StopPipes): string {
  if (!p) return "– pipes";
  if (p.kind === "borrowed") return "no pipes";
  if (p.kind === "prepared") return `${p.prepared} prepared`;
  if (p.kind === "removed") return "removed";
  return `${p.total} pipes`;
}

/** The grip of a stop or a division: the pointer drags it (dnd-kit), the keyboard carries it (division-board.tsx). */
export function DragHandle({
  label,
  carry,
  listeners,
  attributes,
  setRef,
}: {
  label: string;
  carry: { type: "stop" | "division"; id: string };
  listeners?: object;
  attributes?: object;
  setRef?: (el: HTMLElement | null) => void;
}) {
  return (
    <button
      type="button"
      ref={setRef}
      aria-label={label}
      className="cursor-grab touch-none rounded px-0.5 text-tin hover:bg-paper-deep hover:text-ink active:cursor-grabbing"
      {...attributes}
      {...listeners}
      data-carry-type={carry.type}
      data-carry-id={carry.id}
    >
      <svg viewBox="0 0 10 16" className="h-4 w-2.5" aria-hidden="true" fill="currentColor">
        <circle cx="2.5" cy="3" r="1.3" /><circle cx="7.5" cy="3" r="1.3" />
        <circle cx="2.5" cy="8" r="1.3" /><circle cx="7.5" cy="8" r="1.3" />
        <circle cx="2.5" cy="13" r="1.3" /><circle cx="7.5" cy="13" r="1.3" />
      </svg>
    </button>
  );
}

/**
 * What a card shows, apart from its drag wiring. dnd-kit re-renders every sortable on each drag
 * step; keeping the body memoised (primitive props, stable stop objects) keeps a 150-stop board quick.
 */
const CardBody = memo(function CardBody({ stop, pipesText, onEdit }: { stop: DocStop; pipesText: string; onEdit?: (stopId: string) => void }) {
  const removed = stop.origin === "removed";
  return (
    <div className="min-w-0 flex-1">
      <div className="flex items-baseline gap-2">
        {onEdit ? (
          <button type="button" onClick={() => onEdit(stop.id)} className={`min-w-0 truncate text-left font-serif text-[15px] font-semibold hover:underline ${removed ? "line-through decoration-1" : ""}`} aria-label={`Edit ${stop.name} ${pitchText(stop)}`}>
            {stop.name}
          </button>
        ) : (
          <span className={`min-w-0 truncate font-serif text-[15px] font-semibold ${removed ? "line-through decoration-1" : ""}`}>{stop.name}</span>
        )}
        <Pitch stop={stop} className="ml-auto font-serif text-[15px]" />
      </div>
      <div className="mt-0.5 flex items-center gap-2 text-xs text-ink-soft">
        <Treatment stop={stop} />
        <span className="num ml-auto text-tin">{pipesText}</span>
      </div>
    </div>
  );
});

export function StopCard({ stop, pipes, divisionName, editable, disabledDrop, onEdit }: { stop: DocStop; pipes: StopPipes; divisionName: string; editable: boolean; disabledDrop: boolean; onEdit: (stopId: string) => void }) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({
    id: `stop:${stop.id}`,
    data: { type: "stop", stopId: stop.id },
    disabled: editable ? { draggable: false, droppable: disabledDrop } : true,
  });
  const carried = useContext(CarryContext);
  const isCarried = carried?.type === "stop" && carried.id === stop.id;
  return (
    <li
      ref={setNodeRef}
      style={{ transform: CSS.Translate.toString(transform), transition }}
      className={`flex items-start gap-1.5 rounded border bg-paper-card px-2 py-1.5 shadow-[0_1px_0_rgba(29,36,51,0.05)] ${isDragging ? "z-10 border-brass opacity-80 shadow-md" : isCarried ? "border-brass ring-2 ring-brass/60" : "border-tin-rule"}`}
      data-carried={isCarried || undefined}
      data-testid={`stop-${stop.name}`}
      data-stop-id={stop.id}
      data-division={divisionName}
    >
      {editable && (
        <span className="pt-0.5">
          <DragHandle label={`Move ${stop.name} ${pitchText(stop)}`} carry={{ type: "stop", id: stop.id }} listeners={listeners} attributes={attributes} setRef={setActivatorNodeRef} />
        </span>
      )}
      <CardBody stop={stop} pipesText={pipesWords(pipes)} onEdit={editable ? onEdit : undefined} />
    </li>
  );
}
