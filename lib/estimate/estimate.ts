/**
 * The estimate of a whole scheme: one entry point, estimateScheme(scheme, rates), in stages with
 * typed hand-offs, each in a file named after what it computes:
 *   plan (pipes.ts) → per-pipe sums (pipe-aggregates.ts) → each division's work (division-work.ts)
 *   → the organ's work (organ-work.ts) → programme (programme.ts) → time on site (site.ts)
 *   → management (design.ts) → money (money.ts).
 */
import type { Scheme } from "./scheme";
import type { Rates } from "./rates";
import { planScheme, type PipeCounts, type SchemePlan } from "./pipes";
import { aggregatePipes } from "./pipe-aggregates";
import { divisionWork, type DivisionDraft, type StopEstimate, type DivisionChest } from "./division-work";
import { organWork } from "./organ-work";
import { planProgramme, type Programme } from "./programme";
import { bookSiteTime, siteTimeOf, type SiteTime, type Transport, type Weights } from "./site";
import { bookManagement } from "./design";
import { priceCentres, type Money } from "./money";
import { centreHours, packageLabels, packages, type CostCentre, type PackageId } from "./cost-centres";
import { DEPARTMENT_COUNT, type Department } from "./departments";
import { departmentRecord, sumHours, totalHours } from "./labour";
import { metals, woods, type Metal, type Wood } from "./materials";
import { cautionsFor, type Caution } from "./cautions";
import type { WindNeed } from "./wind";
import type { CaseFigures } from "./case";
import type { SwellBox } from "./swell-box";
import type { Wiring } from "./wiring";

export type { StopEstimate, DivisionChest } from "./division-work";

export interface DivisionEstimate {
  readonly id: string;
  readonly name: string;
  readonly keyboard: "manual" | "pedal";
  readonly compass: { readonly low: string; readonly high: string };
  readonly notes: number;
  readonly windPressureMm: number;
  readonly windPressurePa: number;
  readonly stops: readonly StopEstimate[];
  readonly pipes: PipeCounts;
  readonly hours: Readonly<Record<Department, number>>;
  readonly hoursTotal: number;
  /** Finished metal and timber of the pipes standing in the division, new and existing (weights). */
  readonly metalKg: Readonly<Record<Metal, number>>;
  readonly woodM3: Readonly<Record<Wood, number>>;
  readonly woodKg: Readonly<Record<Wood, number>>;
  readonly chest: DivisionChest;
  readonly swellBox: SwellBox | null;
  readonly wiring: Wiring;
  /** Wind the division needs for the full organ, m³/min. */
  readonly windM3PerMin: number;
  /** Pipes and chests, kg: the load on the floor or gallery under this division. */
  readonly weightKg: number;
  /** Direct cost of this division's centres before overheads (a share of money.subtotalAmount). */
  readonly directCostAmount: string;
}

export interface PackageEstimate {
  readonly package: PackageId;
  readonly label: string;
  readonly hours: Readonly<Record<Department, number>>;
  readonly hoursTotal: number;
}

export interface Estimate {
  readonly schemeName: string;
  readonly tuning: {
    readonly pitchHz: number;
    readonly temperatureC: number;
    readonly mutations: "tempered" | "pure";
    readonly speedOfSoundMPerS: number;
  };
  readonly ratesProvenance: string;
  readonly divisions: readonly DivisionEstimate[];
  /** Work not tied to one division: wind system, case, console, its wiring and the relay, site, design and management. */
  readonly schemeWide: {
    readonly hours: Readonly<Record<Department, number>>;
    readonly hoursTotal: number;
    readonly wiring: Wiring;
    readonly directCostAmount: string;
  };
  /** Hours by part of the work (pipes and voicing, chests and action, case, wind …); their costs are in money.byPackage. */
  readonly packages: readonly PackageEstimate[];
  readonly wind: WindNeed & { readonly trunkM: number };
  readonly case: CaseFigures;
  readonly site: { readonly transport: Transport; readonly time: SiteTime; readonly weights: Weights };
  readonly totals: {
    /** Stop controls (prepared included, removed excluded). */
    readonly stops: number;
    /** Ranks of pipes standing in the finished organ. */
    readonly ranks: number;
    readonly pipes: PipeCounts;
    readonly hours: Readonly<Record<Department, number>>;
    readonly hoursTotal: number;
    /** Hours per stop control: the trade's quick check (docs/estimating-method.md, "Calibration"). */
    readonly hoursPerStop: number;
    /** Finished metal of the pipes in the organ, new and existing (weights). */
    readonly metalKg: Readonly<Record<Metal, number>>;
    readonly metalTotalKg: number;
    /** Metal bought: new pipes with casting and offcut allowance, dummy front pipes, repairs. */
    readonly metalBoughtKg: Readonly<Record<Metal, number>>;
    readonly metalBoughtTotalKg: number;
    readonly woodM3: Readonly<Record<Wood, number>>;
    readonly woodKg: Readonly<Record<Wood, number>>;
    /** Timber bought for pipes, case and swell boxes. */
    readonly woodBoughtM3: Readonly<Record<Wood, number>>;
    readonly wiring: Wiring & { readonly conductorLengthKm: number };
  };
  readonly money: Money;
  readonly programme: Programme;
  readonly cautions: readonly Caution[];
}

/** Thrown by estimateScheme for a scheme that parseScheme would have refused; carries the messages. */
export class SchemeError extends Error {
  constructor(readonly messages: readonly string[]) {
    super(`The scheme is not consistent: ${messages.join("; ")}`);
    this.name = "SchemeError";
  }
}

const r1 = (x: number) => Math.round(x * 10) / 10;
const r2 = (x: number) => Math.round(x * 100) / 100;
const r3 = (x: number) => Math.round(x * 1000) / 1000;

/** Sums rounded figures exactly, in units of 10^-dp. */
function sumRounded(values: readonly number[], dp: number): number {
  const k = 10 ** dp;
  let s = 0;
  for (const v of values) s += Math.round(v * k);
  return s / k;
}

function recordOf<K extends string>(keys: readonly K[], f: (k: K) => number): Record<K, number> {
  const o = {} as Record<K, number>;
  for (const k of keys) o[k] = f(k);
  return o;
}

/** Hours of some centres as shown: each centre's departments rounded to tenths, then summed exactly (in tenths). */
function hoursOf(centres: readonly CostCentre[]): Record<Department, number> {
  const tenths = new Float64Array(DEPARTMENT_COUNT);
  for (const c of centres) for (let d = 0; d < DEPARTMENT_COUNT; d++) tenths[d] += Math.round(c.hours[d] * 10);
  for (let d = 0; d < DEPARTMENT_COUNT; d++) tenths[d] /= 10;
  return departmentRecord(tenths);
}

/**
 * Estimates a scheme with the firm's rates and norms (demo-rates.ts holds invented defaults).
 * Pure and deterministic. The scheme must be one parseScheme accepted; otherwise throws SchemeError.
 */
export function estimateScheme(scheme: Scheme, rates: Rates, plan: SchemePlan = planScheme(scheme)): Estimate {
  if (plan.messages.length) throw new SchemeError(plan.messages);
  const agg = aggregatePipes(scheme, plan, rates);
  const dw = divisionWork(scheme, plan, agg, rates);
  const ow = organWork(scheme, plan, dw, rates);

  const centres: CostCentre[] = [...dw.centres, ...ow.centres];
  const allBeforeManagement = hoursOf(centres);
  const programme = planProgramme(allBeforeManagement, rates.programme, scheme.programme);
  const time = siteTimeOf(programme, scheme.site, rates);
  bookSiteTime(time, ow.site);
  let others = 0;
  for (const c of centres) others += centreHours(c);
  bookManagement(others, rates, ow.design);

  const money = priceCentres(centres, rates);
  const costOf = new Map(money.byDivision.map((d) => [d.division, d.directCostAmount]));
  const byDivision = new Map<string, CostCentre[]>();
  for (const c of dw.centres) {
    const list = byDivision.get(c.division!);
    if (list) list.push(c);
    else byDivision.set(c.division!, [c]);
  }
  const divisions: DivisionEstimate[] = dw.divisions.map((d: DivisionDraft, i) => {
    const hours = hoursOf(byDivision.get(d.id) ?? []);
    return {
      id: d.id, name: d.name, keyboard: d.keyboard, compass: d.compass, notes: d.notes, windPressureMm: d.windPressureMm, windPressurePa: d.windPressurePa,
      stops: d.stops, pipes: d.pipes, hours, hoursTotal: totalHours(hours), metalKg: d.metalKg, woodM3: d.woodM3, woodKg: d.woodKg,
      chest: d.chest, swellBox: d.swellBox, wiring: d.wiring, windM3PerMin: ow.wind.divisionsM3PerMin[i],
      weightKg: r1(d.pipesKg + d.chestsKg), directCostAmount: costOf.get(d.id) ?? "0.00",
    };
  });
  const wideHours = hoursOf(ow.centres);
  const allHours = sumHours([...divisions.map((d) => d.hours), wideHours]);
  const byPackage = new Map<PackageId, CostCentre[]>(packages.map((p) => [p, []]));
  for (const c of centres) byPackage.get(c.package)!.push(c);
  const packageEstimates: PackageEstimate[] = packages
    .map((p) => {
      const hours = hoursOf(byPackage.get(p)!);
      return { package: p, label: packageLabels[p], hours, hoursTotal: totalHours(hours) };
    })
    .filter((p) => p.hoursTotal > 0 || money.byPackage.some((b) => b.package === p.package));

  const metalTotals = recordOf(metals, (m) => sumRounded(divisions.map((d) => d.metalKg[m]), 1));
  const woodTotals = recordOf(woods, (w) => sumRounded(divisions.map((d) => d.woodM3[w]), 3));
  const bought = (m: Metal | Wood) => money.materials.find((l) => l.material === m)?.quantity ?? 0;
  const metalBought = recordOf(metals, (m) => bought(m));
  const conductors = divisions.reduce((s, d) => s + d.wiring.conductors, ow.consoleWiring.conductors);
  const conductorLengthM = divisions.reduce((s, d) => s + d.wiring.conductorLengthM, ow.consoleWiring.conductorLengthM);
  const hoursTotal = totalHours(allHours);

  return {
    schemeName: scheme.name,
    tuning: { pitchHz: scheme.tuning.pitchHz, temperatureC: scheme.tuning.temperatureC, mutations: scheme.tuning.mutations, speedOfSoundMPerS: r3(agg.speedOfSoundMPerS) },
    ratesProvenance: rates.provenance,
    divisions,
    schemeWide: { hours: wideHours, hoursTotal: totalHours(wideHours), wiring: ow.consoleWiring, directCostAmount: costOf.get(null) ?? "0.00" },
    packages: packageEstimates,
    wind: ow.wind,
    case: ow.case,
    site: { transport: ow.transport, time, weights: ow.weights },
    totals: {
      stops: dw.stopControls,
      ranks: dw.ranks,
      pipes: dw.pipes,
      hours: allHours,
      hoursTotal,
      hoursPerStop: dw.stopControls ? r1(hoursTotal / dw.stopControls) : 0,
      metalKg: metalTotals,
      metalTotalKg: sumRounded(metals.map((m) => metalTotals[m]), 1),
      metalBoughtKg: metalBought,
      metalBoughtTotalKg: sumRounded(metals.map((m) => metalBought[m]), 1),
      woodM3: woodTotals,
      woodKg: recordOf(woods, (w) => sumRounded(divisions.map((d) => d.woodKg[w]), 1)),
      woodBoughtM3: recordOf(woods, (w) => bought(w)),
      wiring: { conductors, conductorLengthM, conductorLengthKm: r2(conductorLengthM / 1000) },
    },
    money,
    programme,
    cautions: cautionsFor({ leadBearing: dw.leadBearing || ow.case.dummyPipes > 0, electric: dw.anyElectric || scheme.wind.blower === "new", siteWork: true }),
  };
}

