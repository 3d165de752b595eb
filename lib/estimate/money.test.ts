import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import Decimal from "decimal.js";
import { diffAmount, priceCentres, sumAmounts, type CostCentre } from "./money";
import { type Rates } from "./rates";
import { departments, type Department } from "./labour";

const zeroHours = () => Object.fromEntries(departments.map((d) => [d, 0])) as Record<Department, number>;
const centre = (id: string, hours: Partial<Record<Department, number>>, materials: CostCentre["materials"] = {}): CostCentre => ({
  id, hours: { ...zeroHours(), ...hours }, materials,
});
const sum = (xs: readonly string[]) => xs.reduce((s, x) => s.plus(x), new Decimal(0)).toFixed(2);

describe("money", () => {
  it("prices labour by department and materials by quantity", () => {
    const m = priceCentres([centre("gt", { voicing: 10.5 }, { spotted: 100.5 })], DEFAULT_RATES);
    expect(m.labour).toEqual([{ department: "voicing", label: "Voicing", hours: 10.5, rateAmount: "72.00", amount: "756.00" }]);
    expect(m.materials[0]).toMatchObject({ material: "spotted", quantity: 100.5, unit: "kg", priceAmount: "24.00", amount: "2412.00" });
    expect(m.subtotalAmount).toBe("3168.00");
  });

  it("applies overhead, contingency, margin and tax in order, each rounded to the cent", () => {
    const rates: Rates = { ...DEFAULT_RATES, overheadPercent: "10", contingencyPercent: "5", marginPercent: "10", taxPercent: "20" };
    const m = priceCentres([centre("gt", { erection: 1 })], { ...rates, hourlyRate: { ...rates.hourlyRate, erection: "100.00" } });
    expect(m.subtotalAmount).toBe("100.00");
    expect(m.overhead.amount).toBe("10.00");
    expect(m.contingency.amount).toBe("5.50"); // 5 % of 110.00
    expect(m.margin.amount).toBe("11.55"); // 10 % of 115.50
    expect(m.netAmount).toBe("127.05");
    expect(m.tax.amount).toBe("25.41");
    expect(m.totalAmount).toBe("152.46");
  });

  it("rounds half up at the cent and never goes through floats", () => {
    // 0.1 h at 0.35 = 0.035 → 0.04 (half up); a float sum 0.1 + 0.2 would show 0.30000000000000004.
    const rates: Rates = { ...DEFAULT_RATES, hourlyRate: { ...DEFAULT_RATES.hourlyRate, transport: "0.35" }, cablePricePerM: "0.10" };
    const m = priceCentres([centre("a", { transport: 0.1 }, { cable: 1 }), centre("b", {}, { cable: 2 })], rates);
    expect(m.labour[0].amount).toBe("0.04");
    expect(m.materials[0].amount).toBe("0.30");
  });

  it("serialises every amount as a decimal string with two places", () => {
    const m = priceCentres([centre("gt", { voicing: 3.3 }, { oak: 0.123 })], DEFAULT_RATES);
    for (const a of [m.subtotalAmount, m.netAmount, m.totalAmount, m.tax.amount, ...m.labour.map((l) => l.amount)]) expect(a).toMatch(/^-?\d+\.\d{2}$/);
  });

  it("adds and subtracts amount strings exactly", () => {
    expect(sumAmounts(["0.10", "0.20"])).toBe("0.30");
    expect(diffAmount("100.05", "99.95")).toBe("-0.10");
  });

  const arbCentre = fc.record({
    id: fc.string({ minLength: 1, maxLength: 4 }),
    hours: fc.record(Object.fromEntries(departments.map((d) => [d, fc.integer({ min: 0, max: 200000 }).map((t) => t / 10)])) as Record<Department, fc.Arbitrary<number>>),
    materials: fc.record({ spotted: fc.integer({ min: 0, max: 99999 }).map((x) => x / 10), oak: fc.integer({ min: 0, max: 9999 }).map((x) => x / 1000), cable: fc.nat(100000) }),
  });
  const arbPercent = fc.integer({ min: 0, max: 400 }).map((x) => (x / 10).toString());
  const arbAmount = fc.integer({ min: 1, max: 20000 }).map((x) => (x / 100).toFixed(2));

  it("keeps shown lines summing exactly to the shown totals", () => {
    fc.assert(
      fc.property(fc.array(arbCentre, { minLength: 1, maxLength: 8 }), arbPercent, arbPercent, arbPercent, arbPercent, arbAmount, (centres, o, c, g, t, rate) => {
        const rates: Rates = {
          ...DEFAULT_RATES, overheadPercent: o, contingencyPercent: c, marginPercent: g, taxPercent: t,
          hourlyRate: { ...DEFAULT_RATES.hourlyRate, voicing: rate },
        };
        const m = priceCentres(centres, rates);
        return (
          sum(m.labour.map((l) => l.amount)) === m.labourAmount &&
          sum(m.materials.map((l) => l.amount)) === m.materialsAmount &&
          sum([m.labourAmount, m.materialsAmount]) === m.subtotalAmount &&
          sum([m.subtotalAmount, m.overhead.amount, m.contingency.amount, m.margin.amount]) === m.netAmount &&
          sum([m.netAmount, m.tax.amount]) === m.totalAmount &&
          sum(m.byCentre.map((b) => b.directCostAmount)) === m.subtotalAmount
        );
      }),
      { numRuns: 200 },
    );
  });
});
