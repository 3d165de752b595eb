import { randomUUID } from "node:crypto";
import Papa from "papaparse";
import { afterAll, describe, expect, it } from "vitest";
import { api, baseUrl, closeTestDb, makeUser, signIn, testDb } from "../support/server";
import firstFormatRates from "../../lib/estimate/test-support/first-format-rates.json";

afterAll(closeTestDb);

async function newSet(cookie: string) {
  const res = await api("/api/rate-sets", { method: "POST", cookie, body: { name: `Test rates ${randomUUID().slice(0, 8)}` } });
  expect(res.status).toBe(201);
  return (await api(`/api/rate-sets/${res.json.rateSet.id}`, { cookie })).json;
}

async function versionCount(rateSetId: string): Promise<number> {
  const { rows } = await testDb().query("select count(*)::int as n from rate_set_versions where rate_set_id = $1", [rateSetId]);
  return rows[0].n;
}

/** The form a browser posts: every rate as text, nested as the rates are. */
function asForm(rates: unknown): unknown {
  return JSON.parse(JSON.stringify(rates, (_k, v) => (typeof v === "number" ? String(v) : v)));
}

describe("the rate book", () => {
  it("saves every change as a new version; old versions stay readable and compare with the current one", async () => {
    const cookie = await signIn(await makeUser("estimator"));
    const set = await newSet(cookie);
    expect(set.set.version).toBe(1);
    const form = asForm(set.current.rates) as { hourlyRate: Record<string, string>; norms: { newMetalPipe: Record<string, string> } };
    form.hourlyRate.voicing = "81.50";
    form.norms.newMetalPipe["2to4"] = "1.75";
    const saved = await api(`/api/rate-sets/${set.set.id}`, { method: "PUT", cookie, body: { version: 1, effectiveDate: "2028-01-01", note: "voicing up", rates: form } });
    expect(saved.status).toBe(200);
    expect(saved.json.set.version).toBe(2);
    expect(saved.json.current.rates.hourlyRate.voicing).toBe("81.50");
    expect(saved.json.current.rates.norms.newMetalPipe["2to4"]).toBe(1.75);
    expect(saved.json.versions.map((v: { version: number; note: string }) => [v.version, v.note])).toEqual([[2, "voicing up"], [1, expect.stringMatching(/copied from/)]]);

    const old = await api(`/api/rate-sets/${set.set.id}/versions/1`, { cookie });
    expect(old.json.version.rates.hourlyRate.voicing).toBe(set.current.rates.hourlyRate.voicing);
    const cmp = await api(`/api/rate-sets/${set.set.id}/compare?from=1&to=2`, { cookie });
    expect(cmp.json.changes.map((c: { key: string; from: string; to: string }) => [c.key, c.from, c.to])).toEqual([
      ["hourlyRate.voicing", set.current.rates.hourlyRate.voicing, "81.50"],
      ["norms.newMetalPipe.2to4", String(set.current.rates.norms.newMetalPipe["2to4"]), "1.75"],
    ]);
  });

  it("answers bad rate values with 422 and every field path in the estimator's words, and saves nothing", async () => {
    const cookie = await signIn(await makeUser("admin"));
    const set = await newSet(cookie);
    const form = asForm(set.current.rates) as { hourlyRate: Record<string, string>; programme: { efficiency: string; crew: Record<string, string> }; currency: string };
    form.hourlyRate.voicing = "-5";
    form.programme.efficiency = "1.4";
    form.programme.crew.erection = "2.5";
    form.currency = "XYZ";
    const res = await api(`/api/rate-sets/${set.set.id}`, { method: "PUT", cookie, body: { version: 1, effectiveDate: "2028-01-01", rates: form } });
    expect(res.status).toBe(422);
    expect(Object.keys(res.json.error.fields).sort()).toEqual(["rates.currency", "rates.hourlyRate.voicing", "rates.programme.crew.erection", "rates.programme.efficiency"]);
    expect(res.json.error.fields["rates.programme.efficiency"][0]).toMatch(/^Programme — Efficiency .* must be more than 0 and at most 1\.$/);
    expect(res.json.error.fields["rates.currency"][0]).toMatch(/"XYZ" is not a known ISO 4217 currency code/);
    expect(JSON.stringify(res.json)).not.toMatch(/Invalid|expected (number|string)/);
    expect(await versionCount(set.set.id)).toBe(1);
    // A stale version is refused with 409, and nothing is written either.
    const stale = await api(`/api/rate-sets/${set.set.id}`, { method: "PUT", cookie, body: { version: 7, effectiveDate: "2028-01-01", rates: asForm(set.current.rates) } });
    expect(stale.status).toBe(409);
    expect(await versionCount(set.set.id)).toBe(1);
  });

  it("exports a CSV a spreadsheet opens, previews an edited file row by row, and saves it as a new version", async () => {
    const cookie = await signIn(await makeUser("estimator"));
    const set = await newSet(cookie);
    const csv = await api(`/api/rate-sets/${set.set.id}/csv`, { cookie });
    expect(csv.status).toBe(200);
    expect(csv.text.startsWith("label,key,value,unit")).toBe(true);
    // A byte-order mark first (fetch's text() drops it), so spreadsheets read the file as UTF-8.
    const raw = await fetch(`${baseUrl}/api/rate-sets/${set.set.id}/csv`, { headers: { cookie } });
    expect([...Buffer.from(await raw.arrayBuffer()).subarray(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    expect(raw.headers.get("content-disposition")).toMatch(/^attachment; filename=".+-v1\.csv"$/);
    const rows = Papa.parse<string[]>(csv.text.replace(/^\uFEFF/, "")).data.filter((r) => r.length > 1);
    const edited = rows.map((r) => (r[1] === "hourlyRate.erection" ? [r[0]!, r[1]!, "61.25", r[3]!] : r));
    const preview = await api(`/api/rate-sets/${set.set.id}/import`, { method: "POST", cookie, body: { version: 1, csv: Papa.unparse(edited), commit: false } });
    expect(preview.status).toBe(200);
    expect(preview.json.preview.ok).toBe(true);
    expect(preview.json.preview.changedCount).toBe(1);
    expect(await versionCount(set.set.id)).toBe(1);
    const commit = await api(`/api/rate-sets/${set.set.id}/import`, { method: "POST", cookie, body: { version: 1, csv: Papa.unparse(edited), commit: true } });
    expect(commit.status).toBe(200);
    expect(commit.json.savedVersion).toBe(2);
    expect((await api(`/api/rate-sets/${set.set.id}`, { cookie })).json.current.rates.hourlyRate.erection).toBe("61.25");
  });

  it("names every bad row of an imported file and saves nothing from it", async () => {
    const cookie = await signIn(await makeUser("estimator"));
    const set = await newSet(cookie);
    const csv = (await api(`/api/rate-sets/${set.set.id}/csv`, { cookie })).text.replace(/^\uFEFF/, "");
    const rows = Papa.parse<string[]>(csv).data.filter((r) => r.length > 1);
    const at = (key: string) => rows.findIndex((r) => r[1] === key);
    rows[at("hourlyRate.voicing")]![2] = "seventy";
    rows[at("programme.hoursPerWeek")]![2] = "0";
    rows.push(["", "norms.noSuchNorm", "1", ""]);
    const body = { version: 1, csv: Papa.unparse(rows), commit: true };
    const res = await api(`/api/rate-sets/${set.set.id}/import`, { method: "POST", cookie, body });
    expect(res.status).toBe(422);
    const bad = res.json.error.details.preview.rows.filter((r: { problems: string[] }) => r.problems.length);
    expect(bad.map((r: { row: number }) => r.row)).toEqual([at("hourlyRate.voicing") + 1, at("programme.hoursPerWeek") + 1, rows.length]);
    expect(res.json.error.fields[`csv.row.${rows.length}`][0]).toBe(`Row ${rows.length}: no rate is called "norms.noSuchNorm".`);
    expect(await versionCount(set.set.id)).toBe(1);
  });

  it("reads a version stored before the estimator gained a rate, with that rate's demo default filled in", async () => {
    const cookie = await signIn(await makeUser("estimator"));
    const set = await newSet(cookie);
    // As if saved by an older Stopwright: one nested norm and one top-level rate are not in the stored JSON.
    await testDb().query("update rate_set_versions set rates = (rates #- '{norms,relocatePipe}') - 'cutUpByFamily' where rate_set_id = $1", [set.set.id]);
    const read = await api(`/api/rate-sets/${set.set.id}`, { cookie });
    expect(read.status).toBe(200);
    expect(read.json.current.rates.norms.relocatePipe).toBe(set.current.rates.norms.relocatePipe);
    expect(read.json.current.rates.cutUpByFamily).toEqual(set.current.rates.cutUpByFamily);
    expect(read.json.current.rates.hourlyRate).toEqual(set.current.rates.hourlyRate);
  });

  it("reads a version stored in the first rates format (one cut-up, per-pipe voicing norms), keeping its figures", async () => {
    const cookie = await signIn(await makeUser("estimator"));
    const set = await newSet(cookie);
    const old = { ...firstFormatRates, cutUpFraction: 0.28, hourlyRate: { ...firstFormatRates.hourlyRate, voicing: "77.00" } };
    await testDb().query("update rate_set_versions set rates = $2::jsonb where rate_set_id = $1", [set.set.id, JSON.stringify(old)]);
    const read = await api(`/api/rate-sets/${set.set.id}`, { cookie });
    expect(read.status).toBe(200);
    expect(read.json.current.rates.hourlyRate.voicing).toBe("77.00");
    expect(read.json.current.rates.cutUpByFamily.flute).toBe(0.28);
    expect(read.json.current.rates.norms.voiceNewFluePipe.over8).toBe(firstFormatRates.norms.voiceNewFluePipe);
  });

  it("is for estimators and administrators only", async () => {
    const owner = await signIn(await makeUser("estimator"));
    const set = await newSet(owner);
    for (const role of ["designer", "workshop", "client"] as const) {
      const cookie = await signIn(await makeUser(role));
      expect((await api("/api/rate-sets", { cookie })).status, role).toBe(403);
      expect((await api(`/api/rate-sets/${set.set.id}`, { method: "PUT", cookie, body: { version: 1, effectiveDate: "2028-01-01", rates: asForm(set.current.rates) } })).status, role).toBe(403);
      expect((await api(`/api/rate-sets/${set.set.id}/csv`, { cookie })).status, role).toBe(403);
    }
    expect(await versionCount(set.set.id)).toBe(1);
  });

  it("takes a CSV file only inside a JSON body from the app's own pages", async () => {
    const cookie = await signIn(await makeUser("estimator"));
    const set = await newSet(cookie);
    const asText = await api(`/api/rate-sets/${set.set.id}/import`, { method: "POST", cookie, body: "key,value\n", headers: { "content-type": "text/csv" } });
    expect(asText.status).toBe(415);
    const foreign = await api(`/api/rate-sets/${set.set.id}/import`, { method: "POST", cookie, body: { version: 1, csv: "", commit: true }, headers: { origin: "http://evil.example" } });
    expect(foreign.status).toBe(403);
  });
});

describe("firm details", () => {
  it("an administrator saves them, with a logo; bad input is refused with field paths and nothing changes", async () => {
    const cookie = await signIn(await makeUser("admin"));
    const before = (await api("/api/firm", { cookie })).json;
    const bad = await api("/api/firm", { method: "PUT", cookie, body: { version: before.version, details: { ...before.details, name: "", email: "not-an-address" } } });
    expect(bad.status).toBe(422);
    expect(Object.keys(bad.json.error.fields).sort()).toEqual(["details.email", "details.name"]);
    expect((await api("/api/firm", { cookie })).json.version).toBe(before.version);
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="200" height="50"><rect width="200" height="50" fill="#b0852f"/></svg>').toString("base64");
    const ok = await api("/api/firm", { method: "PUT", cookie, body: { version: before.version, details: { ...before.details, name: before.details.name || "Invented Organ Works" }, logo: { kind: "upload", type: "image/svg+xml", base64: svg } } });
    expect(ok.status).toBe(200);
    expect(ok.json.details.logo).toMatchObject({ width: 800, height: 200 });
    expect(Buffer.from(ok.json.details.logo.png, "base64").subarray(1, 4).toString()).toBe("PNG");
    const notPng = await api("/api/firm", { method: "PUT", cookie, body: { version: ok.json.version, details: ok.json.details, logo: { kind: "upload", type: "image/png", base64: Buffer.from("hello").toString("base64") } } });
    expect(notPng.status).toBe(422);
    expect(notPng.json.error.fields["logo.base64"][0]).toMatch(/not a PNG image/);
  });

  it("is refused to every role but the administrator", async () => {
    for (const role of ["designer", "estimator", "workshop", "client"] as const) {
      const cookie = await signIn(await makeUser(role));
      expect((await api("/api/firm", { cookie })).status, role).toBe(403);
    }
  });
});
