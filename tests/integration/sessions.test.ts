// Sessions end when they should: signing out, disabling the account and changing its role each
// revoke the session in the database, so a copy of the cookie stops working at once (it used to
// work for up to 12 h), and /api/auth/session stops reporting the old identity and role.
import { afterAll, describe, expect, it } from "vitest";
import { api, baseUrl, closeTestDb, makeUser, signIn, signOut, testDb } from "../support/server";

afterAll(closeTestDb);

async function sessionOf(cookie: string) {
  return (await api("/api/auth/session", { cookie })).json;
}

describe("revoking sessions", () => {
  it("signing out ends the session for every copy of its cookie", async () => {
    const user = await makeUser("designer");
    const cookie = await signIn(user);
    const copy = cookie; // what an attacker lifted from the browser before sign-out
    expect((await api("/api/projects", { cookie })).status).toBe(200);
    expect((await sessionOf(cookie)).user).toMatchObject({ id: user.id, role: "designer" });
    const out = await signOut(cookie);
    expect(out.status).toBe(200);
    expect((await api("/api/projects", { cookie: copy })).status).toBe(401);
    expect(await sessionOf(copy)).toEqual({});
    const page = await fetch(`${baseUrl}/projects`, { headers: { cookie: copy }, redirect: "manual" });
    // The proxy only reads the token; the page itself checks the database and sends them to sign in.
    expect([302, 303, 307]).toContain(page.status);
    expect(page.headers.get("location")).toMatch(/\/sign-in/);
  });

  it("signing out one browser leaves the user's other sessions alone", async () => {
    const user = await makeUser("estimator");
    const laptop = await signIn(user);
    const phone = await signIn(user);
    await signOut(laptop);
    expect((await api("/api/projects", { cookie: laptop })).status).toBe(401);
    expect((await api("/api/projects", { cookie: phone })).status).toBe(200);
  });

  it("disabling an account ends all its sessions at once, and re-enabling does not bring them back", async () => {
    const admin = await signIn(await makeUser("admin"));
    const user = await makeUser("workshop");
    const [a, b] = [await signIn(user), await signIn(user)];
    expect((await api(`/api/users/${user.id}`, { method: "PATCH", cookie: admin, body: { disabled: true } })).status).toBe(200);
    for (const cookie of [a, b]) {
      expect((await api("/api/projects", { cookie })).status).toBe(401);
      expect(await sessionOf(cookie)).toEqual({});
    }
    expect((await api(`/api/users/${user.id}`, { method: "PATCH", cookie: admin, body: { disabled: false } })).status).toBe(200);
    expect((await api("/api/projects", { cookie: a })).status).toBe(401);
    expect((await api("/api/projects", { cookie: await signIn(user) })).status).toBe(200);
  });

  it("a change of role ends the sessions that carried the old role", async () => {
    const admin = await signIn(await makeUser("admin"));
    const user = await makeUser("estimator");
    const cookie = await signIn(user);
    expect((await sessionOf(cookie)).user.role).toBe("estimator");
    expect((await api(`/api/users/${user.id}`, { method: "PATCH", cookie: admin, body: { role: "client" } })).status).toBe(200);
    expect((await api("/api/projects", { cookie })).status).toBe(401);
    expect(await sessionOf(cookie)).toEqual({});
    const again = await signIn(user);
    expect((await sessionOf(again)).user.role).toBe("client");
  });

  it("a renamed user keeps their session and is shown by their new name", async () => {
    const admin = await signIn(await makeUser("admin"));
    const user = await makeUser("designer");
    const cookie = await signIn(user);
    expect((await api(`/api/users/${user.id}`, { method: "PATCH", cookie: admin, body: { name: "Renamed Person" } })).status).toBe(200);
    expect((await sessionOf(cookie)).user).toMatchObject({ name: "Renamed Person", role: "designer" });
    expect((await api("/api/projects", { cookie })).status).toBe(200);
  });

  it("a session ends when its time is up, whatever its cookie says", async () => {
    const user = await makeUser("designer");
    const cookie = await signIn(user);
    await testDb().query("update auth_sessions set expires_at = now() - interval '1 second' where user_id = $1", [user.id]);
    expect((await api("/api/projects", { cookie })).status).toBe(401);
  });

  it("keeps no password or token in the sessions table, only ids and times", async () => {
    const user = await makeUser("designer");
    await signIn(user);
    const { rows } = await testDb().query("select * from auth_sessions where user_id = $1", [user.id]);
    expect(rows).toHaveLength(1);
    expect(Object.keys(rows[0]).sort()).toEqual(["created_at", "expires_at", "id", "revoked_at", "user_id"]);
  });
});
