// The documents written for the large example, read back with a general-purpose docx reader (mammoth),
// then opened in a real word processor (Debian's LibreOffice Writer, installed by scripts/test.sh) and
// checked as PDF with poppler's pdftotext, pdfinfo and pdffonts.
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import JSZip from "jszip";
import mammoth from "mammoth";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { pitchText } from "@/components/spec/format";
import { writeDocument } from "@/lib/documents";
import { formatCount, formatMoney } from "@/lib/documents/common";
import { workItems } from "@/lib/documents/work-list";
import { exampleQuotation } from "@/lib/quote/example";
import { readQuotationSnapshot, type Quotation } from "@/lib/quote/quotation";
import issuedFirstFormat from "@/lib/quote/test-support/issued-first-format.json";

const large = JSON.parse(readFileSync(join(__dirname, "../../examples/large-five-manual.json"), "utf8"));
/** Spaces of every width as one plain space, so a figure reads the same in docx, mammoth and pdftotext. */
const norm = (s: string) => s.replace(/[\s\u00a0\u2009\u202f]+/g, " ");

let q: Quotation;
let tender: Buffer;
let text: string;
let dir: string;

beforeAll(async () => {
  q = exampleQuotation(large);
  tender = await writeDocument("tender", q);
  text = norm((await mammoth.extractRawText({ buffer: tender })).value);
  dir = mkdtempSync(join(tmpdir(), "stopwright-docs-"));
}, 60_000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe("the tender for the large example, read back with mammoth", () => {
  it("names every stop of every division with its pitch as the trade writes it", () => {
    let n = 0;
    for (const d of q.scheme.document.divisions) {
      expect(text).toContain(d.name.toUpperCase());
      for (const s of d.stops) {
        n++;
        expect(text, `${d.name}: ${s.name}`).toContain(`${n}. ${s.name}`);
      }
    }
    expect(n).toBeGreaterThan(140);
    // Mutations typeset with true fractions and a prime.
    const nazard = q.scheme.document.divisions.flatMap((d) => d.stops).find((s) => s.footage === "2 2/3")!;
    expect(pitchText(nazard)).toBe("2⅔′");
    expect(text).toContain("2⅔′");
  });

  it("names a mixture once with its ranks, even when its name already carries them", () => {
    const named = q.scheme.document.divisions.flatMap((d) => d.stops).filter((s) => s.family === "mixture" && / [IVX]+$/.test(s.name));
    expect(named.length).toBeGreaterThan(2);
    for (const s of named) expect(text, s.name).not.toContain(`${s.name} ${pitchText(s)}`);
    expect(text).not.toMatch(/\b(II|III|IV|V|VI) \1\b/);
    expect(text).toContain("Pedal: Mixture IV 2⅔′ — ");
  });

  it("gives every division's pipe total and price, and the grand total, exactly as the frozen estimate and totals have them", () => {
    for (const d of q.estimate.divisions) {
      const stops = d.stops.filter((s) => s.origin !== "removed").length;
      expect(text, d.name).toContain(norm(`${d.name}: ${stops} stops pipes ${formatCount(d.pipes.total)}`));
    }
    for (const w of q.totals.works) expect(text, w.label).toContain(norm(`${w.label} € ${formatMoney(w.amount)}`));
    expect(text).toContain(norm(`Total price € ${formatMoney(q.totals.totalAmount)}`));
    expect(text).toContain(norm(`Pipes in the finished organ ${formatCount(q.estimate.totals.pipes.total)}`));
    for (const s of q.totals.stages) expect(text).toContain(norm(`${s.label} ${s.percent} % € ${formatMoney(s.amount)}`));
  });

  it("carries the cover, scope, technical notes, programme, options, provisional sums, exclusions, validity, safety and acceptance", () => {
    for (const section of ["Tender", "Introduction", "1. Specification", "2. Scope of works", "3. Technical notes", "4. Programme", "5. Price", "6. Options", "7. Provisional sums", "8. Payment stages", "9. Exclusions", "10. Validity and terms", "11. Safety", "12. Acceptance"]) {
      expect(text, section).toContain(section);
    }
    for (const o of q.totals.options) expect(text).toContain(o.title);
    expect(text).toMatch(/licensed electrician/);
    expect(text).toMatch(/local codes, regulations/);
    expect(text).toMatch(/Signature:/);
    expect(text).toContain(q.number);
  });

  it("prices the organ's own parts of the work on their own lines and says what they are", () => {
    // The large example has a new case with display pipes, a new wind system and a site 320 km away (examples/large-five-manual.json).
    for (const label of ["Case and front", "Wind system", "Console", "Site, transport and travel", "Design and management"]) {
      const line = q.totals.works.find((w) => w.label === label);
      expect(line, label).toBeDefined();
      expect(text).toContain(norm(`${label} € ${formatMoney(line!.amount)}`));
    }
    expect(text).not.toContain("Console, wiring, transport and general work");
    expect(text).toContain("Wind, case, site and design");
    expect(text).toMatch(/Wind system new: a new blower of about [\d.,]+ m³\/min/);
    expect(text).toMatch(/Case new, about 14[\s,]?000 mm wide/);
    expect(text).toContain(`${q.estimate.case.dummyPipes} new display pipes`);
  });

  it("says nothing of the firm's hours, rates or margins", () => {
    expect(text).not.toMatch(/[Mm]argin|[Oo]verheads|[Cc]ontingency|per hour|Voicing/);
    expect(text).not.toContain(formatMoney(q.estimate.money.subtotalAmount));
  });

  it("embeds the shipped fonts and the programme picture", async () => {
    const zip = await JSZip.loadAsync(tender);
    const names = Object.keys(zip.files);
    expect(names.filter((n) => n.startsWith("word/fonts/"))).toHaveLength(6);
    expect(names.some((n) => /^word\/media\/.+\.png$/.test(n))).toBe(true);
    const fontTable = await zip.file("word/fontTable.xml")!.async("string");
    expect(fontTable).toContain('w:name="Source Serif 4"');
    expect(fontTable).toContain('w:name="Inter"');
  });
});

describe("the tender opened in LibreOffice Writer", () => {
  it("converts to a PDF whose text, page count and fonts are a firm's document", () => {
    const file = join(dir, "tender.docx");
    writeFileSync(file, tender);
    execFileSync("libreoffice", ["--headless", `-env:UserInstallation=file://${join(dir, "profile")}`, "--convert-to", "pdf", "--outdir", dir, file], { timeout: 180_000, stdio: "pipe" });
    const pdf = join(dir, "tender.pdf");
    const pdfText = norm(execFileSync("pdftotext", ["-layout", pdf, "-"], { encoding: "utf8" }));
    expect(pdfText).toContain(`Tender ${q.number}`);
    expect(pdfText).toContain(`€ ${norm(formatMoney(q.totals.totalAmount))}`);
    for (const d of q.estimate.divisions) expect(pdfText).toContain(d.name.toUpperCase());
    expect(pdfText).toMatch(/12\. Acceptance/);
    const pages = Number(/Pages:\s+(\d+)/.exec(execFileSync("pdfinfo", [pdf], { encoding: "utf8" }))![1]);
    // About 150 stops in the trade's layout, plus the commercial sections: a real tender, not a page or two.
    expect(pages).toBeGreaterThanOrEqual(10);
    expect(pages).toBeLessThanOrEqual(30);
    const fonts = execFileSync("pdffonts", [pdf], { encoding: "utf8" });
    expect(fonts).toMatch(/SourceSerif4-Regular\s+TrueType/);
    expect(fonts).toMatch(/Inter-Regular\s+TrueType/);
  }, 240_000);
});

describe("the internal cost sheet and the workshop's work list", () => {
  it("the cost sheet shows hours, rates, overheads, contingency and margin, and says it is internal", async () => {
    const doc = norm((await mammoth.extractRawText({ buffer: await writeDocument("cost-sheet", q) })).value);
    expect(doc).toContain("INTERNAL — CONFIDENTIAL");
    const m = q.estimate.money;
    expect(doc).toContain(norm(`Margin ${m.margin.percent} % € ${formatMoney(m.margin.amount)}`));
    expect(doc).toContain(norm(`Contingency ${m.contingency.percent} % € ${formatMoney(m.contingency.amount)}`));
    for (const l of m.labour) expect(doc, l.label).toContain(norm(`${l.label} ${formatCount(l.hours, 1)} € ${formatMoney(l.rateAmount)} € ${formatMoney(l.amount)}`));
    expect(doc).toContain(norm(`Total price quoted € ${formatMoney(q.totals.totalAmount)}`));
    // The discount's line when there is one; no line, and never a signed zero, when there is none; the mixtures' ranks once.
    expect(q.totals.discount.kind).not.toBe("none");
    expect(doc).toContain(norm(`Discount € −${formatMoney(q.totals.discount.amount)}`));
    expect(doc).not.toMatch(/\b(II|III|IV|V|VI) \1\b/);
    const plain = norm((await mammoth.extractRawText({ buffer: await writeDocument("cost-sheet", exampleQuotation(large, { discount: { kind: "none", value: "0" } })) })).value);
    expect(plain).toContain("Total price quoted");
    expect(plain).not.toMatch(/Discount|−\s?€?\s?0\.00|€ −0\.00/);
  }, 60_000);

  it("the work list has every rank to make, restore, revoice or move, biggest first within each kind of work, and no prices", async () => {
    const doc = norm((await mammoth.extractRawText({ buffer: await writeDocument("work-list", q) })).value);
    expect(doc).not.toMatch(/€|EUR|[Mm]argin/);
    const items = workItems(q);
    const expected = q.estimate.divisions.flatMap((d) => d.stops.filter((s) => s.work.some((w) => ["restored", "revoiced", "relocated", "rescaled"].includes(w)) || ((s.origin === "new" || s.origin === "extension") && s.pipes.new > 0)));
    expect(items).toHaveLength(expected.length);
    for (const i of items) expect(doc).toContain(norm(`${i.stop.name} ${i.pitch}`));
    // New work before restoration, restoration before revoicing; within a kind, the longest pipes first.
    const order = ["New metal", "New wooden", "New reeds", "Restoration", "Revoicing", "Moving"];
    const groups = items.map((i) => order.findIndex((o) => i.group.startsWith(o)));
    expect(groups).toEqual([...groups].sort((a, b) => a - b));
    for (let k = 1; k < items.length; k++) {
      if (items[k]!.group === items[k - 1]!.group) expect(items[k]!.stop.longestSpeakingLengthMm ?? 0).toBeLessThanOrEqual(items[k - 1]!.stop.longestSpeakingLengthMm ?? 0);
    }
  }, 60_000);

  it("writes the same document content every time for the same quotation", async () => {
    const [a, b] = [await writeDocument("tender", q), await writeDocument("tender", q)];
    const [za, zb] = [await JSZip.loadAsync(a), await JSZip.loadAsync(b)];
    for (const name of Object.keys(za.files).filter((n) => !n.startsWith("word/fonts/") && n !== "word/fontTable.xml")) {
      expect(await zb.file(name)!.async("nodebuffer"), name).toEqual(await za.file(name)!.async("nodebuffer"));
    }
  }, 60_000);
});

describe("a quotation issued before stops had an origin and a work", () => {
  // Frozen by the first format: stops with one treatment word, an estimate with no parts of the work
  // (lib/quote/test-support/issued-first-format.json, the small example as issued then).
  const old = readQuotationSnapshot(issuedFirstFormat);

  it("opens with its stops read in today's words and its figures as issued", () => {
    const doc = old.scheme.document.divisions.flatMap((d) => d.stops);
    expect(doc.find((s) => s.name === "Stopped Diapason")).toMatchObject({ origin: "existing", work: ["restored"] });
    const est = old.estimate.divisions.flatMap((d) => d.stops);
    expect(est.find((s) => s.name === "Bass Flute")).toMatchObject({ origin: "extension", work: [] });
    expect(old.totals).toEqual(issuedFirstFormat.totals);
    expect(old.estimate.money.netAmount).toBe(issuedFirstFormat.estimate.money.netAmount);
  });

  it("writes its tender, cost sheet and work list with the price it was issued at", async () => {
    const tenderText = norm((await mammoth.extractRawText({ buffer: await writeDocument("tender", old) })).value);
    expect(tenderText).toContain(norm(`Total price € ${formatMoney(issuedFirstFormat.totals.totalAmount)}`));
    expect(tenderText).toContain(norm(`Console, wiring, transport and general work € ${formatMoney(issuedFirstFormat.totals.works.at(-1)!.amount)}`));
    expect(tenderText).toContain("Existing stops to be restored");
    expect(tenderText).toContain("Existing: restored");
    // It priced no case, wind or site lines, so its scope does not claim them.
    expect(tenderText).not.toContain("Wind, case, site and design");
    const sheet = norm((await mammoth.extractRawText({ buffer: await writeDocument("cost-sheet", old) })).value);
    expect(sheet).toContain(norm(`Total price quoted € ${formatMoney(issuedFirstFormat.totals.totalAmount)}`));
    const list = norm((await mammoth.extractRawText({ buffer: await writeDocument("work-list", old) })).value);
    expect(list).toContain("Restoration");
    expect(list).toContain("Stopped Diapason");
  }, 60_000);
});
