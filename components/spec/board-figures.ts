"use client";
/**
 * What the board shows of the figures, per division: small values, the same object while they do
 * not change, so a column whose division and figures are unchanged is not drawn again after an
 * edit elsewhere (with 150 stops, a move redraws two columns, not six).
 */
import { useState } from "react";
import type { DrawingUnits } from "@/lib/drawing/units";
import { chestWords, fitState, type FitState } from "./chest-words";
import type { Figures } from "./use-figures";

export type ColumnFigures = {
  notes: number;
  pipesTotal: number;
  fit: FitState;
  hasChest: boolean;
  words: string;
  /** "61 pipes", "no pipes", "12 prepared" by stop id. */
  pipesText: Readonly<Record<string, string>>;
};

type StopPipes = { total: number; prepared: number; kind: string };

export function pipesWords(p: StopPipes | undefined): string {
  if (!p) return "– pipes";
  if (p.kind === "borrowed") return "no pipes";
  if (p.kind === "prepared") return `${p.prepared} prepared`;
  if (p.kind === "removed") return "removed";
  return `${p.total} ${p.total === 1 ? "pipe" : "pipes"}`;
}

/** Per division, with the chest in the firm's drawing units. */
export function columnFiguresOf(figures: Figures | null, units: DrawingUnits = "mm"): Map<string, ColumnFigures> {
  const out = new Map<string, ColumnFigures>();
  if (!figures?.ok) return out;
  for (const d of figures.estimate.divisions) {
    const hasChest = d.chest.main.rows > 0;
    const pipesText: Record<string, string> = {};
    for (const s of d.stops) pipesText[s.id] = pipesWords({ total: s.pipes.total, prepared: s.pipes.prepared, kind: s.kind });
    out.set(d.id, {
      notes: d.notes,
      pipesTotal: d.pipes.total,
      fit: fitState(d.chest.fit, hasChest),
      hasChest,
      words: chestWords(d.chest.main, d.chest.space, d.chest.fit, units),
      pipesText,
    });
  }
  return out;
}

function sameTexts(a: Readonly<Record<string, string>>, b: Readonly<Record<string, string>>): boolean {
  const keys = Object.keys(a);
  if (keys.length !== Object.keys(b).length) return false;
  for (const k of keys) if (a[k] !== b[k]) return false;
  return true;
}

/** Field by field: these are all the fields of ColumnFigures. */
function sameColumn(a: ColumnFigures, b: ColumnFigures): boolean {
  return a.notes === b.notes && a.pipesTotal === b.pipesTotal && a.fit === b.fit && a.hasChest === b.hasChest && a.words === b.words && sameTexts(a.pipesText, b.pipesText);
}

/** The new figures, each division's object kept from `before` when its content is the same. */
export function keepUnchanged(before: ReadonlyMap<string, ColumnFigures>, after: Map<string, ColumnFigures>): Map<string, ColumnFigures> {
  const out = new Map<string, ColumnFigures>();
  for (const [id, value] of after) {
    const old = before.get(id);
    out.set(id, old && sameColumn(old, value) ? old : value);
  }
  return out;
}

/** Column figures that keep their identity while their content is the same (React's "information from previous renders"). */
export function useColumnFigures(figures: Figures | null, units: DrawingUnits): Map<string, ColumnFigures> {
  const [kept, setKept] = useState(() => ({ figures, units, map: columnFiguresOf(figures, units) }));
  if (kept.figures !== figures || kept.units !== units) {
    const map = keepUnchanged(kept.map, columnFiguresOf(figures, units));
    setKept({ figures, units, map });
    return map;
  }
  return kept.map;
}
