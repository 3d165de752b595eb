import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { midiToFreq } from "@tonaljs/midi";
import { MSG_NO_SUCH_STOP, pipesOfStop } from "./geometry";
import { estimateScheme } from "./estimate";
import { parseSchemeFile } from "./validate";
import { speedOfSoundMPerS } from "./acoustics";
import { manual, pedal, scheme, stop } from "./test-support/schemes";

const s = scheme([
  manual("gt", [
    stop("p8", 8),
    stop("mx", "2", { family: "mixture", ranks: 3, breaks: [{ from: "C", footages: ["2", "1 1/3", "1"] }, { from: "c", footages: ["2 2/3", "2", "1 1/3"] }] }),
    stop("tr", 8, { family: "reed", construction: "reed" }),
  ]),
  pedal("pd", [
    stop("b16", 16, { family: "flute", construction: "stopped", material: "pine" }),
    stop("b8", 8, { family: "flute", origin: "extension", source: "b16" }),
  ], { chest: "pitman", action: "electro-pneumatic" }),
]);
const c18 = speedOfSoundMPerS(18);
const first = (stopId: string, extra: Parameters<typeof stop>[2] = {}, footage: string | number = 8) =>
  pipesOfStop(scheme([manual("gt", [stop(stopId, footage, extra)])]), stopId, DEFAULT_RATES)[0];

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

describe("constructions", () => {
  it("speaks an open normal-scale 8′ C at 2.33–2.40 m, under the physical ceiling c/2f", () => {
    // From memory: 2.33–2.40 m at A = 440 Hz, 18 °C; c/2f = 2.615 m is no pipe's length but the ceiling (derived).
    const p = first("p");
    const ceiling = c18 / (2 * 65.406);
    expect(ceiling).toBeCloseTo(2.615, 3);
    expect(p.speakingLengthMm).toBeGreaterThanOrEqual(2330);
    expect(p.speakingLengthMm).toBeLessThanOrEqual(2400);
  });

  it("speaks a stopped wooden 8′ C at 1.10–1.17 m, its mouth as wide as the pipe inside", () => {
    // From memory (references.md): a stopped 8′ C wooden flute about 1.10–1.17 m.
    for (const deviationHt of [0, 2]) {
      const p = first("sd", { family: "flute", construction: "stopped", material: "oak", scale: { deviationHt } });
      expect(p.speakingLengthMm, `${deviationHt} ht`).toBeGreaterThanOrEqual(1100);
      expect(p.speakingLengthMm, `${deviationHt} ht`).toBeLessThanOrEqual(1170);
      expect(p.mouthWidthMm).toBe(p.sideMm);
    }
  });

  it("speaks a capped pipe as a stopped one: about half as long, nothing like an open pipe with a lid", () => {
    const capped = first("c", { family: "flute", construction: "capped" });
    const stopped = first("s", { family: "flute", construction: "stopped" });
    const open = first("o", { family: "flute" });
    expect(capped.speakingLengthMm).toBe(stopped.speakingLengthMm);
    expect(capped.speakingLengthMm).toBeLessThan(open.speakingLengthMm * 0.55);
    expect(capped.sizeClass).toBe("2to4"); // a 4 ft pipe sounding 8′ C
    // A movable cap with its skirt is more metal than a soldered lid.
    expect(capped.metalKg).toBeGreaterThan(stopped.metalKg);
  });

  it("takes a cut-up per stop: a higher mouth lengthens a stopped pipe less", () => {
    const low = first("a", { family: "flute", construction: "stopped", scale: { cutUp: 0.25 } });
    const high = first("b", { family: "flute", construction: "stopped", scale: { cutUp: 0.45 } });
    expect(high.speakingLengthMm).toBeGreaterThan(low.speakingLengthMm);
  });

  it("cuts short-length reed resonators to their fraction of full length", () => {
    // Common practice: regal and vox humana resonators are 1/4 to 1/16 of full length.
    const full = first("t", { family: "reed", construction: "reed" });
    expect(full.speakingLengthMm).toBeCloseTo((1000 * c18) / (2 * 65.406), 0);
    for (const [length, fraction] of [["half", 2], ["quarter", 4], ["eighth", 8], ["sixteenth", 16]] as const) {
      const p = first("r", { family: "reed", construction: "reed", resonator: { length, shape: "cylindrical" } });
      expect(p.speakingLengthMm, length).toBeCloseTo(full.speakingLengthMm / fraction, 0);
    }
    const voxHumana = first("v", { family: "reed", construction: "reed", resonator: { length: "eighth", shape: "cylindrical" } });
    expect(voxHumana.speakingLengthMm).toBeLessThan(400); // 1.31 m before: an eighth is about 0.33 m
    expect(voxHumana.sizeClass).toBe("under1"); // its resonator is a 1 ft pipe (a boundary belongs to the shorter class) …
    expect(voxHumana.pitchClass).toBe("4to8"); // … its block, shallot and tongue those of 8′ C
  });
});

describe("the estimator's loop agrees with the pipes computed one by one", () => {
  const file = parseSchemeFile(readFileSync(join(__dirname, "../../examples/large-five-manual.json"), "utf8"), DEFAULT_RATES);
  if (!file.ok) throw new Error(file.messages.join("\n"));
  const large = file.scheme;
  const e = estimateScheme(large, file.rates);
  const made = new Set(["new", "reused", "restored", "prepared"]);
  const inOrgan = new Set(["new", "reused", "restored"]);

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

  it("on the metal and timber of every stop — basses of other materials, flue trebles and short reeds included — within 0.5 %", () => {
    let checked = 0;
    for (const d of e.divisions)
      for (const st of d.stops) {
        const pipes = pipesOfStop(large, st.id, file.rates).filter((p) => inOrgan.has(p.state));
        const kg = pipes.reduce((sum, p) => sum + p.metalKg, 0);
        const m3 = pipes.reduce((sum, p) => sum + p.woodM3, 0);
        expect(Math.abs(st.metalKg - kg), st.name).toBeLessThanOrEqual(Math.max(0.1, kg * 0.005));
        expect(Math.abs(st.woodM3 - m3), st.name).toBeLessThanOrEqual(Math.max(0.001, m3 * 0.005));
        checked++;
      }
    expect(checked).toBeGreaterThan(140);
  });
});
