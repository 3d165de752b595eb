// The comparison route: two to four schemes of one project, money and hours only for the roles that
// may see them, and the cost of each change for the firm alone.
import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { smallDocument } from "../support/fixtures";
import { api, closeTestDb, makeUser, signIn } from "../support/server";

afterAll(closeTestDb);

describe("GET /api/projects/:id/compare", () => {
  it("compares two to four schemes and shows each role what it may see", async () => {
    const designer = await makeUser("designer");
    const cookie = await signIn(designer);
    const project = (await api("/api/projects", { method: "POST", cookie, body: { name: `Compare ${randomUUID().slice(0, 6)}`, clientName: "Invented" } })).json.project;
    const ids: string[] = [];
    for (const name of ["One", "Two", "Three", "Four", "Five"]) {
      const document = smallDocument(name);
      if (name === "Two") document.divisions![0]!.stops![0]!.origin = "existing";
      const s = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie, body: { name, document } })).json.scheme;
      await api(`/api/schemes/${s.id}`, { method: "PATCH", cookie, body: { sharedWithClient: true } });
      ids.push(s.id);
    }
    const url = (n: number) => `/api/projects/${project.id}/compare?schemes=${ids.slice(0, n).join(",")}`;
    for (const n of [1, 5]) {
      const res = await api(url(n), { cookie });
      expect(res.status).toBe(422);
      expect(res.json.error.message).toBe("Choose between 2 and 4 different schemes to compare.");
    }
    expect((await api(`/api/projects/${project.id}/compare?schemes=${ids[0]},${ids[0]}`, { cookie })).status).toBe(422);

    const firm = (await api(url(4), { cookie })).json.comparison;
    expect(firm.schemes.map((s: { name: string }) => s.name)).toEqual(["One", "Two", "Three", "Four"]);
    expect(firm.divisions[0].rows[0].cells[1]).toMatchObject({ mark: "changed", changes: [{ field: "origin", from: "New", to: "Existing" }] });
    const newPipes = firm.totals.find((r: { key: string }) => r.key === "pipes-new");
    expect(newPipes.diffs[1]).toBe(-61);
    expect(firm.money.rows.find((r: { key: string }) => r.key === "total").diffs[1]).toMatch(/^-\d+\.\d\d$/);
    expect(firm.hours.rows.at(-1).key).toBe("total");

    const costs = (await api(`/api/projects/${project.id}/compare/costs?schemes=${ids[0]},${ids[1]}`, { cookie })).json.costs;
    expect(costs).toEqual([{ schemeId: ids[1], changes: [expect.objectContaining({ stopId: "gt-od", stop: "Open Diapason 8′ (Great)", kind: "changed" })] }]);
    expect(costs[0].changes[0].diffAmount).toBe(firm.money.rows.find((r: { key: string }) => r.key === "total").diffs[1]);

    const workshop = (await api(url(2), { cookie: await signIn(await makeUser("workshop")) })).json.comparison;
    expect(workshop.hours).toBeDefined();
    expect(workshop.money).toBeUndefined();
    const client = await makeUser("client");
    await api(`/api/projects/${project.id}/members`, { method: "POST", cookie, body: { email: client.email } });
    const clientCookie = await signIn(client);
    const seen = await api(url(2), { cookie: clientCookie });
    expect(seen.json.comparison.hours).toBeUndefined();
    expect(seen.json.comparison.money).toBeUndefined();
    expect((await api(`/api/projects/${project.id}/compare/costs?schemes=${ids[0]},${ids[1]}`, { cookie: clientCookie })).status).toBe(403);
  });
});
