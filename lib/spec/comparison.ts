/**
 * Two to four schemes of a project side by side: every stop division by division with what changed
 * against the first scheme, and the estimator's totals with their differences. Built on
 * lib/estimate/compare.ts (compareStops, compareEstimates): this module only lays their results out
 * for a page, and leaves out what the reader's role may not see — money without money:read, hours
 * and weeks by department without estimate:read — so those keys are not even in the answer. Pure.
 */
import { departmentLabels, departments, type Estimate, type Rates, type Scheme } from "@/lib/estimate";
import { compareEstimates, compareStops } from "@/lib/estimate/compare";
import { diffAmount } from "@/lib/estimate/money";
import { pipeWorks, type Origin, type PipeWork } from "@/lib/estimate/scheme";
import { dispositionMark, dispositionText, originLabels, pipeWorkLabels, pitchBesideName, pitchText, stopTitle, type DispositionMark } from "@/components/spec/format";
import type { DocStop, SchemeDocument, Tuning } from "./document";
import { estimateDocument } from "./estimate";

export const MIN_COMPARED = 2;
export const MAX_COMPARED = 4;

export type ComparisonAccess = {
  /** Money lines and the cost of each change (money:read). */
  money: boolean;
  /** Hours by department (estimate:read). */
  hours: boolean;
};

export type ComparedScheme = { id: string; name: string; version: number; document: SchemeDocument };

export type FieldChangeText = { field: string; label: string; from: string; to: string };

export type StopCell =
  | {
      mark: "base" | "same" | "added" | "changed";
      name: string;
      pitch: string;
      /** Where the stop's pipes come from, or the main work on existing ones, for its mark … */
      disposition: DispositionMark;
      /** … and in words ("Existing: restored, revoiced"). */
      dispositionText: string;
      changes: FieldChangeText[];
    }
  | { mark: "removed" | "absent" };

export type StopRow = { stopId: string; cells: StopCell[] };

export type DivisionBlock = {
  id: string;
  name: string;
  rows: StopRow[];
  /** Chest against the space in the case, per scheme; null where the division is not in that scheme or the scheme is incomplete. */
  chests: ({ fits: boolean | null; lengthMm: number; depthMm: number; space: { lengthMm: number; depthMm: number } | null } | null)[];
};

/** One row of figures: a value per scheme (null when that scheme cannot be estimated yet) and its difference from the first. */
export type FigureRow<T> = { key: string; label: string; unit: string; values: (T | null)[]; diffs: (T | null)[] };

export type ComparisonView = {
  schemes: { id: string; name: string; version: number; problems: string[] }[];
  divisions: DivisionBlock[];
  /** Stops, ranks, pipes (new, reused, restored), metal and programme weeks. */
  totals: FigureRow<number>[];
  /** Pipes new, reused and restored per scheme, for the chart. */
  pipesByTreatment: { schemeId: string; new: number; reused: number; restored: number }[];
  hours?: { rows: FigureRow<number>[] };
  money?: { currency: string; rows: FigureRow<string>[] };
};

const FIELD_LABELS: Record<string, string> = {
  name: "name", footage: "pitch", ranks: "ranks", breaks: "breaks", family: "family", construction: "construction", material: "material",
  scale: "scale", compass: "compass", origin: "pipes", work: "work on existing pipes", source: "source rank", addedPipes: "added pipes",
  rescaleHt: "moved by", condition: "survey", duplex: "duplex", resonator: "resonators", fluesFrom: "flues from", bass: "bass",
  offsetBassPipes: "basses off the chest", division: "division",
};

/** compareStops gives lists as JSON; the work on existing pipes reads best as words. */
function workText(v: string): string {
  if (v === "—") return "as it is";
  let list: unknown;
  try {
    list = JSON.parse(v);
  } catch {
    return v;
  }
  if (!Array.isArray(list)) return v;
  const work = pipeWorks.filter((w) => list.includes(w));
  return work.length ? work.map((w) => pipeWorkLabels[w as PipeWork].toLowerCase()).join(", ") : "as it is";
}

function changeText(field: string, from: string, to: string): FieldChangeText {
  const label = FIELD_LABELS[field] ?? field;
  if (field === "origin") return { field, label, from: originLabels[from as Origin] ?? from, to: originLabels[to as Origin] ?? to };
  if (field === "work") return { field, label, from: workText(from), to: workText(to) };
  if (field === "footage") return { field, label, from: pitchText({ footage: from, family: "" }), to: pitchText({ footage: to, family: "" }) };
  // Structured values (scale, compass, breaks) read badly as data: say that they changed.
  const structured = (v: string) => v.startsWith("{") || v.startsWith("[");
  if (structured(from) || structured(to)) return { field, label, from: "", to: "changed" };
  return { field, label, from, to };
}

type Estimated = { scheme: Scheme; estimate: Estimate | null; problems: string[] };

/** The estimator's scheme for a document; an incomplete one still lists its stops, without figures. */
function estimated(doc: SchemeDocument, tuning: Tuning, rates: Rates): Estimated {
  const r = estimateDocument(doc, tuning, rates);
  if (r.ok) return { scheme: r.scheme, estimate: r.estimate, problems: [] };
  // compareStops reads only the divisions and their stops, which a saved document holds already validated.
  return { scheme: { divisions: doc.divisions } as unknown as Scheme, estimate: null, problems: [...r.messages] };
}

const cellOf = (stop: DocStop, mark: "base" | "same" | "added" | "changed", changes: FieldChangeText[] = []): StopCell => ({
  mark, name: stop.name, pitch: pitchBesideName(stop), disposition: dispositionMark(stop), dispositionText: dispositionText(stop), changes,
});

function figureRow(key: string, label: string, unit: string, values: (number | null)[], diffs: (number | null)[]): FigureRow<number> {
  return { key, label, unit, values, diffs };
}

/** Lays out the comparison of `schemes` (the first is the one the others are compared with). */
export function compareDocuments({ schemes, tuning, rates, access }: { schemes: readonly ComparedScheme[]; tuning: Tuning; rates: Rates; access: ComparisonAccess }): ComparisonView {
  const all = schemes.map((s) => estimated(s.document, tuning, rates));
  const base = all[0]!;
  const stopDiffs = all.map((x, i) => (i === 0 ? null : compareStops(base.scheme, x.scheme)));
  const estimateDiffs = all.map((x, i) => (i === 0 || !base.estimate || !x.estimate ? null : compareEstimates(base.estimate, x.estimate)));

  // Divisions and stops in order of first appearance, the first scheme's order first.
  const divisionOrder: { id: string; name: string; stopIds: string[] }[] = [];
  const homeOf = new Map<string, string>();
  for (const s of schemes) {
    for (const d of s.document.divisions) {
      let block = divisionOrder.find((b) => b.id === d.id);
      if (!block) divisionOrder.push((block = { id: d.id, name: d.name, stopIds: [] }));
      for (const st of d.stops) {
        if (homeOf.has(st.id)) continue;
        homeOf.set(st.id, d.id);
        block.stopIds.push(st.id);
      }
    }
  }
  const stopIndex = schemes.map((s) => new Map(s.document.divisions.flatMap((d) => d.stops.map((st) => [st.id, st] as const))));

  const divisions: DivisionBlock[] = divisionOrder.map((block) => ({
    id: block.id,
    name: block.name,
    rows: block.stopIds.map((stopId) => ({
      stopId,
      cells: schemes.map((_, i): StopCell => {
        const stop = stopIndex[i]!.get(stopId);
        if (i === 0) return stop ? cellOf(stop, "base") : { mark: "absent" };
        const diff = stopDiffs[i]!;
        if (!stop) return stopIndex[0]!.has(stopId) ? { mark: "removed" } : { mark: "absent" };
        if (diff.added.some((a) => a.stopId === stopId)) return cellOf(stop, "added");
        const changed = diff.changed.find((c) => c.stopId === stopId);
        return changed ? cellOf(stop, "changed", changed.changes.map((c) => changeText(c.field, c.from, c.to))) : cellOf(stop, "same");
      }),
    })),
    chests: all.map((x) => {
      const d = x.estimate?.divisions.find((e) => e.id === block.id);
      return d ? { fits: d.chest.fit?.fits ?? null, lengthMm: d.chest.main.lengthMm, depthMm: d.chest.main.depthMm, space: d.chest.space } : null;
    }),
  }));

  const values = <T>(f: (e: Estimate) => T) => all.map((x) => (x.estimate ? f(x.estimate) : null));
  const diffs = <T>(f: (c: NonNullable<(typeof estimateDiffs)[number]>) => T, zero: T) => estimateDiffs.map((c, i) => (i === 0 ? (base.estimate ? zero : null) : c ? f(c) : null));

  const totals: FigureRow<number>[] = [
    figureRow("stops", "Stops", "", values((e) => e.totals.stops), diffs((c) => c.totals.stops, 0)),
    figureRow("ranks", "Ranks", "", values((e) => e.totals.ranks), diffs((c) => c.totals.ranks, 0)),
    figureRow("pipes", "Pipes in the organ", "", values((e) => e.totals.pipes.total), diffs((c) => c.totals.pipes.total, 0)),
    figureRow("pipes-new", "new", "", values((e) => e.totals.pipes.new), diffs((c) => c.totals.pipes.new, 0)),
    figureRow("pipes-reused", "reused", "", values((e) => e.totals.pipes.reused), diffs((c) => c.totals.pipes.reused, 0)),
    figureRow("pipes-restored", "restored", "", values((e) => e.totals.pipes.restored), diffs((c) => c.totals.pipes.restored, 0)),
    figureRow("metal", "Pipe metal", "kg", values((e) => e.totals.metalTotalKg), diffs((c) => c.totals.metalTotalKg, 0)),
    figureRow("weeks", "Programme", "weeks", values((e) => e.programme.totalWeeks), diffs((c) => c.totals.weeks, 0)),
  ];

  const view: ComparisonView = {
    schemes: schemes.map((s, i) => ({ id: s.id, name: s.name, version: s.version, problems: all[i]!.problems.slice(0, 3) })),
    divisions,
    totals,
    pipesByTreatment: all.map((x, i) => ({
      schemeId: schemes[i]!.id,
      new: x.estimate?.totals.pipes.new ?? 0,
      reused: x.estimate?.totals.pipes.reused ?? 0,
      restored: x.estimate?.totals.pipes.restored ?? 0,
    })),
  };

  if (access.hours) {
    view.hours = {
      rows: [
        ...departments.map((d) => figureRow(d, departmentLabels[d], "h", values((e) => e.totals.hours[d]), diffs((c) => c.totals.hours[d], 0))),
        figureRow("total", "Total", "h", values((e) => e.totals.hoursTotal), diffs((c) => c.totals.hoursTotal, 0)),
      ].filter((r) => r.key === "total" || r.values.some((v) => (v ?? 0) > 0)),
    };
  }
  if (access.money) {
    const m = (key: string, label: string, pick: (e: Estimate) => string, diff: (c: NonNullable<(typeof estimateDiffs)[number]>) => string): FigureRow<string> => ({
      key, label, unit: "", values: values(pick), diffs: diffs(diff, "0.00"),
    });
    view.money = {
      currency: base.estimate?.money.currency ?? rates.currency,
      rows: [
        m("labour", "Labour", (e) => e.money.labourAmount, (c) => c.money.labour.diffAmount),
        m("materials", "Materials", (e) => e.money.materialsAmount, (c) => c.money.materials.diffAmount),
        m("items", "Bought in", (e) => e.money.itemsAmount, (c) => c.money.items.diffAmount),
        m("overhead", "Overheads", (e) => e.money.overhead.amount, (c) => c.money.overhead.diffAmount),
        m("contingency", "Contingency", (e) => e.money.contingency.amount, (c) => c.money.contingency.diffAmount),
        m("margin", "Margin", (e) => e.money.margin.amount, (c) => c.money.margin.diffAmount),
        m("tax", "Tax", (e) => e.money.tax.amount, (c) => c.money.tax.diffAmount),
        m("total", "Total", (e) => e.money.totalAmount, (c) => c.money.total.diffAmount),
      ],
    };
  }
  return view;
}

export type ChangeCost = {
  stopId: string;
  /** "Open Diapason 8′ (Great)". */
  stop: string;
  kind: "added" | "removed" | "changed";
  changes: FieldChangeText[];
  /** Total of the first scheme with only this change made, minus its total; null when the change cannot stand alone (e.g. an extension of a rank the first scheme lacks). */
  diffAmount: string | null;
};

/** `doc` with one stop as it is in `other` (added, replaced or removed). */
function withOneChange(doc: SchemeDocument, other: SchemeDocument, stopId: string): SchemeDocument {
  const theirs = other.divisions.flatMap((d) => d.stops.map((s) => ({ d, s }))).find((x) => x.s.id === stopId);
  const divisions = doc.divisions.map((d) => ({ ...d, stops: d.stops.filter((s) => s.id !== stopId) }));
  if (theirs) {
    const home = divisions.find((d) => d.id === theirs.d.id);
    // A stop of a division the first scheme lacks comes with that division, holding this stop only.
    if (!home) return { ...doc, divisions: [...divisions, { ...theirs.d, stops: [theirs.s] }] };
    const i = doc.divisions.find((d) => d.id === home.id)?.stops.findIndex((s) => s.id === stopId) ?? -1;
    home.stops.splice(i >= 0 ? i : home.stops.length, 0, theirs.s);
  }
  return { ...doc, divisions };
}

/**
 * What each stop change between the first scheme and another is worth on its own: the first scheme's
 * total with that one change made, minus its total ("retaining the Open Diapason instead of new saves
 * X"). One full estimate per change, so it is asked for separately from the comparison itself.
 */
export function costOfChanges({ base, other, tuning, rates }: { base: SchemeDocument; other: SchemeDocument; tuning: Tuning; rates: Rates }): ChangeCost[] {
  const a = estimated(base, tuning, rates);
  const b = estimated(other, tuning, rates);
  const diff = compareStops(a.scheme, b.scheme);
  const baseTotal = a.estimate?.money.totalAmount ?? null;
  const label = (doc: SchemeDocument, stopId: string) => {
    for (const d of doc.divisions) for (const s of d.stops) if (s.id === stopId) return `${stopTitle(s)} (${d.name})`;
    return stopId;
  };
  const cost = (stopId: string): string | null => {
    if (!baseTotal) return null;
    const r = estimateDocument(withOneChange(base, other, stopId), tuning, rates);
    return r.ok ? diffAmount(baseTotal, r.estimate.money.totalAmount) : null;
  };
  return [
    ...diff.changed.map((c) => ({ stopId: c.stopId, stop: label(other, c.stopId), kind: "changed" as const, changes: c.changes.map((x) => changeText(x.field, x.from, x.to)), diffAmount: cost(c.stopId) })),
    ...diff.added.map((c) => ({ stopId: c.stopId, stop: label(other, c.stopId), kind: "added" as const, changes: [], diffAmount: cost(c.stopId) })),
    ...diff.removed.map((c) => ({ stopId: c.stopId, stop: label(base, c.stopId), kind: "removed" as const, changes: [], diffAmount: cost(c.stopId) })),
  ];
}
