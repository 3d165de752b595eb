"use client";
/** The estimator run in the browser on every change of the document: the live figures. */
import { useMemo } from "react";
import type { Rates } from "@/lib/estimate";
import type { SchemeDocument, Tuning } from "@/lib/spec/document";
import { estimateDocument, type DocumentEstimate, type DrawingRules, type EstimateWithoutMoney } from "@/lib/spec/estimate";

type Ok = Extract<DocumentEstimate, { ok: true }>;
/** Live figures carry the whole estimate; figures computed on the server for a reader without money:read carry it without money. */
export type Figures = ((Ok | (Omit<Ok, "estimate"> & { estimate: EstimateWithoutMoney })) & { ms: number }) | Extract<DocumentEstimate, { ok: false }>;

/**
 * Where the editor's figures come from: the firm's rates in the browser (for the roles that may hold
 * them, who also edit), or figures worked out on the server for a read-only reader, with only the
 * drawing rules beside them, so no norm, crew size or price reaches that browser.
 */
export type FigureSource = { kind: "live"; rates: Rates } | { kind: "fixed"; figures: Figures; rules: DrawingRules };

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
export function useFigures(doc: SchemeDocument, tuning: Tuning, source: FigureSource): Figures {
  const { pitchHz, temperatureC } = tuning;
  return useMemo(() => (source.kind === "live" ? computeFigures(doc, { pitchHz, temperatureC }, source.rates) : source.figures), [doc, pitchHz, temperatureC, source]);
}

export function drawingRulesOf(source: FigureSource): DrawingRules {
  return source.kind === "live" ? source.rates : source.rules;
}

/** Pipe counts by stop id, for the stop cards. */
export function stopPipesById(figures: Figures): Map<string, { total: number; prepared: number; kind: string }> {
  const out = new Map<string, { total: number; prepared: number; kind: string }>();
  if (!figures.ok) return out;
  for (const d of figures.estimate.divisions)
    for (const s of d.stops) out.set(s.id, { total: s.pipes.total, prepared: s.pipes.prepared, kind: s.kind });
  return out;
}
