// The client committee against the real server, database and SMTP stand-in: invitations are
// single-use, hashed and expire; comments, firm notes and preferences keep their rules; and the mail
// each step sends reaches the right people with the right links.
import { createHash, randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { smallDocument } from "../support/fixtures";
import { invitationLink, waitForCount, waitForMail } from "../support/mail";
import { api, baseUrl, closeTestDb, makeUser, signIn, testDb } from "../support/server";

afterAll(closeTestDb);

const uid = () => randomUUID().slice(0, 8);

async function projectWithSchemes(shared: boolean[] = [true, true]) {
  const designer = await makeUser("designer");
  const cookie = await signIn(designer);
  const project = (await api("/api/projects", { method: "POST", cookie, body: { name: `Committee test ${uid()}`, clientName: "Invented parish" } })).json.project;
  const schemes = [];
  for (const [i, share] of shared.entries()) {
    const s = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie, body: { name: `Scheme ${i + 1}`, document: smallDocument(`Scheme ${i + 1}`) } })).json.scheme;
    if (share) expect((await api(`/api/schemes/${s.id}`, { method: "PATCH", cookie, body: { sharedWithClient: true } })).status).toBe(200);
    schemes.push(s);
  }
  return { designer, cookie, project, schemes };
}

async function committeeMember(projectId: string, designerCookie: string) {
  const client = await makeUser("client");
  expect((await api(`/api/projects/${projectId}/members`, { method: "POST", cookie: designerCookie, body: { email: client.email } })).status).toBe(200);
  return { client, cookie: await signIn(client) };
}

const tokenOf = (link: string) => new URL(link).pathname.split("/").pop()!;
const accept = (token: string, password = `pw-${uid()}-long`) => api("/api/invitations/accept", { method: "POST", body: { token, name: "Invited Person", password, confirm: password } });

describe("invitations", () => {
  it("e-mail a link whose token is stored only hashed; following it once makes a committee member of that project only", async () => {
    const { cookie, project } = await projectWithSchemes();
    const email = `invitee-${uid()}@parish.example`;
    const res = await api(`/api/projects/${project.id}/invitations`, { method: "POST", cookie, body: { email, name: "Invited Person" } });
    expect(res.status).toBe(200);
    expect(res.json.kind).toBe("invited");

    const link = await invitationLink(email);
    expect(link.startsWith(`${baseUrl}/invite/`)).toBe(true);
    const token = tokenOf(link);
    const { rows } = await testDb().query("select token_hash from invitations where email = $1", [email]);
    expect(rows[0].token_hash).toBe(createHash("sha256").update(token).digest("hex"));
    expect(JSON.stringify(rows)).not.toContain(token);

    const page = await (await fetch(link)).text();
    expect(page).toContain('data-state="pending"');
    const password = `pw-${uid()}-long`;
    const ok = await accept(token, password);
    expect(ok.status).toBe(200);
    expect(ok.json.projectId).toBe(project.id);
    const memberCookie = await signIn({ email, password });
    expect((await api(`/api/projects/${project.id}`, { cookie: memberCookie })).status).toBe(200);
    const me = (await testDb().query("select role from users where email = $1", [email])).rows[0];
    expect(me.role).toBe("client");

    // Single use: the same link again is refused in words, and nothing more is created.
    const again = await accept(token);
    expect(again.status).toBe(409);
    expect(again.json.error.message).toContain("already been used");
    expect((await testDb().query("select count(*)::int as n from users where email = $1", [email])).rows[0].n).toBe(1);
    expect(await (await fetch(link)).text()).toContain('data-state="accepted"');
  });

  it("expire, and a withdrawn or replaced link no longer works", async () => {
    const { cookie, project } = await projectWithSchemes();
    const late = `late-${uid()}@parish.example`;
    await api(`/api/projects/${project.id}/invitations`, { method: "POST", cookie, body: { email: late, name: "Late Person" } });
    const lateToken = tokenOf(await invitationLink(late));
    await testDb().query("update invitations set expires_at = now() - interval '1 minute' where email = $1", [late]);
    const expired = await accept(lateToken);
    expect(expired.status).toBe(409);
    expect(expired.json.error.message).toContain("expired");
    expect(await (await fetch(`${baseUrl}/invite/${lateToken}`)).text()).toContain("This invitation has expired");

    const other = `other-${uid()}@parish.example`;
    const inv = (await api(`/api/projects/${project.id}/invitations`, { method: "POST", cookie, body: { email: other, name: "Other Person" } })).json.invitation;
    const first = tokenOf(await invitationLink(other));
    expect((await api(`/api/invitations/${inv.id}/resend`, { method: "POST", cookie })).status).toBe(200);
    const both = await waitForCount((m) => m.envelopeTo.includes(other), 2);
    const second = tokenOf(both[1]!.links.find((l) => l.includes("/invite/"))!);
    expect(second).not.toBe(first);
    expect((await accept(first)).status).toBe(404);

    expect((await api(`/api/invitations/${inv.id}`, { method: "DELETE", cookie })).json.invitation.state).toBe("withdrawn");
    const withdrawn = await accept(second);
    expect(withdrawn.status).toBe(409);
    expect(withdrawn.json.error.message).toContain("withdrawn");
    expect((await testDb().query("select count(*)::int as n from users where email = any($1)", [[late, other]])).rows[0].n).toBe(0);
  });

  it("add an existing committee account at once, refuse the firm's own people, and check every field", async () => {
    const { cookie, project } = await projectWithSchemes();
    const client = await makeUser("client");
    const added = await api(`/api/projects/${project.id}/invitations`, { method: "POST", cookie, body: { email: client.email, name: "Known Person" } });
    expect(added.json.kind).toBe("added");
    await waitForMail((m) => m.envelopeTo.includes(client.email) && m.subject.includes("added to the committee"));
    const colleague = await makeUser("estimator");
    const refused = await api(`/api/projects/${project.id}/invitations`, { method: "POST", cookie, body: { email: colleague.email, name: "Colleague" } });
    expect(refused.status).toBe(422);
    const bad = await api(`/api/projects/${project.id}/invitations`, { method: "POST", cookie, body: { email: "not-an-address", name: "" } });
    expect(bad.status).toBe(422);
    expect(Object.keys(bad.json.error.fields).sort()).toEqual(["email", "name"]);
    const weak = await api("/api/invitations/accept", { method: "POST", body: { token: "x".repeat(43), name: "A", password: "short", confirm: "other" } });
    expect(weak.status).toBe(422);
    expect(Object.keys(weak.json.error.fields).sort()).toEqual(["confirm", "password"]);
    // A committee member cannot invite anyone.
    const member = await committeeMember(project.id, cookie);
    expect((await api(`/api/projects/${project.id}/invitations`, { method: "POST", cookie: member.cookie, body: { email: `x-${uid()}@p.example`, name: "X" } })).status).toBe(403);
  });
});

describe("comments and firm notes", () => {
  it("a committee member comments on a shared scheme, on one stop too; the firm's members get the e-mail", async () => {
    const { designer, cookie, project, schemes } = await projectWithSchemes([true, false]);
    const estimator = await makeUser("estimator");
    await api(`/api/projects/${project.id}/members`, { method: "POST", cookie, body: { email: estimator.email } });
    const { client, cookie: clientCookie } = await committeeMember(project.id, cookie);

    const posted = await api(`/api/schemes/${schemes[0].id}/comments`, { method: "POST", cookie: clientCookie, body: { body: "Could the Twelfth be softer?", stopId: "gt-12" } });
    expect(posted.status).toBe(200);
    expect(posted.json.comment.stopLabel).toBe("Twelfth 2⅔′ (Great)");
    expect(posted.json.comment.authorSide).toBe("committee");

    const mail = await waitForMail((m) => m.subject.includes("comment by") && m.envelopeTo.includes(designer.email));
    expect(mail.envelopeTo.sort()).toEqual([designer.email, estimator.email].sort());
    expect(mail.envelopeTo).not.toContain(client.email);
    expect(mail.text).toContain("Could the Twelfth be softer?");
    expect(mail.links).toContain(`${baseUrl}/projects/${project.id}/schemes/${schemes[0].id}#comments`);

    const seen = await api(`/api/schemes/${schemes[0].id}/comments`, { cookie });
    expect(seen.json.comments.map((c: { body: string }) => c.body)).toEqual(["Could the Twelfth be softer?"]);
  });

  it("refuse an unshared scheme, a stop that is not there and an empty comment; notes never reach a client", async () => {
    const { cookie, project, schemes } = await projectWithSchemes([true, false]);
    const { cookie: clientCookie } = await committeeMember(project.id, cookie);
    const hidden = await api(`/api/schemes/${schemes[1].id}/comments`, { method: "POST", cookie: clientCookie, body: { body: "Hello" } });
    expect(hidden.status).toBe(404);
    expect(hidden.json.error.message).toBe("No such scheme.");
    expect((await api(`/api/schemes/${schemes[0].id}/comments`, { method: "POST", cookie: clientCookie, body: { body: "On a ghost", stopId: "no-such-stop" } })).json.error.fields.stopId).toBeDefined();
    const empty = await api(`/api/schemes/${schemes[0].id}/comments`, { method: "POST", cookie: clientCookie, body: { body: "   " } });
    expect(empty.status).toBe(422);
    expect(empty.json.error.fields.body).toEqual(["Write something first."]);

    const note = await api(`/api/schemes/${schemes[0].id}/notes`, { method: "POST", cookie, body: { body: "Firm only: price the offset chest." } });
    expect(note.status).toBe(200);
    expect((await api(`/api/schemes/${schemes[0].id}/notes`, { cookie: clientCookie })).status).toBe(403);
    const asClient = await api(`/api/schemes/${schemes[0].id}/comments`, { cookie: clientCookie });
    expect(asClient.text).not.toContain("Firm only");
    const page = await (await fetch(`${baseUrl}/projects/${project.id}/schemes/${schemes[0].id}`, { headers: { cookie: clientCookie } })).text();
    expect(page).not.toContain("Firm only");
    expect((await testDb().query("select count(*)::int as n from scheme_comments where scheme_id = $1", [schemes[1].id])).rows[0].n).toBe(0);
  });
});

describe("preferences", () => {
  it("one per member, changeable, only for shared schemes of their project; the firm sees the summary", async () => {
    const { cookie, project, schemes } = await projectWithSchemes([true, true, false]);
    const { client, cookie: clientCookie } = await committeeMember(project.id, cookie);
    const first = await api(`/api/projects/${project.id}/preference`, { method: "PUT", cookie: clientCookie, body: { schemeId: schemes[0].id, note: "Simpler" } });
    expect(first.status).toBe(200);
    const changed = await api(`/api/projects/${project.id}/preference`, { method: "PUT", cookie: clientCookie, body: { schemeId: schemes[1].id } });
    expect(changed.json.preference.schemeName).toBe("Scheme 2");
    expect((await testDb().query("select count(*)::int as n from scheme_preferences where user_id = $1", [client.id])).rows[0].n).toBe(1);
    expect((await api(`/api/projects/${project.id}/preference`, { method: "PUT", cookie: clientCookie, body: { schemeId: schemes[2].id } })).status).toBe(404);
    expect((await api(`/api/projects/${project.id}/preference`, { method: "PUT", cookie: clientCookie, body: { schemeId: "not-a-uuid" } })).status).toBe(422);
    // Only committee members record one; only the firm reads the summary.
    expect((await api(`/api/projects/${project.id}/preference`, { method: "PUT", cookie, body: { schemeId: schemes[0].id } })).status).toBe(403);
    expect((await api(`/api/projects/${project.id}/preferences`, { cookie: clientCookie })).status).toBe(403);
    const summary = (await api(`/api/projects/${project.id}/preferences`, { cookie })).json.summary;
    expect(summary.members).toEqual([expect.objectContaining({ userId: client.id, preference: expect.objectContaining({ schemeId: schemes[1].id, schemeName: "Scheme 2" }) })]);
    expect(summary.schemes.map((s: { count: number }) => s.count)).toEqual([0, 1]);
    // Another project's scheme is no choice at all.
    const other = await projectWithSchemes([true]);
    expect((await api(`/api/projects/${project.id}/preference`, { method: "PUT", cookie: clientCookie, body: { schemeId: other.schemes[0].id } })).status).toBe(404);
  });
});

describe("sharing a scheme", () => {
  it("tells each committee member by e-mail, with a link to the scheme", async () => {
    const { cookie, project, schemes } = await projectWithSchemes([false]);
    const a = await committeeMember(project.id, cookie);
    const b = await committeeMember(project.id, cookie);
    await api(`/api/schemes/${schemes[0].id}`, { method: "PATCH", cookie, body: { sharedWithClient: true } });
    for (const who of [a.client, b.client]) {
      const m = await waitForMail((x) => x.envelopeTo.length === 1 && x.envelopeTo[0] === who.email && x.subject.includes("new scheme"));
      expect(m.links).toContain(`${baseUrl}/projects/${project.id}/schemes/${schemes[0].id}`);
    }
  });
});
