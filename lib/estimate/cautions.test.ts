import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import { estimateScheme } from "./estimate";
import { manual, scheme, stop } from "./test-support/schemes";

const codes = (...args: Parameters<typeof scheme>) => estimateScheme(scheme(...args), DEFAULT_RATES).cautions.map((c) => c.code);

describe("cautions", () => {
  it("warns of lead for tin–lead pipe metal, and for any existing metal pipes whatever is recorded", () => {
    expect(codes([manual("gt", [stop("p", 8, { material: "spotted" })])])).toContain("lead");
    expect(codes([manual("gt", [stop("p", 8, { material: "zinc" }), stop("f", 4, { material: "oak" })])], { wind: { blower: "retained" } })).toEqual(["site"]);
    expect(codes([manual("gt", [stop("p", 8, { material: "zinc", origin: "existing", work: ["restored"] })])])).toContain("lead");
    expect(codes([manual("gt", [stop("p", 8, { material: "zinc" })])], { case: { work: "new", dummyPipes: 5, frontMetal: "high-tin" } })).toContain("lead");
  });

  it("warns of mains for electric action or a new blower", () => {
    expect(codes([manual("gt", [stop("p", 8, { material: "zinc" })], { action: "electric" })], { wind: { blower: "retained" } })).toContain("mains");
    expect(codes([manual("gt", [stop("p", 8, { material: "zinc" })])])).toContain("mains"); // a new blower
    expect(codes([manual("gt", [stop("p", 8, { material: "zinc" })])], { wind: { blower: "retained" } })).not.toContain("mains");
  });

  it("defers in every caution it carries to local rules and licensed or competent people", () => {
    const e = estimateScheme(scheme([manual("gt", [stop("p", 8)], { action: "electric" })]), DEFAULT_RATES);
    expect(e.cautions.map((c) => c.code)).toEqual(["lead", "mains", "site"]);
    for (const c of e.cautions) expect(c.text, c.code).toMatch(/regulations|licensed|local .*code/);
  });
});
