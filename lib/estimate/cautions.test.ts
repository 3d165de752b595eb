import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { CAUTION_TEXT, cautionsFor } from "./cautions";
import { estimateScheme } from "./estimate";
import { manual, scheme, stop } from "./test-support/schemes";

describe("cautions", () => {
  it("defers to local regulations and licensed practice in every text", () => {
    expect(CAUTION_TEXT.lead).toMatch(/regulations/);
    expect(CAUTION_TEXT.mains).toMatch(/licensed electrician/);
    expect(CAUTION_TEXT.site).toMatch(/regulations/);
  });

  it("carries each caution only where it applies", () => {
    expect(cautionsFor({ leadBearing: false, electric: false, siteWork: true }).map((c) => c.code)).toEqual(["site"]);
    expect(cautionsFor({ leadBearing: true, electric: true, siteWork: true }).map((c) => c.code)).toEqual(["lead", "mains", "site"]);
  });

  it("warns of lead for tin–lead pipe metal and of mains for electric action", () => {
    const leaded = estimateScheme(scheme([manual("gt", [stop("p", 8, { material: "spotted" })], { action: "electric" })]), DEFAULT_RATES);
    expect(leaded.cautions.map((c) => c.code)).toEqual(["lead", "mains", "site"]);
    const unleaded = estimateScheme(scheme([manual("gt", [stop("p", 8, { material: "zinc" }), stop("f", 4, { material: "oak" })])]), DEFAULT_RATES);
    expect(unleaded.cautions.map((c) => c.code)).toEqual(["site"]);
    const oldPipes = estimateScheme(scheme([manual("gt", [stop("p", 8, { material: "zinc", treatment: "restored" })])]), DEFAULT_RATES);
    expect(oldPipes.cautions.map((c) => c.code)).toContain("lead"); // existing pipe metal may hold lead whatever is recorded
  });
});
