/** What the editor and its estimate worker (estimate.worker.ts) send each other. */
import type { Estimate, Rates } from "@/lib/estimate";
import type { SchemeDocument, Tuning } from "@/lib/spec/document";

export type WorkerRequest = { type: "rates"; rates: Rates } | { type: "estimate"; seq: number; doc: SchemeDocument; tuning: Tuning };

export type WorkerAnswer = {
  seq: number;
  result: { ok: true; estimate: Estimate } | { ok: false; messages: readonly string[] };
  /** The estimator's own time in the worker. */
  ms: number;
};
