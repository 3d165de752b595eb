import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { ceilWeeks, departmentWeeks, planProgramme } from "./programme";
import { departments, type Department } from "./labour";

const P = { ...DEFAULT_RATES.programme, hoursPerWeek: 40, efficiency: 0.8, crew: { ...DEFAULT_RATES.programme.crew, metalPipes: 2, voicing: 1, erection: 4 } };
const hours = (h: Partial<Record<Department, number>>) => ({ ...(Object.fromEntries(departments.map((d) => [d, 0])) as Record<Department, number>), ...h });

describe("programme", () => {
  it("turns hours into weeks: hours ÷ (crew × hours per week × efficiency)", () => {
    expect(departmentWeeks(640, 2, P)).toBe(10);
    expect(departmentWeeks(641, 2, P)).toBe(10.1); // rounded up to tenths
    expect(ceilWeeks(3)).toBe(3);
  });

  it("runs the workshop departments in parallel, the longest setting the phase", () => {
    const p = planProgramme(hours({ metalPipes: 640, voicing: 480 }), P);
    const workshop = p.phases.find((x) => x.id === "workshop")!;
    expect(workshop.weeks).toBe(15);
    expect(workshop.setBy).toBe("voicing");
  });

  it("puts the phases in order and adds them up", () => {
    const p = planProgramme(hours({ dismantling: 96, metalPipes: 640, transport: 64, erection: 1280, tonalFinishing: 128 }), P);
    expect(p.phases.map((x) => x.id)).toEqual(["dismantle", "workshop", "transport", "erection", "finishing"]);
    const crew = P.crew;
    expect(p.phases.map((x) => x.weeks)).toEqual([
      ceilWeeks(96 / (crew.dismantling * 32)), 10, ceilWeeks(64 / (crew.transport * 32)), 10, ceilWeeks(128 / (crew.tonalFinishing * 32)),
    ]);
    expect(p.totalWeeks).toBeCloseTo(p.phases.reduce((s, x) => s + x.weeks, 0), 9);
  });

  it("dates completion from the start and checks it against the target", () => {
    const h = hours({ metalPipes: 640 }); // 10 weeks
    const ok = planProgramme(h, P, { start: "2028-01-03", target: "2028-03-31" });
    expect(ok.completionDate).toBe("2028-03-13");
    expect(ok.meetsTarget).toBe(true);
    expect(ok.slackWeeks).toBe(2.6);
    const late = planProgramme(h, P, { start: "2028-01-03", target: "2028-02-28" });
    expect(late.meetsTarget).toBe(false);
    expect(late.slackWeeks).toBeLessThan(0);
  });
});
