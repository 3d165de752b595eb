import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { estimateScheme } from "./estimate";
import { manual, pedal, scheme, stop } from "./test-support/schemes";
import type { Rates } from "./rates";

type StopExtra = Parameters<typeof stop>[2];
const stopOf = (extra: StopExtra, rates: Rates = DEFAULT_RATES, footage: string | number = 8) =>
  estimateScheme(scheme([manual("gt", [stop("s", footage, extra)])]), rates).divisions[0].stops[0];
const hoursOf = (extra: StopExtra, rates: Rates = DEFAULT_RATES) =>
  estimateScheme(scheme([manual("gt", [stop("s", 8, extra)])]), rates).totals.hours;

describe("pipe work", () => {
  it("charges more to make new than to restore, and least to keep as they are", () => {
    const fresh = stopOf({}).pipeHours;
    const restored = stopOf({ origin: "existing", work: ["restored"] }).pipeHours;
    const kept = stopOf({ origin: "existing" }).pipeHours;
    expect(restored).toBeLessThan(fresh);
    expect(kept).toBeLessThan(restored);
    expect(kept).toBeGreaterThan(0);
  });

  it("lets the survey choose the restoration norm: each finding adds its own work", () => {
    const sound = stopOf({ origin: "existing", work: ["restored"] }).pipeHours;
    const feet = stopOf({ origin: "existing", work: ["restored"], condition: ["feet-collapsing"] }).pipeHours;
    const both = stopOf({ origin: "existing", work: ["restored"], condition: ["feet-collapsing", "split-seams"] }).pipeHours;
    expect(feet).toBeGreaterThan(sound);
    expect(both).toBeGreaterThan(feet);
    // A reed finding does not touch flue pipes, a wood finding not metal ones.
    expect(stopOf({ origin: "existing", work: ["restored"], condition: ["tongues-worn", "woodworm"] }).pipeHours).toBe(sound);
    // Findings choose a restoration norm: without restoring, they change nothing.
    expect(stopOf({ origin: "existing", condition: ["feet-collapsing"] }).pipeHours).toBe(stopOf({ origin: "existing" }).pipeHours);
  });

  it("revoices reeds by their own norm, not the flue norm", () => {
    const reed: StopExtra = { family: "reed", construction: "reed", origin: "existing", work: ["revoiced"] };
    const flue: StopExtra = { origin: "existing", work: ["revoiced"] };
    const voicing = (extra: StopExtra, rates?: Rates) => hoursOf(extra, rates).voicing;
    const dearerReeds: Rates = { ...DEFAULT_RATES, norms: { ...DEFAULT_RATES.norms, revoiceReedPipe: DEFAULT_RATES.norms.revoiceReedPipe * 2 } };
    expect(voicing(reed, dearerReeds)).toBeGreaterThan(voicing(reed));
    expect(voicing(flue, dearerReeds)).toBe(voicing(flue));
    expect(Math.abs(voicing(reed) - 61 * DEFAULT_RATES.norms.revoiceReedPipe)).toBeLessThanOrEqual(0.1);
  });

  it("does the work given on top of each other: a relocated stop can be revoiced too", () => {
    const relocated = hoursOf({ origin: "existing", work: ["relocated"] });
    const both = hoursOf({ origin: "existing", work: ["relocated", "revoiced"] });
    expect(both.erection).toBe(relocated.erection);
    expect(Math.abs(both.voicing - relocated.voicing - 61 * DEFAULT_RATES.norms.revoiceFluePipe)).toBeLessThanOrEqual(0.1); // hours shown to tenths
  });

  it("makes the new basses of a re-scaled rank new, and re-scales the rest", () => {
    const s = stopOf({ origin: "existing", work: ["rescaled"], rescaleHt: 3 });
    expect(s.pipes).toMatchObject({ new: 3, reused: 58, removed: 3 });
    expect(s.metalBoughtKg).toBeGreaterThan(0);
    expect(s.pipeHours).toBeGreaterThan(stopOf({ origin: "existing" }).pipeHours);
  });

  it("sizes a short-length reed's resonator work by the resonator, its reed parts by the pitch", () => {
    const full = hoursOf({ family: "reed", construction: "reed" });
    const regal = hoursOf({ family: "reed", construction: "reed", resonator: { length: "sixteenth", shape: "cylindrical" } });
    expect(regal.metalPipes).toBeLessThan(full.metalPipes / 2);
    expect(regal.reeds).toBe(full.reeds);
    expect(stopOf({ family: "reed", construction: "reed", resonator: { length: "eighth", shape: "cylindrical" } }).metalKg)
      .toBeLessThan(stopOf({ family: "reed", construction: "reed" }).metalKg / 2);
  });

  it("makes a reed's flue trebles as flue pipes and its wooden basses in the wood shop", () => {
    const reed = hoursOf({ family: "reed", construction: "reed" });
    const withFlues = hoursOf({ family: "reed", construction: "reed", fluesFrom: "c'''" });
    expect(withFlues.reeds).toBeLessThan(reed.reeds);
    const woodBasses = estimateScheme(scheme([pedal("pd", [stop("t", 16, { family: "reed", construction: "reed", material: "zinc", bass: { notes: 12, material: "pine" } })])]), DEFAULT_RATES);
    expect(woodBasses.totals.hours.woodPipes).toBeGreaterThan(0);
    expect(woodBasses.totals.woodM3.pine).toBeGreaterThan(0);
    expect(woodBasses.totals.metalKg.zinc).toBeGreaterThan(0);
  });
});

describe("metal and wood of a stop", () => {
  it("weighs a normal-scale spotted 8′ Principal of 61 pipes at 100–130 kg", () => {
    // From memory (Töpfer/Ellerhorst tradition): about 100–130 kg; it came to 166 kg with one thickness per size class.
    const p = stopOf({});
    expect(p.metalKg).toBeGreaterThanOrEqual(100);
    expect(p.metalKg).toBeLessThanOrEqual(130);
  });

  it("casts lead-rich metal thicker and zinc thinner", () => {
    expect(stopOf({ material: "common" }).metalKg).toBeGreaterThan(stopOf({ material: "spotted" }).metalKg);
    expect(stopOf({ material: "zinc" }).metalKg).toBeLessThan(stopOf({ material: "spotted" }).metalKg);
  });

  it("adds 30–60 % to a 16′ stopped wooden bass for its blocks, caps and stoppers", () => {
    // From memory: blocks, caps and stoppers add 30–60 % to a 16′ stopped bass.
    const withParts = stopOf({ family: "flute", construction: "stopped", material: "pine" }, DEFAULT_RATES, 16).woodM3;
    const none: Rates = { ...DEFAULT_RATES, woodPipes: { ...DEFAULT_RATES.woodPipes, blockLengthPerSide: 0, capHeightPerSide: 0, stopperLengthPerSide: 0 } };
    const walls = stopOf({ family: "flute", construction: "stopped", material: "pine" }, none, 16).woodM3;
    expect(withParts / walls - 1).toBeGreaterThanOrEqual(0.3);
    expect(withParts / walls - 1).toBeLessThanOrEqual(0.6);
  });

  it("weighs a stop's timber at its wood's density", () => {
    const e = estimateScheme(scheme([pedal("pd", [stop("o", 16, { family: "flute", material: "oak" }), stop("p", 8, { family: "flute", material: "pine" })])]), DEFAULT_RATES);
    const d = e.divisions[0];
    expect(d.woodKg.oak).toBeCloseTo(d.woodM3.oak * DEFAULT_RATES.woodDensityKgM3.oak, 0);
    expect(d.woodKg.pine).toBeCloseTo(d.woodM3.pine * DEFAULT_RATES.woodDensityKgM3.pine, 0);
  });
});
