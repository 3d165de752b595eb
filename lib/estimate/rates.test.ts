import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { parseRates, ratesSchema } from "./rates";
import { departments, sizeClasses } from "./labour";

describe("rates and norms", () => {
  it("ships a complete default set that its own schema accepts", () => {
    expect(ratesSchema.safeParse(DEFAULT_RATES).success).toBe(true);
    for (const d of departments) {
      expect(Number(DEFAULT_RATES.hourlyRate[d])).toBeGreaterThan(0);
      expect(DEFAULT_RATES.programme.crew[d]).toBeGreaterThanOrEqual(1);
    }
    for (const c of sizeClasses) expect(DEFAULT_RATES.norms.newMetalPipe[c]).toBeGreaterThan(0);
  });

  it("marks the defaults as invented demo values", () => {
    expect(DEFAULT_RATES.provenance).toMatch(/invented demo values/);
  });

  it("makes longer pipes cost more hours in every by-size norm", () => {
    for (const norm of ["newMetalPipe", "newWoodPipe", "reedResonator", "reedParts", "restoreMetalPipe", "restoreWoodPipe", "restoreReedParts"] as const) {
      const v = sizeClasses.map((c) => DEFAULT_RATES.norms[norm][c]);
      for (let i = 1; i < v.length; i++) expect(v[i], `${norm} ${sizeClasses[i]}`).toBeLessThan(v[i - 1]);
    }
  });

  it("fills what a firm leaves out from the defaults", () => {
    const r = parseRates({ norms: { erectPerPipe: 0.2 }, alloys: { spotted: { tin: 0.45, lead: 0.55 } } }, DEFAULT_RATES);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.rates.norms.erectPerPipe).toBe(0.2);
      expect(r.rates.norms.erectPerDivision).toBe(DEFAULT_RATES.norms.erectPerDivision);
      expect(r.rates.alloys.spotted).toEqual({ tin: 0.45, lead: 0.55 });
      expect(r.rates.alloys.common).toEqual(DEFAULT_RATES.alloys.common);
    }
  });

  it("names the field of a bad value", () => {
    const r = parseRates({ hourlyRate: { voicing: "seventy" }, programme: { efficiency: 1.5 }, alloys: { zinc: { zinc: 0.5 } } }, DEFAULT_RATES);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.messages.some((m) => m.startsWith("Rates: hourlyRate.voicing:"))).toBe(true);
      expect(r.messages.some((m) => m.startsWith("Rates: programme.efficiency:"))).toBe(true);
      expect(r.messages.some((m) => m.startsWith("Rates: alloys.zinc:") && /add up to 1/.test(m))).toBe(true);
    }
  });

  it("refuses rates that are not an object", () => {
    expect(parseRates([1, 2], DEFAULT_RATES).ok).toBe(false);
  });
});
