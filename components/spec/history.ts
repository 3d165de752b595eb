/** Undo and redo over whole documents: each edit pushes the previous document (documents are immutable, so this is cheap). */
import type { SchemeDocument } from "@/lib/spec/document";

export const HISTORY_LIMIT = 200;

export type History = { past: SchemeDocument[]; present: SchemeDocument; future: SchemeDocument[]; label: string | null };

export type HistoryAction =
  | { type: "edit"; doc: SchemeDocument; label: string }
  | { type: "undo" }
  | { type: "redo" }
  /** Replace the document from outside (their version, a restored revision), keeping ours as an undo step. */
  | { type: "replace"; doc: SchemeDocument; label: string };

export function initHistory(doc: SchemeDocument): History {
  return { past: [], present: doc, future: [], label: null };
}

export function historyReducer(h: History, a: HistoryAction): History {
  switch (a.type) {
    case "edit":
    case "replace":
      if (a.doc === h.present) return h;
      return { past: [...h.past, h.present].slice(-HISTORY_LIMIT), present: a.doc, future: [], label: a.label };
    case "undo": {
      if (h.past.length === 0) return h;
      const prev = h.past[h.past.length - 1];
      return { past: h.past.slice(0, -1), present: prev, future: [h.present, ...h.future], label: "Undone" };
    }
    case "redo": {
      if (h.future.length === 0) return h;
      const [next, ...rest] = h.future;
      return { past: [...h.past, h.present], present: next, future: rest, label: "Redone" };
    }
  }
}
