import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { countPipes, planScheme, EXISTING, NEW } from "./pipes";
import { arbScheme, manual, pedal, scheme, stop } from "./test-support/schemes";

const mixture = (id: string, footages: string[]) =>
  stop(id, footages[0], {
    family: "mixture", ranks: footages.length,
    breaks: [{ from: "C", footages }, { from: "c'", footages: footages.map((f) => (f === "1/2" ? "2/3" : f)) }],
  });
const unit = { action: "electro-pneumatic", chest: "pitman" } as const;

describe("pipe counts", () => {
  it("counts 23 stops, 30 ranks and 1,569 pipes for a two-manual specimen organ", () => {
    // C. Hendrickson, "Pipe Organ Prices 2", The American Organist (2003): 23 stops, 30 ranks, 1,569 pipes
    // = 21 manual ranks × 61 + 9 pedal ranks × 32.
    const s = scheme([
      manual("gt", [
        stop("gt1", 8), stop("gt2", 8, { family: "flute", construction: "stopped" }), stop("gt3", 4), stop("gt4", 4, { family: "flute" }),
        stop("gt5", 2), mixture("gt6", ["1 1/3", "1", "2/3", "1/2"]), stop("gt7", 8, { family: "reed", construction: "reed" }),
      ]),
      manual("sw", [
        stop("sw1", 8, { family: "flute" }), stop("sw2", 8, { family: "string" }), stop("sw3", 8, { family: "string" }), stop("sw4", 4),
        stop("sw5", 4, { family: "flute" }), stop("sw6", "2 2/3", { family: "mutation" }), stop("sw7", 2), stop("sw8", "1 3/5", { family: "mutation" }),
        stop("sw9", 8, { family: "reed", construction: "reed", resonator: { length: "half", shape: "cylindrical" } }), mixture("sw10", ["1", "2/3"]),
      ]),
      pedal("pd", [
        stop("pd1", 16, { family: "flute", construction: "stopped", material: "pine" }), stop("pd2", 8), stop("pd3", 8, { family: "flute" }),
        stop("pd4", 4), mixture("pd5", ["2 2/3", "2", "1 1/3", "1"]), stop("pd6", 16, { family: "reed", construction: "reed" }),
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
        stop("bf8", 8, { family: "flute", origin: "extension", source: "bd16" }),
        stop("fl4", 4, { family: "flute", origin: "extension", source: "bf8" }),
      ], unit),
    ]);
    const { byStop, total } = countPipes(s);
    expect(byStop.get("bd16")!.new).toBe(32);
    expect(byStop.get("bf8")!.new).toBe(12);
    expect(byStop.get("fl4")!.new).toBe(12);
    expect(total.total).toBe(56);
  });

  it("counts an existing extension's added pipes as existing, restored with the work it is given", () => {
    const s = scheme([
      pedal("pd", [
        stop("bd16", 16, { family: "flute", construction: "stopped", origin: "existing", work: ["restored"] }),
        stop("bf8", 8, { family: "flute", origin: "extension", source: "bd16", addedPipes: "existing", work: ["restored"] }),
      ], unit),
    ]);
    const { byStop } = countPipes(s);
    expect(byStop.get("bf8")).toEqual({ new: 0, reused: 0, restored: 12, total: 12, prepared: 0, removed: 0 });
    expect(planScheme(s).segments.filter((g) => g.stop === 1).every((g) => g.status === EXISTING)).toBe(true);
  });

  it("adds pipes at the bottom for an extension downward", () => {
    const s = scheme([pedal("pd", [stop("p8", 8), stop("p16", 16, { origin: "extension", source: "p8" })], unit)]);
    const plan = planScheme(s);
    const seg = plan.segments.find((g) => g.stop === 1)!;
    expect(countPipes(s).byStop.get("p16")!.new).toBe(12);
    expect(seg.fromKey).toBe(36); // the 12 added pipes are the extension's lowest keys, C–B
    expect(seg.count).toBe(12);
  });

  it("counts a tempered mutation extension by the semitones it shares", () => {
    // A 10⅔′ quint from a 32-note 16′ rank sounds 7 semitones higher: it shares 25 notes and adds 7.
    const s = scheme([pedal("pd", [stop("b16", 16), stop("q", "10 2/3", { family: "mutation", origin: "extension", source: "b16" })], unit)]);
    expect(countPipes(s).byStop.get("q")!.new).toBe(7);
  });

  it("adds nothing for borrowed stops, keeps prepared and removed pipes out of the total", () => {
    const s = scheme([
      manual("gt", [
        stop("a", 8, { origin: "existing" }), stop("b", 4, { origin: "existing", work: ["restored"] }), stop("c", 2, { origin: "prepared" }), stop("d", 1, { origin: "removed" }),
      ], unit),
      pedal("pd", [stop("e", 8, { origin: "borrowed", source: "a" })]),
    ]);
    const { byStop, total } = countPipes(s);
    expect(byStop.get("e")!.total).toBe(0);
    expect(byStop.get("c")).toEqual({ new: 0, reused: 0, restored: 0, total: 0, prepared: 61, removed: 0 });
    expect(byStop.get("d")).toEqual({ new: 0, reused: 0, restored: 0, total: 0, prepared: 0, removed: 61 });
    expect(total).toEqual({ new: 0, reused: 61, restored: 61, total: 122, prepared: 61, removed: 61 });
  });

  it("keeps where the pipes come from apart from the work on them: a relocated stop can also be revoiced", () => {
    const s = scheme([
      manual("gt", [
        stop("s0", 8), stop("s1", 8, { origin: "existing" }), stop("s2", 8, { origin: "existing", work: ["restored"] }),
        stop("s3", 8, { origin: "existing", work: ["revoiced"] }), stop("s4", 8, { origin: "existing", work: ["relocated", "revoiced"] }),
      ]),
    ]);
    expect(countPipes(s).total).toEqual({ new: 61, reused: 183, restored: 61, total: 305, prepared: 0, removed: 0 });
    expect(planScheme(s).stops[4].work).toEqual(["relocated", "revoiced"]);
  });

  it("re-scales an existing rank: the pipes move up, new basses fill the keys they leave, the top pipes become spare", () => {
    const s = scheme([manual("gt", [stop("p", 8, { origin: "existing", work: ["restored", "rescaled"], rescaleHt: 2 })])]);
    expect(countPipes(s).byStop.get("p")).toEqual({ new: 2, reused: 0, restored: 59, total: 61, prepared: 0, removed: 2 });
    const segs = planScheme(s).segments;
    expect(segs.map((g) => [g.fromKey, g.count, g.status])).toEqual([[36, 2, NEW], [38, 59, EXISTING]]);
    const down = scheme([manual("gt", [stop("p", 8, { origin: "existing", work: ["rescaled"], rescaleHt: -3 })])]);
    expect(planScheme(down).segments.map((g) => [g.fromKey, g.count, g.status])).toEqual([[36, 58, EXISTING], [94, 3, NEW]]);
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

  it("counts a progressive mixture III–V only where its ranks sound", () => {
    const s = scheme([manual("gt", [stop("m", "2", {
      family: "mixture", ranks: 5,
      breaks: [
        { from: "C", footages: ["2", "1 1/3", "1", null, null] },
        { from: "c", footages: ["2 2/3", "2", "1 1/3", "1", null] },
        { from: "c'", footages: ["4", "2 2/3", "2", "1 1/3", "1"] },
      ],
    })])]);
    const plan = planScheme(s);
    // 3 ranks on C–B (12 keys), 4 on c–b (12), 5 on c′–c″″ (37): 36 + 48 + 185.
    expect(countPipes(s).total.total).toBe(3 * 12 + 4 * 12 + 5 * 37);
    expect(plan.rows.length).toBe(5);
    expect([plan.stops[0].ranksFrom, plan.stops[0].ranksTo]).toEqual([3, 5]);
  });

  it("splits a rank where its basses are another material and where a reed breaks to flue pipes", () => {
    const s = scheme([manual("gt", [
      stop("od", 8, { bass: { notes: 12, material: "zinc" } }),
      stop("tr", 8, { family: "reed", construction: "reed", fluesFrom: "c'''" }),
    ])]);
    const plan = planScheme(s);
    const formsOf = (stopIndex: number) => plan.segments.filter((g) => g.stop === stopIndex).map((g) => [g.count, plan.forms[g.form].material, plan.forms[g.form].construction]);
    expect(formsOf(0)).toEqual([[12, "zinc", "open"], [49, "spotted", "open"]]);
    expect(formsOf(1)).toEqual([[48, "spotted", "reed"], [13, "spotted", "open"]]);
  });
});

describe("borrowed stops and extensions must match their rank", () => {
  it("refuses a Pedal 16′ borrowed from a manual 8′ rank, naming both stops and the notes it lacks", () => {
    const s = scheme([
      manual("gt", [stop("od", 8, { name: "Open Diapason" })], unit),
      pedal("pd", [stop("b16", 16, { name: "Bourdon", origin: "borrowed", source: "od" })], { name: "Pedal" }),
    ]);
    const { messages } = planScheme(s);
    expect(messages).toHaveLength(1);
    expect(messages[0]).toMatch(/^Division "Pedal", stop "Bourdon": "Open Diapason" 8′ \(gt\) has no pipe for C–B at 16′; a borrowing must find a pipe for every note it plays/);
  });

  it("refuses a 4′ borrowed from a 4′ rank that starts at tenor c", () => {
    const s = scheme([
      manual("gt", [stop("fl", 4, { name: "Flute", compass: { low: "c", high: "c''''" } })], unit),
      manual("sw", [stop("x", 4, { name: "Flute (from Great)", origin: "borrowed", source: "fl" })], { name: "Swell" }),
    ]);
    expect(planScheme(s).messages).toEqual([
      `Division "Swell", stop "Flute (from Great)": "Flute" 4′ (gt) has no pipe for C–B at 4′; a borrowing must find a pipe for every note it plays — make it an extension, or give it a shorter compass`,
    ]);
  });

  it("accepts a borrowing its rank covers, and one its rank's extensions cover", () => {
    const covered = scheme([manual("gt", [stop("od", 8)], unit), pedal("pd", [stop("b8", 8, { origin: "borrowed", source: "od" })])]);
    expect(planScheme(covered).messages).toEqual([]);
    const viaExtension = scheme([
      pedal("pd", [stop("b8", 8), stop("b16", 16, { origin: "extension", source: "b8" })], unit),
      manual("ch", [stop("x", 16, { origin: "borrowed", source: "b16", compass: { low: "C", high: "g'" } })]),
    ]);
    expect(planScheme(viaExtension).messages).toEqual([]);
  });

  it("refuses a rank on a slider chest played from another keyboard, unless its stop is duplexed", () => {
    const s = (duplex: boolean) =>
      scheme([
        manual("sw", [stop("bd", 16, { name: "Lieblich Bourdon", duplex })], { name: "Swell" }),
        pedal("pd", [stop("x", 16, { name: "Lieblich Bourdon (from Swell)", origin: "borrowed", source: "bd" })], { name: "Pedal" }),
      ]);
    expect(planScheme(s(false)).messages).toEqual([
      `Division "Pedal", stop "Lieblich Bourdon (from Swell)": "Lieblich Bourdon" stands on the Swell's slider chest and plays only from its own keys; duplex "Lieblich Bourdon" or put its rank on a unit chest (pitman or direct-electric)`,
    ]);
    expect(planScheme(s(true)).messages).toEqual([]);
  });

  it("refuses an extension of a rank on a slider chest, and a borrowing at another pitch", () => {
    const ext = scheme([pedal("pd", [stop("b16", 16, { name: "Subbass" }), stop("b8", 8, { name: "Bass Flute", origin: "extension", source: "b16" })], { name: "Pedal" })]);
    expect(planScheme(ext).messages).toEqual([
      `Division "Pedal", stop "Bass Flute": an extension needs its rank on a unit chest (pitman or direct-electric), but "Subbass" stands on the Pedal's slider chest`,
    ]);
    const octave = scheme([
      manual("gt", [stop("bd", 16, { name: "Bourdon", duplex: true })], { name: "Great" }),
      pedal("pd", [stop("x", 8, { name: "Bass Flute", origin: "borrowed", source: "bd" })], { name: "Pedal" }),
    ]);
    expect(planScheme(octave).messages[0]).toMatch(/borrowing "Bourdon" at another pitch needs its rank on a unit chest/);
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
        return plan.stops.every((sp) => sp.kind !== "extension" || sp.pipes.total + sp.pipes.prepared <= sp.notes);
      }),
      { numRuns: 200 },
    );
  });

  it("keeps total = new + reused + restored, and the segments of every own stop equal to its pipes", () => {
    fc.assert(
      fc.property(arbScheme, (s) => {
        const plan = planScheme(s);
        const t = countPipes(s).total;
        const bySegments = new Map<number, number>();
        for (const g of plan.segments) bySegments.set(g.stop, (bySegments.get(g.stop) ?? 0) + g.count);
        return (
          t.total === t.new + t.reused + t.restored &&
          plan.stops.every((sp) => sp.kind === "removed" || sp.kind === "borrowed" || (bySegments.get(sp.index) ?? 0) === sp.pipes.total + sp.pipes.prepared)
        );
      }),
      { numRuns: 100 },
    );
  });
});
