import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { consoleWiring, divisionWiring, isElectricAction } from "./wiring";
import { estimateScheme } from "./estimate";
import { manual, pedal, scheme, stop } from "./test-support/schemes";
import type { Scheme } from "./scheme";

const N = DEFAULT_RATES.wiring;
const base = { electric: true, directElectric: false, consoleDistanceM: 20, keyFeeds: [{ keys: 61, runM: 20 }], stopControls: 10, pipeMagnets: 0, offsetPipes: 0 };

describe("wiring of one division", () => {
  it("needs nothing for mechanical or pneumatic action", () => {
    expect(divisionWiring({ ...base, electric: false }, N)).toEqual({ conductors: 0, conductorLengthM: 0 });
    expect(isElectricAction("mechanical")).toBe(false);
    expect(isElectricAction("pneumatic")).toBe(false);
    expect(isElectricAction("electro-pneumatic")).toBe(true);
  });

  it("runs a conductor per key per chest fed and a set per stop control", () => {
    const w = divisionWiring(base, N);
    expect(w.conductors).toBe(61 + 10 * N.conductorsPerStopControl);
    expect(w.conductorLengthM).toBe(61 * 20 + 10 * N.conductorsPerStopControl * 20);
    const twoChests = divisionWiring({ ...base, keyFeeds: [...base.keyFeeds, { keys: 61, runM: 30 }] }, N);
    expect(twoChests.conductorLengthM - w.conductorLengthM).toBe(61 * 30);
  });

  it("adds a conductor per pipe magnet on a direct-electric chest", () => {
    const w = divisionWiring({ ...base, directElectric: true, pipeMagnets: 500 }, N);
    expect(w.conductors - divisionWiring(base, N).conductors).toBe(500);
    expect(w.conductorLengthM - divisionWiring(base, N).conductorLengthM).toBe(500 * N.relayToChestM);
  });

  it("wires the console's couplers and combination system inside it", () => {
    expect(consoleWiring({ electric: true, couplerKeys: 3 * 61, stopControls: 40, pistons: 20 }, N).conductors).toBe(183 + 40 + 20);
    expect(consoleWiring({ electric: false, couplerKeys: 183, stopControls: 40, pistons: 20 }, N).conductors).toBe(0);
  });
});

describe("a large four-manual electric-action organ", () => {
  // Common practice, no source: such an instrument is wired with about ten miles (some 16 km) of cable.
  // Test the order of magnitude, 8–30 km, for a generated four-manual electric organ of about 77 stops and 5,000 pipes.
  function fourManual(): Scheme {
    const flue = ["16", "8", "8", "8", "8", "4", "4", "2 2/3", "2", "1 3/5", "1 1/3", "1", "8", "4"];
    const mix = (id: string) => stop(id, "2", { family: "mixture", ranks: 4, breaks: [{ from: "C", footages: ["2", "1 1/3", "1", "2/3"] }, { from: "c'", footages: ["4", "2 2/3", "2", "1 1/3"] }] });
    const reeds = (p: string) => ["16", "8"].map((f, i) => stop(`${p}r${i}`, f, { family: "reed", construction: "reed" }));
    const division = (id: string, distance: number) =>
      manual(id, [...flue.map((f, i) => stop(`${id}${i}`, f)), mix(`${id}mx`), ...reeds(id)], { action: "electric", chest: "direct-electric", consoleDistanceM: distance });
    const ped = pedal("pd", [
      stop("pd32", 32, { family: "flute", material: "pine" }), stop("pd16", 16), stop("pd16b", 16, { family: "flute", construction: "stopped" }),
      stop("pd8", 8, { origin: "extension", source: "pd16" }), stop("pd4", 4, { origin: "extension", source: "pd8" }),
      stop("pd16r", 16, { family: "reed", construction: "reed" }), stop("pd8r", 8, { origin: "extension", source: "pd16r" }),
      stop("pdb", 16, { origin: "borrowed", source: "swr0" }), mix("pdmx"),
    ], { action: "electric", chest: "direct-electric", consoleDistanceM: 20 });
    return scheme([division("ch", 15), division("gt", 18), division("sw", 20), division("so", 25), ped], {
      accessories: {
        couplers: ["ch", "sw", "so"].map((f) => ({ id: `${f}-gt`, from: f, to: "gt" })).concat(["ch", "gt", "sw", "so"].map((f) => ({ id: `${f}-pd`, from: f, to: "pd" }))),
        combination: { memoryLevels: 100, generalPistons: 12, divisionalPistons: 6 },
      },
    });
  }

  it("is wired with between 8 and 30 km of conductor", () => {
    const s = fourManual();
    const e = estimateScheme(s, DEFAULT_RATES);
    expect(s.divisions.filter((d) => d.keyboard === "manual").length).toBe(4);
    expect(e.totals.stops).toBe(77);
    expect(e.totals.pipes.total).toBeGreaterThan(4500);
    expect(e.totals.wiring.conductorLengthKm).toBeGreaterThanOrEqual(8);
    expect(e.totals.wiring.conductorLengthKm).toBeLessThanOrEqual(30);
  });

  it("needs far less with mechanical action", () => {
    const s = fourManual();
    // On slider chests the Swell reed the Pedal borrows must be duplexed.
    const mech = {
      ...s,
      divisions: s.divisions.map((d) =>
        d.keyboard === "manual" ? { ...d, action: "mechanical" as const, chest: "slider" as const, stops: d.stops.map((st) => (st.id === "swr0" ? { ...st, duplex: true } : st)) } : d,
      ),
    };
    expect(estimateScheme(mech, DEFAULT_RATES).totals.wiring.conductorLengthKm).toBeLessThan(estimateScheme(s, DEFAULT_RATES).totals.wiring.conductorLengthKm / 3);
  });
});
