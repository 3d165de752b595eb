import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { ratesSchema } from "@/lib/estimate";
import {
  checkRates, compareRates, fieldsOf, flattenRates, nestValues, rateBookFields, rateBookFromCsv, rateBookTree, rateTree, ratesFromCsv, ratesToCsv, EFFECTIVE_DATE_KEY,
} from "./index";

const values = () => flattenRates(rateBookFields, DEFAULT_RATES);

describe("the rate book's fields come from the estimator's schema", () => {
  it("has one field for every leaf value of the demo rates, and nothing else", () => {
    const leaves: string[] = [];
    const walk = (v: unknown, path: string[]) => {
      if (typeof v === "object" && v !== null) for (const [k, x] of Object.entries(v)) walk(x, [...path, k]);
      else leaves.push(path.join("."));
    };
    walk(DEFAULT_RATES, []);
    const keys = rateBookFields.map((f) => f.key);
    // Alloys leave out the elements they do not contain; every other leaf is present in both.
    expect(leaves.filter((k) => !keys.includes(k))).toEqual([]);
    expect(keys.filter((k) => !leaves.includes(k)).every((k) => k.startsWith("alloys."))).toBe(true);
  });

  it("reads kinds, limits and units from the schema", () => {
    const f = (key: string) => rateBookFields.find((x) => x.key === key)!;
    expect(f("hourlyRate.voicing")).toMatchObject({ kind: "decimal", unit: "{currency}/h", label: "Voicing" });
    expect(f("metalPricePerKg.spotted")).toMatchObject({ kind: "decimal", unit: "{currency}/kg" });
    expect(f("programme.crew.voicing")).toMatchObject({ kind: "integer", min: { value: 1, inclusive: true }, max: { value: 50, inclusive: true }, unit: "people" });
    expect(f("programme.efficiency")).toMatchObject({ kind: "number", min: { value: 0, inclusive: false }, max: { value: 1, inclusive: true } });
    expect(f("norms.newMetalPipe.2to4")).toMatchObject({ kind: "number", unit: "h", label: "2–4 ft", groupLabels: ["Labour norms", "New metal flue pipe"] });
    expect(f("pipeMetal.footLengthMm.over8").unit).toBe("mm");
    // Labels and units from the schema's own metadata: an amount per unit carries the set's currency.
    expect(f("items.vehiclePerLoad")).toMatchObject({ kind: "decimal", unit: "{currency} per load", label: "Vehicle, fixed part" });
    expect(f("norms.relocatePipe")).toMatchObject({ unit: "h", label: "Relocating an existing pipe" });
    expect(f("overheadPercent").unit).toBe("%");
    expect(f("currency").kind).toBe("text");
    expect(f("alloys.spotted.tin")).toMatchObject({ optional: true });
  });

  it("follows a schema it has never seen: records by key, nested objects, units and descriptions from metadata", () => {
    const schema = z.object({
      design: z.object({ perStop: z.number().min(0).meta({ unit: "h per stop", description: "Drawing and design hours" }) }),
      caseWork: z.record(z.enum(["oak", "pine"]), z.object({ perM2: z.number().positive() })),
      label: z.string().optional(),
    });
    const tree = rateTree(schema);
    const fields = fieldsOf(tree);
    expect(fields.map((f) => f.key)).toEqual(["design.perStop", "caseWork.oak.perM2", "caseWork.pine.perM2", "label"]);
    expect(fields[0]).toMatchObject({ unit: "h per stop", description: "Drawing and design hours" });
    expect(fields[3]!.optional).toBe(true);
  });
});

describe("checking rate values", () => {
  it("turns the demo values back into exactly the demo rates", () => {
    const r = checkRates(values());
    expect(r.ok && r.rates).toEqual(ratesSchema.parse(DEFAULT_RATES));
  });

  it("names every bad value by its field, in the estimator's words", () => {
    const v = { ...values(), "hourlyRate.voicing": "seventy", "programme.efficiency": "1.5", "programme.crew.voicing": "2.5", "norms.relocatePipe": "-1", "alloys.zinc.zinc": "0.5", currency: "EUO" };
    const r = checkRates(v);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems["hourlyRate.voicing"]).toEqual([`Hourly rates by department — Voicing "seventy" is not an amount: write it as digits with a decimal point, e.g. 62.50.`]);
    expect(r.problems["programme.efficiency"]![0]).toMatch(/Programme — Efficiency .* must be more than 0 and at most 1\./);
    expect(r.problems["programme.crew.voicing"]![0]).toMatch(/must be a whole number/);
    expect(r.problems["norms.relocatePipe"]![0]).toMatch(/Labour norms — Relocating an existing pipe must be at least 0\./);
    expect(r.problems["alloys.zinc.tin"] ?? r.problems["alloys.zinc.zinc"]).toBeDefined();
    expect(JSON.stringify(r.problems)).toMatch(/weight fractions must add up to 1/);
    expect(r.problems.currency![0]).toMatch(/"EUO" is not a known ISO 4217 currency code/);
    // No library wording reaches the user.
    expect(JSON.stringify(r.problems)).not.toMatch(/Invalid|expected|Too (small|big)/);
  });

  it("nests flat values into the shape a form edits", () => {
    const nested = nestValues(rateBookFields, values()) as { hourlyRate: { voicing: string }; norms: { newMetalPipe: Record<string, string> } };
    expect(nested.hourlyRate.voicing).toBe(DEFAULT_RATES.hourlyRate.voicing);
    expect(nested.norms.newMetalPipe["2to4"]).toBe(String(DEFAULT_RATES.norms.newMetalPipe["2to4"]));
  });
});

describe("CSV export and import", () => {
  const csv = () => ratesToCsv(rateBookFields, DEFAULT_RATES, "2027-01-01");

  it("writes a file that a general-purpose CSV reader opens, one row per rate plus the effective date", () => {
    const rows = Papa.parse<Record<string, string>>(csv(), { header: true }).data;
    expect(rows).toHaveLength(rateBookFields.length + 1);
    expect(rows[0]).toEqual({ label: "Effective date", key: EFFECTIVE_DATE_KEY, value: "2027-01-01", unit: "yyyy-mm-dd" });
    const voicing = rows.find((r) => r.key === "hourlyRate.voicing")!;
    expect(voicing).toEqual({ label: "Hourly rates by department — Voicing", key: "hourlyRate.voicing", value: "72.00", unit: "EUR/h" });
  });

  it("reads its own export back to the same rates, with nothing changed", () => {
    const r = ratesFromCsv(ratesSchema, rateBookFields, csv(), DEFAULT_RATES);
    expect(r.ok).toBe(true);
    expect(r.ok && r.rates).toEqual(ratesSchema.parse(DEFAULT_RATES));
    expect(r.changedCount).toBe(0);
    expect(r.effectiveDate).toBe("2027-01-01");
  });

  it("marks the rows that change, in a file whose rows were reordered in a spreadsheet", () => {
    const rows = Papa.parse<string[]>(csv()).data;
    const [header, ...rest] = rows;
    const edited = rest.reverse().map((r) => (r[1] === "hourlyRate.voicing" ? [r[0], r[1], "75.5", r[3]] : r));
    const r = ratesFromCsv(ratesSchema, rateBookFields, Papa.unparse([header!, ...edited]), DEFAULT_RATES);
    expect(r.ok).toBe(true);
    expect(r.changedCount).toBe(1);
    expect(r.rows.find((x) => x.changed)).toMatchObject({ key: "hourlyRate.voicing", previous: "72.00", value: "75.5" });
    expect(r.ok && r.rates.hourlyRate.voicing).toBe("75.5");
  });

  it("names every bad row by its spreadsheet row number, and gives no rates", () => {
    const rows = Papa.parse<string[]>(csv()).data;
    const bad = rows.map((r) => [...r]);
    bad.splice(bad.findIndex((r) => r[1] === "norms.relocatePipe"), 1); // a missing rate
    const rowOf = (key: string) => bad.findIndex((r) => r[1] === key);
    bad[rowOf("hourlyRate.voicing")]![2] = "lots";
    bad[rowOf("programme.efficiency")]![2] = "2";
    bad[rowOf(EFFECTIVE_DATE_KEY)]![2] = "31/01/2027";
    bad.push(["", "hourlyRate.erection", "1", ""]); // a repeat
    bad.push(["", "no.such.rate", "1", ""]);
    const r = ratesFromCsv(ratesSchema, rateBookFields, Papa.unparse(bad), DEFAULT_RATES);
    expect(r.ok).toBe(false);
    expect("rates" in r).toBe(false);
    const problems = r.rows.flatMap((x) => x.problems);
    expect(problems).toEqual(expect.arrayContaining([
      expect.stringMatching(new RegExp(`^Row ${rowOf("hourlyRate.voicing") + 1}: Hourly rates by department — Voicing "lots" is not an amount`)),
      expect.stringMatching(new RegExp(`^Row ${rowOf("programme.efficiency") + 1}: Programme — Efficiency .*must be more than 0 and at most 1`)),
      `Row 2: the effective date "31/01/2027" is not a date like 2027-01-31.`,
      expect.stringMatching(/^Row \d+ repeats "hourlyRate.erection" \(first on row \d+\)\.$/),
      expect.stringMatching(/^Row \d+: no rate is called "no.such.rate"\.$/),
    ]));
    expect(r.fileProblems).toEqual([`The file has no row for "norms.relocatePipe" (Labour norms — Relocating an existing pipe).`]);
  });

  it("refuses a file without key and value columns, and an empty file", () => {
    expect(ratesFromCsv(ratesSchema, rateBookFields, "a,b\n1,2\n", DEFAULT_RATES).fileProblems[0]).toMatch(/at least "key" and "value"/);
    expect(ratesFromCsv(ratesSchema, rateBookFields, "\uFEFF  \n", DEFAULT_RATES).fileProblems).toEqual(["The file is empty."]);
  });

  it("reads a file exported before rates were renamed: old names fill today's rates, rates added since keep the current values", () => {
    // The first format's names (foot lengths at the top level, one cut-up, one cleaning and one
    // revoicing norm per pipe, sheet thickness by size class) and none of the rates added since.
    const rows = Papa.parse<string[]>(csv()).data.filter((r) => !/^(pipeMetal\.footLengthMm|cutUpByFamily|norms\.cleanPipe|norms\.revoice(Flue|Reed)Pipe|items|case)(\.|$)/.test(r[1] ?? ""));
    const old = [
      ...rows,
      ...["over8", "4to8", "2to4", "1to2", "under1"].map((c, i) => ["", `footLengthMm.${c}`, String(400 - 50 * i), "mm"]),
      ["", "cutUpFraction", "0.3", ""],
      ["", "norms.cleanRetainedPipe", "0.2", "h"],
      ["", "norms.revoicePipe", "0.5", "h"],
      ["", "sheetThicknessMm.over8", "1.4", "mm"],
    ];
    const current = { ...DEFAULT_RATES, items: { ...DEFAULT_RATES.items, vehiclePerLoad: "999.00" } };
    const r = rateBookFromCsv(Papa.unparse(old), current);
    expect(r.fileProblems).toEqual([]);
    expect(r.rows.flatMap((x) => x.problems)).toEqual([]);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.rates.pipeMetal.footLengthMm).toEqual({ over8: 400, "4to8": 350, "2to4": 300, "1to2": 250, under1: 200 });
    expect(Object.values(r.rates.cutUpByFamily)).toEqual(Object.values(DEFAULT_RATES.cutUpByFamily).map(() => 0.3));
    expect(r.rates.norms.cleanPipe).toEqual({ over8: 0.2, "4to8": 0.2, "2to4": 0.2, "1to2": 0.2, under1: 0.2 });
    expect([r.rates.norms.revoiceFluePipe, r.rates.norms.revoiceReedPipe]).toEqual([0.5, 0.5]);
    // What the old format did not have comes from the version the import replaces, not the demo values.
    expect(r.rates.items.vehiclePerLoad).toBe("999.00");
    expect(r.rates.case).toEqual(DEFAULT_RATES.case);
    // The preview names what each old row became.
    expect(r.rows.find((x) => x.key === "cutUpFraction")!.label).toMatch(/^Old name of \d+ rates \(cutUpByFamily\.principal/);
    expect(r.rows.find((x) => x.key === "footLengthMm.over8")).toMatchObject({ label: expect.stringMatching(/^Old name of .*foot/i), previous: "420", value: "400", changed: true });
    expect(r.rows.find((x) => x.key === "sheetThicknessMm.over8")!.label).toMatch(/no longer used/);
    // A name that never existed is still refused.
    const bad = rateBookFromCsv(Papa.unparse([...old, ["", "norms.noSuchNorm", "1", ""]]), current);
    expect(bad.ok).toBe(false);
    expect(bad.rows.flatMap((x) => x.problems)).toEqual([expect.stringMatching(/no rate is called "norms.noSuchNorm"/)]);
  });

  it("keeps a text that would run as a spreadsheet formula as text, and reads it back unchanged", () => {
    const rates = { ...DEFAULT_RATES, provenance: "=HYPERLINK(\"x\")" };
    const text = ratesToCsv(rateBookFields, rates, "2027-01-01");
    expect(text).toContain(`'=HYPERLINK`);
    const r = ratesFromCsv(ratesSchema, rateBookFields, text, DEFAULT_RATES);
    expect(r.ok && r.rates.provenance).toBe(rates.provenance);
  });
});

describe("comparing versions", () => {
  it("lists exactly the figures that changed, and treats 62.5 and 62.50 as the same", () => {
    const newer = { ...DEFAULT_RATES, hourlyRate: { ...DEFAULT_RATES.hourlyRate, voicing: "75.00", erection: "55.0" }, programme: { ...DEFAULT_RATES.programme, hoursPerWeek: 40 } };
    const changes = compareRates(rateBookFields, DEFAULT_RATES, newer);
    expect(changes).toEqual([
      { key: "hourlyRate.voicing", label: "Hourly rates by department — Voicing", unit: "EUR/h", from: "72.00", to: "75.00" },
      { key: "programme.hoursPerWeek", label: "Programme — Hours per week", unit: "h/week", from: "38", to: "40" },
    ]);
    expect(compareRates(rateBookFields, DEFAULT_RATES, DEFAULT_RATES)).toEqual([]);
  });

  it("lays the tree out in the schema's order with the estimator's sections", () => {
    expect(rateBookTree.children.map((c) => (c.type === "group" ? c.label : c.field.label)).slice(0, 4)).toEqual(["Provenance", "Currency", "Hourly rates by department", "Pipe-metal prices"]);
  });
});
