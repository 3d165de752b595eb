import { afterAll, describe, expect, it } from "vitest";
import { api, closeTestDb, makeUser, signIn, testDb } from "../support/server";

afterAll(closeTestDb);

describe("GET /api/health", () => {
  it("answers 200 with the database reachable", async () => {
    const res = await api("/api/health");
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ status: "ok", database: "reachable" });
  });
});

describe("/api/users", () => {
  it("answers 401 without a session", async () => {
    const res = await api("/api/users");
    expect(res.status).toBe(401);
    expect(res.json.error.code).toBe("unauthenticated");
  });

  it("answers 403 to a role that may not manage users", async () => {
    for (const role of ["designer", "estimator", "workshop", "client"] as const) {
      const cookie = await signIn(await makeUser(role));
      const res = await api("/api/users", { cookie });
      expect(res.status, role).toBe(403);
      const post = await api("/api/users", { method: "POST", cookie, body: { name: "X", email: `x-${role}@test.example`, role: "admin", password: "long-enough-pw" } });
      expect(post.status, role).toBe(403);
    }
    const { rows } = await testDb().query("select count(*)::int as n from users where email like 'x-%@test.example'");
    expect(rows[0].n).toBe(0);
  });

  it("lets an admin list users without password hashes", async () => {
    const admin = await makeUser("admin");
    const res = await api("/api/users", { cookie: await signIn(admin) });
    expect(res.status).toBe(200);
    const me = res.json.users.find((u: { email: string }) => u.email === admin.email);
    expect(me).toMatchObject({ role: "admin", disabled: false });
    expect(JSON.stringify(res.json)).not.toContain("password");
  });

  it("refuses a duplicate e-mail (any case) with a clear message and changes no row", async () => {
    const admin = await makeUser("admin");
    const existing = await makeUser("workshop");
    const cookie = await signIn(admin);
    const before = await testDb().query("select id, name, role, password_hash, updated_at from users order by id");
    const res = await api("/api/users", {
      method: "POST",
      cookie,
      body: { name: "Someone Else", email: existing.email.toUpperCase(), role: "designer", password: "another-password" },
    });
    expect(res.status).toBe(422);
    expect(res.json.error.fields.email[0]).toBe(`A user with the e-mail ${existing.email} already exists.`);
    const after = await testDb().query("select id, name, role, password_hash, updated_at from users order by id");
    expect(after.rows).toEqual(before.rows);
  });

  it("reports every invalid field by name", async () => {
    const cookie = await signIn(await makeUser("admin"));
    const res = await api("/api/users", { method: "POST", cookie, body: { name: "", email: "not-an-email", role: "organist", password: "short" } });
    expect(res.status).toBe(422);
    expect(Object.keys(res.json.error.fields).sort()).toEqual(["email", "name", "password", "role"]);
  });

  it("creates a user who can then sign in", async () => {
    const cookie = await signIn(await makeUser("admin"));
    const email = `new-${Date.now()}@test.example`;
    const res = await api("/api/users", { method: "POST", cookie, body: { name: "New Person", email, role: "estimator", password: "a-good-password" } });
    expect(res.status).toBe(201);
    expect(res.json.user).toMatchObject({ email, role: "estimator" });
    await expect(signIn({ email, password: "a-good-password" })).resolves.toContain("session-token");
  });

  it("changes a role and disables a user; a disabled user's session stops working", async () => {
    const admin = await makeUser("admin");
    const target = await makeUser("designer");
    const adminCookie = await signIn(admin);
    const designerCookie = await signIn(target);
    expect((await api("/api/users", { cookie: designerCookie })).status).toBe(403);

    const promote = await api(`/api/users/${target.id}`, { method: "PATCH", cookie: adminCookie, body: { role: "admin" } });
    expect(promote.status).toBe(200);
    expect(promote.json.user.role).toBe("admin");
    // A change of role ends the sessions that carried the old one; the next sign-in has the new role.
    expect((await api("/api/users", { cookie: designerCookie })).status).toBe(401);
    const targetCookie = await signIn(target);
    expect((await api("/api/users", { cookie: targetCookie })).status).toBe(200);

    const disable = await api(`/api/users/${target.id}`, { method: "PATCH", cookie: adminCookie, body: { disabled: true } });
    expect(disable.json.user.disabled).toBe(true);
    expect((await api("/api/users", { cookie: targetCookie })).status).toBe(401);
    await expect(signIn(target)).rejects.toThrow(/sign-in failed/);
  });

  it("does not let an admin disable themselves", async () => {
    const admin = await makeUser("admin");
    const cookie = await signIn(admin);
    const res = await api(`/api/users/${admin.id}`, { method: "PATCH", cookie, body: { disabled: true } });
    expect(res.status).toBe(409);
    const { rows } = await testDb().query("select disabled from users where id = $1", [admin.id]);
    expect(rows[0].disabled).toBe(false);
  });
});
