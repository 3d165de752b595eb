import { execFileSync } from "node:child_process";
import { join } from "node:path";
import { describe, expect, it } from "vitest";

const root = join(__dirname, "../..");
const cli = (...args: string[]) => execFileSync(join(root, "node_modules/.bin/tsx"), [join(root, "scripts/estimate.ts"), ...args], { cwd: root, encoding: "utf8" });

describe("the command line's JSON", () => {
  it("keeps the pipe total, the hours and the money total where scripts read them", () => {
    const e = JSON.parse(cli("examples/small-two-manual.json"));
    expect(Number.isInteger(e.totals.pipes.total) && e.totals.pipes.total).toBeGreaterThan(1000);
    expect(e.totals.hoursTotal).toBeGreaterThan(1000);
    expect(e.money.totalAmount).toMatch(/^\d+\.\d{2}$/);
    // The organ's own parts of the work are in it too (docs/estimating-method.md, "The stages").
    expect(e.packages.map((p: { package: string }) => p.package)).toEqual(expect.arrayContaining(["case", "wind", "console", "site", "design"]));
  }, 60_000);

  it("prints the summary with the parts of the work", () => {
    const text = cli("examples/small-two-manual.json", "--summary");
    for (const label of ["Wind system", "Case and front", "Console", "Site, transport and travel", "Design and management"]) expect(text).toContain(label);
  }, 60_000);
});
