import { readFileSync } from "node:fs";
import { join } from "node:path";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { estimateScheme } from "@/lib/estimate/estimate";
import { geometryRules } from "@/lib/estimate/geometry";
import { planScheme } from "@/lib/estimate/pipes";
import { parseSchemeFile } from "@/lib/estimate/validate";
import { manual, pedal, scheme, stop } from "@/lib/estimate/test-support/schemes";
import { pipeTable, pipeTableCsv } from "./pipe-table";
import { KG_PER_POUND, MM_PER_INCH } from "./units";

const rules = geometryRules(DEFAULT_RATES);

function fileScheme(name: string) {
  const file = parseSchemeFile(readFileSync(join(__dirname, "../../examples", name), "utf8"), DEFAULT_RATES);
  if (!file.ok) throw new Error(file.messages.join("\n"));
  return file;
}

describe("a stop's pipe table agrees with the estimator", () => {
  for (const name of ["small-two-manual.json", "large-five-manual.json"]) {
    it(`on pipe counts (exactly) and metal and timber (to the estimator's rounding) of every stop of ${name}`, () => {
      const file = fileScheme(name);
      const e = estimateScheme(file.scheme, file.rates);
      const plan = planScheme(file.scheme);
      const r = geometryRules(file.rates);
      let checked = 0;
      for (const d of e.divisions)
        for (const st of d.stops) {
          const t = pipeTable(file.scheme, st.id, r, plan).totals;
          expect(t.byState.new, st.name).toBe(st.pipes.new);
          expect(t.byState.reused, st.name).toBe(st.pipes.reused);
          expect(t.byState.restored, st.name).toBe(st.pipes.restored);
          expect(t.byState.prepared, st.name).toBe(st.pipes.prepared);
          expect(t.inOrgan, st.name).toBe(st.pipes.total);
          // The estimator sums a rank by ratios from its first pipe and rounds to 0.1 kg and 0.001 m³.
          expect(Math.abs(t.metalKg - st.metalKg), st.name).toBeLessThanOrEqual(Math.max(0.1, st.metalKg * 0.005));
          expect(Math.abs(t.woodM3 - st.woodM3), st.name).toBeLessThanOrEqual(Math.max(0.001, st.woodM3 * 0.005));
          checked++;
        }
      expect(checked).toBe(e.divisions.reduce((n, d) => n + d.stops.length, 0));
      // And the whole organ: the sum of the tables is the estimate's pipe total.
      const tables = e.divisions.flatMap((d) => d.stops).map((st) => pipeTable(file.scheme, st.id, r, plan).totals);
      expect(tables.reduce((n, t) => n + t.inOrgan, 0)).toBe(e.totals.pipes.total);
      const kg = tables.reduce((n, t) => n + t.metalKg, 0);
      expect(Math.abs(kg - e.totals.metalTotalKg)).toBeLessThanOrEqual(Math.max(0.1 * tables.length, kg * 0.005));
    });
  }

  it("counts the offset chest's basses as the stop asks", () => {
    const s = scheme([pedal("pd", [stop("b16", 16, { family: "flute", construction: "stopped", material: "pine", offsetBassPipes: 5 })])]);
    const t = pipeTable(s, "b16", rules);
    expect(t.totals.onOffsetChest).toBe(5);
    expect(t.rows.slice(0, 5).every((r) => r.onOffsetChest)).toBe(true);
    expect(t.rows[5].onOffsetChest).toBe(false);
  });
});

describe("a pipe table's values against published references", () => {
  const s = scheme([
    manual("gt", [
      stop("p8", 8),
      stop("g8", 8, { family: "flute", construction: "stopped", material: "oak" }),
      stop("tr", 8, { family: "reed", construction: "reed" }),
      stop("ext", 4, { origin: "extension", source: "p8" }),
    ]),
  ], { tuning: { pitchHz: 440, temperatureC: 18 } });

  it("gives the open 8′ C of the normal scale its published diameter, mouth, pitch and length", () => {
    const c = pipeTable(s, "p8", rules).rows[0];
    expect(c.key).toBe("C");
    // 8′ C = C2 = 65.406 Hz at A = 440 Hz (ISO 16; equal temperament, OEIS A214832, derived).
    expect(c.frequencyHz).toBeCloseTo(65.406, 2);
    // Töpfer's normal scale: 8′ C = 155.5 mm (Wikipedia, "Organ flue pipe scaling", citing Adelung 1991).
    expect(c.diameterMm!).toBeCloseTo(155.5, 1);
    // Mouth width ¼ of the circumference (same article; Dickson, Practical Organ Building, p. 42).
    expect(c.mouthWidthMm!).toBeCloseTo((Math.PI * 155.5) / 4, 1);
    // Open normal-scale 8′ C at 18 °C: about 2.33–2.40 m (references.md, calibration bands, from memory).
    expect(c.speakingLengthMm!).toBeGreaterThan(2330);
    expect(c.speakingLengthMm!).toBeLessThan(2400);
    expect(c.resonatorLengthMm).toBeNull();
    // Normal-scale c' (2′ C size) 54.9 mm in the published table; the formula gives 54.98 (±0.2 mm).
    expect(Math.abs(pipeTable(s, "p8", rules).rows[24].diameterMm! - 54.9)).toBeLessThanOrEqual(0.2);
  });

  it("gives wooden pipes inside sides, not diameters, and reeds a resonator length, not a mouth", () => {
    const w = pipeTable(s, "g8", rules).rows[0];
    expect(w.diameterMm).toBeNull();
    expect(w.insideSideMm!).toBeGreaterThan(0);
    expect(w.footLengthMm).toBeNull();
    // Stopped 8′ C wooden flute about 1.10–1.17 m (references.md, calibration bands, from memory).
    expect(w.speakingLengthMm!).toBeGreaterThan(1100);
    expect(w.speakingLengthMm!).toBeLessThan(1170);
    const r = pipeTable(s, "tr", rules).rows[0];
    expect(r.speakingLengthMm).toBeNull();
    expect(r.resonatorLengthMm!).toBeGreaterThan(2000);
    expect(r.mouthWidthMm).toBeNull();
    expect(r.cutUpMm).toBeNull();
  });

  it("lists an extension's whole compass, the pipes it shares marked as such", () => {
    const t = pipeTable(s, "ext", rules);
    expect(t.rows.length).toBe(61);
    // A 4′ extension of an 8′ rank of 61 notes adds the top octave (12 pipes) — common practice.
    expect(t.totals.byState.new).toBe(12);
    expect(t.totals.byState.shared).toBe(49);
    expect(t.totals.inOrgan).toBe(12);
  });
});

describe("the pipe table as CSV", () => {
  const s = scheme([manual("gt", [stop("p8", 8)])]);
  const table = pipeTable(s, "p8", rules);

  it("is one header row and one row per pipe, that a CSV reader parses back", () => {
    const csv = pipeTableCsv(table, "mm");
    expect(csv.startsWith("\uFEFF")).toBe(true);
    expect(csv).toContain("\r\n");
    const parsed = Papa.parse<Record<string, string>>(csv.slice(1), { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data.length).toBe(61);
    expect(parsed.data[0]["Key"]).toBe("C");
    expect(Number(parsed.data[0]["Diameter (mm)"])).toBeCloseTo(155.5, 1);
    expect(parsed.data[0]["Chest"]).toBe("main");
    expect(parsed.data[60]["Key"]).toBe("c''''");
  });

  it("writes inches and pounds for a firm that works in them (1 in = 25.4 mm, 1 lb = 0.45359237 kg, exact)", () => {
    const mm = Papa.parse<Record<string, string>>(pipeTableCsv(table, "mm").slice(1), { header: true }).data[0];
    const inch = Papa.parse<Record<string, string>>(pipeTableCsv(table, "in").slice(1), { header: true }).data[0];
    expect(Number(inch["Diameter (in)"])).toBeCloseTo(Number(mm["Diameter (mm)"]) / MM_PER_INCH, 2);
    expect(Number(inch["Speaking length (in)"])).toBeCloseTo(Number(mm["Speaking length (mm)"]) / MM_PER_INCH, 1);
    expect(Number(inch["Metal weight (lb)"])).toBeCloseTo(Number(mm["Metal weight (kg)"]) / KG_PER_POUND, 2);
    // 155.5 mm is 6.12 in (derived).
    expect(Number(inch["Diameter (in)"])).toBeCloseTo(6.12, 2);
  });
});
