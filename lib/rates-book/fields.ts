/**
 * The rate book's fields, read from the estimator's `ratesSchema` itself: every leaf of the zod
 * schema (nested objects, records by department or size class, numbers, amounts, codes) becomes a
 * field with a dotted key, a label, a unit and its limits. The editor page, the CSV file and the
 * comparison of versions are all generated from this list, so a rate added to the estimator appears
 * everywhere without new page code. Pure: shared by the browser and the server.
 */
import { z } from "zod";
import { departmentLabels, sizeClassLabels } from "@/lib/estimate";

export type FieldKind = "number" | "integer" | "decimal" | "text" | "enum" | "boolean";

export interface RateField {
  /** Dotted path into the rates object: "norms.newMetalPipe.2to4". */
  readonly key: string;
  readonly path: readonly string[];
  /** The leaf's own label ("2–4 ft") and the labels of the groups above it. */
  readonly label: string;
  readonly groupLabels: readonly string[];
  /** Unit as shown beside the value; "{currency}" stands for the set's currency. */
  readonly unit: string;
  readonly description?: string;
  readonly kind: FieldKind;
  readonly optional: boolean;
  readonly min?: { readonly value: number; readonly inclusive: boolean };
  readonly max?: { readonly value: number; readonly inclusive: boolean };
  readonly options?: readonly string[];
}

/** A node of the rate book as pages show it: a section of fields, or a group of sections. */
export type RateNode =
  | { readonly type: "field"; readonly field: RateField }
  | { readonly type: "group"; readonly key: string; readonly label: string; readonly description?: string; readonly children: readonly RateNode[] };

// Words for the keys the estimator uses today; any other key is read from its camelCase name.
const KNOWN_LABELS: Readonly<Record<string, string>> = {
  ...departmentLabels,
  ...sizeClassLabels,
  provenance: "Provenance",
  currency: "Currency",
  hourlyRate: "Hourly rates by department",
  metalPricePerKg: "Pipe-metal prices",
  woodPricePerM3: "Timber prices",
  cablePricePerM: "Action cable, per conductor metre",
  overheadPercent: "Overheads",
  contingencyPercent: "Contingency",
  marginPercent: "Margin",
  taxPercent: "Tax",
  alloys: "Pipe-metal alloys (weight fractions)",
  woodDensityKgM3: "Timber densities",
  footLengthMm: "Foot length of metal pipes",
  chest: "Windchest rules",
  items: "Bought-in items and site costs",
  pipeMetal: "Metal pipes: sheet, foot and allowances",
  woodPipes: "Wooden pipes: boards, blocks, caps and stoppers",
  cutUpByFamily: "Cut-up by family (mouth height ÷ mouth width)",
  wind: "Wind system",
  swellBox: "Swell boxes",
  case: "Case",
  site: "Site and transport",
  thicknessFactor: "Thickness factor by metal",
  wiring: "Wiring",
  norms: "Labour norms",
  programme: "Programme",
  crew: "Crew by department",
  hoursPerWeek: "Hours per week",
  efficiency: "Efficiency (share of paid hours on the job)",
  "high-tin": "High-tin metal",
  spotted: "Spotted metal",
  common: "Common metal",
  zinc: "Zinc",
  copper: "Copper",
  pine: "Pine",
  oak: "Oak",
  mahogany: "Mahogany",
  tin: "Tin",
  lead: "Lead",
  antimony: "Antimony",
};

/** "consolePerKeyboard" → "Console per keyboard"; "relayToChestM" → "Relay to chest". */
export function humanize(key: string): string {
  const words = key
    .replace(/(Mm|M3|M|Kg|Percent|Fraction)$/, "")
    .replace(/([a-z0-9])([A-Z])/g, "$1 $2")
    .replace(/[-_]/g, " ")
    .toLowerCase()
    .trim();
  return words ? words[0]!.toUpperCase() + words.slice(1) : key;
}

export function labelOf(key: string): string {
  return KNOWN_LABELS[key] ?? humanize(key);
}

/**
 * A field's or group's words: the known label, else the schema's own title (`.meta({ title })`),
 * else its name. A title that only repeats the key after a colon ("Crew: voicing") was made for a
 * record's entry, and the known label or the name reads better.
 */
function labelFor(key: string, meta: Record<string, unknown> | undefined): string {
  const title = typeof meta?.title === "string" ? meta.title : undefined;
  if (KNOWN_LABELS[key] || !title || title.endsWith(`: ${key}`)) return labelOf(key);
  return title;
}

/** The unit of a leaf, from the schema's own metadata when it gives one, else from the names on its path. */
function unitOf(path: readonly string[], kind: FieldKind, meta: Record<string, unknown> | undefined): string {
  const names = path.join(".");
  const last = path[path.length - 1] ?? "";
  const has = (re: RegExp) => path.some((p) => re.test(p));
  if (has(/^hourlyRate$/)) return "{currency}/h";
  const per = names.match(/PricePer(Kg|M3|M)\b/);
  if (per) return `{currency}/${per[1] === "Kg" ? "kg" : per[1] === "M3" ? "m³" : "m"}`;
  if (typeof meta?.unit === "string") {
    // An amount's unit says what it is per ("per load", "each"): the set's currency goes before it.
    return kind === "decimal" && meta.unit !== "%" && meta.unit !== "" ? `{currency} ${meta.unit}` : meta.unit;
  }
  if (/Percent$/.test(last)) return "%";
  if (has(/KgM3$/)) return "kg/m³";
  if (has(/Mm$/)) return "mm";
  if (/M$/.test(last) && kind !== "text") return "m";
  if (last === "hoursPerWeek") return "h/week";
  if (has(/^crew$/)) return "people";
  if (has(/^alloys$/)) return "by weight, 0–1";
  if (/(Factor|Fraction)$/.test(last) || last === "efficiency") return "× (0–1)";
  if (path[0] === "norms") return "h";
  return "";
}

type Def = { type: string; [k: string]: unknown };
type Schema = z.ZodType & { _zod: { def: Def } };

function defOf(s: z.ZodType): Def {
  return (s as Schema)._zod.def;
}

function metaOf(s: z.ZodType): Record<string, unknown> | undefined {
  const m = z.globalRegistry.get(s) as Record<string, unknown> | undefined;
  const description = (s as { description?: string }).description;
  return m || description ? { ...(m ?? {}), ...(description ? { description } : {}) } : undefined;
}

/** Strips optional / default / nullable wrappers, noting optionality and the outermost metadata. */
function unwrap(s: z.ZodType): { inner: z.ZodType; optional: boolean; meta?: Record<string, unknown> } {
  let optional = false;
  let meta = metaOf(s);
  let cur = s;
  for (;;) {
    const def = defOf(cur);
    if (def.type === "optional" || def.type === "nullable") optional = true;
    if (def.type === "optional" || def.type === "default" || def.type === "nullable" || def.type === "prefault" || def.type === "readonly") {
      cur = def.innerType as z.ZodType;
      meta = { ...(metaOf(cur) ?? {}), ...(meta ?? {}) };
      continue;
    }
    if (def.type === "pipe") {
      cur = def.in as z.ZodType;
      continue;
    }
    return { inner: cur, optional, meta };
  }
}

type Check = { check: string; value?: number; inclusive?: boolean; format?: string; pattern?: RegExp };

function checksOf(s: z.ZodType): Check[] {
  const checks = (defOf(s).checks as { _zod: { def: Check } }[] | undefined) ?? [];
  return checks.map((c) => c._zod.def);
}

function recordKeys(def: Def): string[] | null {
  const keyType = def.keyType as z.ZodType | undefined;
  if (!keyType) return null;
  const k = defOf(unwrap(keyType).inner);
  if (k.type === "enum") return Object.values(k.entries as Record<string, string>);
  if (k.type === "literal") return (k.values as unknown[]).map(String);
  return null;
}

function leaf(path: string[], groupLabels: string[], s: z.ZodType, optional: boolean, meta?: Record<string, unknown>): RateField {
  const def = defOf(s);
  let kind: FieldKind = "text";
  let min: RateField["min"];
  let max: RateField["max"];
  let options: string[] | undefined;
  if (def.type === "number") {
    kind = "number";
    for (const c of checksOf(s)) {
      if (c.check === "number_format" && (c.format === "safeint" || c.format === "int32")) kind = "integer";
      if (c.check === "greater_than" && c.value !== undefined) min = { value: c.value, inclusive: !!c.inclusive };
      if (c.check === "less_than" && c.value !== undefined) max = { value: c.value, inclusive: !!c.inclusive };
    }
  } else if (def.type === "string") {
    // A string whose pattern takes "62.50" is an exact decimal (money or a percentage), kept as text.
    const patterns = checksOf(s).filter((c) => c.check === "string_format" && c.pattern).map((c) => c.pattern!);
    kind = patterns.length && patterns.every((p) => p.test("62.50")) ? "decimal" : "text";
  } else if (def.type === "enum") {
    kind = "enum";
    options = Object.values(def.entries as Record<string, string>);
  } else if (def.type === "boolean") {
    kind = "boolean";
  }
  const description = typeof meta?.description === "string" ? meta.description : undefined;
  return {
    key: path.join("."), path, label: labelFor(path[path.length - 1]!, meta), groupLabels, unit: unitOf(path, kind, meta),
    ...(description ? { description } : {}), kind, optional, ...(min ? { min } : {}), ...(max ? { max } : {}), ...(options ? { options } : {}),
  };
}

function walk(s: z.ZodType, path: string[], groupLabels: string[]): RateNode {
  const { inner, optional, meta } = unwrap(s);
  const def = defOf(inner);
  if (def.type === "object") {
    const shape = def.shape as Record<string, z.ZodType>;
    const label = path.length ? labelFor(path[path.length - 1]!, meta) : "Rates";
    const labels = path.length ? [...groupLabels, label] : groupLabels;
    return {
      type: "group", key: path.join("."), label, ...(typeof meta?.description === "string" ? { description: meta.description } : {}),
      children: Object.entries(shape).map(([k, v]) => walk(v, [...path, k], labels)),
    };
  }
  if (def.type === "record") {
    const keys = recordKeys(def);
    if (!keys) throw new Error(`The rate book cannot lay out a record without a fixed list of keys at "${path.join(".")}".`);
    const label = labelFor(path[path.length - 1]!, meta);
    return { type: "group", key: path.join("."), label, children: keys.map((k) => walk(def.valueType as z.ZodType, [...path, k], [...groupLabels, label])) };
  }
  return { type: "field", field: leaf(path, groupLabels, inner, optional, meta) };
}

/** The rate book's tree for a rates schema (the estimator's, unless a test gives another). */
export function rateTree(schema: z.ZodType): Extract<RateNode, { type: "group" }> {
  const root = walk(schema, [], []);
  if (root.type !== "group") throw new Error("The rates schema must be an object.");
  return root;
}

export function fieldsOf(node: RateNode): RateField[] {
  return node.type === "field" ? [node.field] : node.children.flatMap(fieldsOf);
}

/** "Labour norms — New metal pipe — 2–4 ft": a field as a message or a CSV row names it. */
export function fullLabel(f: RateField): string {
  return [...f.groupLabels, f.label].join(" — ");
}

export function unitText(f: RateField, currency: string): string {
  return f.unit.replace("{currency}", currency || "¤");
}
