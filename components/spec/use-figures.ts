"use client";
/**
 * The live figures: the estimator run on every change of the document, in a Web Worker
 * (estimate.worker.ts), so the page stays free while it works. Until the worker answers for the
 * latest document the figures shown are marked stale; the first ones arrive just after the page
 * has loaded, so neither the server nor hydration waits for an estimate.
 */
import { useEffect, useRef, useState } from "react";
import type { Estimate, Rates } from "@/lib/estimate";
import type { SchemeDocument, Tuning } from "@/lib/spec/document";
import type { DrawingRules, EstimateWithoutMoney } from "@/lib/spec/estimate";
import type { WorkerAnswer, WorkerRequest } from "./estimate-messages";

/** Live figures carry the whole estimate; figures computed on the server for a reader without money:read carry it without money. */
export type Figures = { ok: true; estimate: Estimate | EstimateWithoutMoney; ms: number } | { ok: false; messages: readonly string[] };

/**
 * Where the editor's figures come from: the firm's rates in the browser (for the roles that may hold
 * them, who also edit), or figures worked out on the server for a read-only reader, with only the
 * drawing rules beside them, so no norm, crew size or price reaches that browser.
 */
export type FigureSource = { kind: "live"; rates: Rates } | { kind: "fixed"; figures: Figures; rules: DrawingRules };

/** The figures to show (null before the first arrive) and whether they are behind the document. */
export type FigureState = { figures: Figures | null; stale: boolean };

type Job = { doc: SchemeDocument; tuning: Tuning };

/** Only for a browser without workers: the estimator is loaded then, so the editor's first scripts leave it to the worker. */
async function estimateHere(job: Job, rates: Rates): Promise<Figures> {
  const { estimateDocument } = await import("@/lib/spec/estimate");
  const t0 = performance.now();
  const r = estimateDocument(job.doc, job.tuning, rates);
  return r.ok ? { ok: true, estimate: r.estimate, ms: performance.now() - t0 } : r;
}

const newWorker = () => new Worker(new URL("./estimate.worker.ts", import.meta.url), { type: "module", name: "estimate" });

/**
 * The first estimate, asked for while the page hydrates: the worker starts and works out the first
 * figures on its own thread during hydration (about half a second for 150 stops on a slow machine),
 * instead of after it. The hook's effect adopts the worker and its answer (sequence number 1).
 */
type Primed = { worker: Worker; rates: Rates; job: Job; answers: WorkerAnswer[] };
let primed: Primed | null = null;

function prime(job: Job, rates: Rates) {
  if (primed || typeof window === "undefined" || typeof Worker === "undefined") return;
  const worker = newWorker();
  const p: Primed = { worker, rates, job, answers: [] };
  worker.onmessage = (e: MessageEvent<WorkerAnswer>) => void p.answers.push(e.data);
  worker.postMessage({ type: "rates", rates } satisfies WorkerRequest);
  worker.postMessage({ type: "estimate", seq: 1, doc: job.doc, tuning: job.tuning } satisfies WorkerRequest);
  primed = p;
}

export function useFigures(doc: SchemeDocument, tuning: Tuning, source: FigureSource): FigureState {
  const { pitchHz, temperatureC } = tuning;
  const [live, setLive] = useState<{ figures: Figures | null; seq: number }>({ figures: null, seq: 0 });
  const [wanted, setWanted] = useState(0);
  const worker = useRef<Worker | null>(null);
  const seq = useRef(0);
  // One job in the worker at a time; documents that arrive meanwhile keep only the latest.
  const busy = useRef(false);
  const next = useRef<{ seq: number; job: Job } | null>(null);
  // The document the primed worker is already working on (its answer comes as sequence number 1).
  const inFlight = useRef<Job | null>(null);
  const rates = source.kind === "live" ? source.rates : null;
  // In the first render in the browser, before the rest of the page hydrates (render-time, once).
  useState(() => (rates ? prime({ doc, tuning: { pitchHz, temperatureC } }, rates) : undefined));

  useEffect(() => {
    if (!rates) return;
    if (typeof Worker === "undefined") return;
    const adopted = primed?.rates === rates ? primed : null;
    if (adopted) primed = null;
    const w = adopted?.worker ?? newWorker();
    if (!adopted) w.postMessage({ type: "rates", rates } satisfies WorkerRequest);
    const onAnswer = ({ seq: s, result, ms }: WorkerAnswer) => {
      busy.current = false;
      const queued = next.current;
      next.current = null;
      if (queued) send(w, queued.seq, queued.job);
      setLive((prev) => (s < prev.seq ? prev : { seq: s, figures: result.ok ? { ok: true, estimate: result.estimate, ms } : result }));
    };
    w.onmessage = (e: MessageEvent<WorkerAnswer>) => onAnswer(e.data);
    worker.current = w;
    busy.current = !!adopted;
    inFlight.current = adopted?.job ?? null;
    next.current = null;
    // An answer that came before this effect.
    for (const answer of adopted?.answers ?? []) onAnswer(answer);
    return () => {
      w.terminate();
      worker.current = null;
    };
  }, [rates]);

  function send(w: Worker, s: number, job: Job) {
    busy.current = true;
    w.postMessage({ type: "estimate", seq: s, doc: job.doc, tuning: job.tuning } satisfies WorkerRequest);
  }

  useEffect(() => {
    if (!rates) return;
    const s = ++seq.current;
    const job = { doc, tuning: { pitchHz, temperatureC } };
    setWanted(s);
    const w = worker.current;
    const primedJob = inFlight.current;
    inFlight.current = null;
    // The primed worker is on this very document: its answer is this one's (both sequence number 1).
    if (w && s === 1 && primedJob && primedJob.doc === doc && primedJob.tuning.pitchHz === pitchHz && primedJob.tuning.temperatureC === temperatureC) return;
    if (!w) {
      // No worker in this browser: the same estimator, here.
      void estimateHere(job, rates).then((figures) => setLive((cur) => (s > cur.seq ? { seq: s, figures } : cur)));
      return;
    }
    if (busy.current) next.current = { seq: s, job };
    else send(w, s, job);
  }, [doc, pitchHz, temperatureC, rates]);

  if (source.kind === "fixed") return { figures: source.figures, stale: false };
  return { figures: live.figures, stale: live.figures === null || live.seq < wanted };
}

export function drawingRulesOf(source: FigureSource): DrawingRules {
  return source.kind === "live" ? source.rates : source.rules;
}
