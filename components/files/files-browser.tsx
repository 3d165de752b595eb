"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useRef, useState } from "react";
import { ApiError } from "@/components/spec/api";
import { formatDateTime } from "@/components/spec/format";
import { Dialog } from "@/components/ui/dialog";
import { acceptAttribute, fileCategories, fileCategoryLabels, formatBytes, type FileCategory, type SurveyFile } from "@/lib/files/kinds";
import { LinkSelect, decodeLink, encodeLink, linkWords, type LinkTarget } from "./link-select";
import { deleteFile, fileQueryKeys, listFiles, updateFile, uploadFile, type UploadPhase } from "./queries";

function errorText(err: unknown): string {
  return err instanceof ApiError ? err.message : "That did not work; try again.";
}

function Progress({ phase }: { phase: UploadPhase }) {
  const percent = phase.phase === "sending" ? Math.round(phase.fraction * 100) : 100;
  return (
    <div className="space-y-1" data-testid="upload-progress">
      <div
        role="progressbar"
        aria-label="Upload"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        className="h-2.5 overflow-hidden rounded-full border border-tin-rule bg-paper-deep"
      >
        <div className="h-full bg-brass transition-[width] duration-150" style={{ width: `${percent}%` }} />
      </div>
      <p className="text-xs text-ink-soft num">{phase.phase === "sending" ? `Sending… ${percent} %` : "Checking the file…"}</p>
    </div>
  );
}

function UploadPanel({ projectId, targets, initialLink }: { projectId: string; targets: LinkTarget[]; initialLink: string }) {
  const client = useQueryClient();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [caption, setCaption] = useState("");
  const [category, setCategory] = useState<FileCategory | "">("");
  const [link, setLink] = useState(initialLink);
  const [phase, setPhase] = useState<UploadPhase | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const upload = useMutation({
    mutationFn: (f: File) => uploadFile(projectId, f, { caption, category: category || undefined, link: decodeLink(link) }, setPhase),
    onSuccess: (saved) => {
      setDone(`Kept “${saved.name}”${saved.link ? `, linked to ${linkWords(saved.link)}` : ""}.`);
      setFile(null);
      setCaption("");
      if (input.current) input.current.value = "";
      return client.invalidateQueries({ queryKey: fileQueryKeys.project(projectId) });
    },
    onSettled: () => setPhase(null),
  });
  return (
    <section className="panel p-4" aria-labelledby="upload-heading">
      <h2 id="upload-heading" className="mb-3 text-xl font-semibold">Add a survey file</h2>
      <form
        className="grid gap-3 md:grid-cols-2"
        onSubmit={(e) => {
          e.preventDefault();
          setDone(null);
          if (file) upload.mutate(file);
        }}
      >
        <div>
          <label className="label" htmlFor="upload-file">Photo, drawing or document</label>
          <input
            id="upload-file"
            ref={input}
            type="file"
            accept={acceptAttribute}
            className="field file:mr-3 file:rounded file:border-0 file:bg-paper-deep file:px-2 file:py-1"
            onChange={(e) => { setFile(e.target.files?.[0] ?? null); setDone(null); upload.reset(); }}
          />
          <p className="mt-1 text-xs text-tin">JPEG, PNG or WebP photos; PDF drawings and documents.</p>
        </div>
        <div>
          <label className="label" htmlFor="upload-caption">Caption</label>
          <input id="upload-caption" className="field" value={caption} maxLength={500} placeholder="e.g. Trumpet resonators, bass octave: dents and split seams" onChange={(e) => setCaption(e.target.value)} />
        </div>
        <div>
          <label className="label" htmlFor="upload-link">Shows</label>
          <LinkSelect id="upload-link" targets={targets} value={link} onChange={setLink} />
        </div>
        <div>
          <label className="label" htmlFor="upload-category">Kind</label>
          <select id="upload-category" className="field" value={category} onChange={(e) => setCategory(e.target.value as FileCategory | "")}>
            <option value="">By the file (photo or drawing)</option>
            {fileCategories.map((c) => <option key={c} value={c}>{fileCategoryLabels[c]}</option>)}
          </select>
        </div>
        <div className="flex flex-wrap items-center gap-3 md:col-span-2">
          <button type="submit" className="btn-primary" disabled={!file || upload.isPending}>{upload.isPending ? "Uploading…" : "Upload"}</button>
          <div className="min-w-48 flex-1">{phase && <Progress phase={phase} />}</div>
        </div>
        {upload.isError && <p role="alert" className="field-error md:col-span-2"><span aria-hidden="true">✕ </span>{errorText(upload.error)}</p>}
        {done && <p role="status" className="text-sm text-fit md:col-span-2"><span aria-hidden="true">✓ </span>{done}</p>}
      </form>
    </section>
  );
}

function EditFile({ file, targets, mayShare, onDone }: { file: SurveyFile; targets: LinkTarget[]; mayShare: boolean; onDone: () => void }) {
  const client = useQueryClient();
  const [caption, setCaption] = useState(file.caption);
  const [category, setCategory] = useState<FileCategory>(file.category);
  const [link, setLink] = useState(encodeLink(file.link));
  const [shared, setShared] = useState(file.sharedWithClient);
  const save = useMutation({
    mutationFn: () =>
      updateFile(file.id, { caption, category, link: decodeLink(link), ...(mayShare && shared !== file.sharedWithClient ? { sharedWithClient: shared } : {}) }),
    onSuccess: async () => {
      await client.invalidateQueries({ queryKey: fileQueryKeys.project(file.projectId) });
      onDone();
    },
  });
  const remove = useMutation({
    mutationFn: () => deleteFile(file.id),
    onSuccess: async () => {
      await client.invalidateQueries({ queryKey: fileQueryKeys.project(file.projectId) });
      onDone();
    },
  });
  const [confirming, setConfirming] = useState(false);
  return (
    <form className="space-y-3" onSubmit={(e) => { e.preventDefault(); save.mutate(); }} aria-label={`Edit ${file.name}`}>
      <div>
        <label className="label" htmlFor="edit-caption">Caption</label>
        <input id="edit-caption" className="field" value={caption} maxLength={500} onChange={(e) => setCaption(e.target.value)} />
      </div>
      <div className="grid gap-3 sm:grid-cols-[1fr_10rem]">
        <div>
          <label className="label" htmlFor="edit-link">Shows</label>
          <LinkSelect id="edit-link" targets={targets} value={link} onChange={setLink} />
        </div>
        <div>
          <label className="label" htmlFor="edit-category">Kind</label>
          <select id="edit-category" className="field" value={category} onChange={(e) => setCategory(e.target.value as FileCategory)}>
            {fileCategories.map((c) => <option key={c} value={c}>{fileCategoryLabels[c]}</option>)}
          </select>
        </div>
      </div>
      {mayShare && (
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" className="accent-brass" checked={shared} onChange={(e) => setShared(e.target.checked)} />
          Shared with the committee (they see this file and its caption)
        </label>
      )}
      {(save.isError || remove.isError) && <p role="alert" className="field-error">✕ {errorText(save.error ?? remove.error)}</p>}
      <div className="flex flex-wrap items-center gap-2 border-t border-tin-rule pt-3">
        <button type="submit" className="btn-primary" disabled={save.isPending}>Save</button>
        <button type="button" className="btn" onClick={onDone}>Cancel</button>
        {confirming ? (
          <span className="ml-auto flex items-center gap-2 text-sm">
            Delete “{file.name}” for good?
            <button type="button" className="btn text-clash" onClick={() => remove.mutate()} disabled={remove.isPending}>Delete</button>
            <button type="button" className="btn" onClick={() => setConfirming(false)}>Keep</button>
          </span>
        ) : (
          <button type="button" className="btn ml-auto text-clash" onClick={() => setConfirming(true)}>Delete file</button>
        )}
      </div>
    </form>
  );
}

function SharedMark({ shared }: { shared: boolean }) {
  return shared ? (
    <span className="rounded border border-fit/40 px-1 text-[11px] text-fit" title="The committee sees this file"><span aria-hidden="true">◉ </span>Shared</span>
  ) : (
    <span className="rounded border border-tin-rule px-1 text-[11px] text-tin" title="Only the firm sees this file"><span aria-hidden="true">○ </span>Firm only</span>
  );
}

function PdfMark() {
  // A drawn sheet with a folded corner: our own mark for a PDF, no icon font.
  return (
    <svg viewBox="0 0 40 48" className="h-10 w-8 text-ink-soft" aria-hidden="true">
      <path d="M4 2h22l10 10v34H4z" fill="none" stroke="currentColor" strokeWidth="2" />
      <path d="M26 2v10h10" fill="none" stroke="currentColor" strokeWidth="2" />
      <text x="20" y="36" textAnchor="middle" fontSize="10" fontFamily="sans-serif" fill="currentColor">PDF</text>
    </svg>
  );
}

export function FileThumb({ file, className = "" }: { file: SurveyFile; className?: string }) {
  if (!file.thumbnailUrl) {
    return <span className={`flex items-center justify-center bg-paper-deep ${className}`}><PdfMark /></span>;
  }
  // The app's own address: it checks access, then redirects to a short-lived signed link.
  // eslint-disable-next-line @next/next/no-img-element
  return <img src={file.thumbnailUrl} alt={file.caption || file.name} loading="lazy" className={`object-cover ${className}`} />;
}

export function FilesBrowser({ projectId, targets, mayWrite, mayShare, initialLink, committeeView }: {
  projectId: string;
  targets: LinkTarget[];
  mayWrite: boolean;
  mayShare: boolean;
  initialLink: string;
  /** A committee member sees only shared files, so no word about sharing. */
  committeeView: boolean;
}) {
  const files = useQuery({ queryKey: fileQueryKeys.list(projectId), queryFn: () => listFiles(projectId) });
  const [editing, setEditing] = useState<SurveyFile | null>(null);
  const all = files.data ?? [];
  const pictures = all.filter((f) => f.thumbnailUrl);
  const papers = all.filter((f) => !f.thumbnailUrl);
  return (
    <div className="space-y-6">
      {mayWrite && <UploadPanel projectId={projectId} targets={targets} initialLink={initialLink} />}

      <section className="panel" aria-labelledby="gallery-heading">
        <h2 id="gallery-heading" className="border-b border-tin-rule px-4 py-3 text-xl font-semibold">Photos</h2>
        {files.isPending && <p className="px-4 py-4 text-sm text-tin">Loading…</p>}
        {files.isError && <p role="alert" className="px-4 py-4 field-error">✕ {errorText(files.error)}</p>}
        {files.isSuccess && pictures.length === 0 && <p className="px-4 py-4 text-sm text-tin">No photos yet.</p>}
        <ul className="grid grid-cols-2 gap-4 p-4 sm:grid-cols-3 lg:grid-cols-4 xl:grid-cols-5" data-testid="gallery">
          {pictures.map((f) => (
            <li key={f.id} className="flex flex-col overflow-hidden rounded border border-tin-rule bg-paper" data-testid={`file-${f.name}`}>
              <a href={f.url} target="_blank" rel="noopener" className="block aspect-[4/3] bg-paper-deep" aria-label={`Open ${f.name}`}>
                <FileThumb file={f} className="h-full w-full" />
              </a>
              <div className="flex flex-1 flex-col gap-1 p-2 text-xs">
                <p className="text-sm leading-snug text-ink">{f.caption || <span className="text-tin">{f.name}</span>}</p>
                {f.link && <p className="text-ink-soft"><span aria-hidden="true">↳ </span>{linkWords(f.link)}</p>}
                <p className="mt-auto flex flex-wrap items-center gap-2 pt-1 text-tin">
                  {!committeeView && <SharedMark shared={f.sharedWithClient} />}
                  <span className="num">{f.width && f.height ? `${f.width}×${f.height}` : ""}</span>
                  {mayWrite && <button type="button" className="ml-auto underline underline-offset-2 hover:text-ink" onClick={() => setEditing(f)} aria-label={`Edit ${f.name}`}>Edit</button>}
                </p>
              </div>
            </li>
          ))}
        </ul>
      </section>

      <section className="panel" aria-labelledby="list-heading">
        <h2 id="list-heading" className="border-b border-tin-rule px-4 py-3 text-xl font-semibold">All files</h2>
        <div className="relative overflow-x-auto">
          <table className="w-full text-sm" data-testid="files-table">
            <thead className="text-left text-xs uppercase tracking-wide text-tin">
              <tr>
                <th className="px-4 py-2">File</th>
                <th className="px-4 py-2">Kind</th>
                <th className="px-4 py-2">Caption</th>
                <th className="px-4 py-2">Shows</th>
                <th className="px-4 py-2 text-right">Size</th>
                {!committeeView && <th className="px-4 py-2">Committee</th>}
                <th className="px-4 py-2">Added</th>
                <th className="px-4 py-2"><span className="sr-only">Actions</span></th>
              </tr>
            </thead>
            <tbody>
              {[...papers, ...pictures].map((f) => (
                <tr key={f.id} className="border-t border-tin-rule align-top">
                  <td className="min-w-40 px-4 py-2"><a className="break-all underline decoration-tin-rule underline-offset-2 hover:decoration-brass" href={`${f.url}?download=1`}>{f.name}</a></td>
                  <td className="px-4 py-2">{fileCategoryLabels[f.category]}</td>
                  <td className="min-w-56 px-4 py-2">{f.caption}</td>
                  <td className="min-w-40 px-4 py-2 text-ink-soft">{f.link ? linkWords(f.link) : "—"}</td>
                  <td className="whitespace-nowrap px-4 py-2 text-right num">{formatBytes(f.sizeBytes)}</td>
                  {!committeeView && <td className="px-4 py-2"><SharedMark shared={f.sharedWithClient} /></td>}
                  <td className="min-w-32 px-4 py-2 text-xs num">{formatDateTime(f.createdAt)}{f.uploadedByName && <span className="block text-tin">{f.uploadedByName}</span>}</td>
                  <td className="px-4 py-2 text-right">{mayWrite && <button type="button" className="btn py-1 text-xs" onClick={() => setEditing(f)}>Edit</button>}</td>
                </tr>
              ))}
            </tbody>
          </table>
          {files.isSuccess && all.length === 0 && <p className="px-4 py-4 text-sm text-tin">No files yet.</p>}
        </div>
      </section>

      <Dialog open={editing !== null} onClose={() => setEditing(null)} title={editing ? editing.name : ""} wide>
        {editing && <EditFile key={editing.id} file={editing} targets={targets} mayShare={mayShare} onDone={() => setEditing(null)} />}
      </Dialog>
    </div>
  );
}
