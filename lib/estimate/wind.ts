/**
 * The wind system. Wind need — a first model (docs/estimating-method.md, "Wind"): every pipe takes
 * the jet through its flue, Cd · W · δ · √(2p/ρ) (geometry.ts); a division needs, for the full organ,
 * `chordKeys` keys held (`chordKeysPedal` on the pedals) on every stop drawn, each key taking the
 * mean wind of its rank's pipes. Reservoirs: one per wind pressure, sized by the wind it supplies.
 * The blower: the whole need plus leakage and reserve, at the highest pressure plus the losses of
 * the regulators; its motor power Q · p / η (textbook fan power). Trunking per metre; tremulants.
 */
import type { Scheme } from "./scheme";
import type { Rates } from "./rates";
import { D } from "./departments";
import { ITEM, type CostCentre } from "./cost-centres";
import { PA_PER_MM_WATER } from "./units";

export interface WindDivision {
  /** Wind pressure in mm water. */
  readonly pressureMm: number;
  /** Σ over the stops it can play of the mean wind per key of their ranks, m³/s. */
  readonly windPerKeyM3s: number;
  readonly pedal: boolean;
  readonly hasChest: boolean;
}

export interface WindNeed {
  /** Per division, m³/min, for the full organ. */
  readonly divisionsM3PerMin: readonly number[];
  readonly reservoirs: readonly { readonly pressureMm: number; readonly flowM3PerMin: number }[];
  /** The blower: flow with leakage and reserve, pressure with margin, motor power. */
  readonly blowerM3PerMin: number;
  readonly blowerPressureMm: number;
  readonly blowerKw: number;
}

const r1 = (x: number) => Math.round(x * 10) / 10;
const r2 = (x: number) => Math.round(x * 100) / 100;

/** The organ's wind need from its divisions. */
export function windNeed(divisions: readonly WindDivision[], w: Rates["wind"]): WindNeed {
  const perDiv = divisions.map((d) => d.windPerKeyM3s * (d.pedal ? w.chordKeysPedal : w.chordKeys) * 60);
  const byPressure = new Map<number, number>();
  divisions.forEach((d, i) => {
    if (!d.hasChest) return;
    const p = r1(d.pressureMm);
    byPressure.set(p, (byPressure.get(p) ?? 0) + perDiv[i]);
  });
  const reservoirs = [...byPressure.entries()].sort((a, b) => a[0] - b[0]).map(([pressureMm, flow]) => ({ pressureMm, flowM3PerMin: r2(flow) }));
  const total = perDiv.reduce((s, x) => s + x, 0);
  const blowerM3PerMin = total * (1 + w.leakagePercent / 100);
  const highest = divisions.reduce((m, d) => (d.hasChest && d.pressureMm > m ? d.pressureMm : m), 0);
  const blowerPressureMm = highest > 0 ? highest + w.pressureMarginMm : 0;
  const blowerKw = ((blowerM3PerMin / 60) * blowerPressureMm * PA_PER_MM_WATER) / w.blowerEfficiency / 1000;
  return { divisionsM3PerMin: perDiv.map(r2), reservoirs, blowerM3PerMin: r2(blowerM3PerMin), blowerPressureMm: r1(blowerPressureMm), blowerKw: r2(blowerKw) };
}

/** Books the organ's wind system into `centre` (blower, reservoirs, trunking, tremulants); `chestDivisions` winding is booked per division by the caller. */
export function bookWindSystem(
  need: WindNeed, wind: Scheme["wind"], tremulants: number, chestDivisions: number, rates: Rates, centre: CostCentre,
): { trunkM: number } {
  const n = rates.norms;
  const factor = wind.work === "new" ? 1 : wind.work === "restored" ? n.windRestoredFactor : n.windRetainedFactor;
  const trunkM = wind.trunkLengthM ?? chestDivisions * rates.wind.trunkMPerDivision;
  let hours = 0;
  for (const r of need.reservoirs) {
    hours += n.reservoirBase + n.reservoirPerM3PerMin * r.flowM3PerMin;
    centre.items[ITEM.reservoirMaterialsBase] += factor;
    centre.items[ITEM.reservoirMaterialsPerM3PerMin] += factor * r.flowM3PerMin;
  }
  hours += trunkM * n.trunkingPerM + tremulants * n.tremulantFitting;
  centre.items[ITEM.trunkingPerM] += factor * trunkM;
  centre.items[ITEM.tremulant] += factor * tremulants;
  centre.hours[D.chestAction] += factor * hours;
  if (wind.blower === "new" && need.blowerKw > 0) {
    centre.hours[D.chestAction] += n.blowerInstall;
    centre.items[ITEM.blowerBase] += 1;
    centre.items[ITEM.blowerPerKw] += need.blowerKw;
  }
  return { trunkM };
}

/** Winding of one division's chest: regulator and conveyances, a share of new when the wind system is restored or retained. */
export function windingHours(wind: Scheme["wind"], n: Rates["norms"]): number {
  const factor = wind.work === "new" ? 1 : wind.work === "restored" ? n.windRestoredFactor : n.windRetainedFactor;
  return factor * n.windingPerDivision;
}
