// The firm's prices, rates and margins reach a browser only for roles that may see money: they
// are not in the public JavaScript, and the editor page hands other roles norms without prices.
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { smallDocument } from "../support/fixtures";
import { api, baseUrl, closeTestDb, makeUser, signIn } from "../support/server";

afterAll(closeTestDb);

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? filesUnder(path) : [path];
  });
}

describe("prices in the browser", () => {
  it("are not in any public script of the build", () => {
    const scripts = filesUnder(join(process.env.NEXT_DIST_DIR ?? ".next", "static")).filter((f) => f.endsWith(".js"));
    expect(scripts.length).toBeGreaterThan(10);
    const carrying = scripts.filter((f) => readFileSync(f, "utf8").includes(DEFAULT_RATES.provenance));
    expect(carrying).toEqual([]);
  });

  it("reach the editor page for an estimator but not for the workshop", async () => {
    const designer = await makeUser("designer");
    const cookie = await signIn(designer);
    const project = (await api("/api/projects", { method: "POST", cookie, body: { name: "Prices test", clientName: "Invented parish" } })).json.project;
    const scheme = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie, body: { name: "P", document: smallDocument("P") } })).json.scheme;
    const page = async (role: "estimator" | "workshop") =>
      (await fetch(`${baseUrl}/projects/${project.id}/schemes/${scheme.id}`, { headers: { cookie: await signIn(await makeUser(role)) } })).text();
    // The page carries its props serialised, so what the browser holds can be read off it.
    expect(await page("estimator")).toContain(DEFAULT_RATES.provenance);
    const workshop = await page("workshop");
    expect(workshop).toContain("Open Diapason");
    expect(workshop).not.toContain(DEFAULT_RATES.provenance);
    expect(workshop).not.toContain(`"marginPercent":"${DEFAULT_RATES.marginPercent}"`);
    expect(workshop).not.toContain(DEFAULT_RATES.hourlyRate.voicing);
  });
});
