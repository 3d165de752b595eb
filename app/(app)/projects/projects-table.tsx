"use client";
import Link from "next/link";
import { useMemo, useState } from "react";
import { useProjects } from "@/lib/query/hooks";
import { formatDate } from "@/components/spec/format";
import { projectStatusLabels, projectStatuses, type ProjectStatus, type ProjectSummary } from "@/lib/spec/projects";

type SortKey = "name" | "clientName" | "location" | "status" | "targetDate" | "schemeCount" | "updatedAt";
const columns: { key: SortKey; label: string; numeric?: boolean }[] = [
  { key: "name", label: "Project" },
  { key: "clientName", label: "Client" },
  { key: "location", label: "Location" },
  { key: "status", label: "Status" },
  { key: "targetDate", label: "Target" },
  { key: "schemeCount", label: "Schemes", numeric: true },
  { key: "updatedAt", label: "Updated" },
];

function compare(a: ProjectSummary, b: ProjectSummary, key: SortKey): number {
  if (key === "status") return projectStatuses.indexOf(a.status) - projectStatuses.indexOf(b.status);
  if (key === "schemeCount") return a.schemeCount - b.schemeCount;
  const x = a[key] ?? "";
  const y = b[key] ?? "";
  return String(x).localeCompare(String(y), "en-GB", { sensitivity: "base" });
}

/** On a phone only the project column stays; the rest is written under its name. */
const wideOnly = "hidden sm:table-cell";

export function ProjectsTable() {
  const [archived, setArchived] = useState(false);
  const [search, setSearch] = useState("");
  const [status, setStatus] = useState<ProjectStatus | "">("");
  const [sort, setSort] = useState<{ key: SortKey; dir: 1 | -1 }>({ key: "updatedAt", dir: -1 });

  const query = useProjects(archived);

  const rows = useMemo(() => {
    const q = search.trim().toLowerCase();
    const list = (query.data ?? []).filter(
      (p) =>
        (!status || p.status === status) &&
        (!q || [p.name, p.clientName, p.venue, p.location, p.instrument].some((t) => t.toLowerCase().includes(q))),
    );
    return [...list].sort((a, b) => compare(a, b, sort.key) * sort.dir);
  }, [query.data, search, status, sort]);

  return (
    <div>
      <div className="flex flex-wrap items-end gap-3 border-b border-tin-rule px-4 py-3">
        <div className="min-w-56 flex-1">
          <label className="label" htmlFor="project-search">Search</label>
          <input
            id="project-search"
            type="search"
            className="field"
            placeholder="Project, client, venue, location, instrument"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
          />
        </div>
        <div>
          <label className="label" htmlFor="project-status">Status</label>
          <select id="project-status" className="field" value={status} onChange={(e) => setStatus(e.target.value as ProjectStatus | "")}>
            <option value="">All</option>
            {projectStatuses.map((s) => <option key={s} value={s}>{projectStatusLabels[s]}</option>)}
          </select>
        </div>
        {/* The column headers sort on a wide screen; a phone shows one column, so it sorts here. */}
        <div className="sm:hidden">
          <label className="label" htmlFor="project-sort">Sort by</label>
          <select
            id="project-sort"
            className="field"
            value={`${sort.key}:${sort.dir}`}
            onChange={(e) => {
              const [key, dir] = e.target.value.split(":");
              setSort({ key: key as SortKey, dir: Number(dir) as 1 | -1 });
            }}
          >
            {columns.flatMap((c) => [
              <option key={`${c.key}:1`} value={`${c.key}:1`}>{c.label} ▲</option>,
              <option key={`${c.key}:-1`} value={`${c.key}:-1`}>{c.label} ▼</option>,
            ])}
          </select>
        </div>
        <label className="flex items-center gap-2 pb-1.5 text-sm">
          <input type="checkbox" className="accent-brass" checked={archived} onChange={(e) => setArchived(e.target.checked)} />
          Show archived
        </label>
      </div>
      <div className="relative overflow-x-auto">
        <table className="w-full text-sm" data-testid="projects-table">
          <thead className="text-left text-xs uppercase tracking-wide text-tin">
            <tr>
              {columns.map((c) => {
                const active = sort.key === c.key;
                return (
                  <th
                    key={c.key}
                    className={`px-4 py-2 ${c.numeric ? "text-right" : ""} ${c.key === "name" ? "" : wideOnly}`}
                    aria-sort={active ? (sort.dir === 1 ? "ascending" : "descending") : "none"}
                  >
                    <button
                      type="button"
                      className="inline-flex items-center gap-1 uppercase tracking-wide hover:text-ink"
                      onClick={() => setSort((s) => ({ key: c.key, dir: s.key === c.key ? ((-s.dir) as 1 | -1) : 1 }))}
                    >
                      {c.label}
                      <span aria-hidden="true" className={active ? "text-brass-dark" : "text-tin-rule"}>
                        {active ? (sort.dir === 1 ? "▲" : "▼") : "△"}
                      </span>
                    </button>
                  </th>
                );
              })}
            </tr>
          </thead>
          <tbody>
            {rows.map((p) => (
              <tr key={p.id} className="border-t border-tin-rule hover:bg-paper-deep/50" data-testid={`project-${p.name}`}>
                <td className="px-4 py-2">
                  <Link href={`/projects/${p.id}`} className="font-medium text-ink underline decoration-tin-rule underline-offset-2 hover:decoration-brass">
                    {p.name}
                  </Link>
                  {p.archived && <span className="ml-2 rounded border border-tin-rule px-1 text-xs text-tin">▣ Archived</span>}
                  {p.instrument && <span className="block text-xs text-tin">{p.instrument}</span>}
                  <span className="mt-1 block text-xs text-ink-soft sm:hidden" data-testid="project-phone-line">
                    {[p.clientName, p.location].filter(Boolean).join(" · ")}
                    <span className="block text-tin">
                      {projectStatusLabels[p.status]} · {p.schemeCount === 1 ? "1 scheme" : `${p.schemeCount} schemes`}
                      {p.targetDate && ` · target ${formatDate(p.targetDate)}`} · updated {formatDate(p.updatedAt)}
                    </span>
                  </span>
                </td>
                <td className={`${wideOnly} px-4 py-2`}>{p.clientName}{p.venue && <span className="block text-xs text-tin">{p.venue}</span>}</td>
                <td className={`${wideOnly} px-4 py-2`}>{p.location || "–"}</td>
                <td className={`${wideOnly} px-4 py-2`}>{projectStatusLabels[p.status]}</td>
                <td className={`${wideOnly} px-4 py-2 num`}>{formatDate(p.targetDate)}</td>
                <td className={`${wideOnly} px-4 py-2 text-right num`}>{p.schemeCount}</td>
                <td className={`${wideOnly} px-4 py-2 num`}>{formatDate(p.updatedAt)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        {query.isError && <p role="alert" className="px-4 py-3 text-sm text-clash">✕ The projects could not be loaded: {query.error.message}</p>}
        {query.isPending && <p className="px-4 py-3 text-sm text-tin">Loading…</p>}
        {query.isSuccess && rows.length === 0 && (
          <p className="px-4 py-6 text-center text-sm text-tin">
            {query.data.length === 0 ? "No projects yet." : "No project matches the search."}
          </p>
        )}
      </div>
    </div>
  );
}
