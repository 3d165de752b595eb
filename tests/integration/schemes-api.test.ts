import { afterAll, describe, expect, it } from "vitest";
import { smallDocument } from "../support/fixtures";
import { api, closeTestDb, makeUser, signIn, testDb } from "../support/server";

afterAll(closeTestDb);

async function setUp() {
  const designer = await makeUser("designer");
  const cookie = await signIn(designer);
  const project = (await api("/api/projects", { method: "POST", cookie, body: { name: "Scheme tests", clientName: "Invented parish" } })).json.project;
  const created = await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie, body: { name: "Scheme A", document: smallDocument() } });
  expect(created.status).toBe(201);
  return { designer, cookie, project, scheme: created.json.scheme };
}

async function revisionCount(schemeId: string) {
  const { rows } = await testDb().query("select count(*)::int as n from scheme_revisions where scheme_id = $1", [schemeId]);
  return rows[0].n as number;
}

describe("schemes API", () => {
  it("reads stops stored in the first format as the current one, pipes and sizes unchanged, and saves them in the current one", async () => {
    const { scheme, cookie } = await setUp();
    // Rewrite two stored stops as an earlier version of Stopwright saved them.
    await testDb().query(
      `update stops set treatment = 'restored', props = (props - 'origin' - 'work') || '{"treatment":"restored","construction":"reed-full","family":"reed","scale":{"offsetHt":-2,"halvingOn":19,"mouthWidth":0.25}}'::jsonb where scheme_id = $1 and id = 'gt-pr'`,
      [scheme.id],
    );
    await testDb().query(`update stops set treatment = 'extension', props = (props - 'origin') || '{"treatment":"extension"}'::jsonb where scheme_id = $1 and id = 'ped-bass'`, [scheme.id]);
    const read = await api(`/api/schemes/${scheme.id}`, { cookie });
    expect(read.status).toBe(200);
    const principal = read.json.scheme.document.divisions[0].stops[1];
    expect(principal).toMatchObject({ origin: "existing", work: ["restored"], construction: "reed", resonator: { length: "full", shape: "conical" } });
    expect(principal).not.toHaveProperty("treatment");
    // −2 ht from 8′ C on a 4′ rank halving on the 19th is −0.44 ht at its own 4′ C: 12 + 16 · (−2 − 12)/18.
    expect(principal.scale).toEqual({ deviationHt: -0.44, halvingOn: 19, mouthWidth: 0.25 });
    expect(read.json.scheme.document.divisions[1].stops[1]).toMatchObject({ origin: "extension", source: "ped-bd" });
    const estimate = await api(`/api/schemes/${scheme.id}/estimate`, { cookie });
    expect(estimate.status).toBe(200);
    // Saved again, the stops are stored in the current format, with their disposition in a word.
    const saved = await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie, body: { version: 1, document: read.json.scheme.document } });
    expect(saved.status).toBe(200);
    const { rows } = await testDb().query("select treatment, props from stops where scheme_id = $1 and id = 'gt-pr'", [scheme.id]);
    expect(rows[0].treatment).toBe("restored");
    expect(rows[0].props).toMatchObject({ origin: "existing", work: ["restored"] });
    expect(rows[0].props).not.toHaveProperty("treatment");
  });

  it("keeps the case, wind and site of a scheme", async () => {
    const { scheme, cookie } = await setUp();
    const doc = { ...scheme.document, case: { ...scheme.document.case, work: "restored", widthMm: 4000 }, site: { ...scheme.document.site, distanceKm: 210 } };
    const saved = await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie, body: { version: 1, document: doc } });
    expect(saved.status).toBe(200);
    const reread = await api(`/api/schemes/${scheme.id}`, { cookie });
    expect(reread.json.scheme.document.case).toMatchObject({ work: "restored", widthMm: 4000 });
    expect(reread.json.scheme.document.site.distanceKm).toBe(210);
    const { rows } = await testDb().query("select works from schemes where id = $1", [scheme.id]);
    expect(rows[0].works.case.work).toBe("restored");
  });

  it("creates a scheme with its divisions and stops in order, as version 1 with a revision", async () => {
    const { scheme, project } = await setUp();
    expect(scheme).toMatchObject({ projectId: project.id, name: "Scheme A", version: 1, status: "draft", sharedWithClient: false });
    expect(scheme.document.divisions.map((d: { name: string }) => d.name)).toEqual(["Great", "Pedal"]);
    expect(scheme.document.divisions[0].stops.map((s: { name: string }) => s.name)).toEqual(["Open Diapason", "Principal", "Twelfth", "Fifteenth"]);
    // Defaults of the scheme model are filled in and kept.
    expect(scheme.document.divisions[0].stops[2]).toMatchObject({ footage: "2 2/3", ranks: 1, origin: "new", work: [], construction: "open" });
    expect(scheme.document.case).toMatchObject({ work: "none" });
    expect(await revisionCount(scheme.id)).toBe(1);
  });

  it("saves a move with the version it was based on; only the moved stop's position changes", async () => {
    const { scheme, cookie } = await setUp();
    const before = await testDb().query("select id, division_id, position from stops where scheme_id = $1 order by id", [scheme.id]);
    const doc = structuredClone(scheme.document);
    const [twelfth] = doc.divisions[0].stops.splice(2, 1);
    doc.divisions[1].stops.unshift(twelfth); // to the Pedal, first
    const saved = await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie, body: { version: 1, document: doc, note: "moved the Twelfth" } });
    expect(saved.status).toBe(200);
    expect(saved.json.scheme.version).toBe(2);
    expect(saved.json.scheme.document.divisions[1].stops.map((s: { name: string }) => s.name)).toEqual(["Twelfth", "Bourdon", "Bass Flute"]);
    const after = await testDb().query("select id, division_id, position from stops where scheme_id = $1 order by id", [scheme.id]);
    const changed = after.rows.filter((r, i) => r.position !== before.rows[i].position || r.division_id !== before.rows[i].division_id);
    expect(changed.map((r) => r.id)).toEqual(["gt-12"]);
    const reread = await api(`/api/schemes/${scheme.id}`, { cookie });
    expect(reread.json.scheme.document).toEqual(saved.json.scheme.document);
  });

  it("answers 409 to a stale version with the current scheme, and overwrites nothing", async () => {
    const { scheme, cookie } = await setUp();
    const other = await signIn(await makeUser("designer"));
    const first = structuredClone(scheme.document);
    first.divisions[0].stops[0].name = "Large Open Diapason";
    expect((await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie: other, body: { version: 1, document: first } })).status).toBe(200);

    const second = structuredClone(scheme.document);
    second.divisions[0].stops[0].name = "Small Open Diapason";
    const res = await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie, body: { version: 1, document: second } });
    expect(res.status).toBe(409);
    expect(res.json.error.code).toBe("conflict");
    expect(res.json.error.message).toMatch(/saved version 2/);
    expect(res.json.error.details.current.version).toBe(2);
    expect(res.json.error.details.current.document.divisions[0].stops[0].name).toBe("Large Open Diapason");
    expect(await revisionCount(scheme.id)).toBe(2);
  });

  it("refuses a bad document with 422 messages naming division and stop, and saves nothing", async () => {
    const { scheme, cookie } = await setUp();
    const doc = structuredClone(scheme.document);
    doc.divisions[0].stops[1].ranks = 0;
    doc.divisions[1].stops[1].source = "no-such-stop";
    doc.divisions[1].compass.high = "z";
    const res = await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie, body: { version: 1, document: doc } });
    expect(res.status).toBe(422);
    const messages = Object.values(res.json.error.fields).flat() as string[];
    expect(Object.keys(res.json.error.fields)).toEqual(expect.arrayContaining(["document.divisions.0.stops.1.ranks", "document.divisions.1.compass.high"]));
    expect(messages.some((m) => m.startsWith('Division "Great", stop "Principal"'))).toBe(true);
    expect(messages.some((m) => m.startsWith('Division "Pedal"'))).toBe(true);
    // In the product's words, naming the field: never zod's own.
    expect(res.json.error.fields["document.divisions.0.stops.1.ranks"]).toEqual(['Division "Great", stop "Principal": Ranks: at least 1']);
    expect(messages.join(" ")).not.toMatch(/expected|received|Invalid input|Too small|Too big/);

    const refs = structuredClone(scheme.document);
    refs.divisions[1].stops[1].source = "no-such-stop";
    const res2 = await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie, body: { version: 1, document: refs } });
    expect(res2.status).toBe(422);
    expect(res2.json.error.fields["document.divisions.1.stops.1.source"][0]).toBe(`Division "Pedal", stop "Bass Flute": extension source "no-such-stop" does not exist`);

    const reread = await api(`/api/schemes/${scheme.id}`, { cookie });
    expect(reread.json.scheme.version).toBe(1);
    expect(reread.json.scheme.document).toEqual(scheme.document);
    expect(await revisionCount(scheme.id)).toBe(1);
  });

  it("lets estimators and workshop read but not save; clients see nothing until shared", async () => {
    const { scheme, cookie, project } = await setUp();
    for (const role of ["estimator", "workshop"] as const) {
      const c = await signIn(await makeUser(role));
      expect((await api(`/api/schemes/${scheme.id}`, { cookie: c })).status, role).toBe(200);
      expect((await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie: c, body: { version: 1, document: scheme.document } })).status, role).toBe(403);
    }
    const client = await makeUser("client");
    const clientCookie = await signIn(client);
    await api(`/api/projects/${project.id}/members`, { method: "POST", cookie, body: { email: client.email } });
    expect((await api(`/api/schemes/${scheme.id}`, { cookie: clientCookie })).status).toBe(404);
    expect((await api(`/api/projects/${project.id}`, { cookie: clientCookie })).json.schemes).toEqual([]);
    const shared = await api(`/api/schemes/${scheme.id}`, { method: "PATCH", cookie, body: { sharedWithClient: true } });
    expect(shared.json.scheme.sharedWithClient).toBe(true);
    expect((await api(`/api/schemes/${scheme.id}`, { cookie: clientCookie })).status).toBe(200);
    expect((await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie: clientCookie, body: { version: 1, document: scheme.document } })).status).toBe(403);
    // The firm's working history stays with the firm.
    expect((await api(`/api/schemes/${scheme.id}/revisions`, { cookie: clientCookie })).status).toBe(403);
    expect((await api(`/api/schemes/${scheme.id}/revisions/1`, { cookie: clientCookie })).status).toBe(403);
  });

  it("tells a client neither which scheme a shared one was copied from nor other members' e-mails", async () => {
    const { scheme, cookie, project, designer } = await setUp();
    const copy = (await api(`/api/schemes/${scheme.id}/duplicate`, { method: "POST", cookie, body: { name: "Shared copy" } })).json.scheme;
    await api(`/api/schemes/${copy.id}`, { method: "PATCH", cookie, body: { sharedWithClient: true } });
    const client = await makeUser("client");
    await api(`/api/projects/${project.id}/members`, { method: "POST", cookie, body: { email: client.email } });
    const clientCookie = await signIn(client);
    expect((await api(`/api/schemes/${copy.id}`, { cookie })).json.scheme.copiedFromId).toBe(scheme.id);
    expect((await api(`/api/schemes/${copy.id}`, { cookie: clientCookie })).json.scheme.copiedFromId).toBeNull();
    const seen = (await api(`/api/projects/${project.id}`, { cookie: clientCookie })).json;
    expect(seen.schemes.map((s: { copiedFromId: string | null }) => s.copiedFromId)).toEqual([null]);
    const emails = Object.fromEntries(seen.project.members.map((m: { id: string; email: string }) => [m.id, m.email]));
    expect(emails).toEqual({ [designer.id]: "", [client.id]: client.email });
  });

  it("refuses changes to the schemes of an archived project with 409, and saves nothing", async () => {
    const { scheme, cookie, project } = await setUp();
    await api(`/api/projects/${project.id}/archive`, { method: "POST", cookie, body: { archived: true } });
    const save = await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie, body: { version: 1, document: { ...scheme.document, name: "Changed" } } });
    expect(save.status).toBe(409);
    expect(save.json.error.message).toMatch(/archived/);
    expect((await api(`/api/schemes/${scheme.id}/duplicate`, { method: "POST", cookie, body: { name: "Copy" } })).status).toBe(409);
    expect((await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie, body: { name: "New" } })).status).toBe(409);
    expect(await revisionCount(scheme.id)).toBe(1);
    expect((await api(`/api/projects/${project.id}`, { cookie })).json.schemes).toHaveLength(1);
    // Brought back, it can be changed again.
    await api(`/api/projects/${project.id}/archive`, { method: "POST", cookie, body: { archived: false } });
    expect((await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie, body: { version: 1, document: scheme.document } })).status).toBe(200);
  });

  it("keeps every revision and restores an earlier one as a new version", async () => {
    const { scheme, cookie } = await setUp();
    const doc = structuredClone(scheme.document);
    doc.divisions[0].stops.pop();
    const v2 = (await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie, body: { version: 1, document: doc, note: "no Fifteenth" } })).json.scheme;
    expect(v2.document.divisions[0].stops).toHaveLength(3);

    const list = await api(`/api/schemes/${scheme.id}/revisions`, { cookie });
    expect(list.json.revisions.map((r: { version: number; note: string }) => [r.version, r.note])).toEqual([[2, "no Fifteenth"], [1, "created"]]);
    expect(list.json.revisions[0].authorName).toBe("Test designer");
    const one = await api(`/api/schemes/${scheme.id}/revisions/1`, { cookie });
    expect(one.json.revision.document.divisions[0].stops).toHaveLength(4);
    expect((await api(`/api/schemes/${scheme.id}/revisions/9`, { cookie })).status).toBe(404);

    expect((await api(`/api/schemes/${scheme.id}/revisions/1/restore`, { method: "POST", cookie, body: { version: 1 } })).status).toBe(409);
    const restored = await api(`/api/schemes/${scheme.id}/revisions/1/restore`, { method: "POST", cookie, body: { version: 2 } });
    expect(restored.status).toBe(200);
    expect(restored.json.scheme.version).toBe(3);
    expect(restored.json.scheme.document).toEqual(scheme.document);
    expect(await revisionCount(scheme.id)).toBe(3);
  });

  it("duplicates a scheme into an independent copy that remembers its source", async () => {
    const { scheme, cookie, project } = await setUp();
    const copy = await api(`/api/schemes/${scheme.id}/duplicate`, { method: "POST", cookie, body: { name: "Scheme B" } });
    expect(copy.status).toBe(201);
    expect(copy.json.scheme).toMatchObject({ name: "Scheme B", version: 1, copiedFromId: scheme.id });
    expect(copy.json.scheme.document.divisions).toEqual(scheme.document.divisions);
    const doc = structuredClone(copy.json.scheme.document);
    doc.divisions[0].stops = [];
    await api(`/api/schemes/${copy.json.scheme.id}`, { method: "PUT", cookie, body: { version: 1, document: doc } });
    const original = await api(`/api/schemes/${scheme.id}`, { cookie });
    expect(original.json.scheme.document.divisions[0].stops).toHaveLength(4);
    const listed = await api(`/api/projects/${project.id}`, { cookie });
    expect(listed.json.schemes.map((s: { name: string; stopCount: number }) => [s.name, s.stopCount])).toEqual([["Scheme A", 6], ["Scheme B", 2]]);
    const all = await api("/api/projects", { cookie });
    expect(all.json.projects.find((p: { id: string }) => p.id === project.id).schemeCount).toBe(2);
  });

  it("answers 404 for a scheme that does not exist and 400 for a body that is not JSON", async () => {
    const { scheme, cookie } = await setUp();
    expect((await api("/api/schemes/00000000-0000-4000-8000-000000000000", { cookie })).status).toBe(404);
    const bad = await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie, body: "{not json" });
    expect(bad.status).toBe(400);
  });
});

describe("GET /api/schemes/:id/estimate", () => {
  it("estimates the saved scheme; money only for roles that may see it", async () => {
    const { scheme } = await setUp();
    const estimator = await signIn(await makeUser("estimator"));
    const res = await api(`/api/schemes/${scheme.id}/estimate`, { cookie: estimator });
    expect(res.status).toBe(200);
    expect(res.json.version).toBe(1);
    // Great: 4 ranks × 61 notes; Pedal C–g′: Bourdon 32 + the 8′ extension adds the 12 notes above it (common practice).
    const [great, pedal] = res.json.estimate.divisions;
    expect(great.pipes.total).toBe(4 * 61);
    expect(pedal.pipes.total).toBe(32 + 12);
    expect(typeof res.json.estimate.money.totalAmount).toBe("string");

    const workshop = await signIn(await makeUser("workshop"));
    const w = await api(`/api/schemes/${scheme.id}/estimate`, { cookie: workshop });
    expect(w.status).toBe(200);
    expect(w.json.estimate.money).toBeUndefined();
    expect(w.text).not.toMatch(/Amount"/);
    expect(w.json.estimate.divisions[0].hoursTotal).toBe(great.hoursTotal);

    const client = await signIn(await makeUser("client"));
    expect((await api(`/api/schemes/${scheme.id}/estimate`, { cookie: client })).status).toBe(403);
  });
});
