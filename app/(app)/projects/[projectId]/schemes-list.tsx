"use client";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiError, errorText } from "@/components/spec/api";
import { useCreateScheme, useDuplicateScheme, usePatchScheme } from "@/lib/query/hooks";
import { formatDateTime } from "@/components/spec/format";
import { schemeStatuses, type SchemeStatus } from "@/lib/spec/document";
import type { SchemeSummary } from "@/lib/spec/projects";
import { PhoneLabel, phoneTable } from "@/components/ui/phone-table";

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
  const create = useCreateScheme(projectId);
  const pending = create.isPending;
  return (
    <form
      aria-label="New scheme"
      noValidate
      className="grid gap-2 border-t border-tin-rule px-4 py-3 sm:grid-cols-[14rem_1fr_auto] sm:items-end"
      onSubmit={(e) => {
        e.preventDefault();
        if (!name.trim()) return setError("Give the scheme a name.");
        setError(null);
        create.mutate(
          { name: name.trim(), description },
          {
            onSuccess: ({ scheme }) => router.push(`/projects/${projectId}/schemes/${scheme.id}`),
            onError: (err) => setError(err instanceof ApiError ? (err.fields?.name?.join(" ") ?? err.message) : "The scheme could not be created."),
          },
        );
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

/** Columns a phone can do without: the counts, version and date are in the editor too. */
const { wideOnly, cell } = phoneTable;

function SchemeRow({ projectId, scheme, mayEdit, clientView, copiedFrom }: { projectId: string; scheme: SchemeSummary; mayEdit: boolean; clientView: boolean; copiedFrom?: string }) {
  const router = useRouter();
  const [copying, setCopying] = useState(false);
  const [copyName, setCopyName] = useState(`${scheme.name} (copy)`);
  const [error, setError] = useState<string | null>(null);
  const duplicate = useDuplicateScheme();
  const patch = usePatchScheme(projectId);
  const pending = duplicate.isPending || patch.isPending;
  const onError = (err: unknown) => setError(errorText(err));
  const change = (body: { status?: SchemeStatus; sharedWithClient?: boolean }) => {
    setError(null);
    patch.mutate({ schemeId: scheme.id, ...body }, { onError });
  };

  return (
    <tr className={`${phoneTable.row} sm:align-top`} data-testid={`scheme-${scheme.name}`}>
      <td className={`${phoneTable.lead} sm:min-w-[13rem]`}>
        <Link href={`/projects/${projectId}/schemes/${scheme.id}`} className="font-medium underline decoration-tin-rule underline-offset-2 hover:decoration-brass">
          {scheme.name}
        </Link>
        {scheme.description && <span className="block text-xs text-ink-soft">{scheme.description}</span>}
        {copiedFrom && <span className="block text-xs text-tin">Copied from {copiedFrom}</span>}
        {copying && (
          <form
            className="mt-2 flex flex-wrap gap-2"
            aria-label={`Duplicate ${scheme.name}`}
            onSubmit={(e) => {
              e.preventDefault();
              if (!copyName.trim()) return setError("Give the copy a name.");
              setError(null);
              duplicate.mutate({ schemeId: scheme.id, name: copyName.trim() }, { onSuccess: ({ scheme: copy }) => router.push(`/projects/${projectId}/schemes/${copy.id}`), onError });
            }}
          >
            <label className="sr-only" htmlFor={`copy-${scheme.id}`}>Name of the copy</label>
            <input id={`copy-${scheme.id}`} className="field min-w-[12rem] flex-1 py-1" value={copyName} onChange={(e) => setCopyName(e.target.value)} autoFocus />
            <button type="submit" className="btn-primary py-1" disabled={pending}>Duplicate</button>
            <button type="button" className="btn py-1" onClick={() => setCopying(false)}>Cancel</button>
          </form>
        )}
        {error && <p role="alert" className="field-error">{error}</p>}
      </td>
      <td className={`${wideOnly} text-right num`}>{scheme.divisionCount}</td>
      <td className={`${cell} text-sm sm:text-right num`}><PhoneLabel>Stops</PhoneLabel>{scheme.stopCount}</td>
      <td className={`${wideOnly} text-right num`}>v{scheme.version}</td>
      <td className={`${cell} flex items-center gap-1.5`}>
        <PhoneLabel>Status</PhoneLabel>
        {mayEdit ? (
          <select
            className="field w-auto min-w-[9.5rem] py-1"
            aria-label={`Status of ${scheme.name}`}
            value={scheme.status}
            disabled={pending}
            onChange={(e) => change({ status: e.target.value as SchemeStatus })}
          >
            {schemeStatuses.map((s) => <option key={s} value={s}>{schemeStatusLabels[s]}</option>)}
          </select>
        ) : (
          schemeStatusLabels[scheme.status]
        )}
      </td>
      {!clientView && (
        <td className={cell}>
          <PhoneLabel>Committee</PhoneLabel>
          {mayEdit ? (
            <label className="inline-flex items-center gap-1.5 text-xs">
              <input
                type="checkbox"
                className="accent-brass"
                checked={scheme.sharedWithClient}
                disabled={pending}
                onChange={(e) => change({ sharedWithClient: e.target.checked })}
              />
              {scheme.sharedWithClient ? "Shared" : "Not shared"}
            </label>
          ) : scheme.sharedWithClient ? "Shared" : "Not shared"}
        </td>
      )}
      <td className={`${wideOnly} num text-xs`}>{formatDateTime(scheme.updatedAt)}</td>
      <td className={`${cell} whitespace-nowrap sm:text-right`}>
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

export function SchemesList({ projectId, schemes, mayEdit, clientView }: { projectId: string; schemes: SchemeSummary[]; mayEdit: boolean; clientView: boolean }) {
  const names = new Map(schemes.map((s) => [s.id, s.name]));
  return (
    <section className="panel" aria-labelledby="schemes-heading">
      <div className="flex flex-wrap items-center gap-3 border-b border-tin-rule px-4 py-3">
        <h2 id="schemes-heading" className="flex-1 text-xl font-semibold">{clientView ? "Schemes shared with the committee" : "Schemes"}</h2>
        {schemes.length >= 2 && (
          <Link className="btn-primary" href={`/projects/${projectId}/compare`} data-testid="compare-link">Compare schemes</Link>
        )}
      </div>
      {/* relative: the header's screen-reader-only words are placed inside the scrolling box, not beside the page */}
      <div className="relative overflow-x-auto">
        <table className={phoneTable.table} data-testid="schemes-table">
          <thead className={phoneTable.head}>
            <tr>
              <th className="px-4 py-2">Scheme</th>
              <th className={`${wideOnly} px-4 py-2 text-right`}>Divisions</th>
              <th className="px-4 py-2 text-right">Stops</th>
              <th className={`${wideOnly} px-4 py-2 text-right`}>Version</th>
              <th className="px-4 py-2">Status</th>
              {!clientView && <th className="px-4 py-2">Committee</th>}
              <th className={`${wideOnly} px-4 py-2`}>Updated</th>
              <th className="px-4 py-2"><span className="sr-only">Actions</span></th>
            </tr>
          </thead>
          <tbody className={phoneTable.body}>
            {schemes.map((s) => (
              <SchemeRow key={s.id} projectId={projectId} scheme={s} mayEdit={mayEdit} clientView={clientView} copiedFrom={s.copiedFromId ? names.get(s.copiedFromId) : undefined} />
            ))}
          </tbody>
        </table>
        {schemes.length === 0 && <p className="px-4 py-4 text-sm text-tin">No schemes yet.{mayEdit && " Start one below."}</p>}
      </div>
      {mayEdit && <NewSchemeForm projectId={projectId} />}
    </section>
  );
}
