// Stop lists out and in through the API: export then import gives the same scheme and the same
// estimate; a bad file is refused with its rows named and saves nothing.
import { afterAll, describe, expect, it } from "vitest";
import { smallDocument } from "../support/fixtures";
import { api, baseUrl, closeTestDb, makeUser, signIn, testDb } from "../support/server";

afterAll(closeTestDb);

async function setUp() {
  const designer = await makeUser("designer");
  const cookie = await signIn(designer);
  const project = (await api("/api/projects", { method: "POST", cookie, body: { name: "Import tests", clientName: "Invented parish" } })).json.project;
  const scheme = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie, body: { name: "Scheme A", document: smallDocument() } })).json.scheme;
  return { cookie, project, scheme };
}

async function exported(schemeId: string, cookie: string, format: "csv" | "json") {
  const res = await fetch(`${baseUrl}/api/schemes/${schemeId}/export${format === "csv" ? "?format=csv" : ""}`, { headers: { cookie } });
  expect(res.status).toBe(200);
  expect(res.headers.get("content-disposition")).toMatch(new RegExp(`attachment; filename="Scheme-A\\.${format}"`));
  const bytes = Buffer.from(await res.arrayBuffer());
  // The byte-order mark (EF BB BF) lets spreadsheets read ⅔ and ′; text() would hide it.
  if (format === "csv") expect([...bytes.subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
  return bytes.toString("utf8");
}

async function counts(projectId: string) {
  const { rows } = await testDb().query(
    "select (select count(*)::int from schemes where project_id = $1) as schemes, (select count(*)::int from scheme_revisions r join schemes s on s.id = r.scheme_id where s.project_id = $1) as revisions",
    [projectId],
  );
  return rows[0] as { schemes: number; revisions: number };
}

const estimateOf = async (schemeId: string, cookie: string) => (await api(`/api/schemes/${schemeId}/estimate`, { cookie })).json.estimate;

describe("stop lists in and out", () => {
  it("a scheme file exported and imported as a new scheme is the same scheme with the same estimate", async () => {
    const { cookie, project, scheme } = await setUp();
    const text = await exported(scheme.id, cookie, "json");
    expect(JSON.parse(text)).toMatchObject({ name: "Scheme A", tuning: { pitchHz: 440 }, divisions: scheme.document.divisions });
    const body = { format: "json", fileName: "Scheme-A.json", text, target: { kind: "new" } };
    const preview = await api(`/api/projects/${project.id}/imports/preview`, { method: "POST", cookie, body });
    expect(preview.json.preview).toMatchObject({ ok: true, summary: { stopCount: 6 }, target: { kind: "new", name: "Scheme A" } });
    const created = await api(`/api/projects/${project.id}/imports`, { method: "POST", cookie, body });
    expect(created.status).toBe(201);
    expect(created.json.scheme.document).toEqual(scheme.document);
    expect(await estimateOf(created.json.scheme.id, cookie)).toEqual(await estimateOf(scheme.id, cookie));
  });

  it("a CSV exported and imported into the draft is a new revision with the same document and estimate", async () => {
    const { cookie, project, scheme } = await setUp();
    const before = await estimateOf(scheme.id, cookie);
    const csv = await exported(scheme.id, cookie, "csv");
    expect(csv.startsWith("\uFEFFdivision,name,pitch,ranks,family,origin,work")).toBe(true);
    expect(csv.trim().split("\r\n")).toHaveLength(1 + 6);
    const body = { format: "csv", fileName: "Scheme-A.csv", text: csv, target: { kind: "replace", schemeId: scheme.id, version: 1 } };
    const saved = await api(`/api/projects/${project.id}/imports`, { method: "POST", cookie, body });
    expect(saved.status).toBe(200);
    expect(saved.json.scheme.version).toBe(2);
    expect(saved.json.scheme.document).toEqual(scheme.document);
    expect(await estimateOf(scheme.id, cookie)).toEqual(before);
    const revisions = await api(`/api/schemes/${scheme.id}/revisions`, { cookie });
    expect(revisions.json.revisions[0]).toMatchObject({ version: 2, note: "imported from Scheme-A.csv" });
    // Imported again against the version it was previewed on, it is refused as stale, not written over.
    expect((await api(`/api/projects/${project.id}/imports`, { method: "POST", cookie, body })).status).toBe(409);
  });

  it("a CSV imported as a new scheme has the same divisions and stops", async () => {
    const { cookie, project, scheme } = await setUp();
    const csv = await exported(scheme.id, cookie, "csv");
    const created = await api(`/api/projects/${project.id}/imports`, { method: "POST", cookie, body: { format: "csv", fileName: "Scheme-A.csv", text: csv, target: { kind: "new", name: "Scheme A again" } } });
    expect(created.status).toBe(201);
    expect(created.json.scheme.name).toBe("Scheme A again");
    expect(created.json.scheme.document.divisions).toEqual(scheme.document.divisions);
  });

  it("refuses a CSV with bad rows, naming every row, and saves nothing", async () => {
    const { cookie, project, scheme } = await setUp();
    const before = await counts(project.id);
    const text = ["division,name,pitch,ranks,family", "Great,Open Diapason,8′,,principal", "Great,Twelfth,2.67,,mutation", "Great,Sesquialtera,2 2/3,II,mutation", "Swell,Oboe,8,,oboe"].join("\n");
    for (const target of [{ kind: "new" }, { kind: "replace", schemeId: scheme.id }]) {
      const body = { format: "csv", fileName: "by-hand.csv", text, target };
      const preview = await api(`/api/projects/${project.id}/imports/preview`, { method: "POST", cookie, body });
      expect(preview.status).toBe(200);
      expect(preview.json.preview.ok).toBe(false);
      expect(preview.json.preview.problems.map((p: { row: number }) => p.row)).toEqual([3, 5]);
      const res = await api(`/api/projects/${project.id}/imports`, { method: "POST", cookie, body });
      expect(res.status).toBe(422);
      expect(res.json.error.message).toBe('"by-hand.csv" has problems; nothing was imported.');
      expect(res.json.error.fields.file).toEqual([
        expect.stringMatching(/^Row 3, pitch: "2\.67" is not a footage/),
        expect.stringMatching(/^Row 5, family: "oboe" is not one of/),
      ]);
    }
    // Once the cells read, the estimator's own checks name the row too.
    const fixed = text.replace("2.67", "2 2/3").replace("8,,oboe", "8,,reed");
    const res = await api(`/api/projects/${project.id}/imports`, { method: "POST", cookie, body: { format: "csv", fileName: "by-hand.csv", text: fixed, target: { kind: "new" } } });
    expect(res.status).toBe(422);
    expect(res.json.error.fields.file).toEqual([expect.stringMatching(/^Row 4: Division "Great", stop "Sesquialtera"/)]);
    expect(await counts(project.id)).toEqual(before);
  });

  it("replaces only a draft's document, and only for those who may edit", async () => {
    const { cookie, project, scheme } = await setUp();
    const csv = await exported(scheme.id, cookie, "csv");
    await api(`/api/schemes/${scheme.id}`, { method: "PATCH", cookie, body: { status: "proposed" } });
    const res = await api(`/api/projects/${project.id}/imports`, { method: "POST", cookie, body: { format: "csv", fileName: "a.csv", text: csv, target: { kind: "replace", schemeId: scheme.id } } });
    expect(res.status).toBe(409);
    expect(res.json.error.message).toMatch(/no longer a draft/);
    const estimator = await signIn(await makeUser("estimator"));
    expect((await api(`/api/projects/${project.id}/imports/preview`, { method: "POST", cookie: estimator, body: { format: "csv", fileName: "a.csv", text: csv, target: { kind: "new" } } })).status).toBe(403);
    const client = await signIn(await makeUser("client"));
    expect((await fetch(`${baseUrl}/api/schemes/${scheme.id}/export`, { headers: { cookie: client } })).status).toBe(404);
  });
});
