import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { midiToFreq } from "@tonaljs/midi";
import { MSG_NO_SUCH_STOP, pipesOfStop } from "./geometry";
import { estimateScheme } from "./estimate";
import { parseSchemeFile } from "./validate";
import { alloyDensityGCm3, bodyAreaFactor, sheetAreaMm2 } from "./materials";
import { manual, pedal, scheme, stop } from "./test-support/schemes";

const s = scheme([
  manual("gt", [
    stop("p8", 8),
    stop("mx", "2", { family: "mixture", ranks: 3, breaks: [{ from: "C", footages: ["2", "1 1/3", "1"] }, { from: "c", footages: ["2 2/3", "2", "1 1/3"] }] }),
    stop("tr", 8, { family: "reed", construction: "reed-full" }),
  ]),
  pedal("pd", [
    stop("b16", 16, { family: "flute", construction: "stopped", material: "pine" }),
    stop("b8", 8, { family: "flute", treatment: "extension", source: "b16" }),
  ]),
]);

describe("pipes of a stop", () => {
  it("lists every pipe with its note and equal-tempered frequency", () => {
    const pipes = pipesOfStop(s, "p8", DEFAULT_RATES);
    expect(pipes.length).toBe(61);
    expect(pipes[0].key).toBe("C");
    expect(pipes[24].key).toBe("c'");
    expect(pipes[60].key).toBe("c''''");
    // ISO 16 pitch; checked note by note against @tonaljs/midi.
    pipes.forEach((p, i) => expect(p.frequencyHz).toBeCloseTo(midiToFreq(36 + i), 2));
  });

  it("shortens and narrows pipes up the compass, mouths a quarter of the circumference", () => {
    const pipes = pipesOfStop(s, "p8", DEFAULT_RATES);
    for (let i = 1; i < pipes.length; i++) {
      expect(pipes[i].speakingLengthMm).toBeLessThan(pipes[i - 1].speakingLengthMm);
      expect(pipes[i].diameterMm).toBeLessThan(pipes[i - 1].diameterMm);
    }
    expect(pipes[0].diameterMm).toBe(155.5);
    expect(pipes[0].mouthWidthMm).toBeCloseTo((Math.PI * 155.5) / 4, 1);
    expect(pipes[0].sizeClass).toBe("4to8");
  });

  it("gives each mixture rank its footage per break", () => {
    const pipes = pipesOfStop(s, "mx", DEFAULT_RATES);
    expect(pipes.length).toBe(3 * 61);
    const rank1 = pipes.filter((p) => p.rank === 1);
    expect(rank1[0].footage).toBe("2");
    expect(rank1[12].footage).toBe("2⅔");
    expect(rank1[0].sounds).toBe("c'");
    expect(rank1[12].sounds).toBe("g'");
  });

  it("shows an extension's shared and added pipes", () => {
    const pipes = pipesOfStop(s, "b8", DEFAULT_RATES);
    expect(pipes.length).toBe(32);
    expect(pipes.filter((p) => p.state === "shared").length).toBe(20);
    expect(pipes.slice(20).every((p) => p.state === "new")).toBe(true);
    expect(pipes[0].sideMm).not.toBeNull();
  });

  it("gives reeds no mouth", () => {
    expect(pipesOfStop(s, "tr", DEFAULT_RATES).every((p) => p.mouthWidthMm === null)).toBe(true);
  });

  it("refuses an unknown stop", () => {
    expect(() => pipesOfStop(s, "nope", DEFAULT_RATES)).toThrow(MSG_NO_SUCH_STOP);
  });
});

describe("the estimator's loop agrees with the pipes computed one by one", () => {
  const file = parseSchemeFile(readFileSync(join(__dirname, "../../examples/large-five-manual.json"), "utf8"), DEFAULT_RATES);
  if (!file.ok) throw new Error(file.messages.join("\n"));
  const large = file.scheme;
  const e = estimateScheme(large, file.rates);
  const made = new Set(["new", "reused", "restored", "prepared"]);

  it("on longest pipe, largest diameter and frequency range of every stop", () => {
    for (const d of e.divisions)
      for (const st of d.stops) {
        if (st.longestSpeakingLengthMm === null) continue;
        const pipes = pipesOfStop(large, st.id, file.rates).filter((p) => made.has(p.state));
        expect(Math.max(...pipes.map((p) => p.speakingLengthMm)), st.name).toBeCloseTo(st.longestSpeakingLengthMm, 0);
        expect(Math.max(...pipes.map((p) => p.diameterMm)), st.name).toBeCloseTo(st.largestDiameterMm!, 0);
        expect(Math.min(...pipes.map((p) => p.frequencyHz)), st.name).toBeCloseTo(st.lowestFrequencyHz!, 1);
        expect(Math.max(...pipes.map((p) => p.frequencyHz)) / st.highestFrequencyHz!, st.name).toBeCloseTo(1, 6);
      }
  });

  it("on the metal of every metal stop, within 0.5 %", () => {
    const r = file.rates;
    for (const div of large.divisions)
      for (const st of div.stops) {
        if (st.treatment !== "new" || ["pine", "oak", "mahogany"].includes(st.material)) continue;
        const kg = pipesOfStop(large, st.id, r).reduce((sum, p) => {
          const area = sheetAreaMm2(bodyAreaFactor(st.construction), st.construction === "stopped" || st.construction === "capped", p.diameterMm, p.speakingLengthMm, r.footLengthMm[p.sizeClass]);
          return sum + area * r.sheetThicknessMm[p.sizeClass] * alloyDensityGCm3(r.alloys[st.material as "spotted"]) * 1e-6;
        }, 0);
        const est = e.divisions.find((d) => d.id === div.id)!.stops.find((x) => x.id === st.id)!.metalKg;
        expect(Math.abs(est - kg), st.name).toBeLessThanOrEqual(Math.max(0.1, kg * 0.005));
      }
  });
});
