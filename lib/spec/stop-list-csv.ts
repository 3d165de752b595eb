/**
 * A scheme's stop list as CSV, one row per stop, for spreadsheets: written from a document, and read
 * back into one with every bad row and cell named. The columns come from the scheme model's own zod
 * schemas (lib/estimate/scheme.ts), so a stop or division property added there becomes a column here
 * without a change (docs/stop-list-csv.md describes them; a test keeps that page complete). Parsing
 * and quoting are papaparse's. Pure: no I/O.
 */
import Papa from "papaparse";
import type { z } from "zod";
import { divisionSchema, stopFormSchema } from "@/lib/estimate/scheme";
import { MSG_NOT_FOOTAGE, parseFootage } from "@/lib/estimate/pitch";
import { checkDocument } from "./validate";
import type { DocDivision, SchemeDocument } from "./document";

export type ImportProblem = { row?: number; column?: string; message: string };

type Kind = "text" | "number" | "integer" | "boolean" | "enum" | "list" | "footage" | "breaks" | "json";
export type CsvColumn = {
  /** The column's heading in the file: the field's path in the scheme model ("scale.deviationHt"). */
  header: string;
  scope: "division" | "stop";
  /** Path inside the division or stop object. */
  path: string[];
  kind: Kind;
  options?: readonly string[];
  /** Values of the first scheme format also read (the scheme model upgrades them). */
  legacy?: readonly string[];
  required: boolean;
};

// A few fields read better under the words stop lists use; the rest keep the model's names.
const STOP_HEADERS: Record<string, string> = { footage: "pitch", name: "name", id: "stop id" };
const DIVISION_HEADERS: Record<string, string> = { name: "division", id: "division id" };
/** The columns a person reads first; everything else follows in the model's order. */
const FIRST = ["division", "name", "pitch", "ranks", "family", "origin", "work", "material", "construction", "compass.low", "compass.high", "source"];

/** A silent rank in a progressive mixture's break, in one cell. */
const SILENT = "–";

// zod 4 internals we rely on: `def.type` and `def.innerType` for wrappers, `options` for enums, `isInt` for numbers.
type AnyDef = { type: string; innerType?: z.ZodType; shape?: Record<string, z.ZodType>; element?: z.ZodType };
/** Columns of the first scheme format, read and passed to the scheme model, which upgrades them; never written. */
const LEGACY_COLUMNS: CsvColumn[] = [
  { header: "treatment", scope: "stop", path: ["treatment"], kind: "enum", options: ["new", "retained", "restored", "revoiced", "relocated", "extension", "borrowed", "prepared", "removed"], required: false },
  { header: "scale.offsetHt", scope: "stop", path: ["scale", "offsetHt"], kind: "number", required: false },
];
type Node = z.ZodType & { def: AnyDef; options?: readonly string[]; isInt?: boolean; shape?: Record<string, z.ZodType> };

function unwrap(schema: z.ZodType): { node: Node; optional: boolean } {
  let node = schema as Node;
  let optional = false;
  while (["default", "optional", "prefault", "nullable"].includes(node.def.type)) {
    optional = true;
    node = node.def.innerType as Node;
  }
  return { node, optional };
}

function columnsOf(shape: Record<string, z.ZodType>, scope: CsvColumn["scope"], skip: string[], prefix: string[] = [], parentOptional = false): CsvColumn[] {
  const out: CsvColumn[] = [];
  for (const [key, field] of Object.entries(shape)) {
    if (!prefix.length && skip.includes(key)) continue;
    const { node, optional } = unwrap(field);
    const path = [...prefix, key];
    const required = !optional && !parentOptional;
    const t = node.def.type;
    if (t === "object") {
      out.push(...columnsOf(node.shape!, scope, skip, path, optional || parentOptional));
      continue;
    }
    let kind: Kind = "json";
    if (key === "footage") kind = "footage";
    else if (key === "breaks") kind = "breaks";
    else if (t === "string") kind = "text";
    else if (t === "number") kind = node.isInt ? "integer" : "number";
    else if (t === "boolean") kind = "boolean";
    else if (t === "enum") kind = "enum";
    else if (t === "union") kind = "text";
    let options = kind === "enum" ? node.options : undefined;
    if (t === "array" && node.def.element && unwrap(node.def.element).node.def.type === "enum") {
      // A list of words in one cell: "restored, revoiced".
      kind = "list";
      options = unwrap(node.def.element).node.options;
    }
    const joined = path.join(".");
    const header = scope === "stop" ? (STOP_HEADERS[joined] ?? joined) : (DIVISION_HEADERS[joined] ?? `division.${joined}`);
    const legacy = joined === "construction" ? ["reed-full", "reed-half"] : undefined;
    out.push({ header, scope, path, kind, options, legacy, required });
  }
  return out;
}

/** Every column, in the order written: the first ones a person reads, then the stop's, then the division's. */
export function stopListColumns(): CsvColumn[] {
  const all = [...columnsOf(divisionSchema.shape, "division", ["stops"]), ...columnsOf(stopFormSchema.shape, "stop", [])];
  const first = FIRST.map((h) => all.find((c) => c.header === h)).filter((c): c is CsvColumn => !!c);
  const rest = all.filter((c) => !first.includes(c));
  return [...first, ...rest.filter((c) => c.scope === "stop"), ...rest.filter((c) => c.scope === "division")];
}

// ── writing ─────────────────────────────────────────────────────────────────────────────────────

function get(obj: unknown, path: string[]): unknown {
  let v = obj;
  for (const k of path) v = v && typeof v === "object" ? (v as Record<string, unknown>)[k] : undefined;
  return v;
}

/** Mixture breaks in one cell: "C: 1 1/3, 1, 2/3; c': 2 2/3, 2, 1 1/3"; a dash for a silent rank. */
export function formatBreaks(breaks: readonly { from: string; footages: readonly (string | number | null)[] }[] | undefined): string {
  return (breaks ?? []).map((b) => `${b.from}: ${b.footages.map((f) => (f === null ? SILENT : f)).join(", ")}`).join("; ");
}

// A spreadsheet runs a cell that starts with = + - @ as a formula; names and ids get a leading
// apostrophe (which spreadsheets hide and the reader below drops). Number columns may start with "-".
const FORMULA_START = /^[=+\-@\t\r]/;

function cellText(col: CsvColumn, value: unknown): string {
  if (value === undefined || value === null) return "";
  if (col.kind === "breaks") return formatBreaks(value as never);
  if (col.kind === "boolean") return value ? "yes" : "no";
  if (col.kind === "list") return (value as readonly string[]).join(", ");
  if (col.kind === "json") return JSON.stringify(value);
  const text = String(value);
  return col.kind === "text" && FORMULA_START.test(text) ? `'${text}` : text;
}

/** The stop list as CSV text: UTF-8 with a byte-order mark (so spreadsheets read ⅔ and ′ right), CRLF lines. */
export function writeStopListCsv(doc: SchemeDocument): string {
  const columns = stopListColumns();
  const rows: string[][] = [];
  for (const division of doc.divisions) {
    for (const stop of division.stops) {
      rows.push(columns.map((c) => cellText(c, get(c.scope === "division" ? division : stop, c.path))));
    }
  }
  return "\uFEFF" + Papa.unparse({ fields: columns.map((c) => c.header), data: rows }, { newline: "\r\n", quotes: false });
}

// ── reading ─────────────────────────────────────────────────────────────────────────────────────

/** Headings compared without case, spaces, underscores or hyphens: "Stop ID", "stop_id" and "stopid" are one. */
const norm = (h: string) => h.replace(/^\uFEFF/, "").trim().toLowerCase().replace(/[\s_\-()]+/g, "");

/** Other headings a spreadsheet made by hand may use. */
const ALIASES: Record<string, string> = {
  stop: "name", stopname: "name", footage: "pitch", pitchft: "pitch", "pitch′": "pitch", divisionname: "division", id: "stop id",
};

const ROMAN: Record<string, number> = { i: 1, ii: 2, iii: 3, iv: 4, v: 5, vi: 6, vii: 7, viii: 8, ix: 9, x: 10, xi: 11, xii: 12 };

function slug(text: string): string {
  return text.toLowerCase().normalize("NFKD").replace(/[^\w]+/g, "-").replace(/^-|-$/g, "").slice(0, 40) || "x";
}

function unique(base: string, taken: Set<string>): string {
  let id = base;
  for (let i = 2; taken.has(id); i++) id = `${base}-${i}`;
  taken.add(id);
  return id;
}

function set(obj: Record<string, unknown>, path: string[], value: unknown) {
  let o = obj;
  for (const k of path.slice(0, -1)) o = (o[k] ??= {}) as Record<string, unknown>;
  o[path[path.length - 1]!] = value;
}

type Cell = { ok: true; value: unknown } | { ok: false; message: string };

function readBreaks(text: string): Cell {
  const out: { from: string; footages: (string | null)[] }[] = [];
  for (const part of text.split(";").map((p) => p.trim()).filter(Boolean)) {
    const m = /^([^:]+):(.+)$/.exec(part);
    if (!m) return { ok: false, message: `"${part}" is not a break; write each as a note, a colon and the footages of every rank, e.g. C: 1 1/3, 1, 2/3; c': 2 2/3, 2, 1 1/3` };
    out.push({ from: m[1]!.trim(), footages: m[2]!.split(",").map((f) => f.trim()).filter(Boolean).map((f) => (/^[-–—]$/.test(f) ? null : f)) });
  }
  return { ok: true, value: out.length ? out : undefined };
}

function readCell(col: CsvColumn, raw: string): Cell {
  const text = raw.trim().replace(/^'(?=[=+\-@])/, "");
  switch (col.kind) {
    case "text":
      return { ok: true, value: text };
    case "footage":
      return parseFootage(text) ? { ok: true, value: text } : { ok: false, message: `"${text}" ${MSG_NOT_FOOTAGE}` };
    case "integer": {
      const roman = col.path.at(-1) === "ranks" ? ROMAN[text.toLowerCase()] : undefined;
      const n = roman ?? Number(text);
      return Number.isInteger(n) ? { ok: true, value: n } : { ok: false, message: `"${text}" is not a whole number` };
    }
    case "number": {
      const n = Number(text.replace(",", "."));
      return Number.isFinite(n) ? { ok: true, value: n } : { ok: false, message: `"${text}" is not a number` };
    }
    case "boolean": {
      const t = text.toLowerCase();
      if (["yes", "y", "true", "1", "x"].includes(t)) return { ok: true, value: true };
      if (["no", "n", "false", "0"].includes(t)) return { ok: true, value: false };
      return { ok: false, message: `"${text}" is neither yes nor no` };
    }
    case "enum": {
      const t = text.toLowerCase().replace(/[\s_]+/g, "-");
      if (col.legacy?.includes(t)) return { ok: true, value: t };
      // "Prepared for", "Spotted metal": the model's word may be followed by more words.
      const hit = col.options!.find((o) => t === o) ?? col.options!.find((o) => t.startsWith(`${o}-`));
      return hit ? { ok: true, value: hit } : { ok: false, message: `"${text}" is not one of ${col.options!.join(", ")}` };
    }
    case "list": {
      const words = text.split(/[,;]/).map((w) => w.trim().toLowerCase().replace(/[\s_]+/g, "-")).filter(Boolean);
      const bad = words.find((w) => !col.options!.includes(w));
      return bad ? { ok: false, message: `"${bad}" is not one of ${col.options!.join(", ")}` } : { ok: true, value: words };
    }
    case "breaks":
      return readBreaks(text);
    case "json":
      try {
        return { ok: true, value: JSON.parse(text) };
      } catch {
        return { ok: false, message: `"${text}" cannot be read` };
      }
  }
}

const PAPA_WORDS: Record<string, string> = {
  MissingQuotes: "a quoted cell is not closed (a \" is missing)",
  InvalidQuotes: "a cell has a stray quotation mark",
  UndetectableDelimiter: "the columns are not separated by commas or semicolons",
  TooFewFields: "has fewer cells than there are columns",
  TooManyFields: "has more cells than there are columns",
};

export type CsvRead = { ok: true; document: SchemeDocument; notes: string[] } | { ok: false; problems: ImportProblem[]; notes: string[] };

/**
 * Reads a stop list. `base`, when the list replaces a draft's document, lends each division it
 * names (by id or name) its properties where the file leaves them out, and its couplers,
 * tremulants and combination system, which a stop list does not carry.
 */
export function readStopListCsv(text: string, opts: { name: string; description?: string; base?: SchemeDocument }): CsvRead {
  const notes: string[] = [];
  const problems: ImportProblem[] = [];
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { skipEmptyLines: "greedy" });
  // Spreadsheet row numbers: the heading is row 1.
  for (const e of parsed.errors) {
    const words = PAPA_WORDS[e.code] ?? "cannot be read";
    problems.push(e.row !== undefined && e.row !== null ? { row: e.row + 1, message: `Row ${e.row + 1}: ${words}.` } : { message: `The file ${words}.` });
  }
  const [headings = [], ...rows] = parsed.data;
  if (!headings.length || rows.length === 0) return { ok: false, problems: [{ message: "The file has no stops: a heading row, then one row per stop." }], notes };

  const columns = stopListColumns();
  const byNorm = new Map([...columns, ...LEGACY_COLUMNS].map((c) => [norm(c.header), c]));
  // A division property may also be headed without "division." where no stop property has that name ("keyboard", "action").
  const stopPaths = new Set(columns.filter((c) => c.scope === "stop").map((c) => norm(c.path.join("."))));
  for (const c of columns) if (c.scope === "division" && !stopPaths.has(norm(c.path.join(".")))) byNorm.set(norm(c.path.join(".")), byNorm.get(norm(c.path.join("."))) ?? c);
  const at: (CsvColumn | undefined)[] = headings.map((h) => {
    const n = norm(h);
    return byNorm.get(n) ?? byNorm.get(norm(ALIASES[n] ?? ""));
  });
  const unknown = headings.filter((h, i) => !at[i] && h.trim());
  if (unknown.length) notes.push(`Columns Stopwright does not read were left out: ${unknown.map((h) => `"${h.trim()}"`).join(", ")}.`);
  for (const need of ["division", "name", "pitch", "family"]) {
    if (!at.some((c) => c?.header === need)) problems.push({ column: need, message: `The file has no "${need}" column; every stop needs its ${need === "name" ? "name" : need}.` });
  }
  if (problems.length) return { ok: false, problems, notes };

  type Built = { division: Record<string, unknown>; firstRow: number; stops: { stop: Record<string, unknown>; row: number }[]; given: Map<string, { value: unknown; row: number }> };
  const divisions = new Map<string, Built>();
  for (const [r, cells] of rows.entries()) {
    const row = r + 2;
    const stop: Record<string, unknown> = {};
    const div: Record<string, unknown> = {};
    for (const [i, col] of at.entries()) {
      if (!col) continue;
      const raw = cells[i] ?? "";
      if (!raw.trim()) continue;
      const cell = readCell(col, raw);
      if (!cell.ok) {
        problems.push({ row, column: col.header, message: `Row ${row}, ${col.header}: ${cell.message}.` });
        continue;
      }
      if (cell.value !== undefined) set(col.scope === "stop" ? stop : div, col.path, cell.value);
    }
    const divisionName = typeof div.name === "string" ? div.name : "";
    if (!divisionName && !div.id) {
      problems.push({ row, column: "division", message: `Row ${row}: name the division the stop belongs to (Great, Swell, Pedal …).` });
      continue;
    }
    const key = String(div.id ?? divisionName).toLowerCase();
    let built = divisions.get(key);
    if (!built) {
      built = { division: {}, firstRow: row, stops: [], given: new Map() };
      divisions.set(key, built);
    }
    // The first row that gives a division property sets it; a later row that disagrees is an error.
    for (const col of columns.filter((c) => c.scope === "division")) {
      const v = get(div, col.path);
      if (v === undefined) continue;
      const prior = built.given.get(col.header);
      if (!prior) {
        built.given.set(col.header, { value: v, row });
        set(built.division, col.path, v);
      } else if (JSON.stringify(prior.value) !== JSON.stringify(v)) {
        problems.push({ row, column: col.header, message: `Row ${row}, ${col.header}: "${String(v)}" here, but "${String(prior.value)}" on row ${prior.row} for the same division; give one value.` });
      }
    }
    built.stops.push({ stop, row });
  }

  // Ids the file leaves out are made from the names, unique in the scheme.
  const base = opts.base;
  const divisionIds = new Set<string>();
  const stopIds = new Set<string>();
  for (const b of divisions.values()) {
    if (typeof b.division.id === "string") divisionIds.add(b.division.id);
    for (const s of b.stops) if (typeof s.stop.id === "string" && s.stop.id) stopIds.add(s.stop.id);
  }
  const rowOf = new Map<string, number>();
  const docDivisions: unknown[] = [];
  for (const b of divisions.values()) {
    const name = String(b.division.name ?? b.division.id);
    const lent = base?.divisions.find((d) => (b.division.id ? d.id === b.division.id : d.name.toLowerCase() === name.toLowerCase()));
    const pedal = /ped/i.test(name);
    const division: Record<string, unknown> = {
      ...(lent ? withoutStops(lent) : { keyboard: pedal ? "pedal" : "manual", compass: pedal ? { low: "C", high: "g'" } : { low: "C", high: "c''''" } }),
      ...b.division,
      name,
    };
    if (!b.division.id) division.id = lent?.id ?? unique(slug(name), divisionIds);
    const stops = b.stops.map(({ stop, row }, j) => {
      const id = typeof stop.id === "string" && stop.id ? stop.id : unique(`${division.id}-${slug(String(stop.name ?? j + 1))}`, stopIds);
      rowOf.set(`${docDivisions.length}.${j}`, row);
      return { ...stop, id };
    });
    rowOf.set(`${docDivisions.length}`, b.firstRow);
    docDivisions.push({ ...division, stops });
  }
  if (problems.length) return { ok: false, problems, notes };

  // Sources may name a stop by id or, in a hand-made list, by its name when that is unique.
  const names = new Map<string, string[]>();
  for (const d of docDivisions as { stops: { id: string; name?: string }[] }[]) for (const s of d.stops) if (s.name) names.set(s.name.toLowerCase(), [...(names.get(s.name.toLowerCase()) ?? []), s.id]);
  for (const d of docDivisions as { stops: { source?: string }[] }[]) {
    for (const s of d.stops) {
      if (s.source && !stopIds.has(s.source)) {
        const ids = names.get(s.source.toLowerCase());
        if (ids?.length === 1) s.source = ids[0];
      }
    }
  }

  const accessories = base ? keepAccessories(base, docDivisions as { id: string }[], notes) : undefined;
  // The case, wind and site are no part of a stop list either: a draft keeps its own.
  const works = base ? { case: base.case, wind: base.wind, site: base.site } : {};
  const raw = { name: opts.name, description: opts.description ?? "", divisions: docDivisions, ...(accessories ? { accessories } : {}), ...works };
  const check = checkDocument(raw);
  if (check.ok) return { ok: true, document: check.document, notes };
  for (const [path, messages] of Object.entries(check.fields)) {
    const m = /^divisions\.(\d+)(?:\.stops\.(\d+))?/.exec(path);
    const row = m ? (m[2] !== undefined ? rowOf.get(`${m[1]}.${m[2]}`) : rowOf.get(m[1]!)) : undefined;
    for (const message of messages) problems.push(row ? { row, message: `Row ${row}: ${message}` } : { message });
  }
  problems.sort((a, b) => (a.row ?? 0) - (b.row ?? 0));
  return { ok: false, problems, notes };
}

function withoutStops(d: DocDivision): Record<string, unknown> {
  const { stops: _stops, ...rest } = d;
  return rest;
}

/** Couplers and tremulants of the draft that still have both their divisions. */
function keepAccessories(base: SchemeDocument, divisions: { id: string }[], notes: string[]) {
  const ids = new Set(divisions.map((d) => d.id));
  const couplers = base.accessories.couplers.filter((c) => ids.has(c.from) && ids.has(c.to));
  const tremulants = base.accessories.tremulants.filter((t) => ids.has(t.division));
  const dropped = base.accessories.couplers.length - couplers.length + base.accessories.tremulants.length - tremulants.length;
  if (dropped) notes.push(`${dropped} coupler${dropped === 1 ? "" : "s"} or tremulant${dropped === 1 ? "" : "s"} of the draft served a division the file does not have and will go.`);
  return { ...base.accessories, couplers, tremulants };
}
