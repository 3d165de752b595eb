import { randomUUID } from "node:crypto";
import JSZip from "jszip";
import mammoth from "mammoth";
import { afterAll, describe, expect, it } from "vitest";
import { smallDocument } from "../support/fixtures";
import { api, baseUrl, closeTestDb, makeUser, signIn, testDb, type TestUser } from "../support/server";
import { groupThousands } from "@/lib/spec/digits";
import { waitForMail } from "../support/mail";

afterAll(closeTestDb);

async function setUp() {
  const designer = await makeUser("designer");
  const estimator = await makeUser("estimator");
  const [dc, ec] = [await signIn(designer), await signIn(estimator)];
  const project = (await api("/api/projects", { method: "POST", cookie: dc, body: { name: "Quotation tests", clientName: "Invented parish", targetDate: "2029-06-30" } })).json.project;
  const scheme = (await api(`/api/projects/${project.id}/schemes`, { method: "POST", cookie: dc, body: { name: "Scheme A", document: smallDocument() } })).json.scheme;
  // A rate set of the test's own, so changing it touches no other test.
  const set = (await api("/api/rate-sets", { method: "POST", cookie: ec, body: { name: `Quote rates ${randomUUID().slice(0, 8)}` } })).json.rateSet;
  return { designer, estimator, dc, ec, project, scheme, set };
}

async function create(ctx: Awaited<ReturnType<typeof setUp>>) {
  const res = await api(`/api/projects/${ctx.project.id}/quotations`, { method: "POST", cookie: ctx.ec, body: { schemeId: ctx.scheme.id, rateSetId: ctx.set.id } });
  expect(res.status).toBe(201);
  return res.json.quotation;
}

async function download(id: string, kind: string, cookie: string) {
  const res = await fetch(`${baseUrl}/api/quotations/${id}/documents/${kind}`, { headers: { cookie } });
  return { status: res.status, type: res.headers.get("content-type"), bytes: Buffer.from(await res.arrayBuffer()) };
}

/** Every part of a .docx but the embedded fonts (obfuscated with a fresh random key each time they are written). */
async function contentParts(bytes: Buffer): Promise<Map<string, Buffer>> {
  const zip = await JSZip.loadAsync(bytes);
  const out = new Map<string, Buffer>();
  for (const name of Object.keys(zip.files).sort()) {
    if (name.startsWith("word/fonts/") || name === "word/fontTable.xml" || zip.files[name]!.dir) continue;
    out.set(name, await zip.file(name)!.async("nodebuffer"));
  }
  return out;
}

function terms(q: { quotation: { commercial: Record<string, unknown> } }) {
  return structuredClone(q.quotation.commercial) as Record<string, unknown> & { lumpSums: unknown[]; options: unknown[]; stages: { id: string; label: string; percent: string }[] };
}

describe("quotations", () => {
  it("numbers drafts in sequence, prices them from the scheme revision and the chosen rate set, and totals equal their lines", async () => {
    const ctx = await setUp();
    const a = await create(ctx);
    const b = await create(ctx);
    const [, year, n] = /^Q-(\d{4})-(\d{4,})$/.exec(a.number)!;
    expect(b.number).toBe(`Q-${year}-${String(Number(n) + 1).padStart(4, "0")}`);
    expect(a).toMatchObject({ status: "draft", schemeVersion: 1, rateSetVersion: 1 });
    const t = a.quotation.totals;
    expect(t.worksAmount).toBe(a.quotation.estimate.money.netAmount);
    expect(t.stages.map((s: { percent: string }) => s.percent)).toEqual(["25", "25", "25", "25"]);
    const cents = (s: string) => Math.round(Number(s) * 100);
    expect(t.stages.reduce((s: number, x: { amount: string }) => s + cents(x.amount), 0)).toBe(cents(t.totalAmount));
  });

  it("refuses bad terms with 422 and field paths — stages that miss 100 %, a negative lump sum, an unknown currency — and saves nothing", async () => {
    const ctx = await setUp();
    const q = await create(ctx);
    const c = terms(q);
    c.stages = [{ id: "a", label: "On signing", percent: "50" }, { id: "b", label: "On completion", percent: "45" }];
    c.lumpSums = [{ id: "l", category: "case", description: "Case repairs", quantity: "1", unit: "item", unitPrice: "-250.00" }];
    c.currency = "QQQ";
    const res = await api(`/api/quotations/${q.id}`, { method: "PUT", cookie: ctx.ec, body: { version: q.version, commercial: c } });
    expect(res.status).toBe(422);
    expect(res.json.error.fields).toMatchObject({
      "commercial.stages": ["The payment stages add up to 95 %; they must add up to exactly 100 %."],
      "commercial.lumpSums.0.unitPrice": ["Unit price cannot be negative."],
      "commercial.currency": [expect.stringMatching(/"QQQ" is not a known ISO 4217 currency code/)],
    });
    const discount = { ...terms(q), discount: { kind: "amount", value: "999999999.00" } };
    const res2 = await api(`/api/quotations/${q.id}`, { method: "PUT", cookie: ctx.ec, body: { version: q.version, commercial: discount } });
    expect(res2.status).toBe(422);
    expect(res2.json.error.fields["commercial.discount.value"][0]).toMatch(/more than the works and lump sums/);
    const { rows } = await testDb().query("select version, commercial from quotations where id = $1", [q.id]);
    expect(rows[0].version).toBe(q.version);
    expect(rows[0].commercial).toEqual(q.quotation.commercial);
  });

  it("freezes an issued quotation: changing the scheme and the rate set afterwards changes neither it nor its documents", async () => {
    const ctx = await setUp();
    const q = await create(ctx);
    const c = terms(q);
    c.lumpSums = [{ id: "scaffold", category: "scaffolding", description: "Scaffold tower", quantity: "4", unit: "week", unitPrice: "385.50" }];
    c.options = [{ id: "cymbel", title: "Cymbelstern", description: "", price: "4200.00" }];
    c.startDate = "2028-09-04";
    const saved = await api(`/api/quotations/${q.id}`, { method: "PUT", cookie: ctx.ec, body: { version: q.version, commercial: c } });
    expect(saved.status).toBe(200);
    const issued = await api(`/api/quotations/${q.id}/issue`, { method: "POST", cookie: ctx.ec, body: { version: saved.json.quotation.version } });
    expect(issued.status).toBe(200);
    expect(issued.json.quotation.status).toBe("issued");
    const before = (await api(`/api/quotations/${q.id}`, { cookie: ctx.ec })).json.quotation;
    const docsBefore = await Promise.all(["tender", "cost-sheet", "work-list"].map(async (k) => contentParts((await download(q.id, k, ctx.ec)).bytes)));

    // The scheme changes: a stop goes and one is renamed.
    const doc = structuredClone(ctx.scheme.document);
    doc.divisions[0].stops.pop();
    doc.divisions[0].stops[0].name = "Large Open Diapason";
    expect((await api(`/api/schemes/${ctx.scheme.id}`, { method: "PUT", cookie: ctx.dc, body: { version: 1, document: doc } })).status).toBe(200);
    // The rate set changes: every hourly rate up.
    const set = (await api(`/api/rate-sets/${ctx.set.id}`, { cookie: ctx.ec })).json;
    const rates = JSON.parse(JSON.stringify(set.current.rates, (_k, v) => (typeof v === "number" ? String(v) : v)));
    for (const k of Object.keys(rates.hourlyRate)) rates.hourlyRate[k] = "99.00";
    expect((await api(`/api/rate-sets/${ctx.set.id}`, { method: "PUT", cookie: ctx.ec, body: { version: 1, effectiveDate: "2028-02-01", rates } })).status).toBe(200);

    const after = (await api(`/api/quotations/${q.id}`, { cookie: ctx.ec })).json.quotation;
    expect(after.quotation).toEqual(before.quotation);
    expect(after.quotation.scheme.document.divisions[0].stops[0].name).toBe("Open Diapason");
    const docsAfter = await Promise.all(["tender", "cost-sheet", "work-list"].map(async (k) => contentParts((await download(q.id, k, ctx.ec)).bytes)));
    for (const [i, parts] of docsAfter.entries()) {
      expect([...parts.keys()]).toEqual([...docsBefore[i]!.keys()]);
      for (const [name, bytes] of parts) expect(bytes.equals(docsBefore[i]!.get(name)!), name).toBe(true);
    }
    // A new quotation from the current state sees the changes.
    const fresh = await create(ctx);
    expect(fresh.schemeVersion).toBe(2);
    expect(fresh.rateSetVersion).toBe(2);
    expect(fresh.quotation.totals.worksAmount).not.toBe(before.quotation.totals.worksAmount);
    // The frozen terms cannot be edited, and it cannot be issued twice.
    expect((await api(`/api/quotations/${q.id}`, { method: "PUT", cookie: ctx.ec, body: { version: after.version, commercial: c } })).status).toBe(409);
    expect((await api(`/api/quotations/${q.id}/issue`, { method: "POST", cookie: ctx.ec, body: { version: after.version } })).status).toBe(409);
  }, 120_000);

  it("writes a tender with the issued figures, read back with mammoth", async () => {
    const ctx = await setUp();
    const q = await create(ctx);
    const issued = (await api(`/api/quotations/${q.id}/issue`, { method: "POST", cookie: ctx.ec, body: { version: q.version } })).json.quotation;
    const res = await download(q.id, "tender", ctx.ec);
    expect(res.status).toBe(200);
    expect(res.type).toBe("application/vnd.openxmlformats-officedocument.wordprocessingml.document");
    const text = (await mammoth.extractRawText({ buffer: res.bytes })).value.replace(/[\s\u202f\u2009]+/g, " ");
    expect(text).toContain(issued.number);
    for (const s of smallDocument().divisions!.flatMap((d) => d.stops!)) expect(text).toContain(s.name);
    const [w, c] = issued.quotation.totals.totalAmount.split(".");
    expect(text).toContain(`${groupThousands(w, " ")}.${c}`);
  }, 60_000);

  it("lets only estimators and administrators make, change and issue quotations", async () => {
    const ctx = await setUp();
    const q = await create(ctx);
    for (const role of ["designer", "workshop", "client"] as const) {
      const cookie = await signIn(await makeUser(role));
      expect((await api(`/api/projects/${ctx.project.id}/quotations`, { method: "POST", cookie, body: { schemeId: ctx.scheme.id } })).status, role).toBe(403);
      expect((await api(`/api/quotations/${q.id}`, { method: "PUT", cookie, body: { version: q.version, commercial: terms(q) } })).status, role).toBe(403);
      expect((await api(`/api/quotations/${q.id}/issue`, { method: "POST", cookie, body: { version: q.version } })).status, role).toBe(403);
    }
    const admin = await signIn(await makeUser("admin"));
    expect((await api(`/api/quotations/${q.id}/issue`, { method: "POST", cookie: admin, body: { version: q.version } })).status).toBe(200);
    const { rows } = await testDb().query("select count(*)::int as n from quotations where project_id = $1", [ctx.project.id]);
    expect(rows[0].n).toBe(1);
  });

  it("keeps the internal cost sheet from the workshop and clients; a client gets only a tender sent to them", async () => {
    const ctx = await setUp();
    const q = await create(ctx);
    await api(`/api/quotations/${q.id}/issue`, { method: "POST", cookie: ctx.ec, body: { version: q.version } });
    expect((await download(q.id, "cost-sheet", ctx.ec)).status).toBe(200);
    expect((await download(q.id, "cost-sheet", ctx.dc)).status).toBe(200);

    const workshop = await signIn(await makeUser("workshop"));
    expect((await download(q.id, "cost-sheet", workshop)).status).toBe(403);
    expect((await download(q.id, "tender", workshop)).status).toBe(403);
    const list = await download(q.id, "work-list", workshop);
    expect(list.status).toBe(200);
    expect((await mammoth.extractRawText({ buffer: list.bytes })).value).not.toMatch(/€|EUR/);
    expect((await api(`/api/quotations/${q.id}`, { cookie: workshop })).status).toBe(404);

    const client: TestUser = await makeUser("client");
    await api(`/api/projects/${ctx.project.id}/members`, { method: "POST", cookie: ctx.dc, body: { email: client.email } });
    const cc = await signIn(client);
    // Not sent yet: the committee member does not learn it exists.
    expect((await download(q.id, "tender", cc)).status).toBe(404);
    expect((await api(`/api/projects/${ctx.project.id}/quotations`, { cookie: cc })).json.quotations).toEqual([]);
    // Once it was sent to the committee: the tender and its price, and nothing else.
    const sent = await api(`/api/quotations/${q.id}/send`, { method: "POST", cookie: ctx.ec, body: {} });
    expect(sent.status).toBe(200);
    const seen = (await api(`/api/projects/${ctx.project.id}/quotations`, { cookie: cc })).json.quotations;
    expect(seen.map((x: { id: string; totalAmount: string | null }) => [x.id, x.totalAmount])).toEqual([[q.id, sent.json.quotation.quotation.totals.totalAmount]]);
    expect((await download(q.id, "tender", cc)).status).toBe(200);
    expect((await download(q.id, "cost-sheet", cc)).status).toBe(403);
    expect((await download(q.id, "work-list", cc)).status).toBe(403);
    expect((await api(`/api/quotations/${q.id}`, { cookie: cc })).status).toBe(404);
    // A client of another project gets nothing.
    const stranger = await signIn(await makeUser("client"));
    expect((await download(q.id, "tender", stranger)).status).toBe(404);
  }, 60_000);

  it("sends the issued tender to each committee member by e-mail, with the Word document attached", async () => {
    const ctx = await setUp();
    const q = await create(ctx);
    // A draft is not sent, and a project without a committee has no one to send to; nothing is recorded.
    const draft = await api(`/api/quotations/${q.id}/send`, { method: "POST", cookie: ctx.ec, body: {} });
    expect(draft.status).toBe(409);
    expect(draft.json.error.message).toMatch(/draft; issue it/);
    const issued = (await api(`/api/quotations/${q.id}/issue`, { method: "POST", cookie: ctx.ec, body: { version: q.version } })).json.quotation;
    const nobody = await api(`/api/quotations/${q.id}/send`, { method: "POST", cookie: ctx.ec, body: {} });
    expect(nobody.status).toBe(409);
    expect(nobody.json.error.message).toMatch(/no committee member/);
    expect((await testDb().query("select sent_at from quotations where id = $1", [q.id])).rows[0].sent_at).toBeNull();

    const members = [await makeUser("client"), await makeUser("client")];
    for (const m of members) await api(`/api/projects/${ctx.project.id}/members`, { method: "POST", cookie: ctx.dc, body: { email: m.email } });
    // Only the money roles that issue quotations send them.
    for (const role of ["designer", "workshop", "client"] as const) {
      expect((await api(`/api/quotations/${q.id}/send`, { method: "POST", cookie: await signIn(await makeUser(role)), body: {} })).status, role).toBe(403);
    }
    const res = await api(`/api/quotations/${q.id}/send`, { method: "POST", cookie: ctx.ec, body: {} });
    expect(res.status).toBe(200);
    expect(res.json.sentTo).toBe(2);
    expect(res.json.quotation.sentAt).toEqual(expect.any(String));

    const [w, c] = issued.quotation.totals.totalAmount.split(".");
    for (const m of members) {
      // One message each: no member learns the others' addresses.
      const mail = await waitForMail((x) => x.envelopeTo.includes(m.email) && x.subject.includes(issued.number));
      expect(mail.envelopeTo).toEqual([m.email]);
      expect(mail.text.replace(/[\s\u202f]+/g, " ")).toContain(`${groupThousands(w!, " ")}.${c}`);
      const [doc] = mail.attachments;
      expect(doc!.filename).toBe(`tender-${issued.number}.docx`);
      expect(doc!.contentType).toBe("application/vnd.openxmlformats-officedocument.wordprocessingml.document");
      const text = (await mammoth.extractRawText({ buffer: doc!.content })).value;
      expect(text).toContain(issued.number);
      for (const s of smallDocument().divisions!.flatMap((d) => d.stops!)) expect(text).toContain(s.name);
    }
    // The committee member downloads the same tender from the project.
    const cc = await signIn(members[0]!);
    expect((await download(q.id, "tender", cc)).status).toBe(200);

    // Once answered, it is not sent again.
    await api(`/api/quotations/${q.id}/decision`, { method: "POST", cookie: ctx.ec, body: { outcome: "accepted" } });
    const late = await api(`/api/quotations/${q.id}/send`, { method: "POST", cookie: ctx.ec, body: {} });
    expect(late.status).toBe(409);
    expect(late.json.error.message).toMatch(/accepted/);
  }, 120_000);

  it("records acceptance of an issued quotation, and refuses it for a lapsed one", async () => {
    const ctx = await setUp();
    const q = await create(ctx);
    const issued = (await api(`/api/quotations/${q.id}/issue`, { method: "POST", cookie: ctx.ec, body: { version: q.version } })).json.quotation;
    const other = await create(ctx);
    await api(`/api/quotations/${other.id}/issue`, { method: "POST", cookie: ctx.ec, body: { version: other.version } });
    await testDb().query("update quotations set valid_until = date '2000-01-01' where id = $1", [other.id]);
    expect((await api(`/api/quotations/${other.id}`, { cookie: ctx.ec })).json.quotation.status).toBe("lapsed");
    const lapsed = await api(`/api/quotations/${other.id}/decision`, { method: "POST", cookie: ctx.ec, body: { outcome: "accepted" } });
    expect(lapsed.status).toBe(409);
    expect(lapsed.json.error.message).toMatch(/lapsed/);
    const ok = await api(`/api/quotations/${issued.id}/decision`, { method: "POST", cookie: ctx.ec, body: { outcome: "accepted" } });
    expect(ok.json.quotation.status).toBe("accepted");
    expect((await api(`/api/quotations/${issued.id}/decision`, { method: "POST", cookie: ctx.ec, body: { outcome: "declined" } })).status).toBe(409);
    expect((await api(`/api/quotations/${issued.id}/decision`, { method: "POST", cookie: ctx.ec, body: { outcome: "maybe" } })).status).toBe(422);
  });
});
