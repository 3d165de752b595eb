import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import Decimal from "decimal.js";
import { estimateScheme, type Estimate } from "./estimate";
import { swellBoxOf } from "./swell-box";
import { manual, pedal, scheme, stop } from "./test-support/schemes";
import type { SchemeInput } from "./scheme";

const organ = (extra: Partial<SchemeInput> = {}, swell: Parameters<typeof manual>[2] = {}) =>
  estimateScheme(
    scheme([manual("gt", [stop("p", 8), stop("o", 4)]), manual("sw", [stop("g", 8, { family: "flute", construction: "stopped", material: "pine" })], { enclosed: true, ...swell }), pedal("pd", [stop("b", 16, { family: "flute", construction: "stopped", material: "pine" })])], extra),
    DEFAULT_RATES,
  );
const item = (e: Estimate, key: string) => e.money.items.find((i) => i.item === key)?.quantity ?? 0;
const pkgHours = (e: Estimate, p: string) => e.packages.find((x) => x.package === p)?.hoursTotal ?? 0;

describe("the case and its front", () => {
  const box = { widthMm: 5000, depthMm: 2000, heightMm: 7000 };

  it("costs casework by the case's surface: front, sides and roof", () => {
    const e = organ({ case: { work: "new", ...box } });
    expect(e.case.surfaceM2).toBeCloseTo(5 * 7 + 2 * 2 * 7 + 5 * 2, 6);
    expect(e.packages.find((p) => p.package === "case")!.hours.casework).toBeCloseTo(e.case.surfaceM2 * DEFAULT_RATES.norms.caseNewPerM2, 0);
    expect(e.totals.woodBoughtM3.oak).toBeGreaterThan(0);
  });

  it("charges less to restore a case than to make one, and nothing when there is none", () => {
    const hours = (work: "new" | "restored" | "retained" | "none") => pkgHours(organ({ case: { work, ...box } }), "case");
    expect(hours("restored")).toBeLessThan(hours("new"));
    expect(hours("retained")).toBeLessThan(hours("restored"));
    expect(hours("none")).toBe(0);
  });

  it("takes decoration, gilding and dummy pipes as quantities", () => {
    const plain = organ({ case: { work: "restored", ...box } });
    const dressed = organ({ case: { work: "restored", ...box, decorationM2: 4, gildingM2: 2, dummyPipes: 10, dummyPipeLengthMm: 2000, frontMetal: "high-tin" } });
    expect(item(dressed, "gildingPerM2")).toBe(2);
    expect(dressed.case.dummyMetalKg).toBeGreaterThan(0);
    expect(dressed.totals.metalBoughtKg["high-tin"]).toBeGreaterThan(dressed.case.dummyMetalKg);
    expect(pkgHours(dressed, "case")).toBeGreaterThan(pkgHours(plain, "case") + 4 * DEFAULT_RATES.norms.decorationPerM2);
  });
});

describe("swell boxes", () => {
  it("sizes the box round the chest and its tallest pipe unless given, shutters filling the front", () => {
    const e = organ();
    const sw = e.divisions[1];
    expect(sw.swellBox!.sized).toBe("from chest");
    expect(sw.swellBox!.widthMm).toBeCloseTo(sw.chest.main.lengthMm + 2 * DEFAULT_RATES.swellBox.clearanceMm, 0);
    expect(sw.swellBox!.shutterM2).toBeCloseTo((sw.swellBox!.widthMm * sw.swellBox!.heightMm) / 1e6, 1);
    const given = swellBoxOf({ ...e.divisions[1], action: "mechanical", swellBox: { widthMm: 3000, depthMm: 2000, heightMm: 4000 } } as never, sw.chest.main, 2000, DEFAULT_RATES);
    expect([given.sized, given.wallM2, given.shutterM2]).toEqual(["given", 2 * 3 * 2 + 2 * 2 * 4 + 3 * 4, 12]);
  });

  it("gives a bigger box more hours, and an electric division a shutter motor", () => {
    const small = organ({}, { swellBox: { widthMm: 3000, depthMm: 1500, heightMm: 3000 } });
    const big = organ({}, { swellBox: { widthMm: 4000, depthMm: 2000, heightMm: 4000 } });
    expect(pkgHours(big, "swellBoxes")).toBeGreaterThan(pkgHours(small, "swellBoxes"));
    expect(item(organ({}, { action: "electric" }), "swellMotor")).toBe(1);
    expect(item(organ(), "swellMotor")).toBe(0);
    expect(item(organ(), "swellPedal")).toBe(1);
  });
});

describe("the console", () => {
  const withPistons = { accessories: { combination: { memoryLevels: 100, generalPistons: 8, divisionalPistons: 4 } } };

  it("buys keyboards, a pedalboard and a drawstop per control for a new console", () => {
    const e = organ();
    expect(item(e, "keyboard")).toBe(2);
    expect(item(e, "pedalboard")).toBe(1);
    expect(item(e, "drawstopMechanical")).toBe(e.totals.stops);
  });

  it("fits solenoid drawstops where a combination system drives the stops, and buys that system", () => {
    const e = organ(withPistons);
    expect(item(e, "drawstopElectric")).toBe(e.totals.stops);
    expect(item(e, "combinationBase")).toBe(1);
    expect(item(e, "combinationPerLevel")).toBe(100);
    expect(item(e, "piston")).toBe(8 + 4 * 3);
  });

  it("keeps a restored console's keyboards and buys only its combination system; a retained one buys nothing", () => {
    const restored = organ({ accessories: { ...withPistons.accessories, consoleWork: "restored" } });
    expect(item(restored, "keyboard")).toBe(0);
    expect(item(restored, "combinationBase")).toBe(1);
    const retained = organ({ accessories: { ...withPistons.accessories, consoleWork: "retained" } });
    expect(retained.money.byPackage.find((p) => p.package === "console")!.directCostAmount).not.toBe(organ(withPistons).money.byPackage.find((p) => p.package === "console")!.directCostAmount);
    expect(item(retained, "combinationBase")).toBe(0);
  });
});

describe("the site", () => {
  it("carries the organ's weight in loads, there and back over the road distance", () => {
    const e = organ({ site: { distanceKm: 200 } });
    const w = e.site.weights;
    expect(w.totalKg).toBeCloseTo(w.pipesKg + w.chestsKg + w.windKg + w.caseKg + w.consoleKg, 0);
    expect(e.site.transport.loadsOut).toBe(Math.ceil(w.totalKg / DEFAULT_RATES.site.loadCapacityKg));
    expect(e.site.transport.loadsIn).toBe(0); // nothing existing to fetch
    expect(item(e, "vehiclePerKm")).toBe(e.site.transport.loadsOut * 2 * 200);
  });

  it("fetches existing pipes to the workshop too", () => {
    const e = estimateScheme(scheme([manual("gt", [stop("p", 8, { origin: "existing", work: ["restored"] })])]), DEFAULT_RATES);
    expect(e.site.weights.existingToWorkshopKg).toBeGreaterThan(0);
    expect(e.site.transport.loadsIn).toBe(1);
  });

  it("hires scaffolding for the weeks on site and lodges the crew beyond a day's travel", () => {
    const near = organ({ site: { distanceKm: 30 } });
    const far = organ({ site: { distanceKm: 300 } });
    expect(near.site.time.lodging).toBe(false);
    expect(far.site.time.lodging).toBe(true);
    expect(item(far, "lodgingPerPersonWeek")).toBe(far.site.time.personWeeks);
    expect(item(near, "lodgingPerPersonWeek")).toBe(0);
    const onSite = ["dismantle", "erection", "finishing"].reduce((s, id) => s + far.programme.phases.find((p) => p.id === id)!.weeks, 0);
    expect(far.site.time.weeks).toBeCloseTo(onSite, 6);
    expect(item(far, "scaffoldPerWeek")).toBeCloseTo(onSite, 2);
    expect(item(organ({ site: { scaffold: false } }), "scaffoldPerWeek")).toBe(0);
    expect(new Decimal(far.money.totalAmount).greaterThan(near.money.totalAmount)).toBe(true);
  });
});

describe("design and management", () => {
  it("draws by stops and divisions and manages a share of every other hour", () => {
    const e = organ();
    const n = DEFAULT_RATES.norms;
    expect(e.totals.hours.design).toBeCloseTo(n.designBase + e.totals.stops * n.designPerStop + 3 * n.designPerDivision, 0);
    const others = e.totals.hoursTotal - e.totals.hours.management;
    expect(e.totals.hours.management).toBeCloseTo((others * n.managementPercent) / 100, 0);
  });
});
