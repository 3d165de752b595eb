import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { departmentWeeks, planProgramme } from "./programme";
import { departments, type Department } from "./departments";

// 40 paid hours a week at 80 % efficiency: 32 hours of work per person per week.
const P = {
  ...DEFAULT_RATES.programme, hoursPerWeek: 40, efficiency: 0.8,
  crew: { ...DEFAULT_RATES.programme.crew, design: 1, metalPipes: 2, voicing: 1, erection: 4, dismantling: 3, transport: 2, tonalFinishing: 2 },
};
const hours = (h: Partial<Record<Department, number>>) => ({ ...(Object.fromEntries(departments.map((d) => [d, 0])) as Record<Department, number>), ...h });

describe("programme", () => {
  it("turns hours into weeks: hours ÷ (crew × hours per week × efficiency), rounded up to tenths", () => {
    expect(departmentWeeks(640, 2, P)).toBe(10); // 640 / 64
    expect(departmentWeeks(641, 2, P)).toBe(10.1); // 10.016 → 10.1, never promising less than the hours need
    expect(departmentWeeks(0, 2, P)).toBe(0);
  });

  it("runs the workshop departments in parallel, the longest setting the phase", () => {
    const p = planProgramme(hours({ metalPipes: 640, voicing: 480 }), P);
    const workshop = p.phases.find((x) => x.id === "workshop")!;
    expect(workshop.weeks).toBe(15); // voicing 480 / 32 beats metal 640 / 64 = 10
    expect(workshop.setBy).toBe("voicing");
  });

  it("puts the phases in order and adds them up; management runs alongside and sets none", () => {
    const p = planProgramme(hours({ design: 96, dismantling: 96, metalPipes: 640, transport: 64, erection: 1280, tonalFinishing: 128, management: 5000 }), P);
    expect(p.phases.map((x) => x.id)).toEqual(["design", "dismantle", "workshop", "transport", "erection", "finishing"]);
    // 96/32 = 3; 96/96 = 1; 640/64 = 10; 64/64 = 1; 1280/128 = 10; 128/64 = 2.
    expect(p.phases.map((x) => x.weeks)).toEqual([3, 1, 10, 1, 10, 2]);
    expect(p.totalWeeks).toBe(27);
  });

  it("dates completion from the start and checks it against the target", () => {
    const h = hours({ metalPipes: 640 }); // 10 weeks
    const ok = planProgramme(h, P, { start: "2028-01-03", target: "2028-03-31" });
    expect(ok.completionDate).toBe("2028-03-13");
    expect(ok.meetsTarget).toBe(true);
    expect(ok.slackWeeks).toBe(2.6);
    const late = planProgramme(h, P, { start: "2028-01-03", target: "2028-02-28" });
    expect(late.meetsTarget).toBe(false);
    expect(late.slackWeeks).toBe(-2);
  });
});
