import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { estimateScheme } from "./estimate";
import { jetSpeedMPerS, windFlowM3s, REFERENCE_MOUTH_MM } from "./geometry";
import { windNeed } from "./wind";
import { checkOrgan40, manual, pedal, scheme, stop } from "./test-support/schemes";

const W = DEFAULT_RATES.wind;

describe("wind of one pipe (a first model)", () => {
  it("takes the jet speed from Bernoulli: √(2p/ρ)", () => {
    // 80 mm water = 784.5 Pa (NIST SP 811); ρ = 1.2 kg/m³ → 36.2 m/s (derived).
    expect(jetSpeedMPerS(80, 1.2)).toBeCloseTo(Math.sqrt((2 * 80 * 9.80665) / 1.2), 9);
    expect(jetSpeedMPerS(80, 1.2)).toBeCloseTo(36.2, 1);
  });

  it("grows with the mouth faster than in proportion, and with the square root of the pressure", () => {
    const q = (mouth: number, p: number) => windFlowM3s(mouth, p, 1, W);
    expect(q(2 * REFERENCE_MOUTH_MM, 80) / q(REFERENCE_MOUTH_MM, 80)).toBeCloseTo(Math.pow(2, 1 + W.windwayExponent), 9);
    expect(q(REFERENCE_MOUTH_MM, 320) / q(REFERENCE_MOUTH_MM, 80)).toBeCloseTo(2, 9);
  });
});

describe("the organ's wind", () => {
  it("gives one reservoir per wind pressure, each sized by the wind it supplies", () => {
    const need = windNeed(
      [
        { pressureMm: 80, windPerKeyM3s: 0.01, pedal: false, hasChest: true },
        { pressureMm: 80, windPerKeyM3s: 0.02, pedal: false, hasChest: true },
        { pressureMm: 100, windPerKeyM3s: 0.05, pedal: true, hasChest: true },
      ],
      W,
    );
    expect(need.reservoirs.map((r) => r.pressureMm)).toEqual([80, 100]);
    expect(need.reservoirs[0].flowM3PerMin).toBeCloseTo(0.03 * W.chordKeys * 60, 2);
    expect(need.reservoirs[1].flowM3PerMin).toBeCloseTo(0.05 * W.chordKeysPedal * 60, 2);
    expect(need.blowerPressureMm).toBe(100 + W.pressureMarginMm);
    // Motor power Q · p / η (textbook fan power).
    expect(need.blowerKw).toBeCloseTo((need.blowerM3PerMin / 60) * need.blowerPressureMm * 9.80665 / W.blowerEfficiency / 1000, 2);
  });

  it("sizes a bigger blower for more stops and higher pressure", () => {
    const organ = (stops: number, mm: number) =>
      estimateScheme(scheme([manual("gt", Array.from({ length: stops }, (_, i) => stop(`s${i}`, i % 2 ? 4 : 8)), { windPressure: { value: mm, unit: "mm" } })]), DEFAULT_RATES).wind;
    expect(organ(8, 80).blowerM3PerMin).toBeGreaterThan(organ(4, 80).blowerM3PerMin);
    expect(organ(4, 120).blowerKw).toBeGreaterThan(organ(4, 80).blowerKw);
  });

  it("puts the 40-stop check organ's blower in the usual range for its size", () => {
    // From memory: organs of about 40 stops are blown by some 20–60 m³/min at 100–150 mm, a motor of roughly 0.5–3 kW.
    const w = estimateScheme(checkOrgan40(), DEFAULT_RATES).wind;
    expect(w.blowerM3PerMin).toBeGreaterThanOrEqual(20);
    expect(w.blowerM3PerMin).toBeLessThanOrEqual(60);
    expect(w.blowerKw).toBeGreaterThanOrEqual(0.5);
    expect(w.blowerKw).toBeLessThanOrEqual(3);
  });

  it("prices a new blower but keeps a retained one, and releathers restored reservoirs at their share", () => {
    const organ = (wind: { work?: "new" | "restored" | "retained"; blower?: "new" | "retained" }) =>
      estimateScheme(scheme([manual("gt", [stop("p", 8)]), pedal("pd", [stop("b", 16)])], { wind }), DEFAULT_RATES);
    const items = (e: ReturnType<typeof organ>) => e.money.items.map((i) => i.item);
    expect(items(organ({}))).toEqual(expect.arrayContaining(["blowerBase", "blowerPerKw", "reservoirMaterialsBase", "trunkingPerM"]));
    expect(items(organ({ blower: "retained" }))).not.toContain("blowerBase");
    const windHours = (e: ReturnType<typeof organ>) => e.packages.find((p) => p.package === "wind")!.hoursTotal;
    expect(windHours(organ({ work: "restored" }))).toBeLessThan(windHours(organ({})));
  });
});
