"use client";
import { memo, useContext, type MouseEvent, type PointerEvent } from "react";
import type { DocStop } from "@/lib/spec/document";
import { BOARD_ID, CarryContext, StopPressContext } from "./carry-context";
import { stopTitle } from "./format";
import { Pitch } from "./pitch";
import { Treatment } from "./treatment-mark";

export { pipesWords } from "./board-figures";

// One element for every grip: React skips an unchanged element. The dots are a mask (globals.css).
const gripDots = <span className="mark mark-grip h-4 w-2.5 align-middle" aria-hidden="true" />;

/**
 * A grip pressed by the pointer does not take the focus (the keyboard still reaches it by Tab): a
 * stop dropped in another division leaves its column, and taking a focused button out of the page
 * costs Chromium a synchronous blur, some 20 ms on the drop of a 150-stop board.
 */
const keepFocus = (e: MouseEvent) => e.preventDefault();

/**
 * The grip of a stop or a division: the pointer drags it (dnd-kit), the keyboard carries it
 * (division-board.tsx). A division's grip is wired by its column's sortable hook (listeners,
 * attributes); a stop's grip only hands its press to the board (onPress).
 */
export const DragHandle = memo(function DragHandle({
  label,
  carryType,
  carryId,
  listeners,
  attributes,
  setRef,
  onPress,
}: {
  label: string;
  carryType: "stop" | "division";
  carryId: string;
  listeners?: object;
  attributes?: object;
  setRef?: (el: HTMLElement | null) => void;
  onPress?: ((e: PointerEvent<HTMLButtonElement>) => void) | null;
}) {
  return (
    <button
      type="button"
      ref={setRef}
      aria-label={label}
      className="-my-1 cursor-grab touch-none rounded px-1 py-1 text-tin hover:bg-paper-deep hover:text-ink active:cursor-grabbing"
      {...(onPress ? { "aria-roledescription": "draggable", "aria-describedby": BOARD_ID, onPointerDown: onPress } : {})}
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
 * The grip of a stop. It reads no dnd-kit context: with 150 stops, a hook per grip drew every grip
 * again whenever a drag started, crossed a column or ended. The board's one stop draggable takes the
 * press instead (division-board.tsx), and marks the card left behind.
 */
const StopGrip = memo(function StopGrip({ stop }: { stop: DocStop }) {
  const press = useContext(StopPressContext);
  return <DragHandle label={`Move ${stopTitle(stop)}`} carryType="stop" carryId={stop.id} onPress={press} />;
});

/**
 * A stop on the board. Its layout and paint are contained, so a change inside one card is laid out
 * and painted within it. (content-visibility: auto cost more than it saved here: each drop moved cards
 * in and out of sight, and the browser drew a second frame to paint them.) Where a dragged card lands is worked out by the board from the pointer, so no card is
 * measured or redrawn while the pointer moves; the card being dragged is marked by the board with an
 * attribute (data-dragging), not by a redraw.
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
      className={`flex items-start gap-1.5 rounded border bg-paper-card px-2 py-1.5 shadow-[0_1px_0_rgba(29,36,51,0.05)] [contain:layout_paint] data-[dragging]:border-dashed data-[dragging]:border-brass data-[dragging]:opacity-40 ${isCarried ? "border-brass ring-2 ring-brass/60" : "border-tin-rule"}`}
      data-carried={isCarried || undefined}
      data-testid={`stop-${stop.name}`}
      data-stop-id={stop.id}
      data-division={divisionName}
    >
      {editable && (
        <span className="pt-0.5">
          <StopGrip stop={stop} />
        </span>
      )}
      <CardBody stop={stop} pipesText={pipesText} editable={editable} onOpen={onOpen} />
    </li>
  );
});
