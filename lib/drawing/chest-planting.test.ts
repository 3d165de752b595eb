import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { estimateScheme, parseSchemeFile, planScheme, type Rates, type Scheme } from "@/lib/estimate";
import { drawingRules } from "@/lib/spec/estimate";
import { pipeTable } from "./pipe-table";
import { plantScheme, type PlantedChest } from "./chest-planting";

const example = (file: string) => {
  const r = parseSchemeFile(readFileSync(join(__dirname, "../../examples", file), "utf8"), DEFAULT_RATES);
  if (!r.ok) throw new Error(r.messages.join("\n"));
  return r;
};
const FILES = ["small-two-manual.json", "large-five-manual.json"];

/** Lengths of every row as the drawing placed it, side by side: from the pipes' positions and widths, not from the chest rule's sums. */
function drawnRowLengths(c: PlantedChest): { c: number; cs: number }[] {
  return c.rows.map((r) => {
    const sides = [[], []] as { lo: number; hi: number }[][];
    for (const p of r.pipes) sides[c.splitMm !== null && p.x > c.splitMm ? 1 : 0].push({ lo: p.x - p.rowWidthMm / 2, hi: p.x + p.rowWidthMm / 2 });
    const extent = (s: { lo: number; hi: number }[]) => (s.length ? Math.max(...s.map((q) => q.hi)) - Math.min(...s.map((q) => q.lo)) : 0);
    return { c: extent(sides[0]), cs: extent(sides[1]) };
  });
}

/** No two pipes of a row overlap: their widths (footprint plus clearance) stand side by side. */
function overlaps(c: PlantedChest): number {
  let n = 0;
  for (const r of c.rows) {
    const s = [...r.pipes].sort((a, b) => a.x - b.x);
    for (let i = 1; i < s.length; i++) if (s[i].x - s[i].rowWidthMm / 2 < s[i - 1].x + s[i - 1].rowWidthMm / 2 - 1e-6) n++;
  }
  return n;
}

describe("the chest planting and the figures", () => {
  it("draws from rules that hold no price, labour norm, crew or percentage", () => {
    const keys: string[] = [];
    const walk = (v: unknown, path: string) => {
      if (!v || typeof v !== "object") return;
      for (const [k, x] of Object.entries(v)) {
        keys.push(`${path}${k}`);
        walk(x, `${path}${k}.`);
      }
    };
    walk(drawingRules(DEFAULT_RATES), "");
    expect(keys).toContain("chest.clearanceMinMm");
    expect(keys).toContain("chest.bassesAt");
    expect(keys.filter((k) => /price|amount|rate|norm|crew|percent|margin|items|programme/i.test(k))).toEqual([]);
  });

  for (const file of FILES) {
    for (const bassesAt of ["ends", "centre"] as const) {
      it(`agree on every chest of ${file} with the basses at the ${bassesAt}: row lengths, length, depth, halves, the offset chests`, () => {
        const r = example(file);
        const rates: Rates = { ...r.rates, chest: { ...r.rates.chest, bassesAt } };
        const e = estimateScheme(r.scheme, rates);
        // Planted as a reader without money:read gets the rules.
        const planted = new Map(plantScheme(r.scheme, drawingRules(rates)).map((p) => [p.divisionId, p]));
        const end = rates.chest.endBoardMm;
        for (const d of e.divisions) {
          const p = planted.get(d.id);
          if (d.chest.main.rows === 0 && !d.chest.offset) {
            expect(p, d.name).toBeUndefined();
            continue;
          }
          const main = p!.main;
          expect(main.lengthMm, d.name).toBeCloseTo(d.chest.main.lengthMm, 1);
          expect(main.depthMm, d.name).toBeCloseTo(d.chest.main.depthMm, 1);
          expect(main.rows.length, d.name).toBe(d.chest.main.rows);
          expect(main.splitMm, d.name).toBe(d.chest.main.halvesMm?.[0] ?? null);
          // The longest row the drawing lays, plus the end boards, is the chest the figures need.
          const rows = drawnRowLengths(main);
          if (d.chest.main.halvesMm) {
            expect(Math.max(...rows.map((x) => x.c)) + 2 * end, `${d.name} C side`).toBeCloseTo(d.chest.main.halvesMm[0], 1);
            expect(Math.max(...rows.map((x) => x.cs)) + 2 * end, `${d.name} C♯ side`).toBeCloseTo(d.chest.main.halvesMm[1], 1);
          } else {
            expect(Math.max(...rows.map((x) => x.c)) + 2 * end, d.name).toBeCloseTo(d.chest.main.lengthMm, 1);
          }
          expect(overlaps(main), d.name).toBe(0);
          expect(p!.offset?.lengthMm ?? null, d.name).toBe(d.chest.offset?.lengthMm ?? null);
          if (p!.offset) {
            expect(Math.max(...drawnRowLengths(p!.offset).map((x) => x.c)) + 2 * end, `${d.name} offset`).toBeCloseTo(d.chest.offset!.lengthMm, 1);
            expect(overlaps(p!.offset), `${d.name} offset`).toBe(0);
          }
          // Every pipe stands on its chest, between the end boards (the rule rounds each half to 0.1 mm).
          for (const row of main.rows) for (const q of row.pipes) {
            expect(q.x - q.rowWidthMm / 2, `${d.name} ${row.label} ${q.key}`).toBeGreaterThanOrEqual(end - 0.15);
            expect(q.x + q.rowWidthMm / 2, `${d.name} ${row.label} ${q.key}`).toBeLessThanOrEqual(main.lengthMm - end + 0.15);
          }
        }
      });
    }
  }

  it("plants the largest pipes at the ends or in the centre, as the firm's rule says", () => {
    const r = example("small-two-manual.json");
    const great = (bassesAt: "ends" | "centre") => plantScheme(r.scheme, drawingRules({ ...r.rates, chest: { ...r.rates.chest, bassesAt } }))[0].main;
    for (const bassesAt of ["ends", "centre"] as const) {
      const c = great(bassesAt);
      const split = c.splitMm ?? c.lengthMm / 2;
      // The lowest pipe of each row (key order) stands nearer the ends, or nearer the middle, than its highest.
      for (const row of c.rows) {
        const first = row.pipes[0];
        const last = row.pipes.filter((q) => q.x <= split).at(-1)!;
        const fromMiddle = (x: number) => Math.abs(x - split);
        if (bassesAt === "ends") expect(fromMiddle(first.x), row.label).toBeGreaterThan(fromMiddle(last.x));
        else expect(fromMiddle(first.x), row.label).toBeLessThan(fromMiddle(last.x));
      }
    }
  });

  for (const file of FILES) {
    it(`weighs what the estimator weighs on the chests of ${file}, new and existing apart`, () => {
      const r = example(file);
      const e = estimateScheme(r.scheme, r.rates);
      const planted = plantScheme(r.scheme, drawingRules(r.rates));
      const drawn = planted.reduce((s, p) => s + p.main.load.totalKg + (p.offset?.load.totalKg ?? 0), 0);
      const figures = e.divisions.reduce((s, d) => s + d.weightKg, 0);
      // The estimator rounds each division to 0.1 kg.
      expect(Math.abs(drawn - figures)).toBeLessThanOrEqual(0.05 * e.divisions.length + 1e-6);
      for (const p of planted) {
        const c = p.main.load;
        expect(c.totalKg).toBeCloseTo(c.newPipesKg + c.existingPipesKg + c.chestKg, 9);
      }
    });

    it(`tells each rank's wind so that a division of its own stops adds up to the estimator's wind on ${file}`, () => {
      const r = example(file);
      const e = estimateScheme(r.scheme, r.rates);
      const plan = planScheme(r.scheme);
      const planted = new Map(plantScheme(r.scheme, drawingRules(r.rates), plan).map((p) => [p.divisionId, p]));
      let checked = 0;
      for (const [i, d] of e.divisions.entries()) {
        const p = planted.get(d.id);
        const ownOnly = plan.divisions[i].stops.every((s) => plan.stops[s].kind === "own" || plan.stops[s].kind === "prepared");
        if (!p || !ownOnly) continue;
        const told = [...p.main.rows, ...(p.offset?.rows ?? [])].reduce((s, x) => s + x.windM3PerMin, 0);
        expect(told, d.name).toBeCloseTo(p.windM3PerMin, 9);
        expect(Math.abs(told - d.windM3PerMin), d.name).toBeLessThanOrEqual(0.006);
        checked++;
      }
      expect(checked).toBeGreaterThan(0);
    });
  }
});

describe("the elevation", () => {
  /** Standing heights of a division's pipes from its pipe tables (a separate module): speaking or resonator length plus foot. */
  function heightsFromTables(scheme: Scheme, rates: Rates, divisionIndex: number): number[] {
    const rules = drawingRules(rates);
    const plan = planScheme(scheme);
    return scheme.divisions[divisionIndex].stops.flatMap((s) =>
      pipeTable(scheme, s.id, rules, plan).rows
        .filter((row) => row.state !== "borrowed" && row.state !== "shared" && row.state !== "removed")
        .map((row) => (row.speakingLengthMm ?? row.resonatorLengthMm!) + (row.footLengthMm ?? 0)),
    );
  }

  it("flags exactly the pipes taller than the clear height in the case, and none when it is not given", () => {
    const r = example("small-two-manual.json");
    const heights = heightsFromTables(r.scheme, r.rates, 0).sort((a, b) => a - b);
    expect(heights.length).toBeGreaterThan(100);
    const noHeight = plantScheme(r.scheme, drawingRules(r.rates))[0].elevation;
    expect(noHeight.availableMm).toBeNull();
    expect(noHeight.tooTall).toEqual([]);
    expect(noHeight.tallestMm).toBeCloseTo(heights.at(-1)!, 6);

    for (const available of [heights.at(-1)! + 1, heights[Math.floor(heights.length * 0.98)], heights[Math.floor(heights.length / 2)], 300]) {
      const d0 = r.scheme.divisions[0];
      const scheme: Scheme = { ...r.scheme, divisions: [{ ...d0, space: { lengthMm: 9000, depthMm: 3000, heightMm: available } }, ...r.scheme.divisions.slice(1)] };
      const e = plantScheme(scheme, drawingRules(r.rates))[0].elevation;
      const expected = heights.filter((h) => h > available).length;
      expect(e.tooTall.reduce((s, t) => s + t.keys.length, 0), `clear height ${available}`).toBe(expected);
      for (const t of e.tooTall) expect(t.overMm).toBeCloseTo(t.tallestMm - available, 9);
      // The pipes flagged are the tall ones, in the drawing too.
      const planted = plantScheme(scheme, drawingRules(r.rates))[0];
      const pipes = [...planted.main.rows, ...(planted.offset?.rows ?? [])].flatMap((row) => row.pipes);
      expect(pipes.filter((q) => q.heightMm > available).length).toBe(expected);
    }
  });
});
