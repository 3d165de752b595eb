// Legal but unusual values the forms warn about (lib/spec/plausibility.ts), against the sources
// named there: NIST SP 811 for the inch of water, the RCO/AGO pedal compasses, equal temperament.
import { describe, expect, it } from "vitest";
import { frequencyHz } from "@/lib/estimate";
import { compassWarning, divisionWarnings, rankTopWarning, stopWarnings, TOP_SOUNDING_MIDI, windWarning } from "@/lib/spec/plausibility";

const manual = { low: "C", high: "c''''" };

describe("wind pressure", () => {
  it("passes the usual pressures (Hendrickson 1992: 3–4 in usual, 4–10 in in 1910–50)", () => {
    for (const w of [{ value: 80 }, { value: 100, unit: "mm" as const }, { value: 3, unit: "in" as const }, { value: 10, unit: "in" as const }]) expect(windWarning(w)).toBeNull();
  });
  it("warns about 5000 mm and says it in both units (1 in = 25.4 mm of water, NIST SP 811)", () => {
    expect(windWarning({ value: 5000, unit: "mm" })).toMatch(/^Wind of 5000 mm \(197 in\) is far above the usual/);
    expect(windWarning({ value: 40, unit: "in" })).toMatch(/^Wind of 40 in \(1016 mm\)/);
    expect(windWarning({ value: 10, unit: "mm" })).toMatch(/very low/);
  });
  it("says nothing of a value the schema refuses anyway", () => {
    expect(windWarning({ value: 0 })).toBeNull();
    expect(windWarning({ value: Number.NaN })).toBeNull();
  });
});

describe("compass", () => {
  it("warns about a 61-note pedal and passes 30 and 32 notes (RCO 1881, AGO 1933)", () => {
    expect(compassWarning("pedal", manual)).toMatch(/^61 notes is a manual's compass/);
    expect(compassWarning("pedal", { low: "C", high: "g'" })).toBeNull();
    expect(compassWarning("pedal", { low: "C", high: "f'" })).toBeNull();
  });
  it("passes manuals of 54 to 61 notes, warns beyond", () => {
    expect(compassWarning("manual", manual)).toBeNull();
    expect(compassWarning("manual", { low: "C", high: "f'''" })).toBeNull();
    expect(compassWarning("manual", { low: "C", high: "c'''''" })).toMatch(/^73 notes/);
    expect(compassWarning("manual", { low: "C", high: "g'" })).toMatch(/^32 notes is short for a manual/);
  });
  it("leaves a reversed or unreadable compass to the checks that refuse it", () => {
    expect(compassWarning("pedal", { low: "g'", high: "C" })).toBeNull();
    expect(compassWarning("pedal", { low: "C", high: "x" })).toBeNull();
  });
});

describe("the top of the pitch range", () => {
  it("is c'''' of a 1′ rank, about 16.7 kHz (equal temperament from A = 440 Hz, ISO 16)", () => {
    expect(frequencyHz(TOP_SOUNDING_MIDI)).toBeCloseTo(440 * 2 ** ((132 - 69) / 12), 6);
    expect(frequencyHz(TOP_SOUNDING_MIDI) / 1000).toBeCloseTo(16.74, 2);
  });
  it("passes 8′ to 1′ ranks on a 61-note manual and a 1′ on the pedals", () => {
    for (const footage of ["8", "4", "2 2/3", "2", "1 3/5", "1 1/3", "1"]) expect(rankTopWarning({ footage }, manual), footage).toBeNull();
    expect(rankTopWarning({ footage: "1" }, { low: "C", high: "g'" })).toBeNull();
  });
  it("warns about a ½′ rank running to c'''' (about 33 kHz), and not when its own compass stops lower", () => {
    expect(rankTopWarning({ footage: "1/2" }, manual)).toMatch(/^Its top pipe would sound about 33.5 kHz/);
    expect(rankTopWarning({ footage: "1/2", compass: { low: "C", high: "c'''" } }, manual)).toBeNull();
  });
  it("follows a mixture break by break: breaking back passes, running on warns with the rank", () => {
    const broken = { footage: "1", ranks: 2, breaks: [{ from: "C", footages: ["1", "2/3"] }, { from: "c'", footages: ["2", "1 1/3"] }, { from: "c''", footages: ["4", "2 2/3"] }] };
    expect(rankTopWarning(broken, manual)).toBeNull();
    const unbroken = { footage: "1", ranks: 2, breaks: [{ from: "C", footages: ["1", "2/3"] }] };
    expect(rankTopWarning(unbroken, manual)).toMatch(/^Rank 2 would sound about 25.1 kHz.*Add a break back/);
    expect(stopWarnings(unbroken, manual)).toEqual([{ field: "breaks", message: expect.stringMatching(/^Rank 2/) }]);
  });
});

describe("a division's warnings", () => {
  it("gathers the wind, the compass and the stops its compass would push past the top", () => {
    const w = divisionWarnings({ keyboard: "pedal", compass: { low: "C", high: "c''''" }, windPressure: { value: 5000, unit: "mm" }, stops: [{ name: "Sifflet", footage: "1/2" }, { name: "Bourdon", footage: "16" }] });
    expect(w.map((x) => x.field)).toEqual(["windPressure.value", "compass.high", "stops"]);
    expect(w[2]!.message).toMatch(/^Sifflet: Its top pipe/);
    expect(divisionWarnings({ keyboard: "manual", compass: manual, windPressure: { value: 80 }, stops: [{ name: "Principal", footage: "4" }] })).toEqual([]);
  });
});
