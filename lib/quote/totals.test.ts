import DecimalJs from "decimal.js";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { estimateScheme, parseScheme } from "@/lib/estimate";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { commercialSchema, defaultCommercial, hundredths, type Commercial } from "./commercial";
import { formatAmount, priceQuotation, splitByWeights, stageAmounts, sumMoney } from "./totals";
import { effectiveStatus, formatQuoteNumber, QUOTE_NUMBER } from "./quotation";

const stages = (...percents: string[]) => percents.map((percent, i) => ({ id: `s${i}`, label: `Stage ${i + 1}`, percent }));

describe("payment stages", () => {
  it("places the rounding remainder on the last stage: 1,000,000.01 at 25/25/25/25", () => {
    expect(stageAmounts("1000000.01", stages("25", "25", "25", "25")).map((s) => s.amount)).toEqual(["250000.00", "250000.00", "250000.00", "250000.01"]);
  });

  it("splits thirds to the cent: 100.00 at 33.33/33.33/33.34", () => {
    expect(stageAmounts("100.00", stages("33.33", "33.33", "33.34")).map((s) => s.amount)).toEqual(["33.33", "33.33", "33.34"]);
  });

  it("refuses stages that do not add up to 100 %", () => {
    expect(() => stageAmounts("100.00", stages("50", "49.99"))).toThrow(/100 %/);
  });

  it("property: for any total and any percentages adding to 100, the stages add up to the total exactly, none negative, each within a cent of its share", () => {
    const percentsTo100 = fc
      .array(fc.integer({ min: 1, max: 10000 }), { minLength: 1, maxLength: 12 })
      .map((ws) => {
        // Hundredths of a percent that add up to exactly 10,000, each at least 1.
        const sum = ws.reduce((a, b) => a + b, 0);
        const raw = ws.map((w) => Math.max(1, Math.floor((w * 10000) / sum)));
        raw[raw.length - 1]! += 10000 - raw.reduce((a, b) => a + b, 0);
        return raw;
      })
      .filter((hs) => hs.every((h) => h >= 1));
    const totals = fc.bigInt({ min: 0n, max: 10n ** 13n }).map((c) => new DecimalJs(c.toString()).div(100).toFixed(2));
    fc.assert(
      fc.property(totals, percentsTo100, (total, hs) => {
        const ss = stages(...hs.map((h) => (h / 100).toFixed(2)));
        expect(ss.reduce((s, x) => s + hundredths(x.percent), 0)).toBe(10000);
        const amounts = stageAmounts(total, ss).map((s) => s.amount);
        expect(sumMoney(amounts)).toBe(total);
        for (const [i, a] of amounts.entries()) {
          expect(new DecimalJs(a).gte(0)).toBe(true);
          const exact = new DecimalJs(total).times(hs[i]!).div(10000);
          // Every stage but the last is its share rounded down; the last gathers at most a cent per stage.
          const slack = i === amounts.length - 1 ? 0.01 * amounts.length : 0.01;
          expect(new DecimalJs(a).minus(exact).abs().lte(slack)).toBe(true);
        }
      }),
      { numRuns: 400 },
    );
  });

  it("property: shares by any weights add up to the amount exactly", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1e9 }), fc.array(fc.integer({ min: 0, max: 1e7 }), { minLength: 1, maxLength: 20 }), (c, ws) => {
        const amount = (c / 100).toFixed(2);
        const parts = splitByWeights(amount, ws.map((w) => (w / 100).toFixed(2)));
        expect(sumMoney(parts)).toBe(amount);
        expect(parts.every((p) => !p.startsWith("-"))).toBe(true);
      }),
    );
  });
});

describe("quotation totals", () => {
  const scheme = parseScheme({
    name: "Test", divisions: [
      { id: "gt", name: "Great", keyboard: "manual", compass: { low: "C", high: "c''''" }, stops: [{ id: "p", name: "Principal", footage: "8", family: "principal" }, { id: "o", name: "Octave", footage: "4", family: "principal" }] },
      { id: "ped", name: "Pedal", keyboard: "pedal", compass: { low: "C", high: "g'" }, stops: [{ id: "b", name: "Bourdon", footage: "16", family: "flute", construction: "stopped", material: "pine" }] },
    ],
  });
  if (!scheme.ok) throw new Error(scheme.messages.join("; "));
  const estimate = estimateScheme(scheme.scheme, DEFAULT_RATES);
  const base = (): Commercial => defaultCommercial({ currency: "EUR", taxPercent: "20" });

  it("worked example: lump sums, a provisional sum, a 5 % discount and 20 % tax, every total the sum of the lines above it", () => {
    const c: Commercial = {
      ...base(),
      lumpSums: [
        { id: "l1", category: "scaffolding", description: "Scaffold tower, hire", quantity: "3", unit: "week", unitPrice: "333.33" },
        { id: "l2", category: "case", description: "New oak case front", quantity: "1", unit: "item", unitPrice: "18500.00" },
      ],
      provisionalSums: [{ id: "p1", description: "Blower overhaul", amount: "2400.00" }],
      discount: { kind: "percent", value: "5" },
    };
    const t = priceQuotation(estimate, c);
    expect(t.lumpSums.map((l) => l.amount)).toEqual(["999.99", "18500.00"]);
    expect(t.worksAmount).toBe(estimate.money.netAmount);
    expect(sumMoney(t.works.map((w) => w.amount))).toBe(t.worksAmount);
    expect(t.lumpSumsAmount).toBe(sumMoney(t.lumpSums.map((l) => l.amount)));
    expect(t.subtotalAmount).toBe(sumMoney([t.worksAmount, t.lumpSumsAmount, t.provisionalAmount]));
    // 5 % of works + lump sums, half-up to the cent; provisional sums are not discounted.
    const discountable = new DecimalJs(t.worksAmount).plus(t.lumpSumsAmount);
    expect(t.discount.amount).toBe(discountable.times(0.05).toDecimalPlaces(2, DecimalJs.ROUND_HALF_UP).toFixed(2));
    expect(t.netAmount).toBe(new DecimalJs(t.subtotalAmount).minus(t.discount.amount).toFixed(2));
    expect(t.tax.amount).toBe(new DecimalJs(t.netAmount).times(0.2).toDecimalPlaces(2, DecimalJs.ROUND_HALF_UP).toFixed(2));
    expect(t.totalAmount).toBe(sumMoney([t.netAmount, t.tax.amount]));
    expect(sumMoney(t.stages.map((s) => s.amount))).toBe(t.totalAmount);
    // Each division, then the organ's own parts of the work that cost something (no case in this scheme).
    expect(t.works.map((w) => w.label)).toEqual(["Great division", "Pedal division", "Wind system", "Console", "Site, transport and travel", "Design and management"]);
    const organ = estimate.money.byCentre.filter((x) => x.division === null).map((x) => x.directCostAmount);
    expect(sumMoney(organ)).toBe(estimate.schemeWide.directCostAmount);
  });

  it("charges no tax under a zero-rated, exempt or reverse-charge treatment, and options stand apart from the total", () => {
    const withOption = { ...base(), options: [{ id: "o1", title: "Cymbelstern", description: "", price: "4200.00" }] };
    const standard = priceQuotation(estimate, withOption);
    expect(standard.options[0]).toMatchObject({ price: "4200.00", taxAmount: "840.00", totalAmount: "5040.00" });
    const plain = priceQuotation(estimate, base());
    expect(standard.totalAmount).toBe(plain.totalAmount);
    for (const treatment of ["zero-rated", "exempt", "reverse-charge"] as const) {
      const t = priceQuotation(estimate, { ...withOption, tax: { treatment, percent: "20" } });
      expect(t.tax.amount).toBe("0.00");
      expect(t.totalAmount).toBe(t.netAmount);
      expect(t.options[0]!.totalAmount).toBe("4200.00");
    }
  });

  it("refuses a discount larger than what it applies to", () => {
    expect(() => priceQuotation(estimate, { ...base(), discount: { kind: "amount", value: "999999999.00" } })).toThrow(/more than the works/);
  });

  it("property: for random lump sums, discounts and tax rates, every shown total equals the sum of its shown lines", () => {
    const money = fc.integer({ min: 0, max: 5_000_000_00 }).map((c) => (c / 100).toFixed(2));
    const qty = fc.integer({ min: 1, max: 99_999 }).map((q) => (q / 1000).toString());
    const pct = fc.integer({ min: 0, max: 10000 }).map((h) => (h / 100).toFixed(2));
    fc.assert(
      fc.property(fc.array(fc.tuple(qty, money), { maxLength: 8 }), fc.array(money, { maxLength: 4 }), pct, pct, (ls, ps, discount, tax) => {
        const c: Commercial = {
          ...base(),
          lumpSums: ls.map(([quantity, unitPrice], i) => ({ id: `l${i}`, category: "other", description: "x", quantity, unit: "item", unitPrice })),
          provisionalSums: ps.map((amount, i) => ({ id: `p${i}`, description: "x", amount })),
          discount: { kind: "percent", value: discount },
          tax: { treatment: "standard", percent: tax },
        };
        expect(commercialSchema.safeParse(c).success).toBe(true);
        const t = priceQuotation(estimate, c);
        expect(sumMoney(t.works.map((w) => w.amount))).toBe(t.worksAmount);
        expect(sumMoney(t.lumpSums.map((l) => l.amount))).toBe(t.lumpSumsAmount);
        expect(sumMoney(t.provisionalSums.map((l) => l.amount))).toBe(t.provisionalAmount);
        expect(sumMoney([t.worksAmount, t.lumpSumsAmount, t.provisionalAmount])).toBe(t.subtotalAmount);
        expect(new DecimalJs(t.subtotalAmount).minus(t.discount.amount).toFixed(2)).toBe(t.netAmount);
        expect(sumMoney([t.netAmount, t.tax.amount])).toBe(t.totalAmount);
        expect(sumMoney(t.stages.map((s) => s.amount))).toBe(t.totalAmount);
      }),
      { numRuns: 200 },
    );
  });
});

describe("commercial terms", () => {
  const base = () => defaultCommercial({ currency: "EUR", taxPercent: "20" });

  it("answers bad input with field paths in the product's own words", () => {
    const r = commercialSchema.safeParse({
      ...base(),
      currency: "XYZ",
      lumpSums: [{ id: "l", category: "case", description: "Case", quantity: "1", unit: "item", unitPrice: "-500" }],
      stages: stages("25", "25", "25", "20"),
      validityDays: 0,
    });
    expect(r.success).toBe(false);
    if (r.success) return;
    const byPath = Object.fromEntries(r.error.issues.map((i) => [i.path.join("."), i.message]));
    expect(byPath["lumpSums.0.unitPrice"]).toBe("Unit price cannot be negative.");
    expect(byPath.currency).toMatch(/"XYZ" is not a known ISO 4217 currency code/);
    expect(byPath.stages).toBe("The payment stages add up to 95 %; they must add up to exactly 100 %.");
    expect(byPath.validityDays).toBe("Validity must be at least 1 day.");
  });

  it("reads percentages as exact hundredths", () => {
    expect(["33.33", "33.33", "33.34"].map(hundredths).reduce((a, b) => a + b)).toBe(10000);
    expect(hundredths("12.5")).toBe(1250);
  });
});

describe("numbers, status and amounts", () => {
  it("numbers quotations in a format of our own, in sequence", () => {
    expect(formatQuoteNumber(2027, 42)).toBe("Q-2027-0042");
    expect(QUOTE_NUMBER.test(formatQuoteNumber(2027, 12345))).toBe(true);
  });

  it("reads an issued quotation past its validity as lapsed, and only then", () => {
    expect(effectiveStatus("issued", "2027-03-31", "2027-03-31")).toBe("issued");
    expect(effectiveStatus("issued", "2027-03-31", "2027-04-01")).toBe("lapsed");
    expect(effectiveStatus("accepted", "2027-03-31", "2027-05-01")).toBe("accepted");
    expect(effectiveStatus("draft", null, "2027-05-01")).toBe("draft");
  });

  it("groups thousands with thin spaces and keeps the cents as written", () => {
    expect(formatAmount("1000000.01")).toBe("1\u202f000\u202f000.01");
    expect(formatAmount("-12.5")).toBe("−12.50");
  });
});
