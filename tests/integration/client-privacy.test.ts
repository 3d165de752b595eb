// What a committee member's browser receives: only their own project's shared schemes, and never the
// firm's rates, labour norms, crew sizes, hours or margins — checked in the JSON of every route they
// may call and in the HTML and React Server Component payload of every page they may open.
import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { smallDocument } from "../support/fixtures";
import { api, baseUrl, closeTestDb, makeUser, signIn } from "../support/server";

afterAll(closeTestDb);

const uid = () => randomUUID().slice(0, 8);

/** Keys and values that only the firm may hold: every norm, rate, price, percentage, crew and hour field. */
const FIRM_ONLY = [
  ...Object.keys(DEFAULT_RATES.norms),
  "hourlyRate", "metalPricePerKg", "woodPricePerM3", "cablePricePerM", "overheadPercent", "contingencyPercent", "marginPercent", "taxPercent",
  "crew", "hoursPerWeek", "efficiency", "norms", "ratesProvenance", DEFAULT_RATES.provenance,
  "hoursTotal", "pipeHours", "labourAmount", "materialsAmount", "totalAmount", "directCostAmount", "byCentre",
];
/**
 * A JSON key holding an object, as it appears in a response or, escaped, inside the page's RSC script
 * payload: the estimate's "hours" and "money", money's "margin", the editor's "rates". (A style's
 * "margin": "0 20px" on a framework page is no leak.)
 */
const keyPattern = (k: string) => new RegExp(`\\\\?"${k}\\\\?"\\s*:\\s*\\{`);

function firmOnlyFound(text: string, extraKeys: string[] = []): string[] {
  const words = FIRM_ONLY.filter((w) => text.includes(w));
  const keys = ["hours", "margin", "money", "rates", ...extraKeys].filter((k) => keyPattern(k).test(text));
  return [...words, ...keys.map((k) => `"${k}":`)];
}

async function setUp() {
  const designer = await makeUser("designer");
  const cookie = await signIn(designer);
  const mk = async (name: string, shared: boolean[]) => {
    const project = (await api("/api/projects", { method: "POST", cookie, body: { name, clientName: "Invented parish" } })).json.project;
    const schemes = [];
    for (const [i, share] of shared.entries()) {
      const s = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie, body: { name: `S${i}`, document: smallDocument(`S${i}`) } })).json.scheme;
      if (share) await api(`/api/schemes/${s.id}`, { method: "PATCH", cookie, body: { sharedWithClient: true } });
      schemes.push(s);
    }
    return { project, schemes };
  };
  const mine = await mk(`Mine ${uid()}`, [true, true, false]);
  const theirs = await mk(`Theirs ${uid()}`, [true, true]);
  const client = await makeUser("client");
  await api(`/api/projects/${mine.project.id}/members`, { method: "POST", cookie, body: { email: client.email } });
  return { cookie, mine, theirs, clientCookie: await signIn(client) };
}

describe("a committee member", () => {
  it("gets 404 for every route of another project and for unshared schemes, worded as for ids that do not exist", async () => {
    const { mine, theirs, clientCookie } = await setUp();
    const p = theirs.project.id;
    const [s1, s2] = theirs.schemes.map((s: { id: string }) => s.id);
    const hidden = mine.schemes[2].id;
    const ghost = randomUUID();
    const calls: [string, string, unknown?][] = [
      ["GET", `/api/projects/${p}`],
      ["GET", `/api/schemes/${s1}`],
      ["GET", `/api/schemes/${s1}/comments`],
      ["POST", `/api/schemes/${s1}/comments`, { body: "hello" }],
      ["GET", `/api/projects/${p}/compare?schemes=${s1},${s2}`],
      ["GET", `/api/projects/${p}/preference`],
      ["PUT", `/api/projects/${p}/preference`, { schemeId: s1 }],
      ["PUT", `/api/projects/${mine.project.id}/preference`, { schemeId: s1 }],
      ["GET", `/api/schemes/${hidden}`],
      ["GET", `/api/schemes/${hidden}/comments`],
      ["GET", `/api/projects/${mine.project.id}/compare?schemes=${mine.schemes[0].id},${hidden}`],
      ["GET", `/api/projects/${mine.project.id}/compare?schemes=${mine.schemes[0].id},${s1}`],
    ];
    for (const [method, path, body] of calls) {
      const res = await api(path, { method, cookie: clientCookie, body });
      expect(res.status, `${method} ${path}`).toBe(404);
    }
    for (const path of [`/projects/${p}`, `/projects/${p}/schemes/${s1}`, `/projects/${p}/compare?schemes=${s1},${s2}`, `/projects/${mine.project.id}/schemes/${hidden}`]) {
      expect((await fetch(`${baseUrl}${path}`, { headers: { cookie: clientCookie } })).status, path).toBe(404);
    }
    // Nothing tells a foreign scheme from one that does not exist.
    const foreign = await api(`/api/schemes/${s1}`, { cookie: clientCookie });
    const missing = await api(`/api/schemes/${ghost}`, { cookie: clientCookie });
    expect(foreign.json).toEqual(missing.json);
  });

  it("receives no rate, norm, crew, hour or margin field in any JSON answer or page it may open", async () => {
    const { cookie, mine, clientCookie } = await setUp();
    const p = mine.project.id;
    const [s0, s1] = mine.schemes.map((s: { id: string }) => s.id);
    await api(`/api/schemes/${s0}/notes`, { method: "POST", cookie, body: { body: "firm-note-marker" } });
    const json = [`/api/projects`, `/api/projects/${p}`, `/api/schemes/${s0}`, `/api/schemes/${s0}/comments`, `/api/projects/${p}/compare?schemes=${s0},${s1}`, `/api/projects/${p}/preference`];
    const pages = [`/`, `/projects`, `/projects/${p}`, `/projects/${p}/schemes/${s0}`, `/projects/${p}/schemes/${s0}/stop-list`, `/projects/${p}/compare?schemes=${s0},${s1}`, `/projects/${p}/files`];
    for (const path of json) {
      const res = await api(path, { cookie: clientCookie });
      expect(res.status, path).toBe(200);
      expect(firmOnlyFound(res.text), path).toEqual([]);
    }
    for (const path of pages) {
      // The HTML with its inline RSC payload, and the RSC payload a client-side navigation fetches.
      for (const headers of [{ cookie: clientCookie }, { cookie: clientCookie, rsc: "1" }] as Record<string, string>[]) {
        const res = await fetch(`${baseUrl}${path}`, { headers });
        expect(res.status, path).toBe(200);
        const text = await res.text();
        expect(firmOnlyFound(text), `${path} ${headers.rsc ? "(RSC)" : "(HTML)"}`).toEqual([]);
        expect(text).not.toContain("firm-note-marker");
      }
    }
    // The same search on the estimator's editor page finds the rates there: the check can fail.
    const estimator = await signIn(await makeUser("estimator"));
    const firmPage = await (await fetch(`${baseUrl}/projects/${p}/schemes/${s0}`, { headers: { cookie: estimator } })).text();
    expect(firmOnlyFound(firmPage)).toEqual(expect.arrayContaining(["hourlyRate", "marginPercent", "newMetalPipe"]));
  });

  it("while the workshop sees hours but no norm, crew size or price on the editor and chests pages", async () => {
    const { mine } = await setUp();
    const workshop = await signIn(await makeUser("workshop"));
    const p = mine.project.id;
    const s0 = mine.schemes[0].id;
    for (const path of [`/projects/${p}/schemes/${s0}`, `/projects/${p}/schemes/${s0}/chests`, `/projects/${p}/compare?schemes=${s0},${mine.schemes[1].id}`]) {
      const text = await (await fetch(`${baseUrl}${path}`, { headers: { cookie: workshop } })).text();
      const found = firmOnlyFound(text).filter((f) => !["hoursTotal", "pipeHours", '"hours":'].includes(f));
      expect(found, path).toEqual([]);
    }
    const editor = await (await fetch(`${baseUrl}/projects/${p}/schemes/${s0}`, { headers: { cookie: workshop } })).text();
    expect(editor).toContain("hoursTotal");
  });
});
