/**
 * One division on the drawing board: its chests in plan and in elevation, which pipes are too tall,
 * the weight standing on each chest, and the wind of its ranks — all from one planting
 * (lib/drawing/chest-planting.ts), in the firm's units. No hooks.
 */
import { StateMark } from "@/components/ui/state-mark";
import { Caution } from "@/components/ui/caution";
import { chestWords, lengthNumber } from "@/components/spec/chest-words";
import { formatNumber, noteText } from "@/components/spec/format";
import { keysInWords, type DivisionPlanting, type PlantedChest } from "@/lib/drawing/chest-planting";
import { flowIn, flowUnitLabel, lengthUnitLabel, weightIn, weightUnitLabel, type DrawingUnits } from "@/lib/drawing/units";
import { ChestElevationSvg, ChestPlanSvg } from "./chest-planting-svg";

type Fit = { fits: boolean; lengthMarginMm: number; depthMarginMm: number } | null;

export const loadCaution =
  "These weights are a first estimate for the structural engineer. Whether a gallery or floor carries the organ — pipes, chests, case, wind system and the people who tune it — is for a structural engineer to judge under local building codes; do not load a gallery on these figures alone. Heavy pipes and chests are lifted with proper lifting gear by people trained to use it.";

export const windNote =
  "A first estimate for sizing the blower and reservoirs (the full-organ chord on every stop), not a design of the wind system: the wind system is designed and proved on the voiced pipes.";

export function ChestBoard({
  divisionName, planting, need, space, fit, windM3PerMin, chestHeightMm, units,
}: {
  divisionName: string;
  planting: DivisionPlanting | null;
  /** The estimator's figures for the main chest (the words use these). */
  need: { lengthMm: number; depthMm: number };
  space: { lengthMm: number; depthMm: number; heightMm?: number } | null;
  fit: Fit;
  /** The estimator's wind for the whole division (extensions and borrowings included), m³/min. */
  windM3PerMin: number;
  chestHeightMm: number;
  units: DrawingUnits;
}) {
  const words = chestWords(need, space, fit, units);
  const clash = fit !== null && !fit.fits;
  const u = lengthUnitLabel(units);
  if (!planting) {
    return (
      <figure className="panel p-4" data-testid={`chest-${divisionName}`}>
        <figcaption className="font-serif text-lg font-semibold">{divisionName}</figcaption>
        <p className="mt-1 text-sm text-tin">No pipes stand on this division&apos;s chest yet.</p>
      </figure>
    );
  }
  const { elevation } = planting;
  const W = weightUnitLabel(units);
  const kg = (x: number) => formatNumber(weightIn(units, x), 0);
  const flow = (x: number) => (units === "mm" ? flowIn(units, x).toFixed(2) : formatNumber(flowIn(units, x), 0));
  const chests: [string, PlantedChest][] = [["Main chest", planting.main]];
  if (planting.offset) chests.push(["Offset chest", planting.offset]);
  const ranks = [...planting.main.rows, ...(planting.offset?.rows ?? [])].filter((r) => r.windM3PerMin > 0);
  return (
    <figure className="panel space-y-3 p-4" data-testid={`chest-${divisionName}`}>
      <figcaption className="flex flex-wrap items-baseline gap-x-3">
        <span className="font-serif text-lg font-semibold">{divisionName}</span>
        <span className="text-xs text-tin">
          {planting.main.layout === "chromatic" ? "chromatic chest" : "C and C♯ half-chests"} · largest pipes {planting.bassesAt === "centre" ? "in the centre" : "at the ends"}
        </span>
      </figcaption>

      <section aria-label={`${divisionName} in plan`}>
        <h3 className="text-sm font-semibold">Plan <span className="font-normal text-tin">front at the bottom</span></h3>
        <ChestPlanSvg planting={planting} space={space} clash={clash} words={words} units={units} />
        <p className={`mt-1 flex items-start gap-1.5 text-sm ${clash ? "font-semibold text-clash" : space ? "text-fit" : "text-ink-soft"}`} data-testid={`chest-words-${divisionName}`}>
          <StateMark kind={clash ? "clash" : space ? "fit" : "unknown"} className="mt-0.5 h-4 w-4" />
          <span>{words}</span>
        </p>
      </section>

      <section aria-label={`${divisionName} in elevation`}>
        <h3 className="text-sm font-semibold">Elevation <span className="font-normal text-tin">from the front; pipe heights are speaking length plus foot</span></h3>
        <ChestElevationSvg planting={planting} chestHeightMm={chestHeightMm} units={units} />
        <div className="mt-1 text-sm" data-testid={`chest-height-words-${divisionName}`}>
          {elevation.availableMm === null ? (
            <p className="flex items-start gap-1.5 text-ink-soft">
              <StateMark kind="unknown" className="mt-0.5 h-4 w-4" />
              <span>Tallest pipe {lengthNumber(elevation.tallestMm, units)} {u}; the clear height in the case is not yet given (the division&apos;s space).</span>
            </p>
          ) : elevation.tooTall.length === 0 ? (
            <p className="flex items-start gap-1.5 text-fit">
              <StateMark kind="fit" className="mt-0.5 h-4 w-4" />
              <span>Every pipe stands: the tallest is {lengthNumber(elevation.tallestMm, units)} {u} under a clear height of {lengthNumber(elevation.availableMm, units)} {u}.</span>
            </p>
          ) : (
            <div className="text-clash">
              <p className="flex items-start gap-1.5 font-semibold">
                <StateMark kind="clash" className="mt-0.5 h-4 w-4" />
                <span>Too tall for the clear height of {lengthNumber(elevation.availableMm, units)} {u} — these pipes need mitring or another place:</span>
              </p>
              <ul className="ml-6 list-disc">
                {elevation.tooTall.map((t) => (
                  <li key={t.label} className="num">
                    {t.label}: {keysInWords(t.keys.map(noteText))}, the tallest {lengthNumber(t.tallestMm, units)} {u}, {lengthNumber(t.overMm, units)} {u} over
                  </li>
                ))}
              </ul>
            </div>
          )}
        </div>
      </section>

      <div className="grid gap-3 md:grid-cols-2">
        <section aria-label={`Weight on the ${divisionName} chests`}>
          <h3 className="text-sm font-semibold">Weight standing on each chest</h3>
          <table className="mt-1 w-full text-sm" data-testid={`chest-loads-${divisionName}`}>
            <thead>
              <tr className="text-left text-xs text-tin">
                <th className="font-normal">{W}</th>
                <th className="pl-3 text-right font-normal">new pipes</th>
                <th className="pl-3 text-right font-normal">existing pipes</th>
                <th className="pl-3 text-right font-normal">chest</th>
                <th className="pl-3 text-right font-normal">total</th>
              </tr>
            </thead>
            <tbody className="num">
              {chests.map(([label, c]) => (
                <tr key={label} className="border-t border-tin-rule">
                  <th scope="row" className="text-left font-normal">{label}</th>
                  <td className="pl-3 text-right">{kg(c.load.newPipesKg)}</td>
                  <td className="pl-3 text-right">{kg(c.load.existingPipesKg)}</td>
                  <td className="pl-3 text-right">{kg(c.load.chestKg)}</td>
                  <td className="pl-3 text-right font-semibold">{kg(c.load.totalKg)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <Caution className="mt-2">{loadCaution}</Caution>
        </section>

        <section aria-label={`Wind of the ${divisionName}`}>
          <h3 className="text-sm font-semibold">Wind <span className="font-normal text-tin">({flowUnitLabel(units)}, full organ)</span></h3>
          <table className="mt-1 w-full text-sm" data-testid={`chest-wind-${divisionName}`}>
            <tbody className="num">
              {ranks.map((r) => (
                <tr key={r.label} className="border-t border-tin-rule">
                  <th scope="row" className="text-left font-normal">{r.label}</th>
                  <td className="pl-3 text-right">{flow(r.windM3PerMin)}</td>
                </tr>
              ))}
              <tr className="border-t border-ink">
                <th scope="row" className="text-left font-semibold">The division, extensions and borrowed stops included</th>
                <td className="pl-3 text-right font-semibold" data-testid={`chest-wind-total-${divisionName}`}>{flow(windM3PerMin)}</td>
              </tr>
            </tbody>
          </table>
          <p className="mt-1 text-xs text-ink-soft" role="note">{windNote}</p>
        </section>
      </div>

      <details className="text-xs text-ink-soft">
        <summary className="cursor-pointer text-tin">Rows, back to front ({planting.main.rows.length})</summary>
        <ol className="mt-1 columns-2 gap-6 sm:columns-3">
          {planting.main.rows.map((r, i) => (
            <li key={i} className="num">{r.label} · {lengthNumber(r.depth, units)} {u}</li>
          ))}
        </ol>
      </details>
      <p className="text-xs text-tin">Circles: metal pipes; squares: wooden pipes (outside size); shaded: existing pipes; dashed: prepared for. Drawn to scale from the estimator&apos;s pipe sizes and the firm&apos;s chest rules.</p>
    </figure>
  );
}
