"use client";
import { useDraggable } from "@dnd-kit/core";
import { memo, useCallback, useContext, useLayoutEffect, type MouseEvent } from "react";
import type { DocStop } from "@/lib/spec/document";
import { CarryContext } from "./carry-context";
import { stopTitle } from "./format";
import { Pitch } from "./pitch";
import { Treatment } from "./treatment-mark";

export { pipesWords } from "./board-figures";

// One element for every grip: React skips an unchanged element, so a grip drawn again redraws no dots.
const gripDots = (
  <svg viewBox="0 0 10 16" className="h-4 w-2.5" aria-hidden="true" fill="currentColor">
    <circle cx="2.5" cy="3" r="1.3" /><circle cx="7.5" cy="3" r="1.3" />
    <circle cx="2.5" cy="8" r="1.3" /><circle cx="7.5" cy="8" r="1.3" />
    <circle cx="2.5" cy="13" r="1.3" /><circle cx="7.5" cy="13" r="1.3" />
  </svg>
);

/**
 * A grip pressed by the pointer does not take the focus (the keyboard still reaches it by Tab): a
 * stop dropped in another division leaves its column, and taking a focused button out of the page
 * costs Chromium a synchronous blur, some 20 ms on the drop of a 150-stop board.
 */
const keepFocus = (e: MouseEvent) => e.preventDefault();

/**
 * The grip of a stop or a division: the pointer drags it (dnd-kit), the keyboard carries it
 * (division-board.tsx). Memoised on primitive props: when a drag starts or ends every grip's
 * dnd-kit hook runs again, but a grip whose props are the same draws nothing again.
 */
export const DragHandle = memo(function DragHandle({
  label,
  carryType,
  carryId,
  listeners,
  attributes,
  setRef,
}: {
  label: string;
  carryType: "stop" | "division";
  carryId: string;
  listeners?: object;
  attributes?: object;
  setRef?: (el: HTMLElement | null) => void;
}) {
  return (
    <button
      type="button"
      ref={setRef}
      aria-label={label}
      className="-my-1 cursor-grab touch-none rounded px-1 py-1 text-tin hover:bg-paper-deep hover:text-ink active:cursor-grabbing"
      {...attributes}
      {...listeners}
      onMouseDown={keepFocus}
      data-carry-type={carryType}
      data-carry-id={carryId}
    >
      {gripDots}
    </button>
  );
});

/**
 * What a card shows, apart from its drag wiring. Memoised on primitive props and the stop object
 * (unchanged stops keep their object across edits), so a drag or an edit redraws only what changed.
 */
const CardBody = memo(function CardBody({ stop, pipesText, editable, onOpen }: { stop: DocStop; pipesText: string; editable: boolean; onOpen: (stopId: string) => void }) {
  const removed = stop.origin === "removed";
  return (
    <div className="min-w-0 flex-1">
      <div className="flex items-baseline gap-2">
        <button
          type="button"
          onClick={() => onOpen(stop.id)}
          className={`min-w-0 truncate text-left font-serif text-[15px] font-semibold hover:underline ${removed ? "line-through decoration-1" : ""}`}
          aria-label={`${editable ? "Edit" : "Details of"} ${stopTitle(stop)}`}
          title={stop.name}
        >
          {stop.name}
        </button>
        <Pitch stop={stop} className="ml-auto shrink-0 font-serif text-[15px]" />
      </div>
      <div className="mt-0.5 flex items-center gap-2 text-xs text-ink-soft">
        <Treatment stop={stop} />
        <span className="num ml-auto shrink-0 text-tin">{pipesText}</span>
      </div>
    </div>
  );
});

/**
 * The grip of a stop: the one part of a card wired to dnd-kit. useDraggable reads dnd-kit's context,
 * which changes when a drag starts, crosses a column or ends; kept in this small component, only the
 * 150 grips are drawn again then, never the cards. Its node is the card (for the overlay's start).
 */
const StopGrip = memo(function StopGrip({ stop, disabled }: { stop: DocStop; disabled: boolean }) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, isDragging, node } = useDraggable({
    id: `stop:${stop.id}`,
    data: { type: "stop", stopId: stop.id },
    disabled,
  });
  const setRef = useCallback(
    (el: HTMLElement | null) => {
      setActivatorNodeRef(el);
      setNodeRef(el?.closest("li") ?? null);
    },
    [setActivatorNodeRef, setNodeRef],
  );
  // The card left behind shows as a dashed ghost: one attribute on one element, no redraw of the card.
  useLayoutEffect(() => {
    node.current?.toggleAttribute("data-dragging", isDragging);
  }, [isDragging, node]);
  return <DragHandle label={`Move ${stopTitle(stop)}`} carryType="stop" carryId={stop.id} listeners={listeners} attributes={attributes} setRef={setRef} />;
});

/**
 * A stop on the board. Cards out of sight are neither laid out nor painted (content-visibility), so
 * a drop or a hover repaints what is on the screen, not 150 cards. Only its grip is wired to the pointer (StopGrip); where it lands is worked
 * out by the board from the pointer, so no card is measured or redrawn while the pointer moves. The
 * card being dragged is marked by its grip with an attribute (data-dragging), not by a redraw.
 */
export const StopCard = memo(function StopCard({
  stop,
  pipesText,
  divisionName,
  editable,
  onOpen,
}: {
  stop: DocStop;
  pipesText: string;
  divisionName: string;
  editable: boolean;
  onOpen: (stopId: string) => void;
}) {
  const carried = useContext(CarryContext);
  const isCarried = carried?.type === "stop" && carried.id === stop.id;
  return (
    <li
      className={`flex items-start gap-1.5 rounded border bg-paper-card px-2 py-1.5 shadow-[0_1px_0_rgba(29,36,51,0.05)] [contain-intrinsic-size:auto_3.25rem] [content-visibility:auto] data-[dragging]:border-dashed data-[dragging]:border-brass data-[dragging]:opacity-40 ${isCarried ? "border-brass ring-2 ring-brass/60" : "border-tin-rule"}`}
      data-carried={isCarried || undefined}
      data-testid={`stop-${stop.name}`}
      data-stop-id={stop.id}
      data-division={divisionName}
    >
      {editable && (
        <span className="pt-0.5">
          <StopGrip stop={stop} disabled={!editable} />
        </span>
      )}
      <CardBody stop={stop} pipesText={pipesText} editable={editable} onOpen={onOpen} />
    </li>
  );
});
