"use client";
import { useEffect, useState, type RefObject } from "react";
import { StateMark } from "@/components/ui/state-mark";
import type { DocDivision } from "@/lib/spec/document";
import type { ColumnFigures } from "./board-figures";

/**
 * The divisions as a row of buttons above the board. On a phone the board shows one division and
 * this picks it; on a wider screen it brings the division's column into view and says which
 * columns are off to the side, so a fifth or sixth division is never lost beyond the edge.
 */
export function DivisionPicker({
  divisions,
  columnFigures,
  picked,
  onPick,
  boardRef,
}: {
  divisions: readonly DocDivision[];
  columnFigures: Map<string, ColumnFigures>;
  picked: string | null;
  onPick: (divisionId: string) => void;
  boardRef: RefObject<HTMLDivElement | null>;
}) {
  const [hidden, setHidden] = useState<ReadonlyMap<string, "left" | "right">>(new Map());
  const ids = divisions.map((d) => d.id).join(" ");

  // Which columns are out of the board's view (only on a wide screen, where the board scrolls sideways).
  useEffect(() => {
    const board = boardRef.current;
    if (!board || typeof IntersectionObserver === "undefined") return;
    const out = new Map<string, "left" | "right">();
    const observer = new IntersectionObserver(
      (entries) => {
        for (const e of entries) {
          const id = (e.target as HTMLElement).dataset.divisionId!;
          // A column counts as in view when most of its width is; a hidden column (phone) never counts as out.
          if (e.intersectionRatio < 0.6 && e.boundingClientRect.width > 0) out.set(id, e.boundingClientRect.left < (e.rootBounds?.left ?? 0) ? "left" : "right");
          else out.delete(id);
        }
        setHidden(new Map(out));
      },
      { root: board, threshold: [0, 0.6, 1] },
    );
    board.querySelectorAll<HTMLElement>(":scope > [data-division-id]").forEach((el) => observer.observe(el));
    return () => observer.disconnect();
  }, [boardRef, ids]);

  if (divisions.length < 2) return null;
  const offscreen = divisions.filter((d) => hidden.has(d.id)).length;

  function pick(id: string) {
    onPick(id);
    const el = boardRef.current?.querySelector<HTMLElement>(`:scope > [data-division-id="${CSS.escape(id)}"]`);
    // After the phone layout has shown it.
    requestAnimationFrame(() => el?.scrollIntoView({ behavior: "smooth", block: "nearest", inline: "nearest" }));
  }

  return (
    <nav aria-label="Divisions" className="mb-2 flex items-center gap-2" data-testid="division-picker">
      <ul className="flex min-w-0 flex-1 gap-1.5 overflow-x-auto pb-1">
        {divisions.map((d) => {
          const f = columnFigures.get(d.id);
          const isPicked = d.id === picked;
          const away = hidden.get(d.id);
          return (
            <li key={d.id} className="shrink-0">
              <button
                type="button"
                onClick={() => pick(d.id)}
                aria-current={isPicked ? "true" : undefined}
                className={`inline-flex items-center gap-1.5 rounded-full border px-3 py-1 text-sm ${isPicked ? "max-md:border-brass max-md:bg-brass-light max-md:font-semibold" : ""} ${away ? "border-dashed border-tin-rule text-ink-soft" : "border-tin-rule bg-paper-card"} hover:border-brass`}
                title={away ? `${d.name} is off to the side: show it` : `Show the ${d.name}`}
              >
                {f?.fit === "clash" && <StateMark kind="clash" className="h-3.5 w-3.5 text-clash" />}
                <span>{d.name}</span>
                <span className="num text-xs text-tin">{d.stops.length}</span>
                {away && <span aria-hidden="true" className="text-tin">{away === "left" ? "←" : "→"}</span>}
              </button>
            </li>
          );
        })}
      </ul>
      {offscreen > 0 && (
        <span className="hidden shrink-0 text-xs text-tin md:inline" data-testid="divisions-offscreen">
          {offscreen} more to the side
        </span>
      )}
    </nav>
  );
}
