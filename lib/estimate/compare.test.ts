import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import Decimal from "decimal.js";
import { compareSchemes, compareStops } from "./compare";
import { estimateScheme } from "./estimate";
import { manual, pedal, scheme, stop } from "./test-support/schemes";

const a = scheme([
  manual("gt", [stop("p8", 8), stop("o4", 4), stop("m", "1 1/3", { family: "mixture", ranks: 3, breaks: [{ from: "C", footages: ["1 1/3", "1", "2/3"] }] })]),
  pedal("pd", [stop("b16", 16, { family: "flute", construction: "stopped" })], { chest: "pitman", action: "electro-pneumatic" }),
], { name: "Scheme A (invented)" });
const b = scheme([
  manual("gt", [stop("p8", 8, { origin: "existing", work: ["restored"] }), stop("f4", 4, { family: "flute" }), stop("m", "1 1/3", { family: "mixture", ranks: 3, breaks: [{ from: "C", footages: ["1 1/3", "1", "2/3"] }] })]),
  pedal("pd", [stop("b16", 16, { family: "flute", construction: "stopped" }), stop("b8", 8, { family: "flute", origin: "extension", source: "b16" })], { chest: "pitman", action: "electro-pneumatic" }),
], { name: "Scheme B (invented)", case: { work: "restored" } });

describe("comparing schemes", () => {
  it("lists stops added, removed and changed, with the fields that changed", () => {
    const c = compareStops(a, b);
    expect(c.added.map((s) => s.stopId).sort()).toEqual(["b8", "f4"]);
    expect(c.removed.map((s) => s.stopId)).toEqual(["o4"]);
    expect(c.changed).toEqual([{ divisionId: "gt", divisionName: "gt", stopId: "p8", stopName: "p8", changes: [{ field: "origin", from: "new", to: "existing" }, { field: "work", from: "[]", to: '["restored"]' }] }]);
  });

  it("treats the same footage written two ways as unchanged", () => {
    const x = scheme([manual("gt", [stop("n", "2 2/3", { family: "mutation" })])]);
    const y = scheme([manual("gt", [stop("n", "2⅔", { family: "mutation" })])]);
    expect(compareStops(x, y).changed).toEqual([]);
  });

  it("gives every total as the second minus the first", () => {
    const c = compareSchemes(a, b, DEFAULT_RATES);
    const ea = estimateScheme(a, DEFAULT_RATES);
    const eb = estimateScheme(b, DEFAULT_RATES);
    expect(c.totals.pipes.total).toBe(eb.totals.pipes.total - ea.totals.pipes.total);
    expect(c.totals.pipes.new).toBe(eb.totals.pipes.new - ea.totals.pipes.new);
    expect(c.totals.pipes.restored).toBe(61);
    expect(c.totals.hoursTotal).toBeCloseTo(eb.totals.hoursTotal - ea.totals.hoursTotal, 6);
    expect(c.money.total.diffAmount).toBe(new Decimal(eb.money.totalAmount).minus(ea.money.totalAmount).toFixed(2));
    expect(c.totals.weeks).toBeCloseTo(eb.programme.totalWeeks - ea.programme.totalWeeks, 6);
    expect(c.divisions.find((d) => d.id === "pd")!.pipesDiff).toBe(12);
    // The case is restored in B only: its part of the work appears in the comparison with its cost.
    const casePart = c.packages.find((p) => p.package === "case")!;
    expect(new Decimal(casePart.directCost.fromAmount).isZero()).toBe(true);
    expect(casePart.directCost.diffAmount).toBe(casePart.directCost.toAmount);
    expect(c.money.items.diffAmount).toBe(new Decimal(eb.money.itemsAmount).minus(ea.money.itemsAmount).toFixed(2));
  });

  it("finds nothing between a scheme and itself", () => {
    const c = compareSchemes(a, a, DEFAULT_RATES);
    expect(c.stops).toEqual({ added: [], removed: [], changed: [] });
    expect(c.totals.pipes.total).toBe(0);
    expect(c.money.total.diffAmount).toBe("0.00");
    expect(c.totals.hoursTotal).toBe(0);
  });
});
