import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { DEFAULT_RATES } from "./demo-rates";
import { aggregatePipes, BODY_STRIDE, PITCH_STRIDE } from "./pipe-aggregates";
import { pipesOfStop, type PipeState } from "./geometry";
import { planScheme } from "./pipes";
import { parseSchemeFile } from "./validate";
import { sizeClasses } from "./departments";
import type { Scheme } from "./scheme";

// The per-pipe stage finds size-class boundaries by logarithms and steps along a run in pieces of
// one class; pipesOfStop classes every pipe on its own from its nominal length. They must agree.
const standing = new Set<PipeState>(["new", "reused", "restored"]);

function load(file: string) {
  const r = parseSchemeFile(readFileSync(join(__dirname, "../../examples", file), "utf8"), DEFAULT_RATES);
  if (!r.ok) throw new Error(r.messages.join("\n"));
  return r;
}

function checkClasses(scheme: Scheme, rates: typeof DEFAULT_RATES): number {
  const plan = planScheme(scheme);
  const agg = aggregatePipes(scheme, plan, rates);
  let pipes = 0;
  plan.stops.forEach((sp, si) => {
    const body = new Array<number>(5).fill(0);
    const pitch = new Array<number>(5).fill(0);
    // [status][kind][class] and [status][flue|reed][class]: summed over all but the class.
    for (let j = 0; j < BODY_STRIDE; j++) body[j % 5] += agg.bodyCounts[si * BODY_STRIDE + j];
    for (let j = 0; j < PITCH_STRIDE; j++) pitch[j % 5] += agg.pitchCounts[si * PITCH_STRIDE + j];
    const oneByOne = pipesOfStop(scheme, sp.stop.id, rates, plan).filter((p) => standing.has(p.state));
    expect(body, `${sp.stop.name}: body classes`).toEqual(sizeClasses.map((c) => oneByOne.filter((p) => p.sizeClass === c).length));
    expect(pitch, `${sp.stop.name}: pitch classes`).toEqual(sizeClasses.map((c) => oneByOne.filter((p) => p.pitchClass === c).length));
    pipes += oneByOne.length;
  });
  return pipes;
}

describe("the per-pipe stage's size classes agree with the pipes classed one by one", () => {
  for (const file of ["small-two-manual.json", "large-five-manual.json"]) {
    it(`on every stop of ${file}, with tempered and with pure mutations`, () => {
      const { scheme, rates } = load(file);
      const pipes = checkClasses(scheme, rates);
      expect(pipes).toBeGreaterThan(1000);
      const pure = checkClasses({ ...scheme, tuning: { ...scheme.tuning, mutations: "pure", pitchHz: 415 } }, rates);
      expect(pure).toBe(pipes);
    });
  }
});
