// The scheme editor streams a skeleton (schemes/[schemeId]/(editor)/loading.tsx) while the server
// draws the board; once it has streamed, the status is sent. So who asks and whether the scheme is
// theirs to see is settled in the layout above it: a missing, foreign or unshared scheme is still a
// 404 worded as for an id that does not exist, and a visitor who is not signed in still goes to sign-in.
import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { smallDocument } from "../support/fixtures";
import { api, baseUrl, closeTestDb, makeUser, signIn } from "../support/server";

afterAll(closeTestDb);

const page = (path: string, cookie?: string) => fetch(`${baseUrl}${path}`, { headers: cookie ? { cookie } : {}, redirect: "manual" });

describe("the scheme editor's page with its loading skeleton", () => {
  it("streams the skeleton for a scheme the user may see, and answers 404 without it for one they may not", async () => {
    const designer = await makeUser("designer");
    const cookie = await signIn(designer);
    const mk = async () => (await api("/api/projects", { method: "POST", cookie, body: { name: `Gate ${randomUUID().slice(0, 8)}`, clientName: "Invented parish" } })).json.project;
    const project = await mk();
    const other = await mk();
    const scheme = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie, body: { name: "S0", document: smallDocument("S0") } })).json.scheme;
    const unshared = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie, body: { name: "S1", document: smallDocument("S1") } })).json.scheme;
    const client = await makeUser("client");
    await api(`/api/projects/${project.id}/members`, { method: "POST", cookie, body: { email: client.email } });
    const clientCookie = await signIn(client);

    // The skeleton is in place: a scheme that exists gets it first, then the editor.
    const ok = await page(`/projects/${project.id}/schemes/${scheme.id}`, cookie);
    expect(ok.status).toBe(200);
    const html = await ok.text();
    expect(html).toContain('data-skeleton="scheme"');
    expect(html).toContain('data-testid="figures"');

    const refused: [string, string][] = [
      [`/projects/${project.id}/schemes/${randomUUID()}`, cookie], // no such scheme
      [`/projects/${project.id}/schemes/not-an-id`, cookie],
      [`/projects/${other.id}/schemes/${scheme.id}`, cookie], // a scheme of another project
      [`/projects/${randomUUID()}/schemes/${scheme.id}`, cookie],
      [`/projects/${project.id}/schemes/${unshared.id}`, clientCookie], // not shared with the committee
    ];
    for (const [path, who] of refused) {
      const res = await page(path, who);
      expect(res.status, path).toBe(404);
      expect(await res.text(), path).not.toContain('data-skeleton="scheme"');
    }

    const signedOut = await page(`/projects/${project.id}/schemes/${scheme.id}`);
    expect(signedOut.status).toBe(307);
    expect(signedOut.headers.get("location")).toContain("/sign-in");
  });
});
