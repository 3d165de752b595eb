/**
 * Comparing two schemes, as an organ committee does: which stops are added, removed or changed
 * (matched by stop id), and the difference (second minus first) in every total — pipes, hours,
 * metal, wood, wiring, chest space, money by line and by part of the work (exact decimals) and weeks.
 */
import type { Scheme, Stop } from "./scheme";
import type { Rates } from "./rates";
import { estimateScheme, type Estimate } from "./estimate";
import { departments, type Department } from "./departments";
import { packageLabels, packages, type PackageId } from "./cost-centres";
import { metals, woods, type Metal, type Wood } from "./materials";
import { diffAmount } from "./money";
import { parseFootage } from "./pitch";

export interface StopRef {
  readonly divisionId: string;
  readonly divisionName: string;
  readonly stopId: string;
  readonly stopName: string;
}

export interface FieldChange {
  readonly field: string;
  readonly from: string;
  readonly to: string;
}

export interface StopChange extends StopRef {
  readonly changes: readonly FieldChange[];
}

export interface AmountDiff {
  readonly fromAmount: string;
  readonly toAmount: string;
  readonly diffAmount: string;
}

export interface Comparison {
  readonly from: string;
  readonly to: string;
  readonly stops: { readonly added: readonly StopRef[]; readonly removed: readonly StopRef[]; readonly changed: readonly StopChange[] };
  /** Second scheme minus first, for each of the estimate's totals (and the programme's weeks). */
  readonly totals: Pick<Estimate["totals"], "stops" | "ranks" | "pipes" | "hours" | "hoursTotal" | "metalKg" | "metalTotalKg" | "woodM3"> & {
    readonly conductorLengthM: number;
    readonly weeks: number;
  };
  readonly money: {
    readonly labour: AmountDiff;
    readonly materials: AmountDiff;
    readonly items: AmountDiff;
    readonly subtotal: AmountDiff;
    readonly overhead: AmountDiff;
    readonly contingency: AmountDiff;
    readonly margin: AmountDiff;
    readonly net: AmountDiff;
    readonly tax: AmountDiff;
    readonly total: AmountDiff;
  };
  /** Direct cost of each part of the work (case, wind, console …) in either scheme. */
  readonly packages: readonly { readonly package: PackageId; readonly label: string; readonly hoursDiff: number; readonly directCost: AmountDiff }[];
  readonly programme: readonly { readonly id: string; readonly label: string; readonly weeksDiff: number }[];
  /** Per division present in either scheme (matched by id). */
  readonly divisions: readonly {
    readonly id: string;
    readonly name: string;
    readonly pipesDiff: number;
    readonly hoursDiff: number;
    readonly chestLengthDiffMm: number;
    readonly chestDepthDiffMm: number;
    readonly fitsFrom: boolean | null;
    readonly fitsTo: boolean | null;
    readonly directCost: AmountDiff;
  }[];
}

const d1 = (a: number, b: number) => Math.round((b - a) * 10) / 10;
const d3 = (a: number, b: number) => Math.round((b - a) * 1000) / 1000;
const amounts = (a: string, b: string): AmountDiff => ({ fromAmount: a, toAmount: b, diffAmount: diffAmount(a, b) });

function show(v: unknown): string {
  return v === undefined ? "—" : typeof v === "string" ? v : JSON.stringify(v);
}

const COMPARED: readonly (keyof Stop)[] = [
  "name", "footage", "ranks", "breaks", "family", "construction", "material", "scale", "resonator", "fluesFrom", "bass", "compass",
  "origin", "source", "addedPipes", "work", "rescaleHt", "condition", "duplex", "offsetBassPipes",
];

function sameFootage(a: Stop["footage"], b: Stop["footage"]): boolean {
  const fa = parseFootage(a);
  const fb = parseFootage(b);
  return fa && fb ? fa.num === fb.num && fa.den === fb.den : a === b;
}

/** Stops added, removed and changed between two schemes, matched by stop id. */
export function compareStops(a: Scheme, b: Scheme): Comparison["stops"] {
  type Located = { division: Scheme["divisions"][number]; stop: Stop };
  const index = (s: Scheme) => {
    const m = new Map<string, Located>();
    for (const division of s.divisions) for (const stop of division.stops) m.set(stop.id, { division, stop });
    return m;
  };
  const ia = index(a);
  const ib = index(b);
  const ref = ({ division, stop }: Located): StopRef => ({ divisionId: division.id, divisionName: division.name, stopId: stop.id, stopName: stop.name });
  const added: StopRef[] = [];
  const removed: StopRef[] = [];
  const changed: StopChange[] = [];
  for (const [id, x] of ib) if (!ia.has(id)) added.push(ref(x));
  for (const [id, x] of ia) {
    const y = ib.get(id);
    if (!y) {
      removed.push(ref(x));
      continue;
    }
    const changes: FieldChange[] = [];
    if (x.division.id !== y.division.id) changes.push({ field: "division", from: x.division.name, to: y.division.name });
    for (const f of COMPARED) {
      const same = f === "footage" ? sameFootage(x.stop.footage, y.stop.footage) : JSON.stringify(x.stop[f]) === JSON.stringify(y.stop[f]);
      if (!same) changes.push({ field: f, from: show(x.stop[f]), to: show(y.stop[f]) });
    }
    if (changes.length) changed.push({ ...ref(y), changes });
  }
  return { added, removed, changed };
}

/** Differences (b − a) in every total of two estimates. */
export function compareEstimates(ea: Estimate, eb: Estimate): Omit<Comparison, "stops"> {
  const pa = ea.totals.pipes;
  const pb = eb.totals.pipes;
  const ma = ea.money;
  const mb = eb.money;
  const ids = [...new Set([...ea.divisions.map((d) => d.id), ...eb.divisions.map((d) => d.id)])];
  return {
    from: ea.schemeName,
    to: eb.schemeName,
    totals: {
      stops: eb.totals.stops - ea.totals.stops,
      ranks: eb.totals.ranks - ea.totals.ranks,
      pipes: {
        new: pb.new - pa.new, reused: pb.reused - pa.reused, restored: pb.restored - pa.restored,
        total: pb.total - pa.total, prepared: pb.prepared - pa.prepared, removed: pb.removed - pa.removed,
      },
      hours: Object.fromEntries(departments.map((d) => [d, d1(ea.totals.hours[d], eb.totals.hours[d])])) as Record<Department, number>,
      hoursTotal: d1(ea.totals.hoursTotal, eb.totals.hoursTotal),
      metalKg: Object.fromEntries(metals.map((m) => [m, d1(ea.totals.metalKg[m], eb.totals.metalKg[m])])) as Record<Metal, number>,
      metalTotalKg: d1(ea.totals.metalTotalKg, eb.totals.metalTotalKg),
      woodM3: Object.fromEntries(woods.map((w) => [w, d3(ea.totals.woodM3[w], eb.totals.woodM3[w])])) as Record<Wood, number>,
      conductorLengthM: eb.totals.wiring.conductorLengthM - ea.totals.wiring.conductorLengthM,
      weeks: d1(ea.programme.totalWeeks, eb.programme.totalWeeks),
    },
    money: {
      labour: amounts(ma.labourAmount, mb.labourAmount),
      materials: amounts(ma.materialsAmount, mb.materialsAmount),
      items: amounts(ma.itemsAmount, mb.itemsAmount),
      subtotal: amounts(ma.subtotalAmount, mb.subtotalAmount),
      overhead: amounts(ma.overhead.amount, mb.overhead.amount),
      contingency: amounts(ma.contingency.amount, mb.contingency.amount),
      margin: amounts(ma.margin.amount, mb.margin.amount),
      net: amounts(ma.netAmount, mb.netAmount),
      tax: amounts(ma.tax.amount, mb.tax.amount),
      total: amounts(ma.totalAmount, mb.totalAmount),
    },
    packages: packages
      .filter((p) => ea.packages.some((x) => x.package === p) || eb.packages.some((x) => x.package === p))
      .map((p) => {
        const cost = (e: Estimate) => e.money.byPackage.find((x) => x.package === p)?.directCostAmount ?? "0.00";
        const hours = (e: Estimate) => e.packages.find((x) => x.package === p)?.hoursTotal ?? 0;
        return { package: p, label: packageLabels[p], hoursDiff: d1(hours(ea), hours(eb)), directCost: amounts(cost(ea), cost(eb)) };
      }),
    programme: eb.programme.phases.map((p, i) => ({ id: p.id, label: p.label, weeksDiff: d1(ea.programme.phases[i].weeks, p.weeks) })),
    divisions: ids.map((id) => {
      const x = ea.divisions.find((d) => d.id === id);
      const y = eb.divisions.find((d) => d.id === id);
      return {
        id,
        name: (y ?? x)!.name,
        pipesDiff: (y?.pipes.total ?? 0) - (x?.pipes.total ?? 0),
        hoursDiff: d1(x?.hoursTotal ?? 0, y?.hoursTotal ?? 0),
        chestLengthDiffMm: d1(x?.chest.main.lengthMm ?? 0, y?.chest.main.lengthMm ?? 0),
        chestDepthDiffMm: d1(x?.chest.main.depthMm ?? 0, y?.chest.main.depthMm ?? 0),
        fitsFrom: x?.chest.fit?.fits ?? null,
        fitsTo: y?.chest.fit?.fits ?? null,
        directCost: amounts(x?.directCostAmount ?? "0.00", y?.directCostAmount ?? "0.00"),
      };
    }),
  };
}

/** Compares scheme b with scheme a: stops and every total (b − a), both estimated with the same rates. */
export function compareSchemes(a: Scheme, b: Scheme, rates: Rates): Comparison {
  return { ...compareEstimates(estimateScheme(a, rates), estimateScheme(b, rates)), stops: compareStops(a, b) };
}
