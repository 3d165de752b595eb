// An archived project is a record: sharing a scheme, changing its status, changing the project's
// details and adding a member all answer 409, like saves, and change nothing. (They used to succeed.)
import { afterAll, describe, expect, it } from "vitest";
import { smallDocument } from "../support/fixtures";
import { expectApiError } from "../support/hygiene";
import { api, closeTestDb, makeUser, signIn, testDb } from "../support/server";

afterAll(closeTestDb);

describe("an archived project", () => {
  it("refuses share, status, project changes and new members with 409, and keeps removal of members open", async () => {
    const designer = await signIn(await makeUser("designer"));
    const client = await makeUser("client");
    const project = (await api("/api/projects", { method: "POST", cookie: designer, body: { name: "Archived record", clientName: "Invented abbey" } })).json.project;
    const scheme = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie: designer, body: { name: "A", document: smallDocument() } })).json.scheme;
    expect((await api(`/api/projects/${project.id}/members`, { method: "POST", cookie: designer, body: { email: client.email } })).status).toBe(200);
    expect((await api(`/api/projects/${project.id}/archive`, { method: "POST", cookie: designer, body: { archived: true } })).status).toBe(200);

    const attempts = [
      ["share", await api(`/api/schemes/${scheme.id}`, { method: "PATCH", cookie: designer, body: { sharedWithClient: true } })],
      ["status", await api(`/api/schemes/${scheme.id}`, { method: "PATCH", cookie: designer, body: { status: "accepted" } })],
      ["project details", await api(`/api/projects/${project.id}`, { method: "PATCH", cookie: designer, body: { name: "Renamed", targetDate: "2031-05-01" } })],
      ["add member", await api(`/api/projects/${project.id}/members`, { method: "POST", cookie: designer, body: { email: (await makeUser("client")).email } })],
      ["save", await api(`/api/schemes/${scheme.id}`, { method: "PUT", cookie: designer, body: { version: 1, document: smallDocument() } })],
    ] as const;
    for (const [label, res] of attempts) {
      expectApiError(res, 409, label);
      expect(res.json.error.message, label).toMatch(/archived; bring it back from the archive/);
    }
    const { rows: [s] } = await testDb().query("select shared_with_client, status, version from schemes where id = $1", [scheme.id]);
    expect(s).toEqual({ shared_with_client: false, status: "draft", version: 1 });
    const { rows: [p] } = await testDb().query("select name, target_date from projects where id = $1", [project.id]);
    expect(p).toEqual({ name: "Archived record", target_date: null });
    const { rows: members } = await testDb().query("select count(*)::int as n from project_members where project_id = $1", [project.id]);
    expect(members[0].n).toBe(2);

    // Taking access away stays possible, and bringing the project back opens it again.
    expect((await api(`/api/projects/${project.id}/members/${client.id}`, { method: "DELETE", cookie: designer })).status).toBe(200);
    expect((await api(`/api/projects/${project.id}/archive`, { method: "POST", cookie: designer, body: { archived: false } })).status).toBe(200);
    expect((await api(`/api/schemes/${scheme.id}`, { method: "PATCH", cookie: designer, body: { sharedWithClient: true } })).status).toBe(200);
  });
});
