"use client";
import { useRouter } from "next/navigation";
import { Fragment, useState } from "react";
import { errorText } from "@/components/spec/api";
import { formatMoney, formatNumber } from "@/components/spec/format";
import { TreatmentMark } from "@/components/spec/treatment-mark";
import { StateMark } from "@/components/ui/state-mark";
import { useChangeCosts, useComparison } from "@/lib/query/hooks";
import { MAX_COMPARED, MIN_COMPARED, type ComparisonView, type FigureRow, type StopCell } from "@/lib/spec/comparison";
import { StackedBars } from "./stacked-bars";

type SchemeOption = { id: string; name: string };

const markWords: Record<StopCell["mark"], { sign: string; word: string; cls: string }> = {
  base: { sign: "", word: "", cls: "" },
  same: { sign: "=", word: "same", cls: "text-tin" },
  added: { sign: "+", word: "added", cls: "text-fit" },
  changed: { sign: "△", word: "changed", cls: "text-caution" },
  removed: { sign: "−", word: "removed", cls: "text-clash" },
  absent: { sign: "", word: "not in this scheme", cls: "text-tin" },
};

type PresentCell = Extract<StopCell, { name: string }>;
const present = (c: StopCell): c is PresentCell => "name" in c;

function Cell({ cell }: { cell: StopCell }) {
  const m = markWords[cell.mark];
  if (!present(cell)) {
    return <span className={`text-xs ${m.cls}`} data-mark={cell.mark}>{m.sign && <span aria-hidden="true">{m.sign} </span>}{m.word}</span>;
  }
  return (
    <span data-mark={cell.mark}>
      <span className="flex items-baseline gap-1.5">
        <TreatmentMark mark={cell.disposition} className="h-3 w-3 shrink-0 translate-y-0.5" />
        <span>{cell.name} <span className="num text-ink-soft">{cell.pitch}</span></span>
      </span>
      <span className="block pl-[18px] text-[11px] text-ink-soft" data-testid="compare-disposition">{cell.dispositionText}</span>
      {m.word && <span className={`block text-[11px] font-semibold ${m.cls}`}><span aria-hidden="true">{m.sign} </span>{m.word}</span>}
      {cell.changes.length > 0 && (
        <ul className="text-[11px] text-ink-soft">
          {cell.changes.map((c) => <li key={c.field}>{c.label}{c.from ? `: ${c.from} → ${c.to}` : ` ${c.to}`}</li>)}
        </ul>
      )}
    </span>
  );
}

function diffText(d: number | null, unit: string, digits = 0): string {
  if (d === null || d === 0) return "";
  return `${d > 0 ? "+" : "−"}${formatNumber(Math.abs(d), digits)}${unit ? ` ${unit}` : ""}`;
}

function NumberRows({ rows, digits = (r: FigureRow<number>) => (r.unit === "kg" || r.unit === "weeks" ? 1 : 0) }: { rows: FigureRow<number>[]; digits?: (r: FigureRow<number>) => number }) {
  return (
    <>
      {rows.map((r) => (
        <tr key={r.key} className="border-t border-tin-rule" data-testid={`total-${r.key}`}>
          <th scope="row" className={`px-3 py-1 text-left font-normal ${r.label === r.label.toLowerCase() ? "pl-6 text-ink-soft" : ""}`}>{r.label}</th>
          {r.values.map((v, i) => (
            <td key={i} className="px-3 py-1 text-right num">
              {v === null ? "—" : `${formatNumber(v, digits(r))}${r.unit ? ` ${r.unit}` : ""}`}
              {i > 0 && r.diffs[i] ? <span className="block text-[11px] text-ink-soft">{diffText(r.diffs[i]!, r.unit, digits(r))}</span> : null}
            </td>
          ))}
        </tr>
      ))}
    </>
  );
}

function SchemePicker({ projectId, options, chosen }: { projectId: string; options: SchemeOption[]; chosen: string[] }) {
  const router = useRouter();
  const [picked, setPicked] = useState(chosen);
  const go = (ids: string[]) => {
    setPicked(ids);
    if (ids.length >= MIN_COMPARED) router.replace(`/projects/${projectId}/compare?schemes=${ids.join(",")}`, { scroll: false });
  };
  return (
    <fieldset className="panel flex flex-wrap items-center gap-x-4 gap-y-2 px-4 py-3 text-sm print:hidden">
      <legend className="sr-only">Schemes to compare</legend>
      <span className="font-semibold">Compare {MIN_COMPARED} to {MAX_COMPARED}:</span>
      {options.map((o) => {
        const on = picked.includes(o.id);
        return (
          <label key={o.id} className="flex items-center gap-1.5">
            <input
              type="checkbox"
              className="accent-brass"
              checked={on}
              disabled={!on && picked.length >= MAX_COMPARED}
              onChange={() => go(on ? picked.filter((id) => id !== o.id) : [...picked, o.id])}
            />
            {o.name}
            {picked[0] === o.id && <span className="text-xs text-tin">(the others are compared with this one)</span>}
          </label>
        );
      })}
      {picked.length < MIN_COMPARED && <span role="status" className="text-caution">Choose at least {MIN_COMPARED} schemes.</span>}
      <button type="button" className="btn ml-auto" onClick={() => window.print()}>Print</button>
    </fieldset>
  );
}

function Tables({ view, projectId, chosen }: { view: ComparisonView; projectId: string; chosen: string[] }) {
  const costs = useChangeCosts(projectId, chosen, !!view.money);
  const names = view.schemes.map((s) => s.name);
  const head = (
    <thead className="text-left text-xs uppercase tracking-wide text-tin">
      <tr>
        <th className="px-3 py-2"><span className="sr-only">Row</span></th>
        {view.schemes.map((s, i) => <th key={s.id} className="px-3 py-2 normal-case text-sm text-ink">{s.name}{i === 0 && <span className="block text-[11px] font-normal text-tin">compared with</span>}</th>)}
      </tr>
    </thead>
  );
  const currency = view.money?.currency ?? "EUR";
  return (
    <div className="space-y-6">
      {view.schemes.some((s) => s.problems.length) && (
        <p role="status" className="panel flex items-start gap-2 px-4 py-2 text-sm text-caution">
          <StateMark kind="caution" className="mt-0.5" />
          <span>{view.schemes.filter((s) => s.problems.length).map((s) => `${s.name} is not complete, so it has no figures yet: ${s.problems[0]}`).join(" ")}</span>
        </p>
      )}

      <section className="panel overflow-x-auto" aria-labelledby="cmp-figures">
        <h2 id="cmp-figures" className="border-b border-tin-rule px-4 py-3 text-xl font-semibold">Figures</h2>
        <table className="w-full text-sm" data-testid="compare-totals">
          {head}
          <tbody>
            <NumberRows rows={view.totals} />
            {view.divisions.map((d) => (
              <tr key={d.id} className="border-t border-tin-rule" data-testid={`chest-${d.name}`}>
                <th scope="row" className="px-3 py-1 text-left font-normal">Chest space: {d.name}</th>
                {d.chests.map((c, i) => {
                  const kind = !c ? null : c.fits === null ? "unknown" : c.fits ? "fit" : "clash";
                  return (
                    <td key={i} className={`px-3 py-1 text-right text-xs ${kind === "clash" ? "font-semibold text-clash" : kind === "fit" ? "text-fit" : "text-tin"}`} data-fits={kind ?? "none"}>
                      {kind && <StateMark kind={kind} className="mr-1" />}
                      {!c ? "—" : c.fits === null ? "no space given" : c.fits ? "fits" : "does not fit"}
                      {c && <span className="block text-ink-soft num">{formatNumber(Math.round(c.lengthMm))} × {formatNumber(Math.round(c.depthMm))} mm</span>}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </section>

      <div className="grid gap-6 lg:grid-cols-2">
        <section className="panel p-4">
          <StackedBars
            title="New, restored and reused pipes"
            testId="chart-pipes"
            series={[{ key: "new", label: "New pipes" }, { key: "restored", label: "Restored pipes" }, { key: "reused", label: "Reused pipes" }]}
            rows={view.pipesByTreatment.map((p, i) => ({ label: names[i]!, values: { new: p.new, restored: p.restored, reused: p.reused } }))}
            format={(n) => formatNumber(n)}
          />
        </section>
        {view.money && (
          <section className="panel p-4">
            <StackedBars
              title={`Money by category (${currency})`}
              testId="chart-money"
              series={view.money.rows.filter((r) => r.key !== "total").map((r) => ({ key: r.key, label: r.label }))}
              rows={names.map((n, i) => ({ label: n, values: Object.fromEntries(view.money!.rows.map((r) => [r.key, Number(r.values[i] ?? 0)])) }))}
              format={(n) => formatMoney(n.toFixed(0), currency).replace(/\.00$/, "")}
            />
          </section>
        )}
        {view.hours && (
          <section className="panel p-4">
            <StackedBars
              title="Hours by department"
              testId="chart-hours"
              series={view.hours.rows.filter((r) => r.key !== "total").map((r) => ({ key: r.key, label: r.label }))}
              rows={names.map((n, i) => ({ label: n, values: Object.fromEntries(view.hours!.rows.map((r) => [r.key, r.values[i] ?? 0])) }))}
              format={(n) => `${formatNumber(n)} h`}
            />
          </section>
        )}
      </div>

      {(view.hours || view.money) && (
        <section className="panel overflow-x-auto" aria-labelledby="cmp-firm">
          <h2 id="cmp-firm" className="border-b border-tin-rule px-4 py-3 text-xl font-semibold">For the firm</h2>
          <table className="w-full text-sm" data-testid="compare-firm">
            {head}
            <tbody>
              {view.hours && <NumberRows rows={view.hours.rows.map((r) => ({ ...r, label: r.key === "total" ? "Total hours" : r.label }))} digits={() => 0} />}
              {view.money?.rows.map((r) => (
                <tr key={r.key} className={`border-t border-tin-rule ${r.key === "total" ? "font-semibold" : ""}`} data-testid={`money-${r.key}`}>
                  <th scope="row" className="px-3 py-1 text-left font-normal">{r.label}</th>
                  {r.values.map((v, i) => (
                    <td key={i} className="px-3 py-1 text-right num">
                      {v === null ? "—" : formatMoney(v, currency)}
                      {i > 0 && r.diffs[i] && r.diffs[i] !== "0.00" ? <span className="block text-[11px] font-normal text-ink-soft">{formatMoney(r.diffs[i]!, currency, { signed: true })}</span> : null}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
          {view.money && (
            <div className="border-t border-tin-rule px-4 py-3 text-sm" data-testid="change-costs">
              <h3 className="mb-1 font-semibold">What each change is worth on its own</h3>
              <p className="mb-2 text-xs text-tin">The total of {names[0]} with only that change made, minus its total (overheads, contingency, margin and tax included).</p>
              {costs.isPending && <p className="text-tin" role="status">Working out each change…</p>}
              {costs.error && <p role="alert" className="field-error">✕ {errorText(costs.error)}</p>}
              {costs.data?.map((c) => (
                <div key={c.schemeId} className="mb-2">
                  <p className="font-medium">{names[view.schemes.findIndex((s) => s.id === c.schemeId)]} against {names[0]}</p>
                  {c.changes.length === 0 ? <p className="text-tin">No stop changes.</p> : (
                    <ul className="space-y-0.5">
                      {c.changes.map((x) => (
                        <li key={x.stopId} className="flex flex-wrap gap-x-2">
                          <span className="flex-1">
                            {x.kind === "added" ? "Adding" : x.kind === "removed" ? "Removing" : "Changing"} the {x.stop}
                            {x.changes.length > 0 && <span className="text-ink-soft"> ({x.changes.map((f) => (f.from ? `${f.label} ${f.from} → ${f.to}` : `${f.label} ${f.to}`)).join(", ")})</span>}
                          </span>
                          <span className={`num ${x.diffAmount?.startsWith("-") ? "text-fit" : ""}`}>
                            {x.diffAmount === null ? "cannot stand alone" : x.diffAmount.startsWith("-") ? `saves ${formatMoney(x.diffAmount.slice(1), currency)}` : x.diffAmount === "0.00" ? "no change" : `adds ${formatMoney(x.diffAmount, currency)}`}
                          </span>
                        </li>
                      ))}
                    </ul>
                  )}
                </div>
              ))}
            </div>
          )}
        </section>
      )}

      <section className="panel overflow-x-auto" aria-labelledby="cmp-stops">
        <h2 id="cmp-stops" className="border-b border-tin-rule px-4 py-3 text-xl font-semibold">Stops, division by division</h2>
        <p className="px-4 pt-2 text-xs text-tin">Marks against {names[0]}: + added, − removed, △ changed (what changed is listed), = the same.</p>
        <table className="w-full text-sm" data-testid="compare-stops">
          {head}
          <tbody>
            {view.divisions.map((d) => (
              <Fragment key={d.id}>
                <tr className="border-t-2 border-ink/60"><th colSpan={view.schemes.length + 1} className="px-3 pt-3 pb-1 text-left font-serif text-base">{d.name}</th></tr>
                {d.rows.map((r) => (
                  <tr key={r.stopId} className="border-t border-tin-rule align-top" data-testid={`row-${r.stopId}`}>
                    <td className="w-0 px-1" />
                    {r.cells.map((c, i) => <td key={i} className="px-3 py-1.5"><Cell cell={c} /></td>)}
                  </tr>
                ))}
              </Fragment>
            ))}
          </tbody>
        </table>
      </section>
    </div>
  );
}

/** The comparison page's body: the picker, then figures, charts and stops for the schemes in the address. */
export function CompareView({ projectId, options, chosen }: { projectId: string; options: SchemeOption[]; chosen: string[] }) {
  const comparison = useComparison(projectId, chosen);
  return (
    <div className="space-y-4">
      <SchemePicker key={chosen.join(",")} projectId={projectId} options={options} chosen={chosen} />
      {comparison.error && <p role="alert" className="field-error">✕ {errorText(comparison.error)}</p>}
      {comparison.data && <Tables view={comparison.data} projectId={projectId} chosen={chosen} />}
      {comparison.isPending && chosen.length >= MIN_COMPARED && <p role="status" className="text-sm text-tin">Comparing…</p>}
    </div>
  );
}
