import { describe, expect, it } from "vitest";
import { ftToMm, mmWaterToPa, PA_PER_INCH_WATER, windPressureMm } from "./units";

describe("units", () => {
  it("converts inches and millimetres of water by NIST SP 811", () => {
    // NIST SP 811, Appendix B: 1 inch of water (conventional) = 249.0889 Pa; 1 mm of water (conventional) = 9.80665 Pa.
    expect(mmWaterToPa(windPressureMm({ value: 1, unit: "in" }))).toBeCloseTo(249.0889, 4);
    expect(mmWaterToPa(1)).toBeCloseTo(9.80665, 5);
    expect(windPressureMm({ value: 4, unit: "in" })).toBeCloseTo(101.6, 2);
    expect(windPressureMm({ value: 80, unit: "mm" })).toBe(80);
    expect(PA_PER_INCH_WATER / 9.80665).toBeCloseTo(25.4, 4);
  });

  it("puts typical church pressures of 4–5 in at about 100–125 mm", () => {
    // Cambridge & District Organists' Association: most church organs about 4–5 in (100–125 mm).
    expect(Math.round(windPressureMm({ value: 4, unit: "in" }))).toBe(102);
    expect(Math.round(windPressureMm({ value: 5, unit: "in" }))).toBe(127);
  });

  it("takes 1 ft as 304.8 mm (NIST SP 811)", () => {
    expect(ftToMm(8)).toBeCloseTo(2438.4, 9);
  });
});
