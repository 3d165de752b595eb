import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import Decimal from "decimal.js";
import { diffAmount, priceCentres, sumAmounts } from "./money";
import { type Rates } from "./rates";
import { D, departments, type Department } from "./departments";
import { costCentre, ITEM, MATERIAL_LINE, type CostCentre, type ItemKey, type MaterialLine, type PackageId } from "./cost-centres";

function centre(
  division: string | null, pkg: PackageId, hours: Partial<Record<Department, number>>,
  materials: Partial<Record<MaterialLine, number>> = {}, items: Partial<Record<ItemKey, number>> = {},
): CostCentre {
  const c = costCentre(division, pkg);
  for (const [d, h] of Object.entries(hours)) c.hours[D[d as Department]] = h!;
  for (const [m, q] of Object.entries(materials)) c.materials[MATERIAL_LINE[m as MaterialLine]] = q!;
  for (const [k, q] of Object.entries(items)) c.items[ITEM[k as ItemKey]] = q!;
  return c;
}
const sum = (xs: readonly string[]) => xs.reduce((s, x) => s.plus(x), new Decimal(0)).toFixed(2);

describe("money", () => {
  it("prices labour by department, materials by quantity and items by their unit", () => {
    const m = priceCentres([centre("gt", "pipes", { voicing: 10.5 }, { spotted: 100.5 }, { keyboard: 2 })], DEFAULT_RATES);
    expect(m.labour).toEqual([{ department: "voicing", label: "Voicing", hours: 10.5, rateAmount: "72.00", amount: "756.00" }]);
    expect(m.materials[0]).toMatchObject({ material: "spotted", quantity: 100.5, unit: "kg", priceAmount: "24.00", amount: "2412.00" });
    expect(m.items[0]).toMatchObject({ item: "keyboard", label: "Manual keyboard", quantity: 2, unit: "each", priceAmount: "2600.00", amount: "5200.00" });
    expect(m.subtotalAmount).toBe("8368.00");
  });

  it("applies overhead, contingency, margin and tax in order, each rounded to the cent", () => {
    const rates: Rates = { ...DEFAULT_RATES, overheadPercent: "10", contingencyPercent: "5", marginPercent: "10", taxPercent: "20" };
    const m = priceCentres([centre("gt", "installation", { erection: 1 })], { ...rates, hourlyRate: { ...rates.hourlyRate, erection: "100.00" } });
    expect(m.subtotalAmount).toBe("100.00");
    expect(m.overhead.amount).toBe("10.00");
    expect(m.contingency.amount).toBe("5.50"); // 5 % of 110.00
    expect(m.margin.amount).toBe("11.55"); // 10 % of 115.50
    expect(m.netAmount).toBe("127.05");
    expect(m.tax.amount).toBe("25.41"); // 20 % of 127.05 = 25.41
    expect(m.totalAmount).toBe("152.46");
  });

  it("rounds half up at the cent, per centre, and never goes through binary fractions", () => {
    // 0.1 h at 0.35 = 0.035 → 0.04 (half up); 0.1 + 0.2 m of cable at 0.10 shows 0.30, not 0.30000000000000004.
    const rates: Rates = { ...DEFAULT_RATES, hourlyRate: { ...DEFAULT_RATES.hourlyRate, transport: "0.35" }, cablePricePerM: "0.10" };
    const m = priceCentres([centre("a", "site", { transport: 0.1 }, { cable: 1 }), centre("b", "electrics", {}, { cable: 2 })], rates);
    expect(m.labour[0].amount).toBe("0.04");
    expect(m.materials[0].amount).toBe("0.30");
    // 7.5 % of 0.14 = 0.0105 → 0.01; of 0.30 = 0.0225 → 0.02; 12.345 % of 100.00 = 12.345 → 12.35 (half up).
    const p = priceCentres([centre(null, "design", { design: 1 })], { ...DEFAULT_RATES, hourlyRate: { ...DEFAULT_RATES.hourlyRate, design: "100.00" }, overheadPercent: "12.345", contingencyPercent: "0", marginPercent: "0", taxPercent: "0" });
    expect(p.overhead.amount).toBe("12.35");
  });

  it("serialises every amount as a decimal string with two places", () => {
    const m = priceCentres([centre("gt", "pipes", { voicing: 3.3 }, { oak: 0.123 }, { pipeMagnet: 7 })], DEFAULT_RATES);
    for (const a of [m.subtotalAmount, m.netAmount, m.totalAmount, m.tax.amount, ...m.labour.map((l) => l.amount), ...m.items.map((l) => l.amount)]) expect(a).toMatch(/^-?\d+\.\d{2}$/);
  });

  it("gives each division's and each package's direct cost", () => {
    const m = priceCentres([centre("gt", "pipes", { voicing: 1 }), centre("gt", "chests", { chestAction: 2 }), centre(null, "case", { casework: 3 })], DEFAULT_RATES);
    expect(m.byDivision).toEqual([{ division: "gt", directCostAmount: "184.00" }, { division: null, directCostAmount: "162.00" }]);
    expect(m.byPackage.map((p) => [p.package, p.directCostAmount])).toEqual([["pipes", "72.00"], ["chests", "112.00"], ["case", "162.00"]]);
  });

  it("adds and subtracts amount strings exactly", () => {
    expect(sumAmounts(["0.10", "0.20"])).toBe("0.30");
    expect(diffAmount("100.05", "99.95")).toBe("-0.10");
  });

  const arbCentre = fc.record({
    division: fc.constantFrom("gt", "sw", null),
    pkg: fc.constantFrom<PackageId>("pipes", "chests", "case", "site"),
    hours: fc.record(Object.fromEntries(departments.map((d) => [d, fc.integer({ min: 0, max: 200000 }).map((t) => t / 10)])) as Record<Department, fc.Arbitrary<number>>),
    spotted: fc.integer({ min: 0, max: 99999 }).map((x) => x / 10),
    oak: fc.integer({ min: 0, max: 9999 }).map((x) => x / 1000),
    cable: fc.nat(100000),
    km: fc.integer({ min: 0, max: 100000 }).map((x) => x / 100),
  });
  const arbPercent = fc.integer({ min: 0, max: 400 }).map((x) => (x / 10).toString());
  const arbAmount = fc.integer({ min: 1, max: 20000 }).map((x) => (x / 100).toFixed(2));

  it("keeps shown lines summing exactly to the shown totals", () => {
    fc.assert(
      fc.property(fc.array(arbCentre, { minLength: 1, maxLength: 8 }), arbPercent, arbPercent, arbPercent, arbPercent, arbAmount, (cs, o, c, g, t, rate) => {
        const rates: Rates = {
          ...DEFAULT_RATES, overheadPercent: o, contingencyPercent: c, marginPercent: g, taxPercent: t,
          hourlyRate: { ...DEFAULT_RATES.hourlyRate, voicing: rate },
        };
        const centres = cs.map((x) => centre(x.division, x.pkg, x.hours, { spotted: x.spotted, oak: x.oak, cable: x.cable }, { vehiclePerKm: x.km }));
        const m = priceCentres(centres, rates);
        const percentOf = (base: string, p: string) => new Decimal(base).times(p).div(100).toDecimalPlaces(2, Decimal.ROUND_HALF_UP).toFixed(2);
        return (
          sum(m.labour.map((l) => l.amount)) === m.labourAmount &&
          sum(m.materials.map((l) => l.amount)) === m.materialsAmount &&
          sum(m.items.map((l) => l.amount)) === m.itemsAmount &&
          sum([m.labourAmount, m.materialsAmount, m.itemsAmount]) === m.subtotalAmount &&
          percentOf(m.subtotalAmount, o) === m.overhead.amount &&
          sum([m.subtotalAmount, m.overhead.amount, m.contingency.amount, m.margin.amount]) === m.netAmount &&
          percentOf(m.netAmount, t) === m.tax.amount &&
          sum([m.netAmount, m.tax.amount]) === m.totalAmount &&
          sum(m.byCentre.map((b) => b.directCostAmount)) === m.subtotalAmount &&
          sum(m.byDivision.map((b) => b.directCostAmount)) === m.subtotalAmount &&
          sum(m.byPackage.map((b) => b.directCostAmount)) === m.subtotalAmount
        );
      }),
      { numRuns: 200 },
    );
  });
});
