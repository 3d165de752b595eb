import { readFileSync } from "node:fs";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { enlargeScheme, restoreScheme } from "@/db/demo-scenario";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { schemeDocumentSchema, type SchemeDocument } from "@/lib/spec/document";
import { estimateDocument } from "@/lib/spec/estimate";
import { readSchemeFile, toSchemeFile } from "@/lib/spec/scheme-file";
import { readStopListCsv, stopListColumns, writeStopListCsv } from "@/lib/spec/stop-list-csv";

const tuning = { pitchHz: 440, temperatureC: 18 };
const large = (() => {
  const file = JSON.parse(readFileSync("examples/large-five-manual.json", "utf8"));
  return schemeDocumentSchema.parse({ name: file.name, divisions: file.divisions, accessories: file.accessories });
})();
const docs: [string, SchemeDocument][] = [
  ["scheme A", schemeDocumentSchema.parse(restoreScheme)],
  ["scheme B", schemeDocumentSchema.parse(enlargeScheme)],
  ["the five-manual example", large],
];

/** A CSV cell has no type: a footage written as the number 8 in a scheme file comes back as the text "8" (the same footage). */
function footagesAsText(doc: SchemeDocument): SchemeDocument {
  return { ...doc, divisions: doc.divisions.map((d) => ({ ...d, stops: d.stops.map((s) => ({ ...s, footage: String(s.footage), breaks: s.breaks?.map((b) => ({ ...b, footages: b.footages.map((f) => (f === null ? null : String(f))) })) })) })) };
}

function estimate(doc: SchemeDocument) {
  const e = estimateDocument(doc, tuning, DEFAULT_RATES);
  if (!e.ok) throw new Error(e.messages.join("; "));
  return e.estimate;
}

describe("stop list CSV", () => {
  it.each(docs)("writes %s and reads back the same divisions and stops, and with its draft the same document and estimate", (_, doc) => {
    const csv = writeStopListCsv(doc);
    const asNew = readStopListCsv(csv, { name: doc.name, description: doc.description });
    expect(asNew.ok, JSON.stringify(!asNew.ok && asNew.problems.slice(0, 3))).toBe(true);
    if (!asNew.ok) return;
    expect(asNew.document.divisions).toEqual(footagesAsText(doc).divisions);
    const replacing = readStopListCsv(csv, { name: doc.name, description: doc.description, base: doc });
    if (!replacing.ok) throw new Error("replacing failed");
    expect(replacing.document).toEqual(footagesAsText(doc));
    expect(estimate(replacing.document)).toEqual(estimate(doc));
  });

  it("writes one row per stop under a heading, readable by another CSV reader", () => {
    const doc = docs[0]![1];
    const parsed = Papa.parse<Record<string, string>>(writeStopListCsv(doc).replace(/^\uFEFF/, ""), { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data).toHaveLength(doc.divisions.reduce((n, d) => n + d.stops.length, 0));
    const mixture = parsed.data.find((r) => r.name === "Mixture")!;
    expect(mixture).toMatchObject({ division: "Swell", pitch: "1 1/3", ranks: "3", family: "mixture", origin: "existing", work: "restored", breaks: "C: 1 1/3, 1, 2/3; c': 2 2/3, 2, 1 1/3" });
    expect(parsed.meta.fields!.slice(0, 7)).toEqual(["division", "name", "pitch", "ranks", "family", "origin", "work"]);
  });

  it("reads a hand-made list with pitches as the trade writes them, Roman ranks, labels and no ids", () => {
    const rows = (sesquialtera: string, source: string) => [
      "Division,Stop,Pitch,Ranks,Family,Treatment,Material,Source,Chest",
      "Great,Open Diapason,8′,,principal,New,Spotted metal,,",
      "Great,Twelfth,2⅔,,mutation,Prepared for,,,",
      "Great,Tierce,1 3/5,,mutation,new,,,",
      sesquialtera,
      // An extended rank stands on a unit chest.
      "Pedal,Bourdon,16',,flute,restored,pine,,pitman",
      `Pedal,Bass Flute,8,,flute,extension,pine,${source},pitman`,
    ].join("\n");
    // A two-rank mutation needs its breaks, an extension its source: both named by their rows.
    const bad = readStopListCsv(rows("Great,Sesquialtera,2 2/3,II,mutation,new,,,", ""), { name: "By hand" });
    expect(bad.ok).toBe(false);
    if (bad.ok) return;
    expect(bad.problems.map((p) => p.row)).toEqual([5, 7]);
    expect(bad.problems[0]!.message).toMatch(/^Row 5: Division "Great", stop "Sesquialtera"/);
    expect(bad.problems[1]!.message).toMatch(/^Row 7: Division "Pedal", stop "Bass Flute"/);

    const good = readStopListCsv(rows("Great,Fifteenth,2,,principal,new,,,", "Bourdon"), { name: "By hand" });
    expect(good.ok, JSON.stringify(!good.ok && good.problems)).toBe(true);
    if (!good.ok) return;
    const [great, pedal] = good.document.divisions;
    // A "Treatment" column, as the first format wrote it, is read as where the pipes come from and the work on them.
    expect(great!.stops.map((s) => [s.name, s.footage, s.origin, s.material])).toEqual([
      ["Open Diapason", "8′", "new", "spotted"],
      ["Twelfth", "2⅔", "prepared", "spotted"],
      ["Tierce", "1 3/5", "new", "spotted"],
      ["Fifteenth", "2", "new", "spotted"],
    ]);
    // A pedal division by its name, with the 32-note compass (AGO console standard: C–g′).
    expect(pedal).toMatchObject({ keyboard: "pedal", compass: { low: "C", high: "g'" } });
    expect(pedal!.stops[0]!.footage).toBe("16'");
    expect(pedal!.stops[0]).toMatchObject({ origin: "existing", work: ["restored"] });
    expect(pedal!.stops[1]).toMatchObject({ origin: "extension", source: pedal!.stops[0]!.id });
    const roman = readStopListCsv("division,name,pitch,ranks,family\nGreat,Celeste,8,II,string\n", { name: "x" });
    expect(roman.ok && roman.document.divisions[0]!.stops[0]!.ranks).toBe(2);
  });

  it("names every bad row and cell in one answer", () => {
    const csv = [
      "division,name,pitch,ranks,family,treatment",
      "Great,Open Diapason,8,,principal,new",
      "Great,Twelfth,2.67,,mutation,new",
      "Great,Oboe,8,one,reed,new",
      ",Orphan,4,,flute,new",
      "Swell,Gamba,8,,strings,new",
    ].join("\r\n");
    const read = readStopListCsv(csv, { name: "Bad" });
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(read.problems.map((p) => p.message)).toEqual([
      expect.stringMatching(/^Row 3, pitch: "2\.67" is not a footage/),
      expect.stringMatching(/^Row 4, ranks: "one" is not a whole number/),
      expect.stringMatching(/^Row 5: name the division/),
      expect.stringMatching(/^Row 6, family: "strings" is not one of principal, flute, string/),
    ]);
  });

  it("refuses a file without the columns a stop needs, and one whose divisions disagree", () => {
    const noFamily = readStopListCsv("division,name,pitch\nGreat,Open Diapason,8\n", { name: "x" });
    expect(!noFamily.ok && noFamily.problems[0]!.message).toMatch(/no "family" column/);
    const disagree = readStopListCsv("division,name,pitch,family,division.keyboard\nGreat,A,8,flute,manual\nGreat,B,4,flute,pedal\n", { name: "x" });
    expect(!disagree.ok && disagree.problems[0]!.message).toMatch(/^Row 3, division\.keyboard: "pedal" here, but "manual" on row 2/);
  });

  it("keeps a spreadsheet from running a stop name as a formula, and reads the name back as it was", () => {
    const doc = structuredClone(docs[0]![1]);
    doc.divisions[0]!.stops[0]!.name = "=HYPERLINK(\"x\")";
    const csv = writeStopListCsv(doc);
    expect(csv).toContain(`"'=HYPERLINK(""x"")"`);
    const read = readStopListCsv(csv, { name: doc.name, base: doc });
    expect(read.ok && read.document.divisions[0]!.stops[0]!.name).toBe("=HYPERLINK(\"x\")");
  });

  it("has a column for every stop and division property of the scheme model, each described in docs/stop-list-csv.md", () => {
    const page = readFileSync("docs/stop-list-csv.md", "utf8");
    const missing = stopListColumns().filter((c) => !page.includes(`| \`${c.header}\``)).map((c) => c.header);
    expect(missing).toEqual([]);
  });
});

describe("scheme file", () => {
  it.each(docs)("writes %s and reads back the same document and estimate", (_, doc) => {
    const text = JSON.stringify(toSchemeFile(doc, tuning));
    const read = readSchemeFile(text, { tuning });
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.document).toEqual(doc);
    expect(estimate(read.document)).toEqual(estimate(doc));
  });

  it("says where the JSON breaks, and names the stop of a bad footage", () => {
    const broken = readSchemeFile('{\n "name": "x",\n "divisions": [\n', { tuning });
    expect(!broken.ok && broken.problems[0]!.message).toMatch(/not valid JSON/);
    const doc = structuredClone(docs[0]![1]);
    (doc.divisions[0]!.stops[1] as { footage: string }).footage = "2.67";
    const bad = readSchemeFile(JSON.stringify(toSchemeFile(doc, tuning)), { tuning });
    expect(!bad.ok && bad.problems.map((p) => p.message)).toEqual([expect.stringMatching(/^Division "Great", stop "Clarabella": Pitch: "2\.67" is not a footage/)]);
  });
});
