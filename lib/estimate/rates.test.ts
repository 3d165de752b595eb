import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { parseRates, ratesSchema, withoutPrices } from "./rates";
import { estimateScheme } from "./estimate";
import { manual, scheme, stop } from "./test-support/schemes";
import firstFormatRates from "./test-support/first-format-rates.json";
import { sizeClasses } from "./departments";

describe("rates and norms", () => {
  it("ships a complete default set that its own schema accepts, marked as invented", () => {
    expect(ratesSchema.safeParse(DEFAULT_RATES).success).toBe(true);
    expect(DEFAULT_RATES.provenance).toMatch(/invented demo values/);
  });

  it("labels every rate and norm with a title, so a rate book can be built from the schema alone", () => {
    const json = z.toJSONSchema(ratesSchema) as { properties: Record<string, unknown> };
    const unlabelled: string[] = [];
    const walk = (node: unknown, path: string, parentTitled: boolean) => {
      if (!node || typeof node !== "object") return;
      const n = node as { title?: string; properties?: Record<string, unknown>; type?: string };
      if (n.properties) {
        for (const [k, v] of Object.entries(n.properties)) walk(v, `${path}.${k}`, parentTitled || !!n.title);
        return;
      }
      if (!n.title && !parentTitled) unlabelled.push(path);
    };
    walk(json, "rates", false);
    expect(unlabelled).toEqual([]);
  });

  it("charges more hours for a longer pipe in every by-size norm the estimate uses", () => {
    // Behaviour, not data: the same stop an octave lower takes more hours to make, restore and voice.
    for (const origin of ["new", "existing"] as const) {
      const hours = (footage: number) =>
        estimateScheme(scheme([manual("gt", [stop("s", footage, { origin, work: origin === "existing" ? ["restored"] : [] })])]), DEFAULT_RATES).divisions[0].stops[0].pipeHours;
      expect(hours(16), origin).toBeGreaterThan(hours(8));
      expect(hours(8), origin).toBeGreaterThan(hours(4));
    }
  });

  it("fills what a firm leaves out from the defaults", () => {
    const r = parseRates({ norms: { erectPerPipe: 0.2 }, items: { keyboard: "3000.00" }, alloys: { spotted: { tin: 0.45, lead: 0.55 } } }, DEFAULT_RATES);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.rates.norms.erectPerPipe).toBe(0.2);
      expect(r.rates.norms.erectPerDivision).toBe(DEFAULT_RATES.norms.erectPerDivision);
      expect(r.rates.items.keyboard).toBe("3000.00");
      expect(r.rates.items.pedalboard).toBe(DEFAULT_RATES.items.pedalboard);
      expect(r.rates.alloys.spotted).toEqual({ tin: 0.45, lead: 0.55 });
      expect(r.rates.alloys.common).toEqual(DEFAULT_RATES.alloys.common);
    }
  });

  it("names the field of a bad value", () => {
    const r = parseRates({ hourlyRate: { voicing: "seventy" }, programme: { efficiency: 1.5 }, alloys: { zinc: { zinc: 0.5 } }, items: { blowerBase: -1 } }, DEFAULT_RATES);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.messages.some((m) => m.startsWith("Rates: hourlyRate.voicing:"))).toBe(true);
      expect(r.messages.some((m) => m.startsWith("Rates: programme.efficiency:"))).toBe(true);
      expect(r.messages.some((m) => m.startsWith("Rates: alloys.zinc:") && /add up to 1/.test(m))).toBe(true);
      expect(r.messages.some((m) => m.startsWith("Rates: items.blowerBase:"))).toBe(true);
    }
  });

  it("reads a rate set of the first format, keeping the firm's figures where their meaning is unchanged", () => {
    // The first format's demo set as it was stored (one cut-up, one flue-voicing and one revoicing figure per pipe, foot lengths at the top).
    const old = firstFormatRates;
    expect(ratesSchema.safeParse(old).success).toBe(false);
    const changed = { ...old, cutUpFraction: 0.27, norms: { ...old.norms, voiceNewFluePipe: 0.61, revoicePipe: 0.4, cleanRetainedPipe: 0.13 } };
    const r = parseRates(changed, DEFAULT_RATES);
    if (!r.ok) throw new Error(r.messages.join("; "));
    expect(Object.values(r.rates.cutUpByFamily)).toEqual(Array(7).fill(0.27));
    for (const c of sizeClasses) {
      expect(r.rates.norms.voiceNewFluePipe[c]).toBe(0.61);
      expect(r.rates.norms.cleanPipe[c]).toBe(0.13);
    }
    expect(r.rates.norms.revoiceFluePipe).toBe(0.4);
    expect(r.rates.norms.revoiceReedPipe).toBe(0.4);
    expect(r.rates.pipeMetal.footLengthMm).toEqual(old.footLengthMm);
    expect(r.rates.hourlyRate.voicing).toBe("72.00");
    // What the first format had no figure for comes from the defaults.
    expect(r.rates.items).toEqual(DEFAULT_RATES.items);
    expect(r.rates.hourlyRate.casework).toBe(DEFAULT_RATES.hourlyRate.casework);
  });

  it("refuses rates that are not an object", () => {
    expect(parseRates([1, 2], DEFAULT_RATES).ok).toBe(false);
  });

  it("withholds every price, bought-in items included, from a role without money", () => {
    const r = withoutPrices(DEFAULT_RATES);
    expect(Object.values(r.items).every((a) => a === "0.00")).toBe(true);
    expect(Object.values(r.hourlyRate).every((a) => a === "0.00")).toBe(true);
    const e = estimateScheme(scheme([manual("gt", [stop("p", 8)])]), r);
    expect(e.money.totalAmount).toBe("0.00");
    expect(e.totals.hoursTotal).toBe(estimateScheme(scheme([manual("gt", [stop("p", 8)])]), DEFAULT_RATES).totals.hoursTotal);
  });
});
