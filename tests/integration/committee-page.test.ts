// A committee member's own page of their project: the schemes shared with them, the firm's people
// apart from the committee, and what happens next, from the project's status and the tenders sent.
import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { smallDocument } from "../support/fixtures";
import { api, baseUrl, closeTestDb, makeUser, signIn } from "../support/server";

afterAll(closeTestDb);

const entities: Record<string, string> = { amp: "&", lt: "<", gt: ">", quot: '"', "#x27": "'", "#39": "'", nbsp: " " };
const decode = (s: string) => s.replace(/&(amp|lt|gt|quot|#x27|#39|nbsp);/g, (_, e: string) => entities[e]!);

/** The page as a browser first gets it: the server-rendered HTML, scripts left out. */
async function page(path: string, cookie: string) {
  const res = await fetch(`${baseUrl}${path}`, { headers: { cookie } });
  const html = (await res.text()).replace(/<script[\s\S]*?<\/script>/g, "");
  const part = (testId: string) => {
    const m = new RegExp(`data-testid="${testId}"[^>]*>([\\s\\S]*?)</(ul|section|p)>`).exec(html);
    return m ? decode(m[1]!.replace(/<!-- -->/g, "").replace(/<[^<>]*>/g, " ").replace(/\s+/g, " ").trim()) : null;
  };
  return { status: res.status, html, part };
}

describe("the committee's project page", () => {
  it("lists the shared schemes and the firm's people by name and role, and says what happens next at each stage", async () => {
    const designer = await makeUser("designer");
    const estimator = await makeUser("estimator");
    const client = await makeUser("client");
    const [dc, ec, cc] = [await signIn(designer), await signIn(estimator), await signIn(client)];
    const project = (await api("/api/projects", { method: "POST", cookie: dc, body: { name: `Committee page ${randomUUID().slice(0, 6)}`, clientName: "Invented parish", venue: "St Invented", targetDate: "2029-06-30" } })).json.project;
    for (const who of [estimator, client]) expect((await api(`/api/projects/${project.id}/members`, { method: "POST", cookie: dc, body: { email: who.email } })).status).toBe(200);
    const shared = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie: dc, body: { name: "Scheme A", document: smallDocument() } })).json.scheme;
    await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie: dc, body: { name: "Scheme in the drawer", document: smallDocument() } });

    // Nothing shared yet: the firm is preparing schemes.
    let p = await page(`/projects/${project.id}`, cc);
    expect(p.status).toBe(200);
    expect(p.part("next-now")).toMatch(/is preparing schemes for your organ\.$/);
    expect(p.html).toContain("No scheme has been shared with you yet.");
    expect(p.html).not.toContain("Scheme in the drawer");
    // The firm's people apart from the committee, by name and role; no e-mail, no stray separators.
    expect(p.part("firm-people")).toBe("Test designer Tonal director Test estimator Estimator");
    expect(p.part("committee-people")).toBe("Test client (you)");
    expect(p.html).not.toContain(designer.email);
    expect(p.html).not.toContain(estimator.email);
    // None of the firm's working parts: no details form, no member management.
    expect(p.html).not.toMatch(/Add by e-mail|Archive project|Save details/);

    // A scheme shared: read it, say which is preferred.
    expect((await api(`/api/schemes/${shared.id}`, { method: "PATCH", cookie: dc, body: { sharedWithClient: true } })).status).toBe(200);
    p = await page(`/projects/${project.id}`, cc);
    expect(p.part("next-now")).toMatch(/One scheme is ready for you to read\.$/);
    expect(p.html).toContain("Scheme A");
    expect(p.html).not.toContain("Scheme in the drawer");

    // A tender sent: its number and how long it stands.
    const set = (await api("/api/rate-sets", { method: "POST", cookie: ec, body: { name: `Committee page ${randomUUID().slice(0, 8)}` } })).json.rateSet;
    const q = (await api(`/api/projects/${project.id}/quotations`, { method: "POST", cookie: ec, body: { schemeId: shared.id, rateSetId: set.id } })).json.quotation;
    const issued = (await api(`/api/quotations/${q.id}/issue`, { method: "POST", cookie: ec, body: { version: q.version } })).json.quotation;
    expect(issued.validUntil).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    p = await page(`/projects/${project.id}`, cc);
    expect(p.part("next-now")).not.toContain(issued.number); // issued, not yet sent: the committee does not learn of it
    expect((await api(`/api/quotations/${q.id}/send`, { method: "POST", cookie: ec, body: {} })).status).toBe(200);
    p = await page(`/projects/${project.id}`, cc);
    const until = new Date(issued.validUntil).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });
    expect(p.part("next-now")).toContain(`has sent you tender ${issued.number} for Scheme A, valid until ${until}.`);
    expect(decode(p.html)).toMatch(/To accept it or to ask for changes, reply to the e-mail it came with/);

    // The firm's own page of the same project is unchanged for the firm.
    const firmView = await page(`/projects/${project.id}`, dc);
    expect(firmView.html).toContain("The firm on this project");
    expect(firmView.html).not.toContain('data-testid="next-steps"');
  }, 60_000);
});
