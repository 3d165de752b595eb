import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { estimateScheme } from "./estimate";
import { addConsoleHours, addDivisionHours, addPipeHours, addTransportHours, D, DEPARTMENT_COUNT, departments, nominalLengthMm, sizeClassIndex, sizeClassOf, sumHours, totalHours } from "./labour";
import { schemeSchema } from "./scheme";

const norms = DEFAULT_RATES.norms;
const hours = () => new Float64Array(DEPARTMENT_COUNT);

describe("size classes", () => {
  it("classes pipes by nominal length at 8, 4, 2 and 1 ft (1 ft = 304.8 mm, NIST SP 811)", () => {
    expect(sizeClassOf(2438.5)).toBe("over8");
    expect(sizeClassOf(2438.4)).toBe("4to8");
    expect(sizeClassOf(1219.3)).toBe("4to8");
    expect(sizeClassOf(1219.2)).toBe("2to4");
    expect(sizeClassOf(609.7)).toBe("2to4");
    expect(sizeClassOf(609.6)).toBe("1to2");
    expect(sizeClassOf(304.9)).toBe("1to2");
    expect(sizeClassOf(304.8)).toBe("under1");
    expect(sizeClassIndex(10)).toBe(4);
  });
});

describe("pipe work", () => {
  const counts = [1, 2, 3, 4, 5]; // pipes per class, over 8′ … under 1′

  it("charges a new metal flue pipe its shop norm by size and its voicing", () => {
    const h = hours();
    addPipeHours("new", false, false, counts, 0, norms, h);
    const n = norms.newMetalPipe;
    expect(h[D.metalPipes]).toBeCloseTo(n.over8 + 2 * n["4to8"] + 3 * n["2to4"] + 4 * n["1to2"] + 5 * n.under1, 9);
    expect(h[D.voicing]).toBeCloseTo(15 * norms.voiceNewFluePipe, 9);
    expect(h[D.woodPipes]).toBe(0);
  });

  it("splits a new reed into resonator making, block/shallot/tongue making and voicing", () => {
    const h = hours();
    addPipeHours("new", false, true, counts, 0, norms, h);
    expect(h[D.metalPipes]).toBeGreaterThan(0);
    expect(h[D.reeds]).toBeGreaterThan(0);
    expect(h[D.voicing]).toBeCloseTo(15 * norms.voiceNewReedPipe, 9);
  });

  it("sends wooden pipes to the wood shop", () => {
    const h = hours();
    addPipeHours("new", true, false, counts, 0, norms, h);
    expect(h[D.woodPipes]).toBeGreaterThan(0);
    expect(h[D.metalPipes]).toBe(0);
  });

  it("charges less to restore than to make new, and least to retain", () => {
    const total = (w: "new" | "restored" | "retained") => {
      const h = hours();
      addPipeHours(w, false, false, counts, 0, norms, h);
      return h.reduce((s, x) => s + x, 0);
    };
    expect(total("restored")).toBeLessThan(total("new"));
    expect(total("retained")).toBeLessThan(total("restored"));
  });

  it("reads the counts at the given offset", () => {
    const h = hours();
    addPipeHours("new", false, false, [9, 9, 9, 9, 9, 0, 0, 0, 0, 1], 5, norms, h);
    expect(h[D.metalPipes]).toBeCloseTo(norms.newMetalPipe.under1, 9);
  });
});

describe("division, console and transport work", () => {
  const work = {
    notes: 61, hasChest: true, chestWork: "new" as const, chestStops: 10, pipeMagnets: 0, offsetPipes: 0, enclosed: false,
    conductors: 0, electric: false, stopControls: 10, pipesInOrgan: 700, existingPipes: 0, existing: false, newStops: 10, existingStops: 0, derivedStops: 0,
  };

  it("costs a chest by note channels, stops, winding and a swell box when enclosed", () => {
    const open = hours();
    addDivisionHours(work, norms, open);
    expect(open[D.chestAction]).toBeCloseTo(61 * norms.chestPerNoteChannel + 10 * norms.chestPerStop + norms.windingPerDivision, 9);
    const boxed = hours();
    addDivisionHours({ ...work, enclosed: true }, norms, boxed);
    expect(boxed[D.chestAction] - open[D.chestAction]).toBeCloseTo(norms.swellBoxPerDivision, 9);
  });

  it("scales chest work down for restored and retained chests", () => {
    const [n, r, k] = (["new", "restored", "retained"] as const).map((chestWork) => {
      const h = hours();
      addDivisionHours({ ...work, chestWork }, norms, h);
      return h[D.chestAction];
    });
    expect(r).toBeCloseTo(n * norms.chestRestoredFactor, 9);
    expect(k).toBeCloseTo(n * norms.chestRetainedFactor, 9);
  });

  it("dismantles only existing divisions and wires only electric ones", () => {
    const h = hours();
    addDivisionHours(work, norms, h);
    expect(h[D.dismantling]).toBe(0);
    expect(h[D.electrics]).toBe(0);
    const e = hours();
    addDivisionHours({ ...work, existing: true, existingPipes: 100, electric: true, conductors: 200 }, norms, e);
    expect(e[D.dismantling]).toBeCloseTo(norms.dismantlePerDivision + 100 * norms.dismantlePerPipe, 9);
    expect(e[D.electrics]).toBeCloseTo(200 * norms.electricsPerConductor + 10 * norms.electricsPerStop + norms.electricsPerDivision, 9);
  });

  it("adds a combination system only when there are pistons or memory levels", () => {
    const c = { work: "new" as const, keyboards: 3, stopControls: 30, couplers: 5, tremulants: 1, pistons: 0, memoryLevels: 0, conductors: 0, electric: false };
    const a = hours();
    addConsoleHours(c, norms, a);
    const b = hours();
    addConsoleHours({ ...c, pistons: 10 }, norms, b);
    expect(b[D.console] - a[D.console]).toBeCloseTo(norms.combinationSystem + 10 * norms.consolePerPiston, 9);
  });

  it("makes a second transport trip when existing material goes to the workshop", () => {
    const a = hours();
    addTransportHours(1000, false, norms, a);
    const b = hours();
    addTransportHours(1000, true, norms, b);
    expect(b[D.transport] - a[D.transport]).toBeCloseTo(norms.transportPerTrip, 9);
  });

  it("sums shown hours exactly in tenths", () => {
    const r = Object.fromEntries(departments.map((d) => [d, 0.1])) as Record<(typeof departments)[number], number>;
    const s = sumHours([r, r, r]);
    expect(s.metalPipes).toBe(0.3);
    expect(totalHours(s)).toBe(3.3);
  });
});

describe("nominal length", () => {
  it("reckons an open 8′ C as 8 ft and a stopped one as 4 ft (common practice, no source)", () => {
    expect(nominalLengthMm(0, 2)).toBeCloseTo(2438.4, 9);
    expect(sizeClassOf(nominalLengthMm(0, 2))).toBe("4to8");
    expect(sizeClassOf(nominalLengthMm(-12, 2))).toBe("over8"); // 16′ C
    expect(sizeClassOf(nominalLengthMm(0, 4))).toBe("2to4"); // stopped 8′ C, a 4 ft pipe
    expect(sizeClassOf(nominalLengthMm(12, 2))).toBe("2to4"); // 4′ C
  });

  it("keeps every pipe in its class when only the pitch standard changes", () => {
    const great = (pitchHz: number) =>
      estimateScheme(
        schemeSchema.parse({
          name: "Pitch test (invented)",
          tuning: { pitchHz },
          divisions: [
            {
              id: "gt", name: "Great", keyboard: "manual", compass: { low: "C", high: "c''''" },
              stops: [
                { id: "a", name: "Open Diapason", footage: "8", family: "principal" },
                { id: "b", name: "Principal", footage: "4", family: "principal" },
                { id: "c", name: "Fifteenth", footage: "2", family: "principal" },
              ],
            },
          ],
        }),
        DEFAULT_RATES,
      ).divisions[0].hours.metalPipes;
    expect(great(415)).toBe(great(440));
    expect(great(466)).toBe(great(440));
  });
});
