"use client";
import { useMutation, useQuery } from "@tanstack/react-query";
import { useState } from "react";
import type { SchemeRead } from "@/lib/spec/document";
import { api, ApiError } from "./api";
import { formatDateTime } from "./format";
import { keys } from "@/lib/query/keys";

/** Every saved version of the scheme, newest first; restoring one saves it again as a new version. */
export function RevisionsPanel({
  schemeId,
  currentVersion,
  editable,
  hasUnsaved,
  onRestored,
  onConflict,
  onClose,
}: {
  schemeId: string;
  currentVersion: number;
  editable: boolean;
  hasUnsaved: boolean;
  onRestored: (scheme: SchemeRead, fromVersion: number) => void;
  onConflict: (current: SchemeRead | null) => void;
  onClose: () => void;
}) {
  const [confirming, setConfirming] = useState<number | null>(null);
  const [error, setError] = useState<string | null>(null);
  const revisions = useQuery({
    queryKey: keys.schemes.revisions(schemeId),
    queryFn: async () => (await api.listRevisions(schemeId)).revisions,
  });
  const restore = useMutation({
    mutationFn: (version: number) => api.restoreRevision(schemeId, version, currentVersion),
    onSuccess: ({ scheme }, version) => {
      setConfirming(null);
      onRestored(scheme, version);
      void revisions.refetch();
    },
    onError: (err) => {
      if (err instanceof ApiError && err.status === 409) {
        onConflict((err.details as { current?: SchemeRead } | undefined)?.current ?? null);
        setError("Someone else saved meanwhile; choose in the banner above, then restore again.");
      } else setError(err instanceof Error ? err.message : "The revision could not be restored.");
    },
  });

  return (
    <aside className="panel text-sm" aria-labelledby="revisions-heading" data-testid="revisions">
      <div className="flex items-center border-b border-tin-rule px-3 py-2">
        <h2 id="revisions-heading" className="flex-1 text-lg font-semibold">Revisions</h2>
        <button type="button" className="btn px-2 py-0.5 text-xs" onClick={onClose}>Close</button>
      </div>
      {revisions.isPending && <p className="px-3 py-2 text-tin">Loading…</p>}
      {revisions.isError && <p role="alert" className="px-3 py-2 text-clash">✕ {revisions.error.message}</p>}
      {error && <p role="alert" className="px-3 py-2 text-xs text-clash">✕ {error}</p>}
      <ol className="max-h-[60vh] divide-y divide-tin-rule overflow-y-auto">
        {revisions.data?.map((r) => (
          <li key={r.version} className="px-3 py-2" data-testid={`revision-${r.version}`}>
            <div className="flex items-baseline gap-2">
              <span className="num font-semibold">v{r.version}</span>
              {r.version === currentVersion && <span className="text-xs text-fit">● current</span>}
              <span className="num ml-auto text-xs text-tin">{formatDateTime(r.createdAt)}</span>
            </div>
            <p className="text-xs text-ink-soft">{r.note || "—"}</p>
            <p className="text-xs text-tin">{r.authorName ?? "unknown"}</p>
            {editable && r.version !== currentVersion && (
              confirming === r.version ? (
                <div className="mt-1 space-y-1">
                  {hasUnsaved && <p className="text-xs text-caution">Your unsaved edits stay one undo step away.</p>}
                  <div className="flex gap-2">
                    <button type="button" className="btn-primary py-0.5 text-xs" disabled={restore.isPending} onClick={() => restore.mutate(r.version)}>
                      {restore.isPending ? "Restoring…" : `Restore v${r.version} as v${currentVersion + 1}`}
                    </button>
                    <button type="button" className="btn py-0.5 text-xs" onClick={() => setConfirming(null)}>Cancel</button>
                  </div>
                </div>
              ) : (
                <button type="button" className="btn mt-1 py-0.5 text-xs" onClick={() => { setError(null); setConfirming(r.version); }} aria-label={`Restore version ${r.version}`}>
                  Restore…
                </button>
              )
            )}
          </li>
        ))}
      </ol>
    </aside>
  );
}
