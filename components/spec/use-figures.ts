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
import { estimateDocument, type DrawingRules, type EstimateWithoutMoney } from "@/lib/spec/estimate";
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

function estimateHere(job: Job, rates: Rates): Figures {
  const t0 = performance.now();
  const r = estimateDocument(job.doc, job.tuning, rates);
  return r.ok ? { ok: true, estimate: r.estimate, ms: performance.now() - t0 } : r;
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
  const rates = source.kind === "live" ? source.rates : null;

  useEffect(() => {
    if (!rates) return;
    if (typeof Worker === "undefined") return;
    const w = new Worker(new URL("./estimate.worker.ts", import.meta.url), { type: "module", name: "estimate" });
    w.postMessage({ type: "rates", rates } satisfies WorkerRequest);
    w.onmessage = (e: MessageEvent<WorkerAnswer>) => {
      const { seq: s, result, ms } = e.data;
      busy.current = false;
      const queued = next.current;
      next.current = null;
      if (queued) send(w, queued.seq, queued.job);
      setLive((prev) => (s < prev.seq ? prev : { seq: s, figures: result.ok ? { ok: true, estimate: result.estimate, ms } : result }));
    };
    worker.current = w;
    busy.current = false;
    next.current = null;
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
    if (!w) {
      // No worker in this browser: the same estimator, here.
      setLive({ seq: s, figures: estimateHere(job, rates) });
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
