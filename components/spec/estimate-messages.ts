/** What the editor and its estimate worker (estimate.worker.ts) send each other. */
import type { Estimate, Rates } from "@/lib/estimate";
import type { SchemeDocument, Tuning } from "@/lib/spec/document";
import type { DocPatch } from "./doc-patch";

/**
 * The worker keeps the last document it was sent: a later one comes whole (`doc`) or as the
 * difference from that one (`patch`, doc-patch.ts).
 */
export type WorkerRequest =
  | { type: "rates"; rates: Rates }
  | { type: "estimate"; seq: number; doc: SchemeDocument; tuning: Tuning }
  | { type: "estimate"; seq: number; patch: DocPatch; tuning: Tuning };

export type WorkerAnswer = {
  seq: number;
  result: { ok: true; estimate: Estimate } | { ok: false; messages: readonly string[] };
  /** The estimator's own time in the worker. */
  ms: number;
};
