/**
 * The editor's live figures off the main thread: the same estimator (lib/spec/estimate →
 * lib/estimate) as the server and the command line, run in a Web Worker so a 150-stop estimate
 * never holds up a drag or a drop. The page sends the firm's rates once, then documents; the
 * worker answers each with the estimate and the milliseconds it took.
 */
import type { Rates } from "@/lib/estimate";
import type { SchemeDocument, Tuning } from "@/lib/spec/document";
import { estimateDocument } from "@/lib/spec/estimate";
import { applyPatch } from "./doc-patch";
import type { WorkerAnswer, WorkerRequest } from "./estimate-messages";

let rates: Rates | null = null;
/** The last document sent: the next may come as a patch on it. */
let held: SchemeDocument | null = null;

self.onmessage = (e: MessageEvent<WorkerRequest>) => {
  const msg = e.data;
  if (msg.type === "rates") {
    rates = msg.rates;
    return;
  }
  try {
    held = "doc" in msg ? msg.doc : applyPatch(held!, msg.patch);
  } catch (err) {
    held = null;
    const answer: WorkerAnswer = { seq: msg.seq, result: { ok: false, messages: [`The figures could not be worked out: ${err instanceof Error ? err.message : String(err)}`] }, ms: 0 };
    (self as unknown as Worker).postMessage(answer);
    return;
  }
  if (!rates) return;
  const answer: WorkerAnswer = { seq: msg.seq, ...estimate(held, msg.tuning, rates) };
  (self as unknown as Worker).postMessage(answer);
};

function estimate(doc: SchemeDocument, tuning: Tuning, r: Rates): Omit<WorkerAnswer, "seq"> {
  const t0 = performance.now();
  try {
    const result = estimateDocument(doc, tuning, r);
    const ms = performance.now() - t0;
    // The parsed scheme stays here: only the chest drawings need it, and they parse it themselves.
    return result.ok ? { result: { ok: true, estimate: result.estimate }, ms } : { result, ms };
  } catch (err) {
    return { result: { ok: false, messages: [`The figures could not be worked out: ${err instanceof Error ? err.message : String(err)}`] }, ms: performance.now() - t0 };
  }
}
