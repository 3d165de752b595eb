/**
 * One stop's pipe table, pipe by pipe, in the firm's units: a plain table that prints (landscape
 * recommended) and scrolls sideways on a phone. No hooks, so the server renders it into the page.
 */
import { containsLead, type Metal } from "@/lib/estimate/materials";
import type { GeometryRules } from "@/lib/estimate/geometry";
import { sizeClassLabels } from "@/lib/estimate/departments";
import { pipeStateLabels, type PipeTable } from "@/lib/drawing/pipe-table";
import { lengthDecimals, lengthIn, lengthUnitLabel, weightIn, weightUnitLabel, type DrawingUnits } from "@/lib/drawing/units";
import { Caution, leadCaution } from "@/components/ui/caution";
import { formatFixed, noteText } from "@/components/spec/format";

export function PipeTableView({ table, units, rules }: { table: PipeTable; units: DrawingUnits; rules: GeometryRules }) {
  const L = lengthUnitLabel(units);
  const W = weightUnitLabel(units);
  const len = (mm: number | null) => (mm === null ? "–" : formatFixed(lengthIn(units, mm), lengthDecimals(units, mm)));
  const thin = (mm: number | null) => (mm === null ? "–" : formatFixed(lengthIn(units, mm), units === "mm" ? 2 : 3));
  const t = table.totals;
  const reeds = table.rows.some((r) => r.resonatorLengthMm !== null);
  const wood = table.rows.some((r) => r.wood);
  const ranks = new Set(table.rows.map((r) => r.rank)).size;
  // On a narrow screen the table scrolls sideways inside its box; the key stays in sight (a single rank only: with a rank column before it, both would have to stay).
  const keySticky = ranks > 1 ? "" : "sticky left-0 print:static";
  const lead = table.rows.some((r) => !r.wood && containsLead(rules.alloys[r.material as Metal]));
  const states = (Object.keys(t.byState) as (keyof typeof t.byState)[]).filter((k) => t.byState[k] > 0);
  return (
    <section className="space-y-3" data-testid="pipe-table" aria-labelledby={`pipes-${table.stopId}`}>
      <header className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <h2 id={`pipes-${table.stopId}`} className="text-xl font-semibold">{table.divisionName}: {table.stopName}</h2>
        <p className="text-sm text-ink-soft" data-testid="pipe-totals">
          {table.rows.length} {table.rows.length === 1 ? "pipe" : "pipes"} listed{ranks > 1 ? ` in ${ranks} ranks` : ""}
          {states.length > 0 && ` — ${states.map((k) => `${t.byState[k]} ${pipeStateLabels[k]}`).join(", ")}`}
          {" · "}in the organ: {t.inOrgan} pipes
          {table.rows.some((r) => !r.wood) && `, metal ${formatFixed(weightIn(units, t.metalKg), 1)} ${W}`}
          {t.woodM3 > 0 && `, timber ${formatFixed(t.woodM3 * 1000, 1)} litres`}
          {t.onOffsetChest > 0 && ` · ${t.onOffsetChest} on an offset chest`}
        </p>
      </header>
      {lead && <Caution className="print:hidden">{leadCaution}</Caution>}
      <div className="overflow-x-auto rounded border border-tin-rule bg-paper-card print:overflow-visible print:border-0">
        <table className="w-full border-collapse text-xs print:text-[7pt]">
          <caption className="sr-only">Pipes of {table.stopName}, lengths in {L}, weights in {W}</caption>
          <thead className="bg-paper text-left text-[11px] uppercase tracking-wide text-tin">
            <tr>
              {ranks > 1 && <th scope="col" className="px-2 py-1.5">Rank</th>}
              <th scope="col" className={`px-2 py-1.5 ${keySticky} bg-paper`}>Key</th>
              <th scope="col" className="px-2 py-1.5">Sounds</th>
              <th scope="col" className="px-2 py-1.5 text-right">Hz</th>
              <th scope="col" className="px-2 py-1.5 text-right">Speaking length ({L})</th>
              {reeds && <th scope="col" className="px-2 py-1.5 text-right">Resonator ({L})</th>}
              <th scope="col" className="px-2 py-1.5 text-right">{wood ? `Diameter / inside side (${L})` : `Diameter (${L})`}</th>
              <th scope="col" className="px-2 py-1.5 text-right">Mouth ({L})</th>
              <th scope="col" className="px-2 py-1.5 text-right">Cut-up ({L})</th>
              <th scope="col" className="px-2 py-1.5 text-right">Foot ({L})</th>
              <th scope="col" className="px-2 py-1.5 text-right">{wood ? `Sheet / board (${L})` : `Sheet (${L})`}</th>
              <th scope="col" className="px-2 py-1.5 text-right">{wood ? `Metal (${W}) / timber (l)` : `Metal (${W})`}</th>
              <th scope="col" className="px-2 py-1.5">Size</th>
              <th scope="col" className="px-2 py-1.5">State</th>
              <th scope="col" className="px-2 py-1.5">Chest</th>
            </tr>
          </thead>
          <tbody>
            {table.rows.map((r) => (
              <tr key={`${r.rank}:${r.keyMidi}`} className={`border-t border-tin-rule/60 ${r.state === "shared" || r.state === "borrowed" ? "text-ink-soft" : ""} ${r.keyMidi % 12 === 0 ? "border-t-tin" : ""}`}>
                {ranks > 1 && <td className="px-2 py-1">{r.rank}</td>}
                <td className={`px-2 py-1 font-medium ${keySticky} bg-paper-card`}>{noteText(r.key)}</td>
                <td className="px-2 py-1">{noteText(r.sounds)} <span className="text-tin">{r.footage}′</span></td>
                <td className="px-2 py-1 text-right">{formatFixed(r.frequencyHz, r.frequencyHz < 100 ? 2 : 1)}</td>
                <td className="px-2 py-1 text-right">{len(r.speakingLengthMm)}</td>
                {reeds && <td className="px-2 py-1 text-right">{len(r.resonatorLengthMm)}</td>}
                <td className="px-2 py-1 text-right">{r.wood ? <span title="inside side of a wooden pipe">□ {len(r.insideSideMm)}</span> : len(r.diameterMm)}</td>
                <td className="px-2 py-1 text-right">{len(r.mouthWidthMm)}</td>
                <td className="px-2 py-1 text-right">{len(r.cutUpMm)}</td>
                <td className="px-2 py-1 text-right">{len(r.footLengthMm)}</td>
                <td className="px-2 py-1 text-right">{thin(r.thicknessMm)}</td>
                <td className="px-2 py-1 text-right">{r.wood ? `${formatFixed(r.woodM3 * 1000, 2)} l` : formatFixed(weightIn(units, r.metalKg), 2)}</td>
                <td className="whitespace-nowrap px-2 py-1">{sizeClassLabels[r.sizeClass]}</td>
                <td className="whitespace-nowrap px-2 py-1">{pipeStateLabels[r.state]}</td>
                <td className="px-2 py-1">{r.onOffsetChest ? "offset" : "main"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-tin">
        Computed from the scale and the firm&apos;s norms (cut-up by family unless the stop sets its own, foot length and sheet by size): a planning table to check against the pipe maker&apos;s own.
        Pipes shared with the rank a stop extends, and borrowed pipes, are listed in grey and counted with the stop that owns them.
      </p>
    </section>
  );
}
