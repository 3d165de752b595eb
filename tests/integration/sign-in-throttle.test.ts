// Sign-in throttling: wrong passwords are counted per account and per network address in
// PostgreSQL (so every server instance sees the same count), a pause refuses even the right
// password with a clear message, and the pause ends by itself. (Before, 50 wrong passwords in
// 4.5 s were followed by a successful sign-in.)
import { createHash } from "node:crypto";
import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { attemptSignIn, closeTestDb, makeUser, testDb } from "../support/server";

afterAll(closeTestDb);

const sha = (v: string) => createHash("sha256").update(v).digest("hex");
/** A documentation address (RFC 5737) of this test's own, so no other test's counts are touched. */
const address = () => `198.51.100.${Math.floor(Math.random() * 250) + 1}-${randomUUID().slice(0, 4)}`;

/** Moves a pause's end into the past: what fifteen minutes of waiting would do. */
async function letPauseEnd(key: string) {
  await testDb().query("update sign_in_throttle set expire = $2 where key = $1", [key, Date.now() - 1000]);
}

describe("per account", () => {
  it("pauses an account after 10 wrong passwords, refuses the right one during the pause, and lets it in after", async () => {
    const user = await makeUser("designer");
    for (let i = 0; i < 9; i++) expect((await attemptSignIn(user.email, "wrong-password", address())).error).toBe("CredentialsSignin");
    // The tenth wrong password starts the pause, and says so.
    expect((await attemptSignIn(user.email, "wrong-password", address())).error).toMatch(/Too many failed sign-ins for this account. Sign-in is paused for 15 minutes/);
    const during = await attemptSignIn(user.email, user.password, address());
    expect(during.cookie).toBeNull();
    expect(during.error).toMatch(/Too many failed sign-ins for this account/);

    const key = `sign-in-account:${sha(user.email)}`;
    const { rows } = await testDb().query("select points from sign_in_throttle where key = $1", [key]);
    expect(rows[0].points).toBeGreaterThan(10);
    await letPauseEnd(key);
    const after = await attemptSignIn(user.email, user.password, address());
    expect(after.error).toBeNull();
    expect(after.cookie).toMatch(/session-token=/);
  });

  it("forgets an account's failures when its owner signs in", async () => {
    const user = await makeUser("estimator");
    for (let round = 0; round < 2; round++) {
      for (let i = 0; i < 8; i++) await attemptSignIn(user.email, "wrong-password", address());
      expect((await attemptSignIn(user.email, user.password, address())).cookie).toMatch(/session-token=/);
    }
  });

  it("counts an unknown e-mail like a known one, so a pause does not tell which accounts exist", async () => {
    const email = `nobody-${randomUUID().slice(0, 8)}@test.example`;
    for (let i = 0; i < 9; i++) await attemptSignIn(email, "whatever", address());
    expect((await attemptSignIn(email, "whatever", address())).error).toMatch(/Too many failed sign-ins for this account/);
  });

  it("keeps hashes, not e-mail addresses, in the counter table", async () => {
    const user = await makeUser("workshop");
    await attemptSignIn(user.email, "wrong-password", address());
    const { rows } = await testDb().query("select key from sign_in_throttle where key like '%' || $1 || '%'", [user.email]);
    expect(rows).toHaveLength(0);
    const hashed = await testDb().query("select 1 from sign_in_throttle where key = $1", [`sign-in-account:${sha(user.email)}`]);
    expect(hashed.rowCount).toBe(1);
  });
});

describe("per address", () => {
  it("pauses an address that tries many accounts, while the same people sign in from elsewhere", async () => {
    const from = address();
    for (let i = 0; i < 29; i++) {
      const r = await attemptSignIn(`guess-${i}-${randomUUID().slice(0, 6)}@test.example`, "guess", from);
      expect(r.error, `attempt ${i + 1}`).toBe("CredentialsSignin");
    }
    expect((await attemptSignIn(`guess-last-${randomUUID().slice(0, 6)}@test.example`, "guess", from)).error).toMatch(/from your network address/);
    const user = await makeUser("designer");
    const blocked = await attemptSignIn(user.email, user.password, from);
    expect(blocked.cookie).toBeNull();
    expect(blocked.error).toMatch(/Sign-in from here is paused/);
    expect((await attemptSignIn(user.email, user.password, address())).cookie).toMatch(/session-token=/);

    await letPauseEnd(`sign-in-address:${sha(from)}`);
    expect((await attemptSignIn(user.email, user.password, from)).cookie).toMatch(/session-token=/);
  }, 60_000);
});
