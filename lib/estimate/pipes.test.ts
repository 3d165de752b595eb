import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { countPipes, planScheme } from "./pipes";
import { arbScheme, manual, pedal, scheme, stop } from "./test-support/schemes";

const mixture = (id: string, footages: string[]) =>
  stop(id, footages[0], {
    family: "mixture", ranks: footages.length,
    breaks: [{ from: "C", footages }, { from: "c'", footages: footages.map((f) => (f === "1/2" ? "2/3" : f)) }],
  });

describe("pipe counts", () => {
  it("counts 23 stops, 30 ranks and 1,569 pipes for a two-manual specimen organ", () => {
    // C. Hendrickson, "Pipe Organ Prices 2", The American Organist (2003): 23 stops, 30 ranks, 1,569 pipes
    // = 21 manual ranks × 61 + 9 pedal ranks × 32.
    const s = scheme([
      manual("gt", [
        stop("gt1", 8), stop("gt2", 8, { family: "flute", construction: "stopped" }), stop("gt3", 4), stop("gt4", 4, { family: "flute" }),
        stop("gt5", 2), mixture("gt6", ["1 1/3", "1", "2/3", "1/2"]), stop("gt7", 8, { family: "reed", construction: "reed-full" }),
      ]),
      manual("sw", [
        stop("sw1", 8, { family: "flute" }), stop("sw2", 8, { family: "string" }), stop("sw3", 8, { family: "string" }), stop("sw4", 4),
        stop("sw5", 4, { family: "flute" }), stop("sw6", "2 2/3", { family: "mutation" }), stop("sw7", 2), stop("sw8", "1 3/5", { family: "mutation" }),
        stop("sw9", 8, { family: "reed", construction: "reed-half" }), mixture("sw10", ["1", "2/3"]),
      ]),
      pedal("pd", [
        stop("pd1", 16, { family: "flute", construction: "stopped", material: "pine" }), stop("pd2", 8), stop("pd3", 8, { family: "flute" }),
        stop("pd4", 4), mixture("pd5", ["2 2/3", "2", "1 1/3", "1"]), stop("pd6", 16, { family: "reed", construction: "reed-full" }),
      ]),
    ]);
    const { total, messages } = countPipes(s);
    expect(messages).toEqual([]);
    const plan = planScheme(s);
    expect(plan.stops.length).toBe(23);
    expect(plan.rows.length).toBe(30);
    expect(total.total).toBe(1569);
    expect(total.new).toBe(21 * 61 + 9 * 32);
  });

  it("adds 12 pipes for a 32-note pedal 16′ rank extended to 8′, and 12 more for 4′ (common practice)", () => {
    const s = scheme([
      pedal("pd", [
        stop("bd16", 16, { family: "flute", construction: "stopped" }),
        stop("bf8", 8, { family: "flute", treatment: "extension", source: "bd16" }),
        stop("fl4", 4, { family: "flute", treatment: "extension", source: "bf8" }),
      ]),
    ]);
    const { byStop, total } = countPipes(s);
    expect(byStop.get("bd16")!.new).toBe(32);
    expect(byStop.get("bf8")!.new).toBe(12);
    expect(byStop.get("fl4")!.new).toBe(12);
    expect(total.total).toBe(56);
  });

  it("adds pipes at the bottom for an extension downward", () => {
    const s = scheme([pedal("pd", [stop("p8", 8), stop("p16", 16, { treatment: "extension", source: "p8" })])]);
    const plan = planScheme(s);
    const seg = plan.segments.find((g) => g.stop === 1)!;
    expect(countPipes(s).byStop.get("p16")!.new).toBe(12);
    expect(seg.fromKey).toBe(36); // the 12 added pipes are the extension's lowest keys, C–B
    expect(seg.count).toBe(12);
  });

  it("counts a tempered mutation extension by the semitones it shares", () => {
    // A 10⅔′ quint from a 32-note 16′ rank sounds 7 semitones higher: it shares 25 notes and adds 7.
    const s = scheme([pedal("pd", [stop("b16", 16), stop("q", "10 2/3", { family: "mutation", treatment: "extension", source: "b16" })])]);
    expect(countPipes(s).byStop.get("q")!.new).toBe(7);
  });

  it("adds nothing for borrowed stops, keeps prepared and removed pipes out of the total", () => {
    const s = scheme([
      manual("gt", [stop("a", 8, { treatment: "retained" }), stop("b", 4, { treatment: "restored" }), stop("c", 2, { treatment: "prepared" }), stop("d", 1, { treatment: "removed" })]),
      pedal("pd", [stop("e", 8, { treatment: "borrowed", source: "a" })]),
    ]);
    const { byStop, total } = countPipes(s);
    expect(byStop.get("e")!.total).toBe(0);
    expect(byStop.get("c")).toEqual({ new: 0, reused: 0, restored: 0, total: 0, prepared: 61, removed: 0 });
    expect(byStop.get("d")).toEqual({ new: 0, reused: 0, restored: 0, total: 0, prepared: 0, removed: 61 });
    expect(total).toEqual({ new: 0, reused: 61, restored: 61, total: 122, prepared: 61, removed: 61 });
  });

  it("keeps new, reused and restored apart by treatment", () => {
    const s = scheme([manual("gt", ["new", "retained", "restored", "revoiced", "relocated"].map((t, i) => stop(`s${i}`, 8, { treatment: t as never })))]);
    expect(countPipes(s).total).toEqual({ new: 61, reused: 183, restored: 61, total: 305, prepared: 0, removed: 0 });
  });

  it("uses the stop's own short compass: a celeste from tenor c has 49 pipes", () => {
    const s = scheme([manual("sw", [stop("vc", 8, { family: "string", compass: { low: "c", high: "c''''" } })])]);
    expect(countPipes(s).total.total).toBe(49);
  });

  it("counts mixture ranks one by one; breaks change pitches, not numbers", () => {
    const withBreaks = scheme([manual("gt", [mixture("m", ["2", "1 1/3", "1", "2/3"])])]);
    const plan = planScheme(withBreaks);
    expect(countPipes(withBreaks).total.total).toBe(4 * 61);
    expect(plan.rows.length).toBe(4);
    // Two break ranges per rank: C–b′ and c′–c″″.
    expect(plan.segments.map((g) => g.count)).toEqual([24, 37, 24, 37, 24, 37, 24, 37]);
  });
});

describe("properties", () => {
  it("never counts a negative number of pipes", () => {
    fc.assert(
      fc.property(arbScheme, (s) => {
        for (const c of countPipes(s).byStop.values()) if (Object.values(c).some((n) => n < 0 || !Number.isInteger(n))) return false;
        return true;
      }),
      { numRuns: 200 },
    );
  });

  it("never lets an extension add more pipes than its own compass", () => {
    fc.assert(
      fc.property(arbScheme, (s) => {
        const plan = planScheme(s);
        return plan.stops.every((sp) => sp.kind !== "extension" || sp.pipes.new + sp.pipes.prepared <= sp.notes);
      }),
      { numRuns: 200 },
    );
  });

  it("keeps total = new + reused + restored", () => {
    fc.assert(
      fc.property(arbScheme, (s) => {
        const t = countPipes(s).total;
        return t.total === t.new + t.reused + t.restored;
      }),
      { numRuns: 100 },
    );
  });
});
