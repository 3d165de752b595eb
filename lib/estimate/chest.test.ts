import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { chestFit, chestSideOf, chestSize, clearanceMm, pipeRowWidthMm, placeRow, rowOf, rowWidthMm, type ChestRow } from "./chest";
import { estimateScheme } from "./estimate";
import { manual, scheme, stop } from "./test-support/schemes";

const N = { clearanceMinMm: 10, clearanceFractionOfDiameter: 0.2, endBoardMm: 50, passageBoardMm: 300, heightMm: 700, kgPerM2: 140, bassesAt: "ends" as const };
const row = (c: number, cs: number, d: number): ChestRow => ({ cSideMm: c, cSharpSideMm: cs, largestFootprintMm: d, largestDiameterMm: d });

describe("chest space", () => {
  it("gives each pipe its diameter plus a clearance that grows with the pipe", () => {
    expect(clearanceMm(100, N)).toBe(30);
    expect(pipeRowWidthMm(100, 100, N)).toBe(130);
    expect(rowWidthMm(100, 100, N.clearanceMinMm, N.clearanceFractionOfDiameter)).toBe(130);
    expect(clearanceMm(200, N)).toBeGreaterThan(clearanceMm(100, N));
  });

  it("makes a chromatic chest as long as its longest row plus two end boards", () => {
    const s = chestSize([row(1000, 900, 100), row(600, 500, 60)], "chromatic", false, N);
    expect(s.lengthMm).toBe(1900 + 100);
    expect(s.halvesMm).toBeUndefined();
  });

  it("splits a C/C♯ chest into two halves, each with its own end boards", () => {
    const s = chestSize([row(1000, 900, 100), row(600, 950, 60)], "c-c-sharp", false, N);
    expect(s.halvesMm).toEqual([1100, 1050]);
    expect(s.lengthMm).toBe(2150);
  });

  it("takes depth as Σ (largest pipe + clearance) over rows, plus a passage board when there is one", () => {
    const rows = [row(1000, 900, 100), row(600, 500, 60)];
    expect(chestSize(rows, "chromatic", false, N).depthMm).toBe(100 + 30 + 60 + 22);
    expect(chestSize(rows, "chromatic", true, N).depthMm).toBe(100 + 30 + 60 + 22 + 300);
  });

  it("says whether the chest fits the space, with the margins", () => {
    const s = chestSize([row(1000, 900, 100)], "chromatic", false, N);
    expect(chestFit(s, { lengthMm: 2100, depthMm: 200 })).toEqual({ fits: true, lengthMarginMm: 100, depthMarginMm: 70 });
    expect(chestFit(s, { lengthMm: 1900, depthMm: 200 }).fits).toBe(false);
    expect(chestFit(s, { lengthMm: 2100, depthMm: 100 }).fits).toBe(false);
  });

  it("is empty for no rows", () => {
    expect(chestSize([], "c-c-sharp", true, N)).toEqual({ layout: "c-c-sharp", rows: 0, lengthMm: 0, depthMm: 0 });
  });
});

describe("chest space of a division", () => {
  const estimateOf = (offsetBassPipes: number, layout: "chromatic" | "c-c-sharp" = "c-c-sharp") =>
    estimateScheme(scheme([manual("gt", [stop("p8", 8, { offsetBassPipes }), stop("o4", 4)], { chestLayout: layout, space: { lengthMm: 4800, depthMm: 900 } })]), DEFAULT_RATES)
      .divisions[0].chest;

  it("shortens the main chest and adds an offset chest when basses stand off", () => {
    const on = estimateOf(0);
    const off = estimateOf(12);
    expect(off.main.lengthMm).toBeLessThan(on.main.lengthMm);
    expect(off.main.depthMm).toBeLessThan(on.main.depthMm);
    expect(on.offset).toBeNull();
    expect(off.offset!.rows).toBe(1);
    expect(off.offset!.lengthMm).toBeGreaterThan(0);
  });

  it("needs about the same row length chromatic or C/C♯, with two more end boards for the halves", () => {
    const chromatic = estimateOf(0, "chromatic").main.lengthMm;
    const split = estimateOf(0, "c-c-sharp").main.lengthMm;
    expect(split - chromatic).toBeCloseTo(2 * DEFAULT_RATES.chest.endBoardMm, -1);
  });

  it("grows the chest when a rank is added and reports the fit against the space", () => {
    const one = estimateScheme(scheme([manual("gt", [stop("p8", 8)], { space: { lengthMm: 4800, depthMm: 900 } })]), DEFAULT_RATES).divisions[0].chest;
    const two = estimateOf(0);
    expect(two.main.depthMm).toBeGreaterThan(one.main.depthMm);
    expect(one.fit!.depthMarginMm).toBeGreaterThan(two.fit!.depthMarginMm);
  });
});

describe("one chest rule for the figures and the drawing", () => {
  it("places a row's pipes from the end boards inward, the C side from the left and the C♯ side from the right", () => {
    const pipes = [0, 1, 2, 3].map((k) => ({ footprintMm: 100 - k * 10, diameterMm: 100 - k * 10, channel: 36 + k }));
    const row = rowOf(pipes, "c-c-sharp", N);
    const size = chestSize([row], "c-c-sharp", false, N);
    const xs = placeRow(pipes, size, N);
    // C (width 100 + 10 + 20 = 130) and D (80 + 10 + 16 = 106) on the left; C♯ (90 + 10 + 18 = 118) and D♯ (70 + 10 + 14 = 94) from the right end.
    expect(xs[0]).toBeCloseTo(50 + 65, 9);
    expect(xs[2]).toBeCloseTo(50 + 130 + 53, 9);
    expect(xs[1]).toBeCloseTo(size.lengthMm - 50 - 59, 9);
    expect(xs[3]).toBeCloseTo(size.lengthMm - 50 - 118 - 47, 9);
    expect(row.cSideMm).toBeCloseTo(236, 9);
    expect(row.cSharpSideMm).toBeCloseTo(212, 9);
    expect(chestSideOf(37, "chromatic")).toBe(0);
  });

  it("plants the basses in the centre when the firm does: each half from the middle outwards, the chest no longer", () => {
    const C = { ...N, bassesAt: "centre" as const };
    const pipes = [0, 1, 2, 3].map((k) => ({ footprintMm: 100 - k * 10, diameterMm: 100 - k * 10, channel: 36 + k }));
    const size = chestSize([rowOf(pipes, "c-c-sharp", C)], "c-c-sharp", false, C);
    // Halves 236 + 2·50 = 336 and 212 + 2·50 = 312 mm, the same as with basses at the ends.
    expect(size.halvesMm).toEqual([336, 312]);
    const xs = placeRow(pipes, size, C);
    expect(xs[0]).toBeCloseTo(336 - 50 - 65, 9);
    expect(xs[2]).toBeCloseTo(336 - 50 - 130 - 53, 9);
    expect(xs[1]).toBeCloseTo(336 + 50 + 59, 9);
    expect(xs[3]).toBeCloseTo(336 + 50 + 118 + 47, 9);
    // Chromatic: the lowest pipe in the middle of the row, the next to its right, the third to its left.
    const chrom = chestSize([rowOf(pipes, "chromatic", C)], "chromatic", false, C);
    const cx = placeRow(pipes, chrom, C);
    expect(cx[2]).toBeLessThan(cx[0]);
    expect(cx[0]).toBeLessThan(cx[1]);
    expect(cx[1]).toBeLessThan(cx[3]);
    expect(cx[2] - 53).toBeCloseTo(50, 9);
    expect(cx[3] + 47).toBeCloseTo(chrom.lengthMm - 50, 9);
  });
});
