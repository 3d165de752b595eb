"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiError, call } from "@/components/spec/api";
import { dispositionText, pitchText } from "@/components/spec/format";
import type { SchemeRead } from "@/lib/spec/document";
import { formatForFileName, IMPORT_MAX_CHARS, type ImportPreview, type ImportRequest } from "@/lib/spec/import";

type Draft = { id: string; name: string; version: number };
type Picked = { fileName: string; text: string; format: "csv" | "json" };

const previewImport = (projectId: string, body: ImportRequest) => call<{ preview: ImportPreview }>("POST", `/api/projects/${projectId}/imports/preview`, body).then((r) => r.preview);
const commitImport = (projectId: string, body: ImportRequest) => call<{ scheme: SchemeRead }>("POST", `/api/projects/${projectId}/imports`, body).then((r) => r.scheme);

function Problems({ preview }: { preview: Extract<ImportPreview, { ok: false }> }) {
  return (
    <div role="alert" className="rounded border border-clash/40 bg-clash/5 p-3" data-testid="import-problems">
      <p className="font-semibold text-clash">
        <span aria-hidden="true">✕ </span>
        {preview.problems.length === 1 ? "One problem" : `${preview.problems.length} problems`} — nothing will be imported until the file is corrected:
      </p>
      <ul className="mt-2 list-disc space-y-1 pl-5 text-sm">
        {preview.problems.map((p, i) => <li key={i}>{p.message}</li>)}
      </ul>
    </div>
  );
}

function Summary({ preview }: { preview: Extract<ImportPreview, { ok: true }> }) {
  const { summary, target } = preview;
  return (
    <div className="space-y-3" data-testid="import-preview">
      <p className="text-sm">
        <span aria-hidden="true" className="text-fit">✓ </span>
        {target.kind === "new" ? <>A new scheme <strong>{summary.name}</strong></> : <>A new revision of <strong>{target.schemeName}</strong> (now version {target.version})</>}
        {" "}with {summary.divisions.length} division{summary.divisions.length === 1 ? "" : "s"} and {summary.stopCount} stop{summary.stopCount === 1 ? "" : "s"}:
      </p>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        {summary.divisions.map((d) => (
          <div key={d.name} className="rounded border border-tin-rule bg-paper p-3">
            <h3 className="font-serif text-lg font-semibold">{d.name}</h3>
            <ul className="mt-1 space-y-0.5 text-sm">
              {d.stops.map((s, i) => (
                <li key={i} className="flex gap-2">
                  <span className="flex-1">{s.name}</span>
                  <span className="num">{pitchText(s)}</span>
                  <span className="w-32 text-right text-xs text-tin">{dispositionText(s)}</span>
                </li>
              ))}
            </ul>
          </div>
        ))}
      </div>
    </div>
  );
}

export function ImportPanel({ projectId, drafts }: { projectId: string; drafts: Draft[] }) {
  const router = useRouter();
  const [picked, setPicked] = useState<Picked | null>(null);
  const [pickError, setPickError] = useState<string | null>(null);
  const [kind, setKind] = useState<"new" | "replace">("new");
  const [name, setName] = useState("");
  const [draftId, setDraftId] = useState(drafts[0]?.id ?? "");

  const request = (p: Picked, k = kind, d = draftId): ImportRequest => ({
    format: p.format,
    fileName: p.fileName,
    text: p.text,
    target: k === "new" ? { kind: "new", name: name.trim() || undefined } : { kind: "replace", schemeId: d },
  });
  const preview = useMutation({ mutationFn: (args: { p: Picked; k?: "new" | "replace"; d?: string }) => previewImport(projectId, request(args.p, args.k, args.d)) });

  /** The same file against another target: a draft lends its divisions' properties, so the preview can change. */
  function retarget(k: "new" | "replace", d: string) {
    setKind(k);
    setDraftId(d);
    save.reset();
    if (picked) preview.mutate({ p: picked, k, d });
  }
  const save = useMutation({
    mutationFn: (p: Picked) => {
      const body = request(p);
      // Save against the version the preview showed: a draft saved meanwhile is refused, not overwritten.
      if (body.target.kind === "replace" && preview.data?.ok && preview.data.target.kind === "replace") body.target.version = preview.data.target.version;
      return commitImport(projectId, body);
    },
    onSuccess: (scheme) => router.push(`/projects/${projectId}/schemes/${scheme.id}`),
  });

  async function pick(file: File | undefined) {
    setPicked(null);
    preview.reset();
    save.reset();
    setPickError(null);
    if (!file) return;
    const format = formatForFileName(file.name);
    if (!format) return setPickError(`"${file.name}" is neither a .csv stop list nor a .json scheme file.`);
    if (file.size > IMPORT_MAX_CHARS) return setPickError(`"${file.name}" is larger than 2 MB; a stop list is far smaller. Is it the right file?`);
    const p = { fileName: file.name, text: await file.text(), format };
    setPicked(p);
    preview.mutate({ p });
  }

  const ready = preview.data?.ok === true;
  const failure = (err: unknown) => (err instanceof ApiError ? err.message : "That did not work; try again.");
  return (
    <section className="panel space-y-4 p-4">
      <div className="grid gap-4 md:grid-cols-2">
        <div>
          <label className="label" htmlFor="import-file">File</label>
          <input id="import-file" type="file" accept=".csv,.json,text/csv,application/json" className="field" onChange={(e) => pick(e.target.files?.[0])} />
          {pickError && <p role="alert" className="field-error">✕ {pickError}</p>}
        </div>
        <fieldset>
          <legend className="label">Import as</legend>
          <div className="space-y-2 text-sm">
            <label className="flex items-center gap-2">
              <input type="radio" name="import-kind" className="accent-brass" checked={kind === "new"} onChange={() => retarget("new", draftId)} />
              A new scheme
            </label>
            {kind === "new" && (
              <div className="pl-6">
                <label className="sr-only" htmlFor="import-name">Name of the new scheme</label>
                <input id="import-name" className="field" placeholder="Name (from the file when empty)" value={name} onChange={(e) => setName(e.target.value)} />
              </div>
            )}
            <label className="flex items-center gap-2">
              <input type="radio" name="import-kind" className="accent-brass" checked={kind === "replace"} disabled={!drafts.length} onChange={() => retarget("replace", draftId)} />
              Replacing the stops of a draft (a new revision; earlier versions stay restorable)
            </label>
            {kind === "replace" && (
              <div className="pl-6">
                <label className="sr-only" htmlFor="import-draft">Draft to replace</label>
                <select id="import-draft" className="field" value={draftId} onChange={(e) => retarget("replace", e.target.value)}>
                  {drafts.map((d) => <option key={d.id} value={d.id}>{d.name} (version {d.version})</option>)}
                </select>
              </div>
            )}
            {!drafts.length && <p className="text-xs text-tin">No scheme of this project is a draft, so none can be replaced.</p>}
          </div>
        </fieldset>
      </div>
      {picked && (
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn" onClick={() => preview.mutate({ p: picked })} disabled={preview.isPending}>Preview again</button>
        </div>
      )}
      {preview.isPending && <p className="text-sm text-tin">Reading “{picked?.fileName}”…</p>}
      {preview.isError && <p role="alert" className="field-error">✕ {failure(preview.error)}</p>}
      {preview.data && !preview.data.ok && <Problems preview={preview.data} />}
      {preview.data?.ok && <Summary preview={preview.data} />}
      {preview.data && preview.data.notes.length > 0 && (
        <ul className="space-y-1 text-sm text-ink-soft">{preview.data.notes.map((n, i) => <li key={i}><span aria-hidden="true">ℹ </span>{n}</li>)}</ul>
      )}
      {ready && picked && (
        <div className="flex items-center gap-3 border-t border-tin-rule pt-3">
          <button type="button" className="btn-primary" onClick={() => save.mutate(picked)} disabled={save.isPending}>
            {save.isPending ? "Importing…" : kind === "new" ? "Import as a new scheme" : "Replace the draft's stops"}
          </button>
          {save.isError && <p role="alert" className="field-error">✕ {failure(save.error)}</p>}
        </div>
      )}
    </section>
  );
}
