/**
 * The scheme model the estimator takes: the contract between the editor, the file format
 * (docs/scheme-format.md), the server and the command line. Pure zod, no I/O.
 */
import { z } from "zod";
import { MAX_FOOTAGE_TEXT, MSG_NOT_FOOTAGE, parseFootage } from "./pitch";

/** Ids of divisions, stops, couplers and tremulants: short words chosen by the editor ("gt-od"). */
const MAX_ID = 64;
/** An id; the length is checked first and stops the check, so no longer text reaches a pattern or an index. */
const idSchema = z.string().min(1).max(MAX_ID, { abort: true, error: `an id of at most ${MAX_ID} characters` });

/** Helmholtz note names as organ builders write them: C, C#, c, c', c'''' (Wikipedia, "Helmholtz pitch notation"). */
export const noteName = z
  .string()
  .max(8, { abort: true, error: "a note in Helmholtz notation, e.g. C, c, c', g', c''''" })
  // Capitals repeat for the lower octaves (C, CC, CCC) and take no primes; small letters take 0–5 primes.
  .regex(
    /^(?:([A-G])\1{0,2}(?:#|b|♯|♭)?|[a-g](?:#|b|♯|♭)?(?:'{1,5}|′{1,5})?)$/,
    "a note in Helmholtz notation, e.g. C, c, c', g', c''''",
  );

export const compassSchema = z.object({ low: noteName, high: noteName });

/**
 * A footage as the trade writes it, kept as an exact fraction: "8", "2 2/3", "2⅔", "1 3/5", "10 2/3", "1/2".
 * Numbers are accepted for whole footages.
 */
export const footageSchema = z
  .union([z.string().min(1), z.number().positive()])
  .refine((f) => typeof f !== "string" || f.length <= MAX_FOOTAGE_TEXT, { abort: true, error: `is too long for a footage (at most ${MAX_FOOTAGE_TEXT} characters, e.g. 10 2/3)` })
  .refine((f) => parseFootage(f) !== null, { error: (issue) => `"${String(issue.input)}" ${MSG_NOT_FOOTAGE}` });

export const families = ["principal", "flute", "string", "reed", "hybrid", "mutation", "mixture"] as const;
export const constructions = ["open", "stopped", "half-stopped", "conical", "capped", "reed-full", "reed-half"] as const;
export const treatments = [
  "new", "retained", "restored", "revoiced", "relocated", "extension", "borrowed", "prepared", "removed",
] as const;
export const actions = ["mechanical", "electro-pneumatic", "electric", "pneumatic"] as const;
export const chestTypes = ["slider", "pitman", "direct-electric", "ventil"] as const;
/** Metals and woods the rate tables price; ids are the file format's words. */
export const materials = ["high-tin", "spotted", "common", "zinc", "copper", "pine", "oak", "mahogany"] as const;

export const scaleSchema = z.object({
  /** Semitones wider (+) or narrower (−) than the normal scale. */
  offsetHt: z.number().min(-24).max(24).default(0),
  /** The note on which the diameter halves, counted from 1 (normal scale: 17, i.e. every 16 semitones). */
  halvingOn: z.number().int().min(8).max(32).default(17),
  /** Mouth width as a fraction of the circumference (normal: 1/4). */
  mouthWidth: z.number().gt(0).lt(1).default(0.25),
});

/** One break range of a mixture: from this note upward, the footage of each rank. */
export const mixtureBreakSchema = z.object({ from: noteName, footages: z.array(footageSchema).min(1).max(12) });

export const stopSchema = z.object({
  id: idSchema,
  name: z.string().min(1).max(80),
  footage: footageSchema,
  ranks: z.number().int().min(1).max(12).default(1),
  /** Mixtures and cornets: each break's footages, one per rank; the first break starts at the rank's lowest note. */
  breaks: z.array(mixtureBreakSchema).max(24).optional(),
  family: z.enum(families),
  construction: z.enum(constructions).default("open"),
  material: z.enum(materials).default("spotted"),
  scale: scaleSchema.default({ offsetHt: 0, halvingOn: 17, mouthWidth: 0.25 }),
  /** A short compass of its own, e.g. from tenor c; otherwise the division's. */
  compass: compassSchema.optional(),
  treatment: z.enum(treatments).default("new"),
  /** For extension and borrowed: the id of the stop whose rank it draws on. */
  source: idSchema.optional(),
  /** The lowest N pipes stand on an offset chest, off the main chest. */
  offsetBassPipes: z.number().int().min(0).max(32).default(0),
});

export const windPressureSchema = z.object({ value: z.number().positive(), unit: z.enum(["mm", "in"]).default("mm") });

export const divisionSchema = z.object({
  id: idSchema,
  name: z.string().min(1).max(60),
  keyboard: z.enum(["manual", "pedal"]),
  compass: compassSchema,
  action: z.enum(actions).default("mechanical"),
  chest: z.enum(chestTypes).default("slider"),
  /** A chromatic chest has one row per rank; a C/C♯ chest splits each rank into two halves. */
  chestLayout: z.enum(["chromatic", "c-c-sharp"]).default("c-c-sharp"),
  windPressure: windPressureSchema.default({ value: 80, unit: "mm" }),
  enclosed: z.boolean().default(false),
  /** Cable run from the console to this division's chests, in metres. */
  consoleDistanceM: z.number().min(0).max(500).default(10),
  /** Chest space available in the case, in mm; absent means not yet known. */
  space: z.object({ lengthMm: z.number().positive(), depthMm: z.number().positive() }).optional(),
  passageBoard: z.boolean().default(true),
  /** What happens to the windchests and action: made new, restored, or kept as they are. */
  chestWork: z.enum(["new", "restored", "retained"]).default("new"),
  // Limits far above any organ, so a runaway file cannot tie up the server.
  stops: z.array(stopSchema).max(250).default([]),
});

export const couplerSchema = z.object({
  id: idSchema,
  /** The division whose keys are coupled (e.g. the Swell in "Swell to Great"). */
  from: idSchema,
  to: idSchema,
  /** 0 unison, -1 sub-octave (16′), +1 octave (4′). */
  octave: z.union([z.literal(-1), z.literal(0), z.literal(1)]).default(0),
});

export const accessoriesSchema = z.object({
  /** What happens to the console: made new, restored, or kept as it is. */
  consoleWork: z.enum(["new", "restored", "retained"]).default("new"),
  couplers: z.array(couplerSchema).max(128).default([]),
  tremulants: z.array(z.object({ id: idSchema, division: idSchema })).max(32).default([]),
  combination: z
    .object({
      memoryLevels: z.number().int().min(0).max(10000).default(0),
      generalPistons: z.number().int().min(0).max(100).default(0),
      divisionalPistons: z.number().int().min(0).max(20).default(0),
    })
    .default({ memoryLevels: 0, generalPistons: 0, divisionalPistons: 0 }),
});

const isoDate = z.iso.date("a date as yyyy-mm-dd");

export const tuningSchema = z.object({
  /** A4 in Hz; ISO 16 standard pitch is 440. */
  pitchHz: z.number().min(380).max(480).default(440),
  /** Design temperature in °C for the speed of sound. */
  temperatureC: z.number().min(-10).max(40).default(18),
  /** Mutations tempered (default) or tuned pure to their harmonic. */
  mutations: z.enum(["tempered", "pure"]).default("tempered"),
});

export const schemeSchema = z.object({
  name: z.string().min(1).max(120),
  tuning: tuningSchema.default({ pitchHz: 440, temperatureC: 18, mutations: "tempered" }),
  divisions: z.array(divisionSchema).min(1).max(16),
  accessories: accessoriesSchema.default({
    consoleWork: "new",
    couplers: [],
    tremulants: [],
    combination: { memoryLevels: 0, generalPistons: 0, divisionalPistons: 0 },
  }),
  /** Dates for the programme (ISO yyyy-mm-dd): work starts, and the client's target for completion. */
  programme: z.object({ start: isoDate, target: isoDate.optional() }).optional(),
});

export type SchemeInput = z.input<typeof schemeSchema>;
export type Scheme = Readonly<z.output<typeof schemeSchema>>;
export type Division = Scheme["divisions"][number];
export type Stop = Division["stops"][number];
export type Treatment = (typeof treatments)[number];
export type Material = (typeof materials)[number];
export type Construction = (typeof constructions)[number];
export type Family = (typeof families)[number];
export type Coupler = Scheme["accessories"]["couplers"][number];
