// Scheme reads and estimates are kept per version in the server's memory; these tests prove a kept
// answer is never served once it is out of date: after a save, a change of the project's tuning,
// a revision restore, a new version of the rate set it is priced with, and for each role's view of money.
import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { smallDocument } from "../support/fixtures";
import { api, closeTestDb, makeUser, signIn } from "../support/server";

afterAll(closeTestDb);

describe("cached scheme reads and estimates", () => {
  it("follow every save, tuning change and restore", async () => {
    const designer = await signIn(await makeUser("designer"));
    const estimator = await signIn(await makeUser("estimator"));
    const project = (await api("/api/projects", { method: "POST", cookie: designer, body: { name: "Cache", clientName: "Invented guild" } })).json.project;
    const created = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie: designer, body: { name: "A", document: smallDocument() } })).json.scheme;
    const path = `/api/schemes/${created.id}`;

    // Read twice (the second from the cache): the same answer.
    const first = await api(path, { cookie: designer });
    const second = await api(path, { cookie: designer });
    expect(second.json).toEqual(first.json);
    const est1 = (await api(`${path}/estimate`, { cookie: estimator })).json;
    expect((await api(`${path}/estimate`, { cookie: estimator })).json).toEqual(est1);
    expect(est1.estimate.tuning.pitchHz).toBe(440);

    // A save: the read and the estimate show the new version at once.
    const doc = structuredClone(first.json.scheme.document);
    doc.divisions[0].stops.pop(); // the Fifteenth goes
    const saved = await api(path, { method: "PUT", cookie: designer, body: { version: 1, document: doc } });
    expect(saved.status).toBe(200);
    const afterSave = await api(path, { cookie: designer });
    expect(afterSave.json.scheme.version).toBe(2);
    expect(afterSave.json.scheme.document.divisions[0].stops.map((s: { name: string }) => s.name)).not.toContain("Fifteenth");
    expect(afterSave.json.scheme.updatedByName).toMatch(/^Test designer/);
    const est2 = (await api(`${path}/estimate`, { cookie: estimator })).json;
    expect(est2.version).toBe(2);
    expect(est2.estimate.totals.pipes.new).toBe(est1.estimate.totals.pipes.new - 61);

    // A change of the project's pitch: same scheme version, new estimate.
    expect((await api(`/api/projects/${project.id}`, { method: "PATCH", cookie: designer, body: { pitchHz: 415 } })).status).toBe(200);
    const est3 = (await api(`${path}/estimate`, { cookie: estimator })).json;
    expect(est3.version).toBe(2);
    expect(est3.estimate.tuning.pitchHz).toBe(415);
    expect((await api(path, { cookie: designer })).json.scheme.tuning.pitchHz).toBe(415);

    // A restore of version 1 is version 3, with the Fifteenth back.
    expect((await api(`${path}/revisions/1/restore`, { method: "POST", cookie: designer, body: { version: 2 } })).status).toBe(200);
    const est4 = (await api(`${path}/estimate`, { cookie: estimator })).json;
    expect(est4.version).toBe(3);
    expect(est4.estimate.totals.pipes.new).toBe(est1.estimate.totals.pipes.new);

    // Sharing changes the scheme row, not its version: the read shows it.
    expect((await api(path, { method: "PATCH", cookie: designer, body: { sharedWithClient: true, status: "proposed" } })).status).toBe(200);
    expect((await api(path, { cookie: designer })).json.scheme).toMatchObject({ version: 3, sharedWithClient: true, status: "proposed" });
  });

  it("follow a new version of the rate set they are priced with", async () => {
    const designer = await signIn(await makeUser("designer"));
    const estimator = await signIn(await makeUser("estimator"));
    const project = (await api("/api/projects", { method: "POST", cookie: designer, body: { name: "Cache rates", clientName: "Invented guild" } })).json.project;
    const scheme = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie: designer, body: { name: "A", document: smallDocument() } })).json.scheme;
    // A set of this test's own (copied from the current one), named with ?rateSet=, so no other test's figures move.
    const created = await api("/api/rate-sets", { method: "POST", cookie: estimator, body: { name: `Cache rates ${randomUUID().slice(0, 8)}` } });
    expect(created.status).toBe(201);
    const setId = created.json.rateSet.id;
    const path = `/api/schemes/${scheme.id}/estimate?rateSet=${setId}`;
    const before = (await api(path, { cookie: estimator })).json;
    expect((await api(path, { cookie: estimator })).json).toEqual(before);
    expect(before.estimate.money.totalAmount).toBe((await api(`/api/schemes/${scheme.id}/estimate`, { cookie: estimator })).json.estimate.money.totalAmount);

    // Voicing dearer by half: a new version of the set, and the next estimate is priced with it.
    const set = (await api(`/api/rate-sets/${setId}`, { cookie: estimator })).json;
    const form = JSON.parse(JSON.stringify(set.current.rates, (_k, v) => (typeof v === "number" ? String(v) : v)));
    form.hourlyRate.voicing = (Number(set.current.rates.hourlyRate.voicing) * 1.5).toFixed(2);
    expect((await api(`/api/rate-sets/${setId}`, { method: "PUT", cookie: estimator, body: { version: 1, effectiveDate: "2028-01-01", note: "voicing up", rates: form } })).status).toBe(200);
    const after = (await api(path, { cookie: estimator })).json;
    expect(after.version).toBe(before.version);
    expect(Number(after.estimate.money.totalAmount)).toBeGreaterThan(Number(before.estimate.money.totalAmount));
  });

  it("keep money out of the estimate for roles without it, whoever asked first", async () => {
    const designer = await signIn(await makeUser("designer"));
    const estimator = await signIn(await makeUser("estimator"));
    const workshop = await signIn(await makeUser("workshop"));
    const project = (await api("/api/projects", { method: "POST", cookie: designer, body: { name: "Cache money", clientName: "Invented guild" } })).json.project;
    const scheme = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie: designer, body: { name: "A", document: smallDocument() } })).json.scheme;
    const withMoney = await api(`/api/schemes/${scheme.id}/estimate`, { cookie: estimator });
    expect(withMoney.json.estimate.money).toBeDefined();
    const without = await api(`/api/schemes/${scheme.id}/estimate`, { cookie: workshop });
    expect(without.status).toBe(200);
    expect(without.json.estimate.money).toBeUndefined();
    expect(without.text).not.toMatch(/directCostAmount/);
  });
});
