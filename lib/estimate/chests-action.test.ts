import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { estimateScheme } from "./estimate";
import { bookChestsAndAction, type ChestWork } from "./chests-action";
import { costCentre, centreHours, ITEM } from "./cost-centres";
import { manual, pedal, scheme, stop } from "./test-support/schemes";
import type { Division } from "./scheme";

/** A ten-stop Great of the usual kind, its 16′ bass octave standing off the chest (invented). */
function tenStopGreat(extra: Partial<Division> = {}) {
  return scheme([manual("gt", [
    stop("b16", 16, { family: "flute", construction: "stopped", offsetBassPipes: 12 }),
    stop("p8", 8, { scale: { deviationHt: 1 } }), stop("r8", 8, { family: "flute", construction: "half-stopped" }),
    stop("g8", 8, { family: "string", scale: { deviationHt: -5, mouthWidth: 0.2 } }), stop("o4", 4), stop("s4", 4, { family: "flute", construction: "conical" }),
    stop("q", "2 2/3", { family: "mutation", scale: { deviationHt: -1 } }), stop("o2", 2),
    stop("mx", "1 1/3", { family: "mixture", ranks: 4, scale: { deviationHt: -2 }, breaks: [
      { from: "C", footages: ["1 1/3", "1", "2/3", "1/2"] }, { from: "c", footages: ["2", "1 1/3", "1", "2/3"] },
      { from: "c'", footages: ["2 2/3", "2", "1 1/3", "1"] }, { from: "c''", footages: ["4", "2 2/3", "2", "1 1/3"] },
    ] }),
    stop("tr", 8, { family: "reed", construction: "reed" }),
  ], extra)]);
}

const chestsOf = (s: ReturnType<typeof tenStopGreat>) => {
  const e = estimateScheme(s, DEFAULT_RATES);
  return { hours: e.packages.find((p) => p.package === "chests")!.hoursTotal, e };
};

describe("chest space of a ten-stop Great", () => {
  it("needs two half-chests of 1.8–2.6 m, 1.2–1.6 m deep plus the passage board", () => {
    // From memory: a ten-stop Great on a C/C♯ slider chest, about two halves of 1.8–2.6 m, about 1.2–1.6 m deep plus the passage board.
    const chest = estimateScheme(tenStopGreat(), DEFAULT_RATES).divisions[0].chest;
    for (const half of chest.main.halvesMm!) {
      expect(half).toBeGreaterThanOrEqual(1800);
      expect(half).toBeLessThanOrEqual(2600);
    }
    const rows = chest.main.depthMm - DEFAULT_RATES.chest.passageBoardMm;
    expect(rows).toBeGreaterThanOrEqual(1200);
    expect(rows).toBeLessThanOrEqual(1600);
    expect(chest.offset!.rows).toBe(1);
  });
});

describe("chests and action by type", () => {
  it("costs a mechanical slider chest and an electric one differently: trackers against magnets and a relay", () => {
    const mech = chestsOf(tenStopGreat({ action: "mechanical" }));
    const elec = chestsOf(tenStopGreat({ action: "electric" }));
    expect(mech.hours).not.toBe(elec.hours);
    expect(mech.hours).toBeGreaterThan(elec.hours);
    const items = (e: typeof mech.e) => e.money.items.map((i) => i.item);
    expect(items(elec.e)).toEqual(expect.arrayContaining(["palletMagnet", "sliderSolenoid", "relayBase"]));
    expect(items(mech.e)).not.toContain("palletMagnet");
    expect(elec.e.totals.hours.electrics).toBeGreaterThan(0);
    expect(mech.e.totals.hours.electrics).toBe(0);
  });

  it("gives unit chests a valve per pipe and no sliders", () => {
    const work: ChestWork = { chest: "direct-electric", action: "electric", chestWork: "new", notes: 61, chestStops: 10, positions: 700, offsetPipes: 0, duplexStops: 0, electricStopAction: true };
    const c = costCentre("x", "chests");
    bookChestsAndAction(work, DEFAULT_RATES, c);
    expect(c.items[ITEM.pipeMagnet]).toBe(700);
    expect(c.items[ITEM.sliderSolenoid]).toBe(0);
    expect(c.items[ITEM.chestMaterialsPerChannel]).toBe(0);
  });

  it("charges a duplexed rank its second channels and slider", () => {
    const plain = chestsOf(scheme([manual("gt", [stop("bd", 16)], { name: "Great" })]));
    const duplexed = chestsOf(scheme([manual("gt", [stop("bd", 16, { duplex: true })], { name: "Great" })]));
    const n = DEFAULT_RATES.norms;
    expect(duplexed.hours - plain.hours).toBeCloseTo(61 * n.duplexPerNote + n.duplexPerStop + n.stopActionMechanicalPerStop, 0);
  });

  it("scales restored and retained chests to their share of new", () => {
    const hours = (chestWork: Division["chestWork"]) => {
      const c = costCentre("x", "chests");
      bookChestsAndAction({ chest: "slider", action: "mechanical", chestWork, notes: 61, chestStops: 8, positions: 600, offsetPipes: 0, duplexStops: 0, electricStopAction: false }, DEFAULT_RATES, c);
      return centreHours(c);
    };
    expect(hours("restored")).toBeCloseTo(hours("new") * DEFAULT_RATES.norms.chestRestoredFactor, 6);
    expect(hours("retained")).toBeCloseTo(hours("new") * DEFAULT_RATES.norms.chestRetainedFactor, 6);
  });

  it("books the mechanical coupler machine with the action, electric couplers in the relay", () => {
    const coupled = (action: "mechanical" | "electric") =>
      estimateScheme(
        scheme([manual("gt", [stop("p", 8)], { action }), manual("sw", [stop("q", 8)], { action }), pedal("pd", [stop("b", 16)], { action })], {
          accessories: { couplers: [{ id: "a", from: "sw", to: "gt" }, { id: "b", from: "gt", to: "pd" }] },
        }),
        DEFAULT_RATES,
      );
    const mech = coupled("mechanical");
    const elec = coupled("electric");
    expect(mech.schemeWide.hours.chestAction - elec.schemeWide.hours.chestAction).toBeCloseTo((61 + 61) * DEFAULT_RATES.norms.couplerMechanicalPerNote, 0);
    expect(elec.schemeWide.wiring.conductors).toBeGreaterThanOrEqual(61 + 61);
  });
});
