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

/** Complete default rates and norms. Invented demo values, every one of them. */
export const DEFAULT_RATES: Rates = {
  provenance: "invented demo values — replace with the firm's own rates and norms",
  currency: "EUR",
  hourlyRate: {
    metalPipes: "58.00", woodPipes: "56.00", reeds: "64.00", voicing: "72.00", chestAction: "56.00",
    console: "60.00", electrics: "62.00", dismantling: "50.00", transport: "45.00", erection: "55.00",
    tonalFinishing: "78.00",
  },
  metalPricePerKg: { "high-tin": "38.00", spotted: "24.00", common: "14.00", zinc: "9.50", copper: "16.00" },
  woodPricePerM3: { pine: "950.00", oak: "2400.00", mahogany: "3800.00" },
  cablePricePerM: "0.35",
  overheadPercent: "18",
  contingencyPercent: "7.5",
  marginPercent: "12",
  taxPercent: "20",
  alloys: {
    "high-tin": { tin: 0.75, lead: 0.25 },
    spotted: { tin: 0.5, lead: 0.5 },
    common: { tin: 0.3, lead: 0.68, antimony: 0.02 },
    zinc: { zinc: 1 },
    copper: { copper: 1 },
  },
  woodDensityKgM3: { pine: 450, oak: 750, mahogany: 600 },
  sheetThicknessMm: { over8: 2.2, "4to8": 1.6, "2to4": 1.1, "1to2": 0.8, under1: 0.6 },
  boardThicknessMm: { over8: 32, "4to8": 24, "2to4": 18, "1to2": 13, under1: 9 },
  footLengthMm: { over8: 450, "4to8": 350, "2to4": 260, "1to2": 200, under1: 160 },
  cutUpFraction: 0.3,
  chest: { clearanceMinMm: 8, clearanceFractionOfDiameter: 0.15, endBoardMm: 60, passageBoardMm: 400 },
  wiring: { relayToChestM: 3, offsetChestRunM: 3, consoleInternalM: 2, conductorsPerStopControl: 2 },
  norms: {
    newMetalPipe: { over8: 9, "4to8": 4.5, "2to4": 1.6, "1to2": 0.8, under1: 0.45 },
    newWoodPipe: { over8: 14, "4to8": 7, "2to4": 3.2, "1to2": 1.8, under1: 1.2 },
    reedResonator: { over8: 8, "4to8": 4, "2to4": 1.8, "1to2": 1, under1: 0.6 },
    reedParts: { over8: 3.5, "4to8": 2.5, "2to4": 1.8, "1to2": 1.4, under1: 1.2 },
    restoreMetalPipe: { over8: 3, "4to8": 1.6, "2to4": 0.7, "1to2": 0.4, under1: 0.25 },
    restoreWoodPipe: { over8: 5, "4to8": 2.5, "2to4": 1.2, "1to2": 0.7, under1: 0.5 },
    restoreReedParts: { over8: 1.5, "4to8": 1.2, "2to4": 0.9, "1to2": 0.7, under1: 0.6 },
    cleanRetainedPipe: 0.12,
    relocatePipe: 0.2,
    voiceNewFluePipe: 0.5,
    voiceNewReedPipe: 0.9,
    revoicePipe: 0.35,
    regulateRestoredPipe: 0.15,
    chestPerNoteChannel: 1.2,
    chestPerStop: 10,
    chestPerPipeMagnet: 0.3,
    offsetChestPerPipe: 1.5,
    windingPerDivision: 60,
    swellBoxPerDivision: 140,
    chestRestoredFactor: 0.45,
    chestRetainedFactor: 0.1,
    consolePerKeyboard: 45,
    consolePerStopControl: 2.5,
    consolePerCoupler: 4,
    consolePerTremulant: 3,
    consolePerPiston: 1.5,
    combinationSystem: 40,
    consoleRestoredFactor: 0.5,
    consoleRetainedFactor: 0.1,
    electricsPerConductor: 0.04,
    electricsPerStop: 1.5,
    electricsPerDivision: 16,
    dismantlePerDivision: 24,
    dismantlePerPipe: 0.06,
    transportPerTrip: 24,
    transportPerThousandPipes: 10,
    erectPerDivision: 60,
    erectPerPipe: 0.1,
    finishPerNewStop: 8,
    finishPerExistingStop: 4,
    finishPerDerivedStop: 1.5,
    finishPerPipe: 0.03,
  },
  programme: {
    hoursPerWeek: 38,
    efficiency: 0.85,
    crew: {
      metalPipes: 2, woodPipes: 1, reeds: 1, voicing: 2, chestAction: 2, console: 1, electrics: 1,
      dismantling: 3, transport: 2, erection: 4, tonalFinishing: 2,
    },
  },
};

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
 * Validates a firm's rates and norms. Any value left out is taken from DEFAULT_RATES, so a file may
 * carry only what differs; alloy compositions replace the default composition as a whole.
 */
export function parseRates(input: unknown): RatesResult {
  if (input !== undefined && !isPlainObject(input)) return { ok: false, messages: ["Rates: expected an object"] };
  const merged = isPlainObject(input) && isPlainObject(input.alloys)
    ? mergeDeep({ ...DEFAULT_RATES, alloys: { ...DEFAULT_RATES.alloys, ...input.alloys } }, { ...input, alloys: undefined })
    : mergeDeep(DEFAULT_RATES, input);
  const r = ratesSchema.safeParse(merged);
  if (r.success) return { ok: true, rates: r.data };
  return { ok: false, messages: r.error.issues.map((i) => `Rates: ${i.path.join(".") || "(top)"}: ${i.message}`) };
}
