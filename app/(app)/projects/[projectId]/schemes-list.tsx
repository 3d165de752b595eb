"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { api, ApiError } from "@/components/spec/api";
import { formatDateTime } from "@/components/spec/format";
import { schemeStatuses, type SchemeStatus } from "@/lib/spec/document";
import type { SchemeSummary } from "@/lib/spec/projects";

export const schemeStatusLabels: Record<SchemeStatus, string> = {
  draft: "Draft",
  proposed: "Proposed",
  preferred: "Preferred",
  accepted: "Accepted",
  withdrawn: "Withdrawn",
};

function NewSchemeForm({ projectId }: { projectId: string }) {
  const router = useRouter();
  const [name, setName] = useState("");
  const [description, setDescription] = useState("");
  const [error, setError] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();
  return (
    <form
      aria-label="New scheme"
      noValidate
      className="grid gap-2 border-t border-tin-rule px-4 py-3 sm:grid-cols-[14rem_1fr_auto] sm:items-end"
      onSubmit={(e) => {
        e.preventDefault();
        if (!name.trim()) return setError("Give the scheme a name.");
        setError(null);
        startTransition(async () => {
          try {
            const { scheme } = await api.createScheme(projectId, { name: name.trim(), description });
            router.push(`/projects/${projectId}/schemes/${scheme.id}`);
          } catch (err) {
            setError(err instanceof ApiError ? (err.fields?.name?.join(" ") ?? err.message) : "The scheme could not be created.");
          }
        });
      }}
    >
      <div>
        <label className="label" htmlFor="scheme-name">New scheme</label>
        <input id="scheme-name" className="field" placeholder="e.g. Scheme B — enlarged Swell" value={name} onChange={(e) => setName(e.target.value)} aria-invalid={!!error} />
      </div>
      <div>
        <label className="label" htmlFor="scheme-description">Description</label>
        <input id="scheme-description" className="field" value={description} onChange={(e) => setDescription(e.target.value)} />
      </div>
      <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Creating…" : "Create scheme"}</button>
      {error && <p role="alert" className="field-error sm:col-span-3"><span aria-hidden="true">✕ </span>{error}</p>}
    </form>
  );
}

function SchemeRow({ projectId, scheme, mayEdit, copiedFrom }: { projectId: string; scheme: SchemeSummary; mayEdit: boolean; copiedFrom?: string }) {
  const router = useRouter();
  const [copying, setCopying] = useState(false);
  const [copyName, setCopyName] = useState(`${scheme.name} (copy)`);
  const [error, setError] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();

  function run(fn: () => Promise<void>) {
    setError(null);
    startTransition(async () => {
      try {
        await fn();
      } catch (err) {
        setError(err instanceof ApiError ? err.message : "That did not work.");
      }
    });
  }

  return (
    <tr className="border-t border-tin-rule align-top" data-testid={`scheme-${scheme.name}`}>
      <td className="px-4 py-2">
        <Link href={`/projects/${projectId}/schemes/${scheme.id}`} className="font-medium underline decoration-tin-rule underline-offset-2 hover:decoration-brass">
          {scheme.name}
        </Link>
        {scheme.description && <span className="block text-xs text-ink-soft">{scheme.description}</span>}
        {copiedFrom && <span className="block text-xs text-tin">Copied from {copiedFrom}</span>}
        {copying && (
          <form
            className="mt-2 flex gap-2"
            aria-label={`Duplicate ${scheme.name}`}
            onSubmit={(e) => {
              e.preventDefault();
              if (!copyName.trim()) return setError("Give the copy a name.");
              run(async () => {
                const { scheme: copy } = await api.duplicateScheme(scheme.id, copyName.trim());
                router.push(`/projects/${projectId}/schemes/${copy.id}`);
              });
            }}
          >
            <label className="sr-only" htmlFor={`copy-${scheme.id}`}>Name of the copy</label>
            <input id={`copy-${scheme.id}`} className="field py-1" value={copyName} onChange={(e) => setCopyName(e.target.value)} autoFocus />
            <button type="submit" className="btn-primary py-1" disabled={pending}>Duplicate</button>
            <button type="button" className="btn py-1" onClick={() => setCopying(false)}>Cancel</button>
          </form>
        )}
        {error && <p role="alert" className="field-error">{error}</p>}
      </td>
      <td className="px-4 py-2 text-right num">{scheme.divisionCount}</td>
      <td className="px-4 py-2 text-right num">{scheme.stopCount}</td>
      <td className="px-4 py-2 text-right num">v{scheme.version}</td>
      <td className="px-4 py-2">
        {mayEdit ? (
          <select
            className="field py-1"
            aria-label={`Status of ${scheme.name}`}
            value={scheme.status}
            disabled={pending}
            onChange={(e) => run(async () => { await api.patchScheme(scheme.id, { status: e.target.value as SchemeStatus }); router.refresh(); })}
          >
            {schemeStatuses.map((s) => <option key={s} value={s}>{schemeStatusLabels[s]}</option>)}
          </select>
        ) : (
          schemeStatusLabels[scheme.status]
        )}
      </td>
      <td className="px-4 py-2">
        {mayEdit ? (
          <label className="inline-flex items-center gap-1.5 text-xs">
            <input
              type="checkbox"
              className="accent-brass"
              checked={scheme.sharedWithClient}
              disabled={pending}
              onChange={(e) => run(async () => { await api.patchScheme(scheme.id, { sharedWithClient: e.target.checked }); router.refresh(); })}
            />
            {scheme.sharedWithClient ? "Shared" : "Not shared"}
          </label>
        ) : scheme.sharedWithClient ? "Shared" : "Not shared"}
      </td>
      <td className="px-4 py-2 num text-xs">{formatDateTime(scheme.updatedAt)}</td>
      <td className="px-4 py-2 text-right whitespace-nowrap">
        <Link className="btn py-1 text-xs" href={`/projects/${projectId}/schemes/${scheme.id}/stop-list`}>Stop list</Link>
        {mayEdit && !copying && (
          <button type="button" className="btn ml-1 py-1 text-xs" onClick={() => setCopying(true)} aria-label={`Duplicate ${scheme.name}`}>
            Duplicate
          </button>
        )}
      </td>
    </tr>
  );
}

export function SchemesList({ projectId, schemes, mayEdit }: { projectId: string; schemes: SchemeSummary[]; mayEdit: boolean }) {
  const names = new Map(schemes.map((s) => [s.id, s.name]));
  return (
    <section className="panel" aria-labelledby="schemes-heading">
      <h2 id="schemes-heading" className="border-b border-tin-rule px-4 py-3 text-xl font-semibold">Schemes</h2>
      <div className="overflow-x-auto">
        <table className="w-full text-sm" data-testid="schemes-table">
          <thead className="text-left text-xs uppercase tracking-wide text-tin">
            <tr>
              <th className="px-4 py-2">Scheme</th>
              <th className="px-4 py-2 text-right">Divisions</th>
              <th className="px-4 py-2 text-right">Stops</th>
              <th className="px-4 py-2 text-right">Version</th>
              <th className="px-4 py-2">Status</th>
              <th className="px-4 py-2">Committee</th>
              <th className="px-4 py-2">Updated</th>
              <th className="px-4 py-2"><span className="sr-only">Actions</span></th>
            </tr>
          </thead>
          <tbody>
            {schemes.map((s) => (
              <SchemeRow key={s.id} projectId={projectId} scheme={s} mayEdit={mayEdit} copiedFrom={s.copiedFromId ? names.get(s.copiedFromId) : undefined} />
            ))}
          </tbody>
        </table>
        {schemes.length === 0 && <p className="px-4 py-4 text-sm text-tin">No schemes yet.{mayEdit && " Start one below."}</p>}
      </div>
      {mayEdit && <NewSchemeForm projectId={projectId} />}
    </section>
  );
}
