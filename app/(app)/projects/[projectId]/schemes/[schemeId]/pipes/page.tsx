import type { Metadata } from "next";
import Link from "next/link";
import { PipeTableView } from "@/components/drawing/pipe-table-view";
import { pitchBesideName, stopTitle } from "@/components/spec/format";
import { pipeTable } from "@/lib/drawing/pipe-table";
import { planDocument } from "@/lib/drawing/scheme-plan";
import { parseDrawingUnits, type DrawingUnits } from "@/lib/drawing/units";
import { requirePageUser } from "@/lib/server/guard";
import { firmRates } from "@/lib/server/rates";
import { drawingRules } from "@/lib/spec/estimate";
import { loadSchemePage } from "../load";
import { PrintButton } from "../stop-list/print-button";

export const metadata: Metadata = { title: "Pipe tables" };

type Search = { stop?: string; units?: string };

/** Every stop's pipes, one stop at a time: the pipe shop's and the tonal director's table. */
export default async function PipesPage({ params, searchParams }: { params: Promise<{ projectId: string; schemeId: string }>; searchParams: Promise<Search> }) {
  const { projectId, schemeId } = await params;
  const search = await searchParams;
  const base = `/projects/${projectId}/schemes/${schemeId}`;
  const user = await requirePageUser("estimate:read", `${base}/pipes`);
  const { scheme, project } = await loadSchemePage(user, projectId, schemeId);
  const rates = await firmRates();
  const units = parseDrawingUnits(search.units, rates.drawingUnits);
  const planned = planDocument(scheme.document, scheme.tuning);
  const doc = scheme.document;
  const stops = doc.divisions.flatMap((d) => d.stops.map((s) => ({ d, s })));
  const chosen = stops.find((x) => x.s.id === search.stop) ?? stops.find((x) => x.s.origin !== "removed") ?? stops[0];
  const href = (q: { stop?: string; units?: DrawingUnits }) => {
    const p = new URLSearchParams();
    const stop = q.stop ?? chosen?.s.id;
    if (stop) p.set("stop", stop);
    p.set("units", q.units ?? units);
    return `${base}/pipes?${p}`;
  };
  const csv = (stop: string) => `/api/schemes/${schemeId}/pipes?stop=${encodeURIComponent(stop)}&units=${units}`;
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-2 print:hidden">
        <Link href={base} className="btn">← Back to the editor</Link>
        <h1 className="mr-auto text-2xl font-semibold">Pipe tables of {doc.name}</h1>
        <div role="group" aria-label="Units" className="flex overflow-hidden rounded border border-tin-rule text-sm">
          {(["mm", "in"] as const).map((u) => (
            <Link key={u} href={href({ units: u })} aria-current={u === units ? "true" : undefined} className={`px-3 py-1.5 ${u === units ? "bg-ink text-paper" : "bg-paper-card text-ink hover:text-brass-dark"}`}>
              {u === "mm" ? "mm, kg" : "inches, lb"}
            </Link>
          ))}
        </div>
        <PrintButton />
        {chosen && planned.ok && <a className="btn" href={csv(chosen.s.id)} download data-testid="pipe-csv">Download CSV</a>}
        {planned.ok && <a className="btn" href={csv("all")} download>All stops (CSV)</a>}
      </div>
      <p className="hidden text-sm print:block">{project.name} · {doc.name} · version {scheme.version} · a′ = {scheme.tuning.pitchHz} Hz at {scheme.tuning.temperatureC} °C</p>
      {!planned.ok ? (
        <div className="panel p-4 text-sm text-caution" role="status">The pipes wait for the scheme to be complete: {planned.messages[0]}</div>
      ) : (
        <div className="grid items-start gap-4 lg:grid-cols-[14rem_minmax(0,1fr)]">
          {/* On a phone a list of every stop would push the table a screen down: a choice of stop instead. */}
          <form method="get" className="flex items-end gap-2 lg:hidden print:hidden">
            <input type="hidden" name="units" value={units} />
            <div className="min-w-0 flex-1">
              <label className="label" htmlFor="pipes-stop">Stop</label>
              <select id="pipes-stop" name="stop" defaultValue={chosen?.s.id} className="field">
                {doc.divisions.map((d) => (
                  <optgroup key={d.id} label={d.name}>
                    {d.stops.map((s) => <option key={s.id} value={s.id}>{stopTitle(s)}</option>)}
                  </optgroup>
                ))}
              </select>
            </div>
            <button type="submit" className="btn">Show</button>
          </form>
          <nav aria-label="Stops" className="panel hidden max-h-[70vh] overflow-y-auto p-2 text-sm lg:block print:hidden">
            {doc.divisions.map((d) => (
              <div key={d.id} className="mb-2">
                <p className="px-2 pb-1 pt-1 text-xs font-semibold uppercase tracking-wide text-tin">{d.name}</p>
                <ul>
                  {d.stops.map((s) => (
                    <li key={s.id}>
                      <Link
                        href={href({ stop: s.id })}
                        aria-current={s.id === chosen?.s.id ? "page" : undefined}
                        className={`flex justify-between gap-2 rounded px-2 py-1 ${s.id === chosen?.s.id ? "bg-ink text-paper" : "hover:bg-paper"}`}
                      >
                        <span className="truncate">{s.name}</span>
                        <span className="shrink-0 opacity-70">{pitchBesideName(s)}</span>
                      </Link>
                    </li>
                  ))}
                </ul>
              </div>
            ))}
          </nav>
          <div className="min-w-0">
            {chosen ? (
              <PipeTableView table={pipeTable(planned.scheme, chosen.s.id, drawingRules(rates), planned.plan)} units={units} rules={drawingRules(rates)} />
            ) : (
              <p className="panel p-4 text-sm">This scheme has no stops yet.</p>
            )}
          </div>
        </div>
      )}
    </div>
  );
}
