"use client";
import { memo } from "react";
import { Caution } from "@/components/ui/caution";
import { StateMark } from "@/components/ui/state-mark";
// The departments module alone: the estimator's barrel would bring the whole estimator and zod into
// the editor's first scripts, which the browser runs only in the figures worker.
import { departmentLabels, departments } from "@/lib/estimate/departments";
import { materialLabels } from "./format";
import { lengthUnitLabel, type DrawingUnits } from "@/lib/drawing/units";
import { chestWords, fitState, lengthNumber } from "./chest-words";
import { formatMoney, formatNumber } from "./format";
import type { Figures } from "./use-figures";

/** Amounts through the product's one money formatter. */
const money = (amount: string, currency: string) => formatMoney(amount, currency);

function Row({ label, value, strong = false, testId }: { label: string; value: string; strong?: boolean; testId?: string }) {
  return (
    <div className={`flex justify-between gap-3 py-0.5 ${strong ? "font-semibold" : ""}`}>
      <dt className="text-ink-soft">{label}</dt>
      <dd className="num text-right" data-testid={testId}>{value}</dd>
    </div>
  );
}

/**
 * The estimator's figures for the document as it stands, recomputed on every change (in a worker):
 * while they are behind the document they are marked "updating", and before the first arrive the
 * panel says it is working them out.
 */
export const FiguresPanel = memo(function FiguresPanel({ figures, showMoney, units, stale = false }: { figures: Figures | null; showMoney: boolean; units: DrawingUnits; stale?: boolean }) {
  if (!figures) {
    return (
      <section className="panel p-3 text-sm" data-testid="figures" aria-labelledby="figures-heading" data-state="pending" data-stale="true" aria-busy="true">
        <h2 id="figures-heading" className="mb-2 text-lg font-semibold">Figures</h2>
        <p className="text-tin">Working out the figures…</p>
        <div className="mt-3 space-y-2" aria-hidden="true">
          {[80, 65, 90, 55, 70, 85].map((w, i) => <div key={i} className="h-3 animate-pulse rounded bg-paper-deep" style={{ width: `${w}%` }} />)}
        </div>
      </section>
    );
  }
  if (!figures.ok) {
    return (
      <section className="panel p-3 text-sm" data-testid="figures" aria-labelledby="figures-heading" data-state="incomplete" data-stale={stale ? "true" : undefined}>
        <h2 id="figures-heading" className="mb-1 text-lg font-semibold">Figures</h2>
        <p className="flex items-start gap-1.5 text-caution"><StateMark kind="caution" className="mt-0.5" />The figures wait for the scheme to be complete:</p>
        <ul className="mt-1 list-disc space-y-0.5 pl-5 text-xs text-ink-soft" data-testid="figures-messages">
          {figures.messages.slice(0, 12).map((m, i) => <li key={i}>{m}</li>)}
        </ul>
      </section>
    );
  }
  return (
    <section className="panel text-sm" data-testid="figures" aria-labelledby="figures-heading" data-state="ok" data-stale={stale ? "true" : undefined} data-estimate-ms={figures.ms.toFixed(1)} aria-busy={stale || undefined}>
      <div className="flex items-baseline border-b border-tin-rule px-3 py-2">
        <h2 id="figures-heading" className="flex-1 text-lg font-semibold">Figures</h2>
        <span className={`text-xs ${stale ? "text-caution" : "text-tin"}`} title="Computed in the browser on every change">{stale ? "updating…" : "live"}</span>
      </div>
      <FiguresBody figures={figures} showMoney={showMoney} units={units} />
    </section>
  );
});

/**
 * The figures themselves. Memoised apart from the panel's frame: an edit marks the figures stale at
 * once (the frame's "updating…"), which draws no figure again until the new ones arrive.
 */
const FiguresBody = memo(function FiguresBody({ figures, showMoney, units }: { figures: Extract<Figures, { ok: true }>; showMoney: boolean; units: DrawingUnits }) {
  const e = figures.estimate;
  const t = e.totals;
  const clashes = e.divisions.filter((d) => d.chest.fit && !d.chest.fit.fits);
  const metals = (Object.entries(t.metalKg) as [keyof typeof materialLabels, number][]).filter(([, kg]) => kg > 0);
  const woods = (Object.entries(t.woodM3) as [keyof typeof materialLabels, number][]).filter(([, m3]) => m3 > 0);
  return (
    <>
      {clashes.length > 0 && (
        <p role="alert" className="flex items-start gap-1.5 border-b border-clash/40 bg-clash-light px-3 py-2 font-semibold text-clash" data-testid="fit-warning">
          <StateMark kind="clash" className="mt-0.5 h-4 w-4" />
          <span>Does not fit: {clashes.map((d) => `the ${d.name} chest`).join(", ")}.</span>
        </p>
      )}
      <div className="space-y-3 px-3 py-2">
        <dl>
          <Row label="Stops" value={formatNumber(t.stops)} testId="fig-stops" />
          <Row label="Ranks" value={formatNumber(t.ranks)} />
          <Row label="Pipes in the organ" value={formatNumber(t.pipes.total)} strong testId="fig-pipes" />
          <Row label="new" value={formatNumber(t.pipes.new)} testId="fig-pipes-new" />
          <Row label="reused" value={formatNumber(t.pipes.reused)} testId="fig-pipes-reused" />
          <Row label="restored" value={formatNumber(t.pipes.restored)} />
          {t.pipes.prepared > 0 && <Row label="prepared for (later)" value={formatNumber(t.pipes.prepared)} />}
          {t.pipes.removed > 0 && <Row label="removed" value={formatNumber(t.pipes.removed)} />}
        </dl>

        <div>
          <h3 className="label">Chest space by division</h3>
          <ul className="space-y-1">
            {e.divisions.map((d) => {
              const state = fitState(d.chest.fit, d.chest.main.rows > 0);
              return (
                <li key={d.id} className={`flex items-start gap-1.5 text-xs ${state === "clash" ? "text-clash" : "text-ink-soft"}`} data-testid={`figures-chest-${d.name}`} data-fits={state}>
                  <StateMark kind={state} className={`mt-px ${state === "fit" ? "text-fit" : state === "unknown" ? "text-tin" : ""}`} />
                  <span>
                    <strong className="font-semibold text-ink">{d.name}</strong>{" "}
                    {d.chest.main.rows > 0 ? chestWords(d.chest.main, d.chest.space, d.chest.fit, units) : "no pipes on a chest."}
                    {d.chest.offset && <> Offset chest {lengthNumber(d.chest.offset.lengthMm, units)} × {lengthNumber(d.chest.offset.depthMm, units)} {lengthUnitLabel(units)}.</>}
                  </span>
                </li>
              );
            })}
          </ul>
        </div>

        <div data-testid="fig-parts">
          <h3 className="label">Parts of the work</h3>
          <table className="w-full text-xs">
            <thead className="sr-only">
              <tr><th>Part</th><th>Hours</th>{showMoney && <th>Direct cost</th>}</tr>
            </thead>
            <tbody>
              {e.packages.map((p) => {
                const cost = showMoney && "money" in e ? e.money.byPackage.find((b) => b.package === p.package)?.directCostAmount : undefined;
                return (
                  <tr key={p.package} data-testid={`fig-part-${p.package}`}>
                    <td className="py-0.5 text-ink-soft">{p.label}</td>
                    <td className="num py-0.5 text-right">{formatNumber(p.hoursTotal, 0)} h</td>
                    {showMoney && <td className="num py-0.5 pl-2 text-right">{cost && "money" in e ? money(cost, e.money.currency) : "–"}</td>}
                  </tr>
                );
              })}
            </tbody>
          </table>
          <ul className="mt-1 space-y-0.5 text-[11px] text-tin">
            <li data-testid="fig-wind">
              Wind {formatNumber(e.wind.blowerM3PerMin, 1)} m³/min at {formatNumber(e.wind.blowerPressureMm, 0)} mm, blower {formatNumber(e.wind.blowerKw, 2)} kW; {e.wind.reservoirs.length} reservoir{e.wind.reservoirs.length === 1 ? "" : "s"}.
            </li>
            <li data-testid="fig-case">
              {e.case.work === "none" ? "No case work." : `Case ${e.case.work}: ${formatNumber(e.case.surfaceM2, 0)} m² of casework${e.case.frontPipes ? `, ${formatNumber(e.case.frontPipes)} front pipes` : ""}.`}
            </li>
            <li data-testid="fig-site">
              Site {formatNumber(e.site.transport.distanceKm)} km: {formatNumber(e.site.transport.loadsOut + e.site.transport.loadsIn)} loads, {formatNumber(e.site.time.weeks, 1)} weeks on site{e.site.time.lodging ? ", crew lodging" : ""}.
            </li>
          </ul>
        </div>

        <div>
          <h3 className="label">Materials and weight</h3>
          <dl>
            <Row label="Pipe metal in the organ" value={`${formatNumber(t.metalTotalKg, 1)} kg`} strong testId="fig-metal" />
            {metals.map(([m, kg]) => <Row key={m} label={materialLabels[m]} value={`${formatNumber(kg, 1)} kg`} />)}
            <Row label="Pipe metal to buy" value={`${formatNumber(t.metalBoughtTotalKg, 1)} kg`} testId="fig-metal-bought" />
            {woods.map(([m, m3]) => <Row key={m} label={`${materialLabels[m]} in pipes`} value={`${formatNumber(m3, 3)} m³`} />)}
            {t.wiring.conductorLengthKm > 0 && <Row label="Cable" value={`${formatNumber(t.wiring.conductorLengthKm, 2)} km`} />}
            <Row label="The organ weighs" value={`${formatNumber(e.site.weights.totalKg / 1000, 1)} t`} testId="fig-weight" />
          </dl>
        </div>

        <div data-testid="fig-hours">
          <h3 className="label">Hours by department</h3>
          <dl>
            {departments.filter((d) => t.hours[d] > 0).map((d) => <Row key={d} label={departmentLabels[d]} value={formatNumber(t.hours[d], 0)} />)}
            <Row label="Total hours" value={formatNumber(t.hoursTotal, 0)} strong testId="fig-hours-total" />
            <Row label="Hours a stop" value={formatNumber(t.hoursPerStop, 0)} testId="fig-hours-per-stop" />
            {e.programme.totalWeeks > 0 && <Row label="Programme" value={`${formatNumber(e.programme.totalWeeks)} weeks`} />}
          </dl>
        </div>

        {showMoney && "money" in e && (
          <div>
            <h3 className="label">Money</h3>
            <dl data-testid="money-lines">
              <Row label="Labour" value={money(e.money.labourAmount, e.money.currency)} />
              <Row label="Materials" value={money(e.money.materialsAmount, e.money.currency)} />
              <Row label="Bought in, site and travel" value={money(e.money.itemsAmount, e.money.currency)} testId="fig-money-items" />
              <Row label={`Overheads ${e.money.overhead.percent} %`} value={money(e.money.overhead.amount, e.money.currency)} />
              <Row label={`Contingency ${e.money.contingency.percent} %`} value={money(e.money.contingency.amount, e.money.currency)} />
              <Row label={`Margin ${e.money.margin.percent} %`} value={money(e.money.margin.amount, e.money.currency)} />
              <Row label={`Tax ${e.money.tax.percent} %`} value={money(e.money.tax.amount, e.money.currency)} />
              <Row label="Total" value={money(e.money.totalAmount, e.money.currency)} strong testId="fig-money" />
            </dl>
            <p className="mt-1 text-[11px] text-tin">From the firm&apos;s rates ({e.ratesProvenance}).</p>
          </div>
        )}
        {e.cautions.map((c) => <Caution key={c.code}>{c.text}</Caution>)}
        <p className="text-[11px] text-tin num" suppressHydrationWarning>Computed in {formatNumber(figures.ms, 1)} ms.</p>
      </div>
    </>
  );
});
