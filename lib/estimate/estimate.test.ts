import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import Decimal from "decimal.js";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { estimateScheme, SchemeError } from "./estimate";
import { parseSchemeFile } from "./validate";
import { departments } from "./labour";
import { metals } from "./materials";
import { pureMinusTemperedCents } from "./pitch";
import { arbScheme, manual, pedal, scheme, stop } from "./test-support/schemes";
import type { Scheme } from "./scheme";

function example(file: string) {
  const r = parseSchemeFile(readFileSync(join(__dirname, "../../examples", file), "utf8"), DEFAULT_RATES);
  if (!r.ok) throw new Error(r.messages.join("\n"));
  return r;
}

const sum = (xs: readonly string[]) => xs.reduce((s, x) => s.plus(x), new Decimal(0)).toFixed(2);
const tenths = (xs: readonly number[]) => xs.reduce((s, x) => s + Math.round(x * 10), 0) / 10;

function deepFreeze<T>(o: T): T {
  if (o && typeof o === "object") {
    for (const v of Object.values(o)) deepFreeze(v);
    Object.freeze(o);
  }
  return o;
}

describe("the examples", () => {
  it("has a small two-manual and pedal scheme of 15–20 stops", () => {
    const { scheme: s, rates } = example("small-two-manual.json");
    const e = estimateScheme(s, rates);
    expect(s.divisions.map((d) => d.keyboard)).toEqual(["manual", "manual", "pedal"]);
    expect(e.totals.stops).toBeGreaterThanOrEqual(15);
    expect(e.totals.stops).toBeLessThanOrEqual(20);
  });

  it("has a large five-manual and pedal scheme of about 150 stops and 10,000 pipes", () => {
    const { scheme: s, rates } = example("large-five-manual.json");
    const e = estimateScheme(s, rates);
    expect(s.divisions.filter((d) => d.keyboard === "manual").length).toBe(5);
    expect(s.divisions.filter((d) => d.keyboard === "pedal").length).toBe(1);
    expect(e.totals.stops).toBeGreaterThanOrEqual(140);
    expect(e.totals.stops).toBeLessThanOrEqual(160);
    expect(e.totals.pipes.total + e.totals.pipes.prepared).toBeGreaterThan(9500);
    expect(e.totals.pipes.total + e.totals.pipes.prepared).toBeLessThan(10500);
    // Both fitting and overfull chests appear in the demo.
    expect(e.divisions.some((d) => d.chest.fit?.fits === true)).toBe(true);
    expect(e.divisions.some((d) => d.chest.fit?.fits === false)).toBe(true);
  });
});

describe("totals", () => {
  const { scheme: s, rates } = example("large-five-manual.json");
  const e = estimateScheme(s, rates);

  it("adds the divisions' pipes, hours and metal up to the scheme totals", () => {
    expect(e.divisions.reduce((n, d) => n + d.pipes.total, 0)).toBe(e.totals.pipes.total);
    for (const dep of departments) expect(tenths([...e.divisions.map((d) => d.hours[dep]), e.schemeWide.hours[dep]])).toBe(e.totals.hours[dep]);
    for (const m of metals) expect(tenths(e.divisions.map((d) => d.metalKg[m]))).toBe(e.totals.metalKg[m]);
    expect(e.divisions.reduce((n, d) => n + d.wiring.conductorLengthM, e.schemeWide.wiring.conductorLengthM)).toBe(e.totals.wiring.conductorLengthM);
  });

  it("shows money lines that sum exactly to the shown totals, and division costs that sum to the subtotal", () => {
    const m = e.money;
    expect(sum([...m.labour.map((l) => l.amount), ...m.materials.map((l) => l.amount)])).toBe(m.subtotalAmount);
    expect(sum([m.subtotalAmount, m.overhead.amount, m.contingency.amount, m.margin.amount])).toBe(m.netAmount);
    expect(sum([m.netAmount, m.tax.amount])).toBe(m.totalAmount);
    expect(sum([...e.divisions.map((d) => d.directCostAmount), e.schemeWide.directCostAmount])).toBe(m.subtotalAmount);
  });

  it("prices every labour line at its hours × rate to within a cent per cost centre", () => {
    for (const l of e.money.labour) {
      const exact = new Decimal(l.hours).times(l.rateAmount);
      expect(exact.minus(l.amount).abs().toNumber()).toBeLessThanOrEqual(0.005 * (e.divisions.length + 1));
    }
  });

  it("carries the lead, mains and site cautions", () => {
    expect(e.cautions.map((c) => c.code)).toEqual(["lead", "mains", "site"]);
  });
});

describe("behaviour", () => {
  const nazard = (mutations: "tempered" | "pure") =>
    estimateScheme(scheme([manual("sw", [stop("n", "2 2/3", { family: "mutation" })])], { tuning: { pitchHz: 440, temperatureC: 18, mutations } }), DEFAULT_RATES).divisions[0].stops[0];

  it("tunes mutations tempered by default and pure on request: a pure twelfth is 1.96 cents sharp", () => {
    const t = nazard("tempered").lowestFrequencyHz!;
    const p = nazard("pure").lowestFrequencyHz!;
    expect(t).toBeCloseTo(196, 0); // g, 19 semitones above 8′ C (derived)
    expect(1200 * Math.log2(p / t)).toBeCloseTo(pureMinusTemperedCents(3), 1);
  });

  it("lowers every pipe with a lower pitch and lengthens it in warmer air", () => {
    const at = (pitchHz: number, temperatureC: number) =>
      estimateScheme(scheme([manual("gt", [stop("p", 8)])], { tuning: { pitchHz, temperatureC, mutations: "tempered" } }), DEFAULT_RATES).divisions[0].stops[0];
    expect(at(415, 18).lowestFrequencyHz!).toBeLessThan(at(440, 18).lowestFrequencyHz!);
    expect(at(415, 18).longestSpeakingLengthMm!).toBeGreaterThan(at(440, 18).longestSpeakingLengthMm!);
    expect(at(440, 25).longestSpeakingLengthMm!).toBeGreaterThan(at(440, 15).longestSpeakingLengthMm!);
  });

  it("charges no pipe making for borrowed and prepared stops but does wire them", () => {
    const base = scheme([manual("gt", [stop("p", 8)], { action: "electric" }), pedal("pd", [], { action: "electric" })]);
    const more = scheme([
      manual("gt", [stop("p", 8)], { action: "electric" }),
      pedal("pd", [stop("b", 8, { treatment: "borrowed", source: "p" }), stop("x", 4, { treatment: "prepared" })], { action: "electric" }),
    ]);
    const [a, b] = [estimateScheme(base, DEFAULT_RATES), estimateScheme(more, DEFAULT_RATES)];
    expect(b.totals.hours.metalPipes).toBe(a.totals.hours.metalPipes);
    expect(b.totals.pipes.total).toBe(a.totals.pipes.total);
    expect(b.totals.pipes.prepared).toBe(32);
    expect(b.totals.wiring.conductorLengthM).toBeGreaterThan(a.totals.wiring.conductorLengthM);
  });

  it("costs more to make pipes new than to restore them", () => {
    const cost = (treatment: "new" | "restored") => estimateScheme(scheme([manual("gt", [stop("p", 8, { treatment }), stop("o", 4, { treatment })])]), DEFAULT_RATES).money.totalAmount;
    expect(new Decimal(cost("new")).greaterThan(cost("restored"))).toBe(true);
  });

  it("puts extension pipes on their rank's chest", () => {
    const s = scheme([
      manual("gt", [stop("d16", 16)], { chest: "direct-electric", action: "electric" }),
      pedal("pd", [stop("d8", 8, { treatment: "extension", source: "d16" })], { action: "electric" }),
    ]);
    const e = estimateScheme(s, DEFAULT_RATES);
    expect(e.divisions[1].pipes.new).toBe(0); // a 32-note 8′ from a 61-note 16′ shares every pipe
    expect(e.divisions[1].chest.main.rows).toBe(0);
    expect(e.divisions[0].chest.main.rows).toBe(1);
  });

  it("refuses an inconsistent scheme with its messages", () => {
    const bad = scheme([manual("gt", [stop("e", 8, { treatment: "extension", source: "nowhere" })])]);
    expect(() => estimateScheme(bad, DEFAULT_RATES)).toThrow(SchemeError);
    try {
      estimateScheme(bad, DEFAULT_RATES);
    } catch (err) {
      expect((err as SchemeError).messages).toEqual(['Division "gt", stop "e": extension source "nowhere" does not exist']);
    }
  });
});

describe("properties", () => {
  it("is deterministic and leaves its input untouched", () => {
    fc.assert(
      fc.property(arbScheme, (s: Scheme) => {
        const frozen = deepFreeze(structuredClone(s));
        return JSON.stringify(estimateScheme(frozen, DEFAULT_RATES)) === JSON.stringify(estimateScheme(s, DEFAULT_RATES));
      }),
      { numRuns: 100 },
    );
  });

  it("never gives negative pipes, hours, metal or weeks", () => {
    fc.assert(
      fc.property(arbScheme, (s) => {
        const e = estimateScheme(s, DEFAULT_RATES);
        const numbers = [
          ...Object.values(e.totals.pipes), ...Object.values(e.totals.hours), ...Object.values(e.totals.metalKg), ...Object.values(e.totals.woodM3),
          e.totals.wiring.conductorLengthM, e.programme.totalWeeks, ...e.divisions.flatMap((d) => [d.chest.main.lengthMm, d.chest.main.depthMm]),
        ];
        return numbers.every((n) => Number.isFinite(n) && n >= 0) && !new Decimal(e.money.totalAmount).isNegative();
      }),
      { numRuns: 150 },
    );
  });

  it("keeps money lines summing to totals for any scheme and rates", () => {
    fc.assert(
      fc.property(arbScheme, fc.integer({ min: 0, max: 300 }), fc.integer({ min: 0, max: 250 }), (s, o, t) => {
        const rates = { ...DEFAULT_RATES, overheadPercent: (o / 10).toString(), taxPercent: (t / 10).toString() };
        const m = estimateScheme(s, rates).money;
        return (
          sum([...m.labour.map((l) => l.amount), ...m.materials.map((l) => l.amount)]) === m.subtotalAmount &&
          sum([m.subtotalAmount, m.overhead.amount, m.contingency.amount, m.margin.amount]) === m.netAmount &&
          sum([m.netAmount, m.tax.amount]) === m.totalAmount &&
          sum(m.byCentre.map((c) => c.directCostAmount)) === m.subtotalAmount
        );
      }),
      { numRuns: 150 },
    );
  });
});
