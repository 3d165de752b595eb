"use client";
/**
 * The live figures: the estimator run on every change of the document, in a Web Worker
 * (estimate.worker.ts), so the page stays free while it works. Until the worker answers for the
 * latest document the figures shown are marked stale; the first ones arrive just after the page
 * has loaded, so neither the server nor hydration waits for an estimate.
 */
import { useCallback, useEffect, useRef, useState } from "react";
import { flushSync } from "react-dom";
import type { Estimate, Rates } from "@/lib/estimate";
import type { SchemeDocument, Tuning } from "@/lib/spec/document";
import type { DrawingRules, EstimateWithoutMoney } from "@/lib/spec/estimate";
import { patchOf } from "./doc-patch";
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

/** A document to work out figures for; a guess is one that may never be shown (see `guess`). */
type Job = { doc: SchemeDocument; tuning: Tuning; guess?: boolean };
/** The same document (by identity: documents are immutable) at the same tuning. */
const sameJob = (a: Job | null, doc: SchemeDocument, tuning: Tuning) => !!a && a.doc === doc && a.tuning.pitchHz === tuning.pitchHz && a.tuning.temperatureC === tuning.temperatureC;

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

export function useFigures(
  doc: SchemeDocument,
  tuning: Tuning,
  source: FigureSource,
): FigureState & { ahead: (doc: SchemeDocument) => void; guess: (doc: SchemeDocument) => void } {
  const { pitchHz, temperatureC } = tuning;
  // The figures shown and the document and tuning they were worked out for: they are stale while
  // that is not the document shown.
  const [live, setLive] = useState<{ figures: Figures | null; seq: number; job: Job | null }>({ figures: null, seq: 0, job: null });
  const worker = useRef<Worker | null>(null);
  const seq = useRef(0);
  // One job in the worker at a time; documents that arrive meanwhile keep only the latest.
  const busy = useRef(false);
  const next = useRef<{ seq: number; job: Job } | null>(null);
  /** The jobs asked for by sequence number, until answered. */
  const jobs = useRef(new Map<number, Job>());
  /** The latest job asked for: the same document is not asked for twice. */
  const asked = useRef<Job | null>(null);
  /** The document the worker holds, which the next is sent as a patch on (doc-patch.ts). */
  const held = useRef<SchemeDocument | null>(null);
  /** The document shown, or about to be (ahead): answers for a guess of another are kept aside. */
  const shown = useRef<SchemeDocument>(doc);
  /** The latest guess and, once the worker has answered, its figures (with the answer's sequence number). */
  const guessed = useRef<{ job: Job; answer: { seq: number; figures: Figures } | null } | null>(null);
  const tuningRef = useRef<Tuning>({ pitchHz, temperatureC });
  useEffect(() => {
    tuningRef.current = { pitchHz, temperatureC };
  }, [pitchHz, temperatureC]);
  const rates = source.kind === "live" ? source.rates : null;
  // In the first render in the browser, before the rest of the page hydrates (render-time, once).
  useState(() => (rates ? prime({ doc, tuning: { pitchHz, temperatureC } }, rates) : undefined));

  const send = useCallback((w: Worker, s: number, job: Job) => {
    busy.current = true;
    const base = held.current;
    held.current = job.doc;
    w.postMessage(
      (base ? { type: "estimate", seq: s, patch: patchOf(base, job.doc), tuning: job.tuning } : { type: "estimate", seq: s, doc: job.doc, tuning: job.tuning }) satisfies WorkerRequest,
    );
  }, []);

  /** Asks the worker for the figures of `job` (once per document), now or after the job it is on. */
  const request = useCallback(
    (w: Worker, job: Job) => {
      if (sameJob(asked.current, job.doc, job.tuning)) return;
      asked.current = job;
      const s = ++seq.current;
      jobs.current.set(s, job);
      if (busy.current) {
        if (next.current) jobs.current.delete(next.current.seq);
        next.current = { seq: s, job };
      } else send(w, s, job);
    },
    [send],
  );

  useEffect(() => {
    if (!rates) return;
    if (typeof Worker === "undefined") return;
    const adopted = primed?.rates === rates ? primed : null;
    if (adopted) primed = null;
    const w = adopted?.worker ?? newWorker();
    if (!adopted) w.postMessage({ type: "rates", rates } satisfies WorkerRequest);
    const onAnswer = ({ seq: s, result, ms }: WorkerAnswer) => {
      busy.current = false;
      const job = jobs.current.get(s) ?? null;
      for (const k of jobs.current.keys()) if (k <= s) jobs.current.delete(k);
      const queued = next.current;
      next.current = null;
      if (queued) send(w, queued.seq, queued.job);
      const figures: Figures = result.ok ? { ok: true, estimate: result.estimate, ms } : result;
      // A guess not shown (yet) is kept aside: the drop that shows it shows its figures with it.
      if (job?.guess && job.doc !== shown.current) {
        if (guessed.current?.job === job) guessed.current.answer = { seq: s, figures };
        return;
      }
      setLive((prev) => (s < prev.seq ? prev : { seq: s, job, figures }));
    };
    // Drawn in the worker's own message task: a task React scheduled after it would wait behind
    // the frames the browser draws first after a drop, and the new figures with it.
    w.onmessage = (e: MessageEvent<WorkerAnswer>) => flushSync(() => onAnswer(e.data));
    worker.current = w;
    next.current = null;
    jobs.current.clear();
    // The primed worker is on the first document already (sequence number 1) and holds it.
    if (adopted) {
      seq.current = Math.max(seq.current, 1);
      jobs.current.set(1, adopted.job);
      asked.current = adopted.job;
      held.current = adopted.job.doc;
      busy.current = true;
    } else {
      asked.current = null;
      held.current = null;
      busy.current = false;
    }
    // An answer that came before this effect.
    for (const answer of adopted?.answers ?? []) onAnswer(answer);
    return () => {
      w.terminate();
      worker.current = null;
      held.current = null;
      asked.current = null;
      busy.current = false;
    };
  }, [rates, send]);

  useEffect(() => {
    shown.current = doc;
    if (!rates) return;
    const job = { doc, tuning: { pitchHz, temperatureC } };
    const w = worker.current;
    if (!w) {
      // No worker in this browser: the same estimator, here.
      const s = ++seq.current;
      void estimateHere(job, rates).then((figures) => setLive((cur) => (s > cur.seq ? { seq: s, job, figures } : cur)));
      return;
    }
    request(w, job);
  }, [doc, pitchHz, temperatureC, rates, request]);

  /**
   * Asks for the figures of a document about to be shown, before React draws it: the worker works
   * while the page commits the edit, instead of after. The document's own render asks again, which
   * then costs nothing.
   */
  const ahead = useCallback(
    (upcoming: SchemeDocument) => {
      shown.current = upcoming;
      const w = worker.current;
      if (!w) return;
      const job = { doc: upcoming, tuning: tuningRef.current };
      const g = guessed.current;
      guessed.current = null;
      // Worked out while the stop was dragged: shown with the drop, in the same frame.
      if (g?.answer && sameJob(g.job, upcoming, job.tuning)) {
        const { seq: s, figures } = g.answer;
        asked.current = job;
        setLive((prev) => (s < prev.seq ? prev : { seq: s, job: g.job, figures }));
        return;
      }
      // A guess still in the worker is not asked for again (request), and its answer is shown when
      // it comes, for its document is the one shown now.
      request(w, job);
    },
    [request],
  );

  /**
   * Asks for the figures of a document that may be shown soon (where a dragged stop would land), so
   * that if it is, its figures are ready. They are not shown unless it is (ahead with the very same
   * document); a later guess replaces an earlier one.
   */
  const guess = useCallback(
    (candidate: SchemeDocument) => {
      const w = worker.current;
      if (!w || guessed.current?.job.doc === candidate) return;
      const job = { doc: candidate, tuning: tuningRef.current, guess: true };
      guessed.current = { job, answer: null };
      request(w, job);
    },
    [request],
  );

  if (source.kind === "fixed") return { figures: source.figures, stale: false, ahead, guess };
  const shownFor = live.job;
  const stale = live.figures === null || !sameJob(shownFor, doc, tuning);
  return { figures: live.figures, stale, ahead, guess };
}

export function drawingRulesOf(source: FigureSource): DrawingRules {
  return source.kind === "live" ? source.rates : source.rules;
}
