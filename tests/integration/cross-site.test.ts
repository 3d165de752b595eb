// Changes come only from Stopwright's own pages: a page on another origin (another port, a sibling
// host) that makes the browser post with the user's cookie is refused, and a JSON API takes only
// bodies that say they are JSON. Each case checks the database to prove nothing was written.
import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { api, baseUrl, closeTestDb, makeUser, signIn, testDb } from "../support/server";

afterAll(closeTestDb);

const ownOrigin = new URL(baseUrl).origin;
const otherPort = `http://127.0.0.1:${Number(new URL(baseUrl).port) + 1}`;

async function usersWithEmail(email: string) {
  const { rows } = await testDb().query("select count(*)::int as n from users where email = $1", [email]);
  return rows[0].n as number;
}

const newAdmin = (email: string) => JSON.stringify({ name: "Intruder", email, role: "admin", password: "intruder-password-1" });

describe("state-changing requests from another origin", () => {
  it("refuses a text/plain post from another origin carrying an admin's cookie, and creates no account", async () => {
    const cookie = await signIn(await makeUser("admin"));
    const email = `intruder-${randomUUID().slice(0, 8)}@test.example`;
    for (const origin of [otherPort, "http://stopwright.evil.example", "null"]) {
      const res = await api("/api/users", { method: "POST", cookie, body: newAdmin(email), headers: { origin, "content-type": "text/plain" } });
      expect(res.status, origin).toBe(403);
      expect(res.json.error.code).toBe("forbidden");
      expect(res.json.error.message).toMatch(/another site/);
    }
    expect(await usersWithEmail(email)).toBe(0);
  });

  it("refuses a JSON post from another origin too, before reading it", async () => {
    const cookie = await signIn(await makeUser("admin"));
    const email = `intruder-${randomUUID().slice(0, 8)}@test.example`;
    const res = await api("/api/users", { method: "POST", cookie, body: newAdmin(email), headers: { origin: otherPort } });
    expect(res.status).toBe(403);
    expect(await usersWithEmail(email)).toBe(0);
  });

  it("refuses a cross-site request that carries no Origin but says where it came from", async () => {
    const cookie = await signIn(await makeUser("admin"));
    const email = `intruder-${randomUUID().slice(0, 8)}@test.example`;
    const res = await api("/api/users", { method: "POST", cookie, body: newAdmin(email), headers: { "sec-fetch-site": "cross-site" } });
    expect(res.status).toBe(403);
    expect(await usersWithEmail(email)).toBe(0);
  });

  it("refuses a scheme save, a project change and a member removal from another origin", async () => {
    const designer = await makeUser("designer");
    const cookie = await signIn(designer);
    const project = await api("/api/projects", { method: "POST", cookie, body: { name: `Cross-site ${randomUUID().slice(0, 6)}`, clientName: "Invented trustees" } });
    expect(project.status).toBe(201);
    const id = project.json.project.id as string;
    const patch = await api(`/api/projects/${id}`, { method: "PATCH", cookie, body: { name: "Renamed from elsewhere" }, headers: { origin: otherPort } });
    expect(patch.status).toBe(403);
    const del = await api(`/api/projects/${id}/members/${designer.id}`, { method: "DELETE", cookie, headers: { origin: otherPort } });
    expect(del.status).toBe(403);
    const { rows } = await testDb().query("select name from projects where id = $1", [id]);
    expect(rows[0].name).not.toBe("Renamed from elsewhere");
  });

  it("accepts the same request from the app's own origin", async () => {
    const cookie = await signIn(await makeUser("admin"));
    const email = `colleague-${randomUUID().slice(0, 8)}@test.example`;
    const res = await api("/api/users", { method: "POST", cookie, body: newAdmin(email), headers: { origin: ownOrigin, "sec-fetch-site": "same-origin" } });
    expect(res.status).toBe(201);
    expect(await usersWithEmail(email)).toBe(1);
  });

  it("answers a server action posted from another origin with 403, not a crash", async () => {
    const cookie = await signIn(await makeUser("admin"));
    const res = await fetch(`${baseUrl}/admin/users`, {
      method: "POST",
      headers: { cookie, origin: otherPort, "next-action": "0".repeat(42), "content-type": "text/plain;charset=UTF-8" },
      body: "[]",
    });
    expect(res.status).toBe(403);
  });
});

describe("JSON bodies must say they are JSON", () => {
  it("answers 415 to a text/plain body from the app's own origin and saves nothing", async () => {
    const cookie = await signIn(await makeUser("admin"));
    const email = `plain-${randomUUID().slice(0, 8)}@test.example`;
    const res = await api("/api/users", { method: "POST", cookie, body: newAdmin(email), headers: { origin: ownOrigin, "content-type": "text/plain" } });
    expect(res.status).toBe(415);
    expect(res.json.error.code).toBe("unsupported_media_type");
    expect(res.json.error.message).toMatch(/Content-Type: application\/json/);
    expect(await usersWithEmail(email)).toBe(0);
  });

  it("answers 415 to a form-encoded body and to a body with no type", async () => {
    const cookie = await signIn(await makeUser("designer"));
    const form = await api("/api/projects", { method: "POST", cookie, body: "name=Form+project&clientName=X", headers: { "content-type": "application/x-www-form-urlencoded" } });
    expect(form.status).toBe(415);
    const none = await fetch(`${baseUrl}/api/projects`, { method: "POST", headers: { cookie }, body: new Blob([JSON.stringify({ name: "Untyped", clientName: "X" })]) });
    expect(none.status).toBe(415);
    const { rows } = await testDb().query("select count(*)::int as n from projects where name in ('Form project', 'Untyped')");
    expect(rows[0].n).toBe(0);
  });

  it("accepts JSON with a charset", async () => {
    const cookie = await signIn(await makeUser("designer"));
    const res = await api("/api/projects", { method: "POST", cookie, body: JSON.stringify({ name: `Charset ${randomUUID().slice(0, 6)}`, clientName: "Invented" }), headers: { "content-type": "application/json; charset=utf-8" } });
    expect(res.status).toBe(201);
  });
});
