import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { alloyDensityGCm3, containsLead, ELEMENT_DENSITY_G_CM3, isWood, sheetAreaMm2, sheetMassKg, woodBoardVolumeM3 } from "./materials";

const within = (actual: number, expected: number, fraction: number) => Math.abs(actual - expected) <= expected * fraction;

describe("densities", () => {
  it("matches the handbook values within 1 %", () => {
    // Periodic-Table-JSON (from Wikipedia), g/cm³: tin 7.287, lead 11.34, zinc 7.14, copper 8.96, antimony 6.697.
    expect(within(alloyDensityGCm3({ tin: 1 }), 7.287, 0.01)).toBe(true);
    expect(within(alloyDensityGCm3({ lead: 1 }), 11.34, 0.01)).toBe(true);
    expect(within(alloyDensityGCm3({ zinc: 1 }), 7.14, 0.01)).toBe(true);
    expect(within(alloyDensityGCm3({ copper: 1 }), 8.96, 0.01)).toBe(true);
    expect(within(alloyDensityGCm3({ antimony: 1 }), 6.697, 0.01)).toBe(true);
    // ECHA tin dossier: white tin 7.265, handbook ~7.31 g/cm³.
    expect(within(ELEMENT_DENSITY_G_CM3.tin, 7.265, 0.01) && within(ELEMENT_DENSITY_G_CM3.tin, 7.31, 0.01)).toBe(true);
  });

  it("puts 50/50 tin–lead (spotted metal) at about 8.9 g/cm³", () => {
    // Derived by the rule of mixtures 1/ρ = Σ wᵢ/ρᵢ; spotted metal is roughly half tin, half lead (Organ Historical Society).
    expect(within(alloyDensityGCm3({ tin: 0.5, lead: 0.5 }), 8.9, 0.01)).toBe(true);
    expect(within(alloyDensityGCm3(DEFAULT_RATES.alloys.spotted), 8.9, 0.01)).toBe(true);
  });

  it("lies between its elements' densities, heavier as lead rises", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 0.99, noNaN: true }), (lead) => {
        const rho = alloyDensityGCm3({ tin: 1 - lead, lead });
        return rho > 7.287 && rho < 11.34 && alloyDensityGCm3({ tin: 1 - lead - 0.005, lead: lead + 0.005 }) > rho;
      }),
    );
  });

  it("refuses an empty composition", () => {
    expect(() => alloyDensityGCm3({})).toThrow(/at least one element/);
  });

  it("keeps the default wood densities within the published ranges", () => {
    // Engineering ToolBox; simetric.co.uk (kg/m³): white pine 350–500, oak 600–900, mahogany ~550–650.
    const w = DEFAULT_RATES.woodDensityKgM3;
    expect(w.pine).toBeGreaterThanOrEqual(350);
    expect(w.pine).toBeLessThanOrEqual(500);
    expect(w.oak).toBeGreaterThanOrEqual(600);
    expect(w.oak).toBeLessThanOrEqual(900);
    expect(w.mahogany).toBeGreaterThanOrEqual(550);
    expect(w.mahogany).toBeLessThanOrEqual(650);
  });

  it("knows which default alloys carry lead and which materials are wood", () => {
    expect(containsLead(DEFAULT_RATES.alloys.spotted)).toBe(true);
    expect(containsLead(DEFAULT_RATES.alloys.zinc)).toBe(false);
    expect(isWood("oak")).toBe(true);
    expect(isWood("copper")).toBe(false);
  });
});

describe("sheet and board", () => {
  it("weighs a square metre of 1 mm spotted metal at about 8.9 kg (derived)", () => {
    expect(sheetMassKg(1e6, 1, alloyDensityGCm3({ tin: 0.5, lead: 0.5 }))).toBeCloseTo(8.873, 2);
  });

  it("computes a cylinder's sheet area as π·D·L plus a conical foot and, on stopped pipes, a cap", () => {
    const open = sheetAreaMm2(1, false, 100, 1000, 0);
    expect(open).toBeCloseTo(Math.PI * 100 * 1000, 6);
    expect(sheetAreaMm2(1, true, 100, 1000, 0) - open).toBeCloseTo((Math.PI * 100 * 100) / 4, 6);
    expect(sheetAreaMm2(1, false, 100, 1000, 200) - open).toBeCloseTo(Math.PI * 50 * 200, 6);
  });

  it("takes a wooden pipe's board volume as four walls: (a + 2t)² − a² per unit length", () => {
    fc.assert(
      fc.property(fc.double({ min: 5, max: 400, noNaN: true }), fc.double({ min: 3, max: 40, noNaN: true }), fc.double({ min: 50, max: 6000, noNaN: true }), (a, t, l) => {
        const expected = ((a + 2 * t) ** 2 - a * a) * l * 1e-9;
        return Math.abs(woodBoardVolumeM3(a, l, t) - expected) <= 1e-12 + expected * 1e-9;
      }),
    );
  });
});
