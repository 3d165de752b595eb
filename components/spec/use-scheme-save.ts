"use client";
/**
 * Saving the editor's document: every edit is local at once; a pause of SAVE_DELAY_MS (or "Save now")
 * PUTs it with the version it was based on. A 409 stops saving and keeps both versions until the
 * designer chooses; a 422 shows the server's messages; nothing typed is dropped on any failure.
 */
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useCallback, useEffect, useRef, useState } from "react";
import type { SchemeDocument, SchemeRead } from "@/lib/spec/document";
import { api, ApiError, fieldMessages } from "./api";

export const SAVE_DELAY_MS = 800;

export type SaveState =
  | { kind: "saved" }
  | { kind: "unsaved" }
  | { kind: "saving" }
  | { kind: "conflict"; current: SchemeRead }
  | { kind: "invalid"; messages: string[] }
  | { kind: "error"; message: string };

export function schemeKey(id: string) {
  return ["scheme", id] as const;
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
  const setState = useCallback((s: SaveState) => {
    stateRef.current = s;
    setStateRaw(s);
  }, []);

  const setVer = useCallback((v: number) => {
    versionRef.current = v;
    setVersion(v);
  }, []);

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
    try {
      const { scheme: saved } = await mutateAsync({ version: versionRef.current, document: doc, note });
      savedRef.current = doc;
      notesRef.current = notesRef.current.slice(notes.length);
      setVer(saved.version);
      queryClient.setQueryData(schemeKey(scheme.id), saved);
      void queryClient.invalidateQueries({ queryKey: [...schemeKey(scheme.id), "revisions"] });
      sendingRef.current = null;
      if (presentRef.current !== doc) {
        setState({ kind: "unsaved" });
        timer.current = setTimeout(() => void saveRef.current(), SAVE_DELAY_MS);
      } else setState({ kind: "saved" });
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
    }
  }, [mutateAsync, queryClient, scheme.id, setState, setVer]);

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
    const k = stateRef.current.kind;
    if (k === "conflict") return; // wait for the designer's choice
    if (k !== "saving") setState({ kind: "unsaved" });
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => void saveRef.current(), SAVE_DELAY_MS);
  }, [present, label, enabled, setState]);

  useEffect(() => () => {
    if (timer.current) clearTimeout(timer.current);
  }, []);

  // Closing the tab with unsaved work asks first.
  useEffect(() => {
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      if (presentRef.current !== savedRef.current) e.preventDefault();
    };
    window.addEventListener("beforeunload", onBeforeUnload);
    return () => window.removeEventListener("beforeunload", onBeforeUnload);
  }, []);

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

  return { state, version, saveNow, acceptServer, saveOver, reportConflict };
}
