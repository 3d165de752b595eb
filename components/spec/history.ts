/**
 * Undo and redo over whole documents: each edit pushes the previous document (documents are
 * immutable, so this is cheap) with the words of the edit that left it, so an undo or a redo can
 * say what it took back or put again ("Undid: Moved the Trumpet 8′ from the Great to the Swell").
 */
import type { SchemeDocument } from "@/lib/spec/document";

export const HISTORY_LIMIT = 200;

/** A document that undo or redo can return to, with the words of the edit that leads away from it. */
export type Step = { doc: SchemeDocument; label: string };

export type History = {
  past: Step[];
  present: SchemeDocument;
  future: Step[];
  /** Words for the latest change of `present` (the revision note of its save), or null at the start. */
  label: string | null;
};

export type HistoryAction =
  | { type: "edit"; doc: SchemeDocument; label: string }
  | { type: "undo" }
  | { type: "redo" }
  /** Replace the document from outside (their version, a restored revision), keeping ours as an undo step. */
  | { type: "replace"; doc: SchemeDocument; label: string };

export function initHistory(doc: SchemeDocument): History {
  return { past: [], present: doc, future: [], label: null };
}

export const undoneLabel = (label: string) => `Undid: ${label}`;
export const redoneLabel = (label: string) => `Redid: ${label}`;

export function historyReducer(h: History, a: HistoryAction): History {
  switch (a.type) {
    case "edit":
    case "replace":
      if (a.doc === h.present) return h;
      return { past: [...h.past, { doc: h.present, label: a.label }].slice(-HISTORY_LIMIT), present: a.doc, future: [], label: a.label };
    case "undo": {
      const prev = h.past[h.past.length - 1];
      if (!prev) return h;
      return { past: h.past.slice(0, -1), present: prev.doc, future: [{ doc: h.present, label: prev.label }, ...h.future], label: undoneLabel(prev.label) };
    }
    case "redo": {
      const [next, ...rest] = h.future;
      if (!next) return h;
      return { past: [...h.past, { doc: h.present, label: next.label }], present: next.doc, future: rest, label: redoneLabel(next.label) };
    }
  }
}

/** What the Undo and Redo buttons would do, for their titles. */
export function nextUndo(h: History): string | null {
  return h.past[h.past.length - 1]?.label ?? null;
}
export function nextRedo(h: History): string | null {
  return h.future[0]?.label ?? null;
}
