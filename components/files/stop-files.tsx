"use client";
import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { FileThumb } from "./files-browser";
import { fileQueryKeys, listFiles } from "./queries";

/** The survey files linked to one stop, shown beside its form in the editor. */
export function StopFiles({ projectId, schemeId, stopId, stopName, mayAdd }: { projectId: string; schemeId: string; stopId: string; stopName: string; mayAdd: boolean }) {
  const files = useQuery({ queryKey: fileQueryKeys.list(projectId, { schemeId, stopId }), queryFn: () => listFiles(projectId, { schemeId, stopId }) });
  const addHref = `/projects/${projectId}/files?scheme=${schemeId}&stop=${encodeURIComponent(stopId)}`;
  return (
    <section aria-labelledby="stop-files-heading" className="mt-4 border-t border-tin-rule pt-3" data-testid="stop-files">
      <div className="mb-2 flex items-baseline gap-3">
        <h3 id="stop-files-heading" className="text-sm font-semibold uppercase tracking-wide text-tin">Survey files of this stop</h3>
        {mayAdd && <Link href={addHref} className="ml-auto text-xs underline underline-offset-2 hover:text-ink">Add a file for the {stopName}</Link>}
      </div>
      {files.isPending && <p className="text-xs text-tin">Loading…</p>}
      {files.isError && <p className="field-error">✕ The files could not be loaded.</p>}
      {files.isSuccess && files.data.length === 0 && <p className="text-xs text-tin">None linked yet.</p>}
      {files.isSuccess && files.data.length > 0 && (
        <ul className="grid grid-cols-3 gap-2 sm:grid-cols-4">
          {files.data.map((f) => (
            <li key={f.id} className="overflow-hidden rounded border border-tin-rule bg-paper text-xs">
              <a href={f.url} target="_blank" rel="noopener" className="block aspect-[4/3] bg-paper-deep" aria-label={`Open ${f.name}`}>
                <FileThumb file={f} className="h-full w-full" />
              </a>
              <p className="p-1.5 leading-snug">{f.caption || f.name}</p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
