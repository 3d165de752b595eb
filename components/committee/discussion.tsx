"use client";
import { useQuery } from "@tanstack/react-query";
import { useMemo, useState } from "react";
import { api, ApiError, errorText } from "@/components/spec/api";
import { formatDateTime, stopTitle } from "@/components/spec/format";
import { useAddComment, useAddNote, useComments, useDeleteComment, useDeleteNote, useNotes } from "@/lib/query/hooks";
import { keys } from "@/lib/query/keys";
import type { CommentRead } from "@/lib/spec/committee";

type Thread = "comments" | "notes";

function Entries({ entries, selfId, onDelete, deleting, empty }: { entries: CommentRead[]; selfId: string; onDelete: (id: string) => void; deleting: boolean; empty: string }) {
  if (!entries.length) return <p className="px-4 py-3 text-sm text-tin">{empty}</p>;
  return (
    <ol className="divide-y divide-tin-rule">
      {entries.map((c) => (
        <li key={c.id} className="px-4 py-3 text-sm" data-testid="comment">
          <p className="flex flex-wrap items-baseline gap-x-2 text-xs text-tin">
            <strong className="text-sm text-ink">{c.authorName}</strong>
            <span className={`rounded border px-1 ${c.authorSide === "committee" ? "border-brass text-brass-dark" : "border-tin-rule"}`}>{c.authorSide === "committee" ? "Committee" : "Organ builder"}</span>
            <time dateTime={c.createdAt}>{formatDateTime(c.createdAt)}</time>
            {c.stopLabel && <span data-testid="comment-stop">on the {c.stopLabel}</span>}
            {c.authorId === selfId && (
              <button type="button" className="ml-auto underline hover:text-ink" disabled={deleting} onClick={() => onDelete(c.id)}>Delete</button>
            )}
          </p>
          <p className="mt-1 whitespace-pre-wrap">{c.body}</p>
        </li>
      ))}
    </ol>
  );
}

function Composer({ thread, stops, onSubmit, pending }: { thread: Thread; stops: { id: string; label: string }[]; onSubmit: (v: { body: string; stopId: string | null }, done: () => void, fail: (e: unknown) => void) => void; pending: boolean }) {
  const [body, setBody] = useState("");
  const [stopId, setStopId] = useState("");
  const [error, setError] = useState<string | null>(null);
  const id = `${thread}-body`;
  return (
    <form
      className="space-y-2 border-t border-tin-rule px-4 py-3"
      aria-label={thread === "comments" ? "Add a comment" : "Add a firm note"}
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        if (!body.trim()) return setError("Write something first.");
        setError(null);
        onSubmit({ body, stopId: stopId || null }, () => { setBody(""); setStopId(""); }, (err) => setError(err instanceof ApiError ? (Object.values(err.fields ?? {}).flat()[0] ?? err.message) : errorText(err)));
      }}
    >
      <div>
        <label className="label" htmlFor={`${thread}-stop`}>About</label>
        <select id={`${thread}-stop`} className="field" value={stopId} onChange={(e) => setStopId(e.target.value)}>
          <option value="">The scheme as a whole</option>
          {stops.map((s) => <option key={s.id} value={s.id}>{s.label}</option>)}
        </select>
      </div>
      <div>
        <label className="label" htmlFor={id}>{thread === "comments" ? "Comment" : "Note (the committee never sees it)"}</label>
        <textarea id={id} rows={3} className="field" maxLength={4000} value={body} onChange={(e) => setBody(e.target.value)} aria-invalid={!!error} />
      </div>
      {error && <p role="alert" className="field-error">✕ {error}</p>}
      <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Posting…" : thread === "comments" ? "Post comment" : "Add note"}</button>
    </form>
  );
}

/**
 * Comments on a scheme (the firm and the project's committee read them; the firm's people are told by
 * e-mail), and for the firm a separate tab of notes the committee never sees.
 */
export function SchemeDiscussion({ schemeId, selfId, canComment, canNotes }: { schemeId: string; selfId: string; canComment: boolean; canNotes: boolean }) {
  const [tab, setTab] = useState<Thread>("comments");
  const scheme = useQuery({ queryKey: keys.schemes.detail(schemeId), queryFn: async () => (await api.getScheme(schemeId)).scheme });
  const comments = useComments(schemeId);
  const notes = useNotes(schemeId, canNotes);
  const addComment = useAddComment(schemeId);
  const addNote = useAddNote(schemeId);
  const delComment = useDeleteComment(schemeId);
  const delNote = useDeleteNote(schemeId);
  const stops = useMemo(
    () => (scheme.data?.document.divisions ?? []).flatMap((d) => d.stops.map((s) => ({ id: s.id, label: `${d.name}: ${stopTitle(s)}` }))),
    [scheme.data],
  );
  const list = tab === "comments" ? comments : notes;
  return (
    <section id="comments" className="panel scroll-mt-4 print:hidden" aria-labelledby="discussion-heading" data-testid="discussion">
      <div className="flex flex-wrap items-center gap-2 border-b border-tin-rule px-4 py-2">
        <h2 id="discussion-heading" className="flex-1 text-xl font-semibold">Comments</h2>
        {canNotes && (
          <div role="tablist" aria-label="Comments or firm notes" className="flex gap-1 text-sm">
            <button type="button" role="tab" aria-selected={tab === "comments"} className={`rounded px-2 py-1 ${tab === "comments" ? "bg-paper-deep font-semibold" : "text-ink-soft"}`} onClick={() => setTab("comments")}>
              With the committee ({comments.data?.length ?? 0})
            </button>
            <button type="button" role="tab" aria-selected={tab === "notes"} className={`rounded px-2 py-1 ${tab === "notes" ? "bg-paper-deep font-semibold" : "text-ink-soft"}`} onClick={() => setTab("notes")}>
              Firm notes ({notes.data?.length ?? 0})
            </button>
          </div>
        )}
      </div>
      {list.error && <p role="alert" className="field-error px-4 py-2">✕ {errorText(list.error)}</p>}
      <Entries
        entries={list.data ?? []}
        selfId={selfId}
        deleting={delComment.isPending || delNote.isPending}
        onDelete={(id) => (tab === "comments" ? delComment.mutate(id) : delNote.mutate(id))}
        empty={tab === "comments" ? "No comments yet." : "No firm notes yet."}
      />
      {tab === "comments" && canComment && (
        <Composer thread="comments" stops={stops} pending={addComment.isPending} onSubmit={(v, done, fail) => addComment.mutate(v, { onSuccess: done, onError: fail })} />
      )}
      {tab === "notes" && canNotes && (
        <Composer thread="notes" stops={stops} pending={addNote.isPending} onSubmit={(v, done, fail) => addNote.mutate(v, { onSuccess: done, onError: fail })} />
      )}
    </section>
  );
}
