"use client";
/**
 * Saving the editor's document: every edit is local at once; a pause of SAVE_DELAY_MS (or "Save now")
 * PUTs it with the version it was based on. A 409 stops saving and keeps both versions until the
 * designer chooses; a 422 shows the server's messages; nothing typed is dropped on any failure.
 * Until it is saved, the work is also kept in the browser (unsaved-drafts.ts), and leaving the editor
 * saves first (`flush`).
 */
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useCallback, useEffect, useRef, useState } from "react";
import type { SchemeDocument, SchemeRead } from "@/lib/spec/document";
import { keys } from "@/lib/query/keys";
import { api, ApiError, fieldMessages } from "./api";
import { clearDraft, writeDraft } from "./unsaved-drafts";

export const SAVE_DELAY_MS = 800;
/** How soon after an edit the browser copy is written (ms): off the path of the edit itself. */
const DRAFT_DELAY_MS = 150;

export type SaveState =
  | { kind: "saved" }
  | { kind: "unsaved" }
  | { kind: "saving" }
  | { kind: "conflict"; current: SchemeRead }
  | { kind: "invalid"; messages: string[] }
  | { kind: "error"; message: string };

/** The saved scheme in the query cache (the page prefetches it; the discussion's stop list reads it). */
export function schemeKey(id: string) {
  return keys.schemes.detail(id);
}

export function useSchemeSave({
  scheme,
  present,
  label,
  enabled,
}: {
  scheme: SchemeRead;
  present: SchemeDocument;
  /** Words of the latest edit, gathered into the revision note. */
  label: string | null;
  enabled: boolean;
}) {
  const queryClient = useQueryClient();
  const [state, setStateRaw] = useState<SaveState>({ kind: "saved" });
  const [version, setVersion] = useState(scheme.version);
  const versionRef = useRef(scheme.version);
  const savedRef = useRef<SchemeDocument>(present);
  const presentRef = useRef(present);
  const sendingRef = useRef<SchemeDocument | null>(null);
  const notesRef = useRef<string[]>([]);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const stateRef = useRef<SaveState>(state);
  const saveRef = useRef<() => Promise<void>>(async () => {});
  const inflightRef = useRef<Promise<void> | null>(null);
  const draftTimer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const setState = useCallback((s: SaveState) => {
    stateRef.current = s;
    setStateRaw(s);
  }, []);

  const setVer = useCallback((v: number) => {
    versionRef.current = v;
    setVersion(v);
  }, []);

  /** Writes the unsaved document to the browser now, or forgets the copy once all is saved. */
  const keepDraft = useCallback(() => {
    if (draftTimer.current) clearTimeout(draftTimer.current);
    draftTimer.current = null;
    if (presentRef.current === savedRef.current) clearDraft(scheme.id);
    else writeDraft({ schemeId: scheme.id, baseVersion: versionRef.current, savedAt: new Date().toISOString(), document: presentRef.current });
  }, [scheme.id]);

  const { mutateAsync } = useMutation({
    mutationFn: (body: { version: number; document: SchemeDocument; note?: string }) => api.saveScheme(scheme.id, body),
  });

  const saveNow = useCallback(async () => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    if (sendingRef.current) return; // the running save reschedules itself when it lands
    const doc = presentRef.current;
    if (doc === savedRef.current) {
      if (stateRef.current.kind !== "conflict") setState({ kind: "saved" });
      return;
    }
    const notes = [...new Set(notesRef.current)];
    const note = notes.length ? notes.join("; ").slice(0, 200) : undefined;
    sendingRef.current = doc;
    setState({ kind: "saving" });
    let landed!: () => void;
    inflightRef.current = new Promise<void>((resolve) => (landed = resolve));
    try {
      const { scheme: saved } = await mutateAsync({ version: versionRef.current, document: doc, note });
      savedRef.current = doc;
      notesRef.current = notesRef.current.slice(notes.length);
      setVer(saved.version);
      queryClient.setQueryData(schemeKey(scheme.id), saved);
      void queryClient.invalidateQueries({ queryKey: keys.schemes.revisions(scheme.id) });
      sendingRef.current = null;
      if (presentRef.current !== doc) {
        setState({ kind: "unsaved" });
        timer.current = setTimeout(() => void saveRef.current(), SAVE_DELAY_MS);
      } else {
        setState({ kind: "saved" });
        clearDraft(scheme.id);
      }
    } catch (err) {
      sendingRef.current = null;
      if (err instanceof ApiError && err.status === 409) {
        const current = (err.details as { current?: SchemeRead } | undefined)?.current;
        if (current) {
          setState({ kind: "conflict", current });
          return;
        }
        // Without their version in the answer, fetch it so the choice can still be offered.
        try {
          const { scheme: fresh } = await api.getScheme(scheme.id);
          setState({ kind: "conflict", current: fresh });
        } catch {
          setState({ kind: "error", message: err.message });
        }
      } else if (err instanceof ApiError && err.status === 422) {
        setState({ kind: "invalid", messages: fieldMessages(err) });
      } else {
        setState({ kind: "error", message: err instanceof Error ? err.message : "The scheme could not be saved." });
      }
    } finally {
      inflightRef.current = null;
      landed();
    }
  }, [mutateAsync, queryClient, scheme.id, setState, setVer]);

  /**
   * Saves whatever is pending and answers whether everything is now saved; false when a save was
   * refused, conflicted or could not reach the server (the work stays here and in the browser copy).
   */
  const flush = useCallback(async (): Promise<boolean> => {
    // Read afresh each time: a save in flight changes it meanwhile.
    // A conflict or a refusal waits for the designer; a failed connection is worth one more try.
    const waiting = () => ["conflict", "invalid"].includes(stateRef.current.kind);
    for (let attempt = 0; attempt < 4; attempt++) {
      if (inflightRef.current) await inflightRef.current;
      if (presentRef.current === savedRef.current) return true;
      if (waiting()) return false;
      await saveRef.current();
      if (waiting() || stateRef.current.kind === "error") return false;
    }
    return presentRef.current === savedRef.current;
  }, []);

  useEffect(() => {
    saveRef.current = saveNow;
  }, [saveNow]);

  // Every change of the document (an edit, undo or redo) schedules a save.
  useEffect(() => {
    presentRef.current = present;
    if (!enabled) return;
    if (present === savedRef.current) {
      if (stateRef.current.kind === "unsaved" || stateRef.current.kind === "invalid" || stateRef.current.kind === "error") setState({ kind: "saved" });
      if (timer.current) clearTimeout(timer.current);
      return;
    }
    if (label) notesRef.current.push(label);
    if (draftTimer.current) clearTimeout(draftTimer.current);
    draftTimer.current = setTimeout(keepDraft, DRAFT_DELAY_MS);
    const k = stateRef.current.kind;
    if (k === "conflict") return; // wait for the designer's choice
    if (k !== "saving") setState({ kind: "unsaved" });
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => void saveRef.current(), SAVE_DELAY_MS);
  }, [present, label, enabled, setState, keepDraft]);

  // Leaving the editor by any way the link guard did not see (the browser's Back, say): the work is
  // kept in the browser, and a save that can still be made is sent; the page's scripts live on.
  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
      if (!enabled || presentRef.current === savedRef.current) return;
      keepDraft();
      const k = stateRef.current.kind;
      if (k === "unsaved" && !sendingRef.current) void saveRef.current();
    },
    [enabled, keepDraft],
  );

  // Closing the tab with unsaved work asks first, and keeps a copy in the browser in case it closes.
  useEffect(() => {
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      if (presentRef.current !== savedRef.current) {
        keepDraft();
        e.preventDefault();
      }
    };
    const onPageHide = () => {
      if (presentRef.current !== savedRef.current) keepDraft();
    };
    window.addEventListener("beforeunload", onBeforeUnload);
    window.addEventListener("pagehide", onPageHide);
    return () => {
      window.removeEventListener("beforeunload", onBeforeUnload);
      window.removeEventListener("pagehide", onPageHide);
    };
  }, [keepDraft]);

  /** The server's document is now the baseline (their version loaded, a revision restored). */
  const acceptServer = useCallback(
    (read: SchemeRead, doc: SchemeDocument) => {
      if (timer.current) clearTimeout(timer.current);
      savedRef.current = doc;
      presentRef.current = doc;
      notesRef.current = [];
      setVer(read.version);
      queryClient.setQueryData(schemeKey(scheme.id), read);
      setState({ kind: "saved" });
    },
    [queryClient, scheme.id, setState, setVer],
  );

  /** Keep mine: save over their version, which is now the one we are based on. */
  const saveOver = useCallback(
    (current: SchemeRead) => {
      setVer(current.version);
      setState({ kind: "unsaved" });
      void saveNow();
    },
    [saveNow, setState, setVer],
  );

  /** Someone else saved first (found by another request, e.g. a restore): offer the same choice as a save would. */
  const reportConflict = useCallback((current: SchemeRead) => setState({ kind: "conflict", current }), [setState]);

  /**
   * The document about to be restored from the browser copy was based on `baseVersion`: save it
   * against that version, so a newer one on the server leads to the conflict choice, not an overwrite.
   */
  const rebase = useCallback((baseVersion: number) => setVer(baseVersion), [setVer]);

  return { state, version, saveNow, flush, acceptServer, saveOver, reportConflict, rebase };
}
