"use client";
/** The estimator run in the browser on every change of the document: the live figures. */
import { useMemo } from "react";
import type { Rates } from "@/lib/estimate";
import type { SchemeDocument, Tuning } from "@/lib/spec/document";
import { estimateDocument, type DocumentEstimate } from "@/lib/spec/estimate";

export type Figures = (Extract<DocumentEstimate, { ok: true }> & { ms: number }) | Extract<DocumentEstimate, { ok: false }>;

export function computeFigures(doc: SchemeDocument, tuning: Tuning, rates: Rates): Figures {
  const t0 = performance.now();
  const result = estimateDocument(doc, tuning, rates);
  return result.ok ? { ...result, ms: performance.now() - t0 } : result;
}

/**
 * Figures follow the document in the same render: the estimator takes a few milliseconds even for
 * a 150-stop scheme, and edits arrive whole (a drop, a submitted form), never per keystroke, so
 * deferring would only add a frame between a move and its figures.
 */
export function useFigures(doc: SchemeDocument, tuning: Tuning, rates: Rates): Figures {
  const { pitchHz, temperatureC } = tuning;
  return useMemo(() => computeFigures(doc, { pitchHz, temperatureC }, rates), [doc, pitchHz, temperatureC, rates]);
}

/** Pipe counts by stop id, for the stop cards. */
export function stopPipesById(figures: Figures): Map<string, { total: number; prepared: number; kind: string }> {
  const out = new Map<string, { total: number; prepared: number; kind: string }>();
  if (!figures.ok) return out;
  for (const d of figures.estimate.divisions)
    for (const s of d.stops) out.set(s.id, { total: s.pipes.total, prepared: s.pipes.prepared, kind: s.kind });
  return out;
}
