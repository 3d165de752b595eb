import { describe, expect, it } from "vitest";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { geometryRules } from "@/lib/estimate/geometry";
import { planScheme } from "@/lib/estimate/pipes";
import { manual, scheme, stop } from "@/lib/estimate/test-support/schemes";
import { scalingChart } from "./scaling-chart";
import { slopeOfHalving } from "./scale-fit";

const rules = geometryRules(DEFAULT_RATES);
const s = scheme([
  manual("gt", [
    stop("p8", 8),
    stop("p4", 4, { scale: { deviationHt: -2, halvingOn: 17 } }),
    stop("fl", 8, { family: "flute", construction: "stopped", material: "oak", scale: { deviationHt: 3, halvingOn: 19 } }),
    stop("mx", "2", { family: "mixture", ranks: 2, breaks: [{ from: "C", footages: ["2", "1 1/3"] }, { from: "c'", footages: ["4", "2 2/3"] }] }),
    stop("x", 2, { origin: "extension", source: "p4" }),
    stop("b", 8, { origin: "borrowed", source: "p8" }),
  ]),
]);
const chart = scalingChart(s, "gt", rules, planScheme(s));
const line = (id: string, rank = 1) => chart.lines.find((l) => l.stopId === id && l.rank === rank)!;

describe("a division's scaling chart", () => {
  it("draws a normal-scale rank on the zero line and a rank 2 semitones narrow 2 below it, at every key", () => {
    expect(line("p8").points.length).toBe(61);
    // Töpfer's normal scale (Wikipedia, "Organ flue pipe scaling"): deviation 0 at every note (diameters rounded to 0.01 mm).
    for (const p of line("p8").points) expect(Math.abs(p.deviationHt)).toBeLessThan(0.03);
    for (const p of line("p4").points) expect(p.deviationHt).toBeCloseTo(-2, 1);
  });

  it("shows a later halving as a line rising by 1 − 16/(H − 1) semitones per key, wooden ranks included", () => {
    const pts = line("fl").points;
    expect(pts[0].deviationHt).toBeCloseTo(3, 1);
    expect((pts[60].deviationHt - pts[0].deviationHt) / 60).toBeCloseTo(slopeOfHalving(19), 3);
    expect(line("fl").wooden).toBe(true);
  });

  it("draws each mixture rank as its own line, the same scale across its breaks", () => {
    expect(chart.lines.filter((l) => l.stopId === "mx").length).toBe(2);
    // Diameters come rounded to 0.01 mm: 0.03 semitone at the smallest pipes (5 mm).
    for (const p of line("mx", 2).points) expect(Math.abs(p.deviationHt)).toBeLessThan(0.03);
  });

  it("draws only the pipes an extension adds, and no line for a borrowed stop", () => {
    // A 2′ extension of a 4′ rank of 61 notes adds the top octave: 12 pipes (common practice).
    expect(line("x").points.length).toBe(12);
    expect(chart.lines.some((l) => l.stopId === "b")).toBe(false);
  });
});
