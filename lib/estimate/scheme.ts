/**
 * The scheme model the estimator takes: the contract between the editor, the file format
 * (docs/scheme-format.md), the server and the command line. Pure zod, no I/O.
 *
 * Older files and stored schemes are read unchanged: `upgradeStop` turns a stop of the first format
 * (one `treatment` word, `reed-full` / `reed-half`, a scale offset measured at 8′ C) into this one
 * before zod sees it, keeping every pipe's size.
 */
import { z } from "zod";
import { MAX_FOOTAGE_TEXT, MSG_NOT_FOOTAGE, parseFootage, semitonesAbove8ft } from "./pitch";
import {
  families, constructions, flueConstructions, origins, pipeWorks, findings, resonatorLengths, actions, chestTypes, materials,
} from "./scheme-terms";
export {
  families, constructions, flueConstructions, origins, pipeWorks, findings, resonatorLengths, RESONATOR_FRACTION, actions, chestTypes, UNIT_CHESTS, materials,
} from "./scheme-terms";

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

const workOnExisting = ["new", "restored", "retained"] as const;

export const scaleSchema = z.object({
  /**
   * Semitones wider (+) or narrower (−) than the normal scale, measured at the stop's own C
   * (4′ C for a 4′ stop, the g of a 2⅔′), as practitioners read a deviation.
   */
  deviationHt: z.number().min(-48).max(48).default(0),
  /** The note on which the diameter halves, counted from 1 (normal scale: 17, i.e. every 16 semitones). */
  halvingOn: z.number().int().min(8).max(32).default(17),
  /** Mouth width as a fraction of the circumference (normal: 1/4). Wooden pipes' mouths span their inside width. */
  mouthWidth: z.number().gt(0).lt(1).default(0.25),
  /** Mouth height as a fraction of the mouth width; absent means the family's default from the firm's norms. */
  cutUp: z.number().min(0.1).max(0.8).optional(),
});

/** One break range of a mixture: from this note upward, the footage of each rank; null where a rank is silent (progressive mixtures). */
export const mixtureBreakSchema = z.object({ from: noteName, footages: z.array(footageSchema.nullable()).min(1).max(12) });

export const resonatorSchema = z.object({
  length: z.enum(resonatorLengths).default("full"),
  /** Conical (trumpet, oboe) or cylindrical (clarinet, regal, vox humana). */
  shape: z.enum(["conical", "cylindrical"]).default("conical"),
});

const stopFields = z.object({
  id: idSchema,
  name: z.string().min(1).max(80),
  footage: footageSchema,
  ranks: z.number().int().min(1).max(12).default(1),
  /** Mixtures and cornets: each break's footages, one per rank; the first break starts at the rank's lowest note. */
  breaks: z.array(mixtureBreakSchema).max(24).optional(),
  family: z.enum(families),
  construction: z.enum(constructions).default("open"),
  material: z.enum(materials).default("spotted"),
  scale: scaleSchema.prefault({}),
  /** Reeds: the resonator's length and shape (full-length conical when absent). */
  resonator: resonatorSchema.optional(),
  /** Reeds: from this key upward the rank breaks to open flue pipes. */
  fluesFrom: noteName.optional(),
  /** The lowest pipes of another material (zinc or wooden basses under metal trebles). */
  bass: z
    .object({ notes: z.number().int().min(1).max(61), material: z.enum(materials), construction: z.enum(flueConstructions).optional() })
    .optional(),
  /** A short compass of its own, e.g. from tenor c; otherwise the division's. */
  compass: compassSchema.optional(),
  origin: z.enum(origins).default("new"),
  /** For an extension or a borrowed stop: the id of the stop whose rank it draws on. */
  source: idSchema.optional(),
  /** Extensions: whether the notes they add to the rank are new pipes or pipes the organ already has. */
  addedPipes: z.enum(["new", "existing"]).default("new"),
  /** Work on existing pipes (an existing stop's, or an extension's existing added pipes). */
  work: z.array(z.enum(pipeWorks)).max(pipeWorks.length).default([]),
  /** Re-scaled: semitones the existing pipes move (+ up: wider, new basses; − down: narrower, new trebles). */
  rescaleHt: z.number().int().min(-12).max(12).default(0),
  /** Survey findings of an existing rank (restored work): each chooses its restoration norm. */
  condition: z.array(z.enum(findings)).max(findings.length).default([]),
  /** The rank's slider chest is duplexed, so the rank also plays from a second keyboard. */
  duplex: z.boolean().default(false),
  /** The lowest N pipes stand on an offset chest, off the main chest. */
  offsetBassPipes: z.number().int().min(0).max(32).default(0),
  /**
   * Survey measurements of an existing rank: at a few keys, a pipe's outside diameter (a wooden
   * pipe's inside side), mm. The scale fitted to them (lib/drawing/scale-fit.ts) is `scale`; the
   * estimator does not read them.
   */
  survey: z.array(z.object({ note: noteName, sizeMm: z.number().min(1).max(1000) })).max(61).optional(),
});

// ── reading the first format ─────────────────────────────────────────────────────────────────

const LEGACY_TREATMENT: Readonly<Record<string, { origin: (typeof origins)[number]; work: (typeof pipeWorks)[number][] }>> = {
  new: { origin: "new", work: [] },
  retained: { origin: "existing", work: [] },
  restored: { origin: "existing", work: ["restored"] },
  revoiced: { origin: "existing", work: ["revoiced"] },
  relocated: { origin: "existing", work: ["relocated"] },
  extension: { origin: "extension", work: [] },
  borrowed: { origin: "borrowed", work: [] },
  prepared: { origin: "prepared", work: [] },
  removed: { origin: "removed", work: [] },
};

/** The origin and work a first-format `treatment` word stands for; undefined for a word that format never had. */
export function fromTreatment(treatment: unknown): { origin: (typeof origins)[number]; work: (typeof pipeWorks)[number][] } | undefined {
  return typeof treatment === "string" && Object.hasOwn(LEGACY_TREATMENT, treatment) ? LEGACY_TREATMENT[treatment] : undefined;
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

/**
 * The deviation at the stop's own C that gives the same pipes as a first-format offset measured at
 * 8′ C: with D = D_normal(s_ref − dev) · 2^(−(s − s_ref)/(H − 1)) against D = 155.5 · 2^(−(s − off)/(H − 1)),
 * dev = s_ref + 16 · (off − s_ref)/(H − 1) (derived; equal to off on the normal halving, H = 17).
 * Rounded to a hundredth of a semitone (diameters move by less than 0.03 %).
 */
export function deviationFromLegacyOffset(offsetAt8ftC: number, halvingOn: number, referenceSemitones: number): number {
  const dev = referenceSemitones + (16 * (offsetAt8ftC - referenceSemitones)) / (halvingOn - 1);
  return Math.round(dev * 100) / 100;
}

/**
 * A stop of the first format in this one; anything else passes through untouched. Never throws:
 * what it cannot read is left for zod to report.
 */
export function upgradeStop(raw: unknown): unknown {
  if (!isRecord(raw)) return raw;
  let s: Record<string, unknown> = raw;
  if ("treatment" in s && s.origin === undefined) {
    const { treatment, ...rest } = s;
    const t = fromTreatment(treatment);
    s = t ? { ...rest, origin: t.origin, work: t.work } : { ...rest, origin: treatment };
  }
  if (s.construction === "reed-full") s = { ...s, construction: "reed", resonator: isRecord(s.resonator) ? s.resonator : { length: "full", shape: "conical" } };
  else if (s.construction === "reed-half") s = { ...s, construction: "reed", resonator: isRecord(s.resonator) ? s.resonator : { length: "half", shape: "cylindrical" } };
  const scale = s.scale;
  if (isRecord(scale) && scale.offsetHt !== undefined && scale.deviationHt === undefined) {
    const { offsetHt, ...rest } = scale;
    const halving = typeof rest.halvingOn === "number" && rest.halvingOn > 1 ? rest.halvingOn : 17;
    // Long text is left for zod's length check: it never reaches the footage parser.
    const f = (typeof s.footage === "string" && s.footage.length <= MAX_FOOTAGE_TEXT) || typeof s.footage === "number" ? parseFootage(s.footage) : null;
    const converted = typeof offsetHt === "number" && f ? deviationFromLegacyOffset(offsetHt, halving, semitonesAbove8ft(f)) : offsetHt;
    s = { ...s, scale: { ...rest, deviationHt: converted } };
  }
  return s;
}

/**
 * A stop, in this format; stops of the first format are upgraded on the way in. The type is the
 * current format's: old input is accepted at run time, new code writes new stops.
 */
export const stopSchema = z.preprocess(upgradeStop, stopFields) as unknown as typeof stopFields;
/** The stop's fields without the upgrade step, for forms that only ever hold the current format. */
export const stopFormSchema = stopFields;

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
  /** Inside size of the swell box in mm; absent means sized from the chest and its tallest pipe. */
  swellBox: z.object({ widthMm: z.number().positive(), depthMm: z.number().positive(), heightMm: z.number().positive() }).optional(),
  /** Cable run from the console to this division's chests, in metres. */
  consoleDistanceM: z.number().min(0).max(500).default(10),
  /**
   * Chest space available in the case, in mm; absent means not yet known. `heightMm`: clear height
   * above the chest for the pipes to stand in (to the roof, a floor or the division above); absent
   * means not measured. Older files have no height and read unchanged.
   */
  space: z.object({ lengthMm: z.number().positive(), depthMm: z.number().positive(), heightMm: z.number().positive().max(40000).optional() }).optional(),
  passageBoard: z.boolean().default(true),
  /** What happens to the windchests and action: made new, restored, or kept as they are. */
  chestWork: z.enum(workOnExisting).default("new"),
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
  consoleWork: z.enum(workOnExisting).default("new"),
  couplers: z.array(couplerSchema).max(128).default([]),
  tremulants: z.array(z.object({ id: idSchema, division: idSchema })).max(32).default([]),
  combination: z
    .object({
      memoryLevels: z.number().int().min(0).max(10000).default(0),
      generalPistons: z.number().int().min(0).max(100).default(0),
      divisionalPistons: z.number().int().min(0).max(20).default(0),
    })
    .prefault({}),
});

/** The case and its front: casework, display and dummy pipes, decoration and gilding as quantities. */
export const caseSchema = z.object({
  /** "none": the organ stands without a case of its own (a chamber), or the case is not part of the work. */
  work: z.enum(["new", "restored", "retained", "none"]).default("none"),
  /** Outside size in mm; absent means sized round the chests and the tallest pipe. */
  widthMm: z.number().positive().max(40000).optional(),
  depthMm: z.number().positive().max(20000).optional(),
  heightMm: z.number().positive().max(40000).optional(),
  timber: z.enum(["pine", "oak", "mahogany"]).default("oak"),
  /** Speaking pipes standing in the front (counted in their stops), to be polished as display pipes. */
  speakingFrontPipes: z.number().int().min(0).max(1000).default(0),
  /** Dummy (non-speaking) display pipes, made new, of this average length in mm. */
  dummyPipes: z.number().int().min(0).max(1000).default(0),
  dummyPipeLengthMm: z.number().min(100).max(11000).default(1500),
  frontMetal: z.enum(["high-tin", "spotted", "common", "zinc", "copper"]).default("high-tin"),
  /** Carved or pierced decoration (pipe shades, cresting), m². */
  decorationM2: z.number().min(0).max(500).default(0),
  /** Gilding (pipe mouths, carving, mouldings), m². */
  gildingM2: z.number().min(0).max(500).default(0),
});

/** The wind system: blower, reservoirs per pressure, trunking; tremulants come from the accessories. */
export const windSchema = z.object({
  work: z.enum(workOnExisting).default("new"),
  /** A new blower, or the existing one kept. */
  blower: z.enum(["new", "retained"]).default("new"),
  /** Length of main wind trunk from the blower to the reservoirs and chests, m; absent means sized per division. */
  trunkLengthM: z.number().min(0).max(500).optional(),
});

/** The site: how far away, whether scaffolding and lodging are needed. */
export const siteSchema = z.object({
  /** Road distance from the workshop, km. */
  distanceKm: z.number().min(0).max(20000).default(50),
  /** Scaffolding or a tower for access inside and in front of the case. */
  scaffold: z.boolean().default(true),
  /** Crew lodge near the site; absent means when the site lies beyond the firm's daily-travel distance. */
  lodging: z.boolean().optional(),
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
  tuning: tuningSchema.prefault({}),
  divisions: z.array(divisionSchema).min(1).max(16),
  accessories: accessoriesSchema.prefault({}),
  case: caseSchema.prefault({}),
  wind: windSchema.prefault({}),
  site: siteSchema.prefault({}),
  /** Dates for the programme (ISO yyyy-mm-dd): work starts, and the client's target for completion. */
  programme: z.object({ start: isoDate, target: isoDate.optional() }).optional(),
});

export type SchemeInput = z.input<typeof schemeSchema>;
export type Scheme = Readonly<z.output<typeof schemeSchema>>;
export type Division = Scheme["divisions"][number];
export type Stop = Division["stops"][number];
export type Origin = (typeof origins)[number];
export type PipeWork = (typeof pipeWorks)[number];
export type Finding = (typeof findings)[number];
export type Material = (typeof materials)[number];
export type Construction = (typeof constructions)[number];
export type FlueConstruction = (typeof flueConstructions)[number];
export type Family = (typeof families)[number];
export type Coupler = Scheme["accessories"]["couplers"][number];
export type CaseWork = Scheme["case"];
export type WindWork = Scheme["wind"];
export type SiteWork = Scheme["site"];

/**
 * One word for what happens to a stop, as a stop list or a report column gives it: its origin, or
 * for existing pipes the work on them ("restored+revoiced"; "retained" when kept as they are).
 */
export function dispositionOf(stop: { readonly origin: Origin; readonly work: readonly PipeWork[] }): string {
  if (stop.origin !== "existing") return stop.origin;
  return stop.work.length ? [...stop.work].sort((a, b) => pipeWorks.indexOf(a) - pipeWorks.indexOf(b)).join("+") : "retained";
}
