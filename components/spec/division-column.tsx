"use client";
import { useSortable } from "@dnd-kit/sortable";
import { CSS } from "@dnd-kit/utilities";
import { Fragment, memo, startTransition, useCallback, useEffect, useLayoutEffect, useRef, useState } from "react";
import { StateMark } from "@/components/ui/state-mark";
import type { DocDivision } from "@/lib/spec/document";
import type { ColumnFigures } from "./board-figures";
import { actionLabels, compassText, formatNumber, windText } from "./format";
import { DragHandle, StopCard } from "./stop-card";

/** A swell box: a box with shutters, our mark for an enclosed division. */
function EnclosedMark() {
  return (
    <svg viewBox="0 0 16 16" className="inline-block h-3.5 w-3.5" aria-hidden="true">
      <rect x="2" y="2.5" width="12" height="11" fill="none" stroke="currentColor" strokeWidth="1.5" />
      <path d="M4.5 5.5h7M4.5 8h7M4.5 10.5h7" stroke="currentColor" strokeWidth="1.2" />
    </svg>
  );
}

/** Where a dragged stop would land: a brass line between cards. */
function DropLine() {
  return <li aria-hidden="true" className="-my-1 h-1 rounded bg-brass" data-testid="drop-line" />;
}

/**
 * Cards drawn with the page (server and hydration): enough to fill a tall screen. The rest follow just
 * after, a batch at a time in transitions React can interrupt, so a 150-stop scheme hydrates about a
 * third of its cards and no batch holds the page for long.
 */
const FIRST_CARDS = 16;
const CARDS_PER_BATCH = 8;

/**
 * The grip of a division and its column's place in dnd-kit: the one part of a column that reads
 * dnd-kit's context, which changes whenever a drag starts, crosses a column or ends. What it changes
 * on the column (its node, its shift while divisions are sorted, whether it is lifted or has a stop
 * over it) it sets on the column's element, so the column and its cards are not drawn again for it.
 */
function DivisionGrip({ division }: { division: DocDivision }) {
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging, isOver, active } = useSortable({
    id: `div:${division.id}`,
    data: { type: "division", divisionId: division.id },
  });
  // The grip's column is the sortable node (the grip is in its header).
  const sectionRef = useRef<HTMLElement | null>(null);
  const setRef = useCallback(
    (el: HTMLElement | null) => {
      sectionRef.current = el?.closest("section") ?? null;
      setActivatorNodeRef(el);
      setNodeRef(sectionRef.current);
    },
    [setActivatorNodeRef, setNodeRef],
  );
  const stopOver = isOver && active !== null && !String(active.id).startsWith("div:");
  const shift = CSS.Translate.toString(transform) ?? "";
  useLayoutEffect(() => {
    const el = sectionRef.current;
    if (!el) return;
    el.style.transform = shift;
    el.style.transition = transition ?? "";
    el.toggleAttribute("data-lifted", isDragging);
    el.toggleAttribute("data-stop-over", stopOver);
  }, [shift, transition, isDragging, stopOver]);
  return <DragHandle label={`Move division ${division.name}`} carryType="division" carryId={division.id} listeners={listeners} attributes={attributes} setRef={setRef} />;
}

/**
 * One division on the board. Memoised: it is drawn again only when its division, its figures or the
 * drop line in it changes, never for a move in another column nor for a drag starting or ending
 * (DivisionGrip). On a phone only the division picked in the picker is shown.
 */
export const DivisionColumn = memo(function DivisionColumn({
  division,
  figures,
  editable,
  dropIndex,
  picked,
  onEditDivision,
  onAddStop,
  onOpenStop,
}: {
  division: DocDivision;
  figures: ColumnFigures | undefined;
  editable: boolean;
  /** Where a stop dragged by the pointer would go, as an index in this column's list; null when not here. */
  dropIndex: number | null;
  /** The division shown on a phone. */
  picked: boolean;
  onEditDivision: (divisionId: string) => void;
  onAddStop: (divisionId: string) => void;
  onOpenStop: (stopId: string) => void;
}) {
  const [shown, setShown] = useState(FIRST_CARDS);
  const stopCount = division.stops.length;
  useEffect(() => {
    if (shown >= stopCount) return;
    startTransition(() => setShown((n) => (n + CARDS_PER_BATCH >= stopCount ? Infinity : n + CARDS_PER_BATCH)));
  }, [shown, stopCount]);
  const stops = shown >= stopCount ? division.stops : division.stops.slice(0, shown);
  const state = figures?.fit ?? "unknown";
  return (
    <section
      className={`${picked ? "flex" : "hidden"} min-w-0 flex-col rounded-md border bg-paper-deep/60 md:flex data-[lifted]:z-20 data-[lifted]:border-brass data-[lifted]:opacity-90 data-[lifted]:shadow-lg data-[stop-over]:border-brass ${dropIndex !== null ? "border-brass" : state === "clash" ? "border-clash" : "border-tin-rule"}`}
      data-testid={`division-${division.name}`}
      data-division-id={division.id}
      aria-labelledby={`div-title-${division.id}`}
    >
      <header className="border-b border-tin-rule px-2.5 pb-2 pt-2">
        <div className="flex items-center gap-1.5">
          {editable && <DivisionGrip division={division} />}
          <h3 id={`div-title-${division.id}`} className="min-w-0 flex-1 truncate text-lg font-semibold" title={division.name}>{division.name}</h3>
          {editable && (
            <button type="button" className="btn px-2 py-0.5 text-xs" onClick={() => onEditDivision(division.id)} aria-label={`Edit division ${division.name}`}>
              Edit
            </button>
          )}
        </div>
        <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-2 text-xs text-ink-soft">
          <dt className="text-tin">Compass</dt>
          <dd className="num">{compassText(division.compass)}{figures && <span className="text-tin"> · {figures.notes} notes</span>}</dd>
          <dt className="text-tin">Action</dt>
          <dd>{actionLabels[division.action]}</dd>
          <dt className="text-tin">Wind</dt>
          <dd className="num">{windText(division.windPressure)}</dd>
        </dl>
        <div className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-0.5 text-xs">
          {division.enclosed && (
            <span className="inline-flex items-center gap-1 text-ink" data-testid={`enclosed-${division.name}`}><EnclosedMark />Enclosed</span>
          )}
          <span className="num text-tin">
            {division.stops.length} {division.stops.length === 1 ? "stop" : "stops"}
            {figures && <> · {formatNumber(figures.pipesTotal)} {figures.pipesTotal === 1 ? "pipe" : "pipes"}</>}
          </span>
        </div>
        {figures?.hasChest && (
          <p
            className={`mt-1.5 flex items-start gap-1 text-xs ${state === "clash" ? "font-semibold text-clash" : state === "fit" ? "text-fit" : "text-tin"}`}
            data-testid={`fit-${division.name}`}
            data-fits={state}
            title={figures.words}
          >
            <StateMark kind={state} className="mt-px h-3.5 w-3.5" />
            {state === "clash" ? "Chest does not fit" : state === "fit" ? "Chest fits" : "Chest space not given"}
          </p>
        )}
      </header>
      <ol className="flex min-h-16 flex-1 flex-col gap-1.5 p-2" aria-label={`Stops of the ${division.name}`}>
        {stops.map((s, i) => (
          <Fragment key={s.id}>
            {dropIndex === i && <DropLine />}
            <StopCard stop={s} pipesText={figures?.pipesText[s.id] ?? "– pipes"} divisionName={division.name} editable={editable} onOpen={onOpenStop} />
          </Fragment>
        ))}
        {dropIndex !== null && dropIndex >= division.stops.length && <DropLine />}
        {division.stops.length === 0 && <li className="rounded border border-dashed border-tin-rule px-2 py-3 text-center text-xs text-tin">No stops yet{editable ? " — add one or drag one here" : ""}.</li>}
      </ol>
      {editable && (
        <div className="border-t border-tin-rule p-2">
          <button type="button" className="btn w-full justify-center py-1 text-xs" onClick={() => onAddStop(division.id)} aria-label={`Add a stop to the ${division.name}`}>
            + Add stop
          </button>
        </div>
      )}
    </section>
  );
});
