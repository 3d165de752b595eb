"use client";
import { useMemo } from "react";
import { planScheme, schemeSchema, type Scheme, type SchemePlan } from "@/lib/estimate";
import { toEstimatorScheme, type SchemeDocument, type Tuning } from "@/lib/spec/document";
import type { Figures } from "./use-figures";

/**
 * The checked scheme and its plan for the drawings (chests, scales). The estimate worker keeps its
 * parsed scheme (sending it back would copy the whole scheme on every edit), so a drawing tab parses
 * the document here, once per edit and only while it is open, whenever the figures say it is complete.
 */
export function useDrawingScheme(doc: SchemeDocument, tuning: Tuning, figures: Figures | null): { scheme: Scheme; plan: SchemePlan } | null {
  const { pitchHz, temperatureC } = tuning;
  const ok = !!figures?.ok;
  return useMemo(() => {
    if (!ok) return null;
    const parsed = schemeSchema.safeParse(toEstimatorScheme(doc, { pitchHz, temperatureC }));
    if (!parsed.success) return null;
    const plan = planScheme(parsed.data);
    return plan.messages.length ? null : { scheme: parsed.data, plan };
  }, [doc, pitchHz, temperatureC, ok]);
}
