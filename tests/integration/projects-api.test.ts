import { afterAll, describe, expect, it } from "vitest";
import { api, closeTestDb, makeUser, signIn, testDb } from "../support/server";

afterAll(closeTestDb);

const project = { name: "Rebuild of the west-end organ", clientName: "Parish of St Test (invented)", venue: "St Test", status: "design", pitchHz: 440, temperatureC: 16 };

describe("/api/projects", () => {
  it("answers 401 without a session and 403 to a role that may not create", async () => {
    expect((await api("/api/projects")).status).toBe(401);
    expect((await api("/api/projects", { method: "POST", body: project })).status).toBe(401);
    for (const role of ["estimator", "workshop", "client"] as const) {
      const cookie = await signIn(await makeUser(role));
      const res = await api("/api/projects", { method: "POST", cookie, body: { ...project, name: `Refused ${role}` } });
      expect(res.status, role).toBe(403);
    }
    const { rows } = await testDb().query("select count(*)::int as n from projects where name like 'Refused %'");
    expect(rows[0].n).toBe(0);
  });

  it("lets a designer create, read, update and archive a project", async () => {
    const designer = await makeUser("designer");
    const cookie = await signIn(designer);
    const created = await api("/api/projects", { method: "POST", cookie, body: project });
    expect(created.status).toBe(201);
    const id = created.json.project.id;
    expect(created.json.project).toMatchObject({ name: project.name, status: "design", temperatureC: 16, archived: false });
    expect(created.json.project.members.map((m: { email: string }) => m.email)).toEqual([designer.email]);

    const read = await api(`/api/projects/${id}`, { cookie });
    expect(read.status).toBe(200);
    expect(read.json.schemes).toEqual([]);

    const patched = await api(`/api/projects/${id}`, { method: "PATCH", cookie, body: { status: "tender", targetDate: "2029-03-31" } });
    expect(patched.json.project).toMatchObject({ status: "tender", targetDate: "2029-03-31" });

    const archived = await api(`/api/projects/${id}/archive`, { method: "POST", cookie, body: { archived: true } });
    expect(archived.json.project.archived).toBe(true);
    const list = await api("/api/projects", { cookie });
    expect(list.json.projects.some((p: { id: string }) => p.id === id)).toBe(false);
    const all = await api("/api/projects?archived=1", { cookie });
    expect(all.json.projects.some((p: { id: string }) => p.id === id)).toBe(true);
  });

  it("lets the estimator set a project's status, and only its status", async () => {
    const designerCookie = await signIn(await makeUser("designer"));
    const id = (await api("/api/projects", { method: "POST", cookie: designerCookie, body: { ...project, name: `Status ${Date.now()}` } })).json.project.id;
    const estimator = await signIn(await makeUser("estimator"));
    const set = await api(`/api/projects/${id}/status`, { method: "PUT", cookie: estimator, body: { status: "tender" } });
    expect(set.status).toBe(200);
    expect(set.json.project.status).toBe("tender");
    // The other details stay the tonal director's.
    expect((await api(`/api/projects/${id}`, { method: "PATCH", cookie: estimator, body: { name: "Renamed" } })).status).toBe(403);
    const bad = await api(`/api/projects/${id}/status`, { method: "PUT", cookie: estimator, body: { status: "sold" } });
    expect(bad.status).toBe(422);
    expect(bad.json.error.fields.status[0]).toBe("Choose one of the project statuses.");
    for (const role of ["workshop", "client"] as const) {
      const res = await api(`/api/projects/${id}/status`, { method: "PUT", cookie: await signIn(await makeUser(role)), body: { status: "complete" } });
      expect(res.status, role).toBe(403);
    }
    const { rows } = await testDb().query("select status, name from projects where id = $1", [id]);
    expect(rows[0]).toMatchObject({ status: "tender" });
    expect(rows[0].name).toMatch(/^Status /);
  });

  it("refuses bad fields with 422 naming each one, and saves nothing", async () => {
    const cookie = await signIn(await makeUser("designer"));
    const res = await api("/api/projects", { method: "POST", cookie, body: { name: "", clientName: "", pitchHz: 600, targetDate: "next spring" } });
    expect(res.status).toBe(422);
    expect(Object.keys(res.json.error.fields).sort()).toEqual(["clientName", "name", "pitchHz", "targetDate"]);
    expect(res.json.error.fields.pitchHz[0]).toMatch(/480 Hz/);
  });

  it("answers 404 for a project that does not exist or is not a uuid", async () => {
    const cookie = await signIn(await makeUser("estimator"));
    expect((await api("/api/projects/00000000-0000-4000-8000-000000000000", { cookie })).status).toBe(404);
    expect((await api("/api/projects/not-an-id", { cookie })).status).toBe(404);
  });

  it("shows a client only the projects they are a member of", async () => {
    const designerCookie = await signIn(await makeUser("designer"));
    const client = await makeUser("client");
    const clientCookie = await signIn(client);
    const a = (await api("/api/projects", { method: "POST", cookie: designerCookie, body: { ...project, name: "Client's own" } })).json.project;
    const b = (await api("/api/projects", { method: "POST", cookie: designerCookie, body: { ...project, name: "Someone else's" } })).json.project;
    expect((await api(`/api/projects/${a.id}`, { cookie: clientCookie })).status).toBe(404);

    const added = await api(`/api/projects/${a.id}/members`, { method: "POST", cookie: designerCookie, body: { email: client.email } });
    expect(added.status).toBe(200);
    const list = await api("/api/projects", { cookie: clientCookie });
    expect(list.json.projects.map((p: { id: string }) => p.id)).toEqual([a.id]);
    expect((await api(`/api/projects/${b.id}`, { cookie: clientCookie })).status).toBe(404);
    // Members may read but not edit.
    expect((await api(`/api/projects/${a.id}`, { method: "PATCH", cookie: clientCookie, body: { name: "Mine now" } })).status).toBe(403);

    const unknown = await api(`/api/projects/${a.id}/members`, { method: "POST", cookie: designerCookie, body: { email: "nobody@test.example" } });
    expect(unknown.status).toBe(422);
    expect(unknown.json.error.fields.email[0]).toMatch(/No user has the e-mail/);

    const removed = await api(`/api/projects/${a.id}/members/${client.id}`, { method: "DELETE", cookie: designerCookie });
    expect(removed.status).toBe(200);
    expect((await api(`/api/projects/${a.id}`, { cookie: clientCookie })).status).toBe(404);
  });
});
