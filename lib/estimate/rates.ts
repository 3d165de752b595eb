/**
 * The firm's rates and labour norms, validated with zod, and a complete default set.
 * No published labour norms, prices per stop or pipe-metal thicknesses were found
 * (../shared/references.md, "Not found"): they are each firm's own. EVERY VALUE IN DEFAULT_RATES IS
 * AN INVENTED DEMO VALUE, to be replaced by the firm's own figures.
 */
import { z } from "zod";
import { metals, woods } from "./materials";
import { departments, sizeClasses } from "./labour";

const amount = z.string().regex(/^\d+(\.\d{1,4})?$/, "an amount such as 62.50 (a string, up to 4 decimals)");
const percent = z.string().regex(/^\d{1,3}(\.\d{1,4})?$/, "a percentage such as 12.5 (a string)");
const hours = z.number().min(0);

function recordOf<K extends string, T extends z.ZodType>(keys: readonly K[], value: T) {
  return z.object(Object.fromEntries(keys.map((k) => [k, value])) as { [P in K]: T });
}

/** Values per size class of speaking length: over 8′, 4–8′, 2–4′, 1–2′, under 1′. */
const bySize = (v: z.ZodNumber) => recordOf(sizeClasses, v);

const composition = z
  .object({
    tin: z.number().min(0).max(1),
    lead: z.number().min(0).max(1),
    antimony: z.number().min(0).max(1),
    zinc: z.number().min(0).max(1),
    copper: z.number().min(0).max(1),
  })
  .partial()
  .refine((c) => Math.abs(Object.values(c).reduce((s, w) => s + (w ?? 0), 0) - 1) < 1e-6, "weight fractions must add up to 1");

export const normsSchema = z.object({
  /** Hours per new metal flue pipe by size class (metal pipe shop). */
  newMetalPipe: bySize(hours),
  newWoodPipe: bySize(hours),
  /** Reed resonators are made in the metal pipe shop; blocks, shallots, tongues and springs in reed making. */
  reedResonator: bySize(hours),
  reedParts: bySize(hours),
  restoreMetalPipe: bySize(hours),
  restoreWoodPipe: bySize(hours),
  restoreReedParts: bySize(hours),
  cleanRetainedPipe: hours,
  relocatePipe: hours,
  voiceNewFluePipe: hours,
  voiceNewReedPipe: hours,
  revoicePipe: hours,
  regulateRestoredPipe: hours,
  chestPerNoteChannel: hours,
  chestPerStop: hours,
  chestPerPipeMagnet: hours,
  offsetChestPerPipe: hours,
  windingPerDivision: hours,
  swellBoxPerDivision: hours,
  chestRestoredFactor: z.number().min(0).max(1),
  chestRetainedFactor: z.number().min(0).max(1),
  consolePerKeyboard: hours,
  consolePerStopControl: hours,
  consolePerCoupler: hours,
  consolePerTremulant: hours,
  consolePerPiston: hours,
  combinationSystem: hours,
  consoleRestoredFactor: z.number().min(0).max(1),
  consoleRetainedFactor: z.number().min(0).max(1),
  electricsPerConductor: hours,
  electricsPerStop: hours,
  electricsPerDivision: hours,
  dismantlePerDivision: hours,
  dismantlePerPipe: hours,
  transportPerTrip: hours,
  transportPerThousandPipes: hours,
  erectPerDivision: hours,
  erectPerPipe: hours,
  finishPerNewStop: hours,
  finishPerExistingStop: hours,
  finishPerDerivedStop: hours,
  finishPerPipe: hours,
});

export const ratesSchema = z.object({
  /** Where the figures come from, e.g. "invented demo values" or "firm's norms 2027". */
  provenance: z.string().min(1),
  currency: z.string().regex(/^[A-Z]{3}$/, "an ISO 4217 code such as EUR"),
  hourlyRate: recordOf(departments, amount),
  metalPricePerKg: recordOf(metals, amount),
  woodPricePerM3: recordOf(woods, amount),
  /** Price per metre of single conductor (multi-core cable priced per core metre). */
  cablePricePerM: amount,
  overheadPercent: percent,
  contingencyPercent: percent,
  marginPercent: percent,
  taxPercent: percent,
  /** Weight fractions of each pipe metal. */
  alloys: recordOf(metals, composition),
  woodDensityKgM3: recordOf(woods, z.number().positive()),
  sheetThicknessMm: bySize(z.number().positive()),
  boardThicknessMm: bySize(z.number().positive()),
  /** Length of a metal pipe's conical foot. */
  footLengthMm: bySize(z.number().min(0)),
  /** Mouth height as a fraction of mouth width (the cut-up), for the mouth end correction. */
  cutUpFraction: z.number().min(0.1).max(0.8),
  chest: z.object({
    clearanceMinMm: z.number().min(0),
    clearanceFractionOfDiameter: z.number().min(0).max(2),
    endBoardMm: z.number().min(0),
    passageBoardMm: z.number().min(0),
  }),
  wiring: z.object({
    /** Direct-electric chests: relay in the organ, this far from the pipe magnets. */
    relayToChestM: z.number().min(0),
    offsetChestRunM: z.number().min(0),
    consoleInternalM: z.number().min(0),
    conductorsPerStopControl: z.number().int().min(1).max(4),
  }),
  norms: normsSchema,
  programme: z.object({
    hoursPerWeek: z.number().positive().max(80),
    /** Share of paid hours that goes into the job (0–1]. */
    efficiency: z.number().gt(0).max(1),
    crew: recordOf(departments, z.number().int().min(1).max(50)),
  }),
});

export type Rates = Readonly<z.output<typeof ratesSchema>>;
export type Norms = Rates["norms"];
export type RatesInput = DeepPartial<z.input<typeof ratesSchema>>;
type DeepPartial<T> = T extends object ? { [K in keyof T]?: DeepPartial<T[K]> } : T;


function isPlainObject(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

/** Deep merge of plain objects: values in `over` replace those in `base`; arrays and scalars replace whole. */
function mergeDeep(base: unknown, over: unknown): unknown {
  if (!isPlainObject(base) || !isPlainObject(over)) return over === undefined ? base : over;
  const out: Record<string, unknown> = { ...base };
  for (const [k, v] of Object.entries(over)) out[k] = mergeDeep(base[k], v);
  return out;
}

export type RatesResult = { ok: true; rates: Rates } | { ok: false; messages: string[] };

/**
 * Validates a firm's rates and norms. Any value left out is taken from `base` (e.g. the firm's
 * stored rates, or DEFAULT_RATES from demo-rates.ts), so a file may carry only what differs; alloy
 * compositions replace the base composition as a whole.
 */
export function parseRates(input: unknown, base: Rates): RatesResult {
  if (input !== undefined && !isPlainObject(input)) return { ok: false, messages: ["Rates: expected an object"] };
  const merged = isPlainObject(input) && isPlainObject(input.alloys)
    ? mergeDeep({ ...base, alloys: { ...base.alloys, ...input.alloys } }, { ...input, alloys: undefined })
    : mergeDeep(base, input);
  const r = ratesSchema.safeParse(merged);
  if (r.success) return { ok: true, rates: r.data };
  return { ok: false, messages: r.error.issues.map((i) => `Rates: ${i.path.join(".") || "(top)"}: ${i.message}`) };
}

/**
 * The rates a role without money:read may hold: the labour norms, crews and chest and wiring rules
 * (what the workshop needs for hours and space), with every price, rate and percentage set to zero.
 */
export function withoutPrices(rates: Rates): Rates {
  const zero = <K extends string>(r: Readonly<Record<K, string>>) => Object.fromEntries(Object.keys(r).map((k) => [k, "0.00"])) as Record<K, string>;
  return {
    ...rates,
    provenance: "prices withheld",
    hourlyRate: zero(rates.hourlyRate),
    metalPricePerKg: zero(rates.metalPricePerKg),
    woodPricePerM3: zero(rates.woodPricePerM3),
    cablePricePerM: "0.00",
    overheadPercent: "0",
    contingencyPercent: "0",
    marginPercent: "0",
    taxPercent: "0",
  };
}
