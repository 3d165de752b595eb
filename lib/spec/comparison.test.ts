import Decimal from "decimal.js";
import { describe, expect, it } from "vitest";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { smallDocument } from "@/tests/support/fixtures";
import { compareDocuments, costOfChanges } from "./comparison";
import { schemeDocumentSchema, type SchemeDocument } from "./document";
import { estimateDocument } from "./estimate";

const tuning = { pitchHz: 440, temperatureC: 18 };
const doc = (edit: (d: SchemeDocument) => void = () => {}): SchemeDocument => {
  const d = schemeDocumentSchema.parse(smallDocument("Base (invented)"));
  edit(d);
  return d;
};
const stopOf = (d: SchemeDocument, id: string) => d.divisions.flatMap((x) => x.stops).find((s) => s.id === id)!;
const total = (d: SchemeDocument) => {
  const r = estimateDocument(d, tuning, DEFAULT_RATES);
  if (!r.ok) throw new Error(r.messages.join("; "));
  return r.estimate.money.totalAmount;
};

const base = doc();
const other = doc((d) => {
  d.name = "Other (invented)";
  Object.assign(stopOf(d, "gt-od"), { origin: "existing", work: ["restored"] });
  d.divisions[0]!.stops = d.divisions[0]!.stops.filter((s) => s.id !== "gt-12");
  d.divisions[0]!.stops.push({ ...stopOf(d, "gt-15"), id: "gt-fl", name: "Flute", footage: "4", family: "flute" });
});
const schemes = [
  { id: "a", name: "Base", version: 1, document: base },
  { id: "b", name: "Other", version: 1, document: other },
];

describe("the comparison page's layout of compareStops and compareEstimates", () => {
  it("marks every stop against the first scheme, in words", () => {
    const view = compareDocuments({ schemes, tuning, rates: DEFAULT_RATES, access: { money: true, hours: true } });
    const great = view.divisions.find((d) => d.id === "gt")!;
    const cell = (stopId: string) => great.rows.find((r) => r.stopId === stopId)!.cells[1]!;
    expect(cell("gt-od")).toMatchObject({
      mark: "changed", disposition: "restored", dispositionText: "Existing: restored",
      changes: [{ field: "origin", label: "pipes", from: "New", to: "Existing" }, { field: "work", label: "work on existing pipes", from: "as it is", to: "restored" }],
    });
    expect(cell("gt-12")).toEqual({ mark: "removed" });
    expect(cell("gt-fl")).toMatchObject({ mark: "added", name: "Flute", pitch: "4′" });
    expect(cell("gt-pr").mark).toBe("same");
    expect(great.rows.find((r) => r.stopId === "gt-fl")!.cells[0]).toEqual({ mark: "absent" });
  });

  it("gives each total with the difference from the first, the same difference compareEstimates gives", () => {
    const view = compareDocuments({ schemes, tuning, rates: DEFAULT_RATES, access: { money: true, hours: true } });
    for (const row of view.totals) {
      const [a, b] = row.values as number[];
      expect(row.diffs[0]).toBe(0);
      expect(row.diffs[1]).toBeCloseTo(b! - a!, 1);
    }
    const money = view.money!.rows.find((r) => r.key === "total")!;
    expect(money.diffs[1]).toBe(new Decimal(money.values[1]!).minus(money.values[0]!).toFixed(2));
  });

  it("leaves out money and hours entirely for readers who may not see them", () => {
    const view = compareDocuments({ schemes, tuning, rates: DEFAULT_RATES, access: { money: false, hours: false } });
    expect(view).not.toHaveProperty("money");
    expect(view).not.toHaveProperty("hours");
    expect(JSON.stringify(view)).not.toMatch(/Amount|hours|margin|percent/i);
    const workshop = compareDocuments({ schemes, tuning, rates: DEFAULT_RATES, access: { money: false, hours: true } });
    expect(workshop.hours!.rows.at(-1)!.key).toBe("total");
    expect(workshop).not.toHaveProperty("money");
  });
});

describe("what each change is worth on its own", () => {
  it("equals the whole difference when the schemes differ by one change", () => {
    const one = doc((d) => void (stopOf(d, "gt-od").origin = "existing"));
    const [c] = costOfChanges({ base, other: one, tuning, rates: DEFAULT_RATES });
    expect(c).toMatchObject({ stopId: "gt-od", kind: "changed" });
    expect(c!.diffAmount).toBe(new Decimal(total(one)).minus(total(base)).toFixed(2));
  });

  it("finds that retaining a stop instead of making it new saves money, and adding one costs", () => {
    const costs = costOfChanges({ base, other: doc((d) => {
      stopOf(d, "gt-od").origin = "existing";
      d.divisions[0]!.stops.push({ ...stopOf(d, "gt-15"), id: "gt-x", name: "Octave", footage: "4" });
    }), tuning, rates: DEFAULT_RATES });
    expect(new Decimal(costs.find((c) => c.stopId === "gt-od")!.diffAmount!).isNegative()).toBe(true);
    expect(new Decimal(costs.find((c) => c.stopId === "gt-x")!.diffAmount!).isPositive()).toBe(true);
  });

  it("says when a change cannot stand alone (an extension of a rank the first scheme lacks)", () => {
    const costs = costOfChanges({ base, other: doc((d) => {
      stopOf(d, "ped-bd").id = "ped-bd2";
      stopOf(d, "ped-bass").source = "ped-bd2";
    }), tuning, rates: DEFAULT_RATES });
    expect(costs.find((c) => c.stopId === "ped-bass")).toMatchObject({ kind: "changed", diffAmount: null });
  });
});
