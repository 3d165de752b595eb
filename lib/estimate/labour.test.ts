import { describe, expect, it } from "vitest";
import { departments, type Department } from "./departments";
import { departmentRecord, dotBySize, hoursRecord, sumBySize, sumHours, totalHours } from "./labour";

describe("hours as shown", () => {
  it("rounds each department to tenths and sums shown hours exactly", () => {
    const r = Object.fromEntries(departments.map((d) => [d, 0.1])) as Record<Department, number>;
    const s = sumHours([r, r, r]);
    expect(s.metalPipes).toBe(0.3); // a float sum would give 0.30000000000000004
    expect(totalHours(s)).toBe(0.3 * departments.length);
    expect(hoursRecord(new Float64Array(departments.length).fill(1.26)).voicing).toBe(1.3);
  });

  it("writes a record with every department, in departments.ts order, each at its own position", () => {
    const r = departmentRecord(departments.map((_, i) => i));
    expect(Object.keys(r)).toEqual([...departments]);
    departments.forEach((d, i) => expect(r[d]).toBe(i));
  });

  it("weights counts by a norm per size class", () => {
    const norm = { over8: 10, "4to8": 5, "2to4": 2, "1to2": 1, under1: 0.5 };
    expect(dotBySize([9, 9, 1, 2, 3, 4, 5], 2, norm)).toBe(1 * 10 + 2 * 5 + 3 * 2 + 4 * 1 + 5 * 0.5);
    expect(sumBySize([9, 9, 1, 2, 3, 4, 5], 2)).toBe(15);
  });
});
