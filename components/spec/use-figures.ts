"use client";
/** The estimator run in the browser on every change of the document: the live figures. */
import { useDeferredValue, useMemo } from "react";
import { estimateScheme, parseScheme, SchemeError, type Estimate, type Scheme } from "@/lib/estimate";
import { toEstimatorScheme, type SchemeDocument, type Tuning } from "@/lib/spec/document";

export type Figures =
  | { ok: true; estimate: Estimate; scheme: Scheme; ms: number }
  | { ok: false; messages: readonly string[] };

export function computeFigures(doc: SchemeDocument, tuning: Tuning): Figures {
  if (doc.divisions.length === 0) return { ok: false, messages: ["Add a division to see the figures."] };
  const t0 = typeof performance !== "undefined" ? performance.now() : 0;
  const parsed = parseScheme(toEstimatorScheme(doc, tuning));
  if (!parsed.ok) return { ok: false, messages: parsed.messages };
  try {
    const estimate = estimateScheme(parsed.scheme);
    const ms = typeof performance !== "undefined" ? performance.now() - t0 : 0;
    return { ok: true, estimate, scheme: parsed.scheme, ms };
  } catch (err) {
    if (err instanceof SchemeError) return { ok: false, messages: err.messages };
    return { ok: false, messages: [err instanceof Error ? err.message : "The estimate could not be computed."] };
  }
}

/** Figures follow the document; deferred so typing and dragging never wait for the estimator. */
export function useFigures(doc: SchemeDocument, tuning: Tuning): Figures {
  const deferred = useDeferredValue(doc);
  const { pitchHz, temperatureC } = tuning;
  return useMemo(() => computeFigures(deferred, { pitchHz, temperatureC }), [deferred, pitchHz, temperatureC]);
}

/** Pipe counts by stop id, for the stop cards. */
export function stopPipesById(figures: Figures): Map<string, { total: number; prepared: number; kind: string }> {
  const out = new Map<string, { total: number; prepared: number; kind: string }>();
  if (!figures.ok) return out;
  for (const d of figures.estimate.divisions)
    for (const s of d.stops) out.set(s.id, { total: s.pipes.total, prepared: s.pipes.prepared, kind: s.kind });
  return out;
}
