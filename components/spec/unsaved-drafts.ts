/**
 * Unsaved work kept in the browser (localStorage), one draft per scheme, so a crash, a closed tab or
 * a lost connection never loses an edit: the editor offers it back on return. A draft remembers the
 * version it was based on, so restoring it over a newer version goes through the conflict choice.
 */
import type { SchemeDocument } from "@/lib/spec/document";

export type UnsavedDraft = { schemeId: string; baseVersion: number; savedAt: string; document: SchemeDocument };

const PREFIX = "stopwright.unsaved.";
const keyOf = (schemeId: string) => PREFIX + schemeId;

/** The storage may be missing (private mode) or full; keeping a draft is best effort, never an error. */
function storage(): Storage | null {
  try {
    return typeof window === "undefined" ? null : window.localStorage;
  } catch {
    return null;
  }
}

export function writeDraft(draft: UnsavedDraft): boolean {
  try {
    storage()?.setItem(keyOf(draft.schemeId), JSON.stringify(draft));
    return true;
  } catch {
    return false;
  }
}

export function readDraft(schemeId: string): UnsavedDraft | null {
  try {
    const raw = storage()?.getItem(keyOf(schemeId));
    if (!raw) return null;
    const d = JSON.parse(raw) as Partial<UnsavedDraft>;
    if (d.schemeId !== schemeId || typeof d.baseVersion !== "number" || typeof d.savedAt !== "string" || !d.document || !Array.isArray(d.document.divisions)) return null;
    return d as UnsavedDraft;
  } catch {
    return null;
  }
}

export function clearDraft(schemeId: string): void {
  try {
    storage()?.removeItem(keyOf(schemeId));
  } catch {
    /* nothing kept, nothing to clear */
  }
}

/** JSON with object keys sorted, so two documents with the same content compare equal. */
function canonical(value: unknown): string {
  return JSON.stringify(value, (_k, v: unknown) =>
    v && typeof v === "object" && !Array.isArray(v) ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) : v,
  );
}

export function sameDocument(a: SchemeDocument, b: SchemeDocument): boolean {
  return a === b || canonical(a) === canonical(b);
}
