/**
 * The firm's rates and norms, validated with zod, every field labelled with its unit (`.meta({ title,
 * description, unit })`, visible through `z.toJSONSchema(ratesSchema)`), so a rate book can be built
 * from this schema alone. No published labour norms, prices per stop or pipe-metal thicknesses were
 * found (../shared/references.md, "Not found"): they are each firm's own. EVERY VALUE IN
 * DEFAULT_RATES (demo-rates.ts) IS AN INVENTED DEMO VALUE, to be replaced by the firm's own figures.
 */
import { z } from "zod";
import { metals, woods } from "./materials";
import { departments, sizeClasses } from "./departments";
import { families, findings } from "./scheme";

type Meta = { title: string; unit?: string; description?: string };
const amount = (m: Meta) => z.string().regex(/^\d+(\.\d{1,4})?$/, "an amount such as 62.50 (a string, up to 4 decimals)").meta(m);
const percent = (m: Meta) => z.string().regex(/^\d{1,3}(\.\d{1,4})?$/, "a percentage such as 12.5 (a string)").meta({ unit: "%", ...m });
const hours = (title: string, description?: string) => z.number().min(0).meta({ title, unit: "h", description });
const num = (m: Meta & { min?: number; max?: number }) => z.number().min(m.min ?? 0).max(m.max ?? Number.MAX_SAFE_INTEGER).meta({ title: m.title, unit: m.unit, description: m.description });
const factor = (title: string, description?: string) => z.number().min(0).max(1).meta({ title, unit: "×", description });

function recordOf<K extends string, T extends z.ZodType>(keys: readonly K[], value: (k: K) => T) {
  return z.object(Object.fromEntries(keys.map((k) => [k, value(k)])) as { [P in K]: T });
}

/** Values per size class of nominal length: over 8′, 4–8′, 2–4′, 1–2′, under 1′. */
const bySize = (title: string, unit: string, description?: string) =>
  recordOf(sizeClasses, () => z.number().min(0)).meta({ title, unit, description: `${description ?? ""} By size class of nominal length.`.trim() });

const composition = z
  .object({
    tin: z.number().min(0).max(1),
    lead: z.number().min(0).max(1),
    antimony: z.number().min(0).max(1),
    zinc: z.number().min(0).max(1),
    copper: z.number().min(0).max(1),
  })
  .partial()
  .refine((c) => Math.abs(Object.values(c).reduce((s, w) => s + (w ?? 0), 0) - 1) < 1e-6, "weight fractions must add up to 1")
  .meta({ title: "Alloy", unit: "weight fraction" });

export const normsSchema = z.object({
  // Pipes
  newMetalPipe: bySize("New metal flue pipe", "h/pipe", "Casting share, planing, cutting, forming, soldering body, foot and mouth (metal pipe shop)."),
  newWoodPipe: bySize("New wooden pipe", "h/pipe", "Boards, block, cap, stopper or foot (wood pipe shop); also wooden reed resonators."),
  reedResonator: bySize("New metal reed resonator", "h/pipe", "Metal pipe shop, by the resonator's own nominal length."),
  reedParts: bySize("New reed block, boot, shallot, tongue and spring", "h/pipe", "Reed making, by the pipe's pitch."),
  voiceNewFluePipe: bySize("Voicing a new flue pipe in the workshop", "h/pipe", "By the pipe's pitch."),
  voiceNewReedPipe: bySize("Voicing a new reed pipe in the workshop", "h/pipe", "By the pipe's pitch."),
  cleanPipe: bySize("Cleaning an existing pipe kept as it is", "h/pipe"),
  restoreMetalPipe: bySize("Restoring a sound existing metal pipe", "h/pipe", "Cleaning, rounding, minor repairs."),
  restoreWoodPipe: bySize("Restoring a sound existing wooden pipe", "h/pipe"),
  restoreReedParts: bySize("Restoring an existing reed's block, shallot, tongue and spring", "h/pipe"),
  finding: recordOf(findings, (f) => bySize(`Restoration where the survey found: ${f}`, "h/pipe")).meta({
    title: "Restoration by survey finding",
    unit: "h/pipe",
    description: "Added to the sound-pipe norm for every finding recorded on the rank; reed findings apply to the reed parts.",
  }),
  regulateRestoredPipe: hours("Regulating a restored pipe", "Per pipe."),
  revoiceFluePipe: hours("Revoicing an existing flue pipe", "Per pipe."),
  revoiceReedPipe: hours("Revoicing an existing reed pipe", "Per pipe: tongues re-curved, shallots reworked."),
  relocatePipe: hours("Relocating an existing pipe", "Per pipe: new rackboards, conveyancing, re-erection."),
  rescalePipe: bySize("Re-scaling an existing pipe (moved up or down the rank)", "h/pipe", "Cut down or lengthened, retuned."),
  polishFrontPipe: hours("Polishing or finishing a front pipe", "Per display pipe, speaking or dummy."),
  // Chests and action
  chestPerNoteChannel: hours("Windchest per note channel", "Pallet, channel, grid."),
  chestPerStop: hours("Windchest per stop on it", "Slider and table, or stop channel."),
  chestPerPipe: hours("Windchest per pipe position", "Boring, rackboard, conveyancing."),
  chestPerPipeMagnet: hours("Fitting a pipe valve or magnet (unit chests)", "Per pipe on pitman and direct-electric chests."),
  offsetChestPerPipe: hours("Offset chest per pipe", "Per pipe standing off the main chest."),
  duplexPerNote: hours("Duplex per note", "Second pallet or channel so a rank plays from a second keyboard."),
  duplexPerStop: hours("Duplex per duplexed stop", "Second slider and its stop action."),
  keyActionMechanicalPerNote: hours("Mechanical key action per note", "Trackers, squares, rollerboard, backfalls."),
  keyActionElectricPerNote: hours("Electric key action per note", "Pallet magnet fitted and adjusted."),
  keyActionPneumaticPerNote: hours("Pneumatic or electro-pneumatic key action per note", "Primary and pallet motors."),
  stopActionMechanicalPerStop: hours("Mechanical stop action per stop", "Trundles, traces, levers."),
  stopActionElectricPerStop: hours("Electric stop action per stop", "Slider solenoid or stop-action motor fitted."),
  couplerMechanicalPerNote: hours("Mechanical coupler machine per coupled note", "Per coupler, per note coupled."),
  chestRestoredFactor: factor("Restored chests and action, share of new", "Hours of restoring ÷ hours of making new."),
  chestRetainedFactor: factor("Retained chests and action, share of new", "Overhaul of chests kept as they are."),
  // Wind
  windingPerDivision: hours("Winding a division", "Regulator, conveyances, concussion bellows."),
  reservoirBase: hours("Reservoir, fixed part", "Per reservoir (one per wind pressure)."),
  reservoirPerM3PerMin: hours("Reservoir, per m³/min of wind it supplies"),
  trunkingPerM: hours("Wind trunking per metre"),
  tremulantFitting: hours("Fitting a tremulant", "Per tremulant."),
  blowerInstall: hours("Installing a blower", "Blower box, silencing, supply connection by others."),
  windRestoredFactor: factor("Restored wind system, share of new", "Releathering reservoirs, overhauling trunks."),
  windRetainedFactor: factor("Retained wind system, share of new"),
  // Swell boxes
  swellBoxPerM2: hours("Swell box wall per m²"),
  shuttersPerM2: hours("Swell shutters per m² of shutter front"),
  swellMechanismMechanical: hours("Mechanical swell linkage", "Per swell box: balanced pedal, rods, rollers."),
  swellMechanismElectric: hours("Electric swell drive fitted", "Per swell box."),
  // Case and front
  caseNewPerM2: hours("New casework per m² of case surface", "Front, sides and roof; framing, panels, mouldings."),
  caseRestoredPerM2: hours("Restoring casework per m²"),
  caseRetainedPerM2: hours("Cleaning and making good retained casework per m²"),
  decorationPerM2: hours("Carved or pierced decoration per m²", "Pipe shades, cresting."),
  gildingPerM2: hours("Gilding per m²"),
  caseErectPerM2: hours("Erecting casework on site per m²"),
  // Console
  consolePerKeyboard: hours("Console per keyboard (manual or pedalboard)", "Fitting, key frames, bushing."),
  consolePerStopControl: hours("Console per stop control"),
  consolePerCoupler: hours("Console per coupler"),
  consolePerTremulant: hours("Console per tremulant control"),
  consolePerPiston: hours("Console per piston"),
  combinationSystem: hours("Fitting a combination system"),
  consoleRestoredFactor: factor("Restored console, share of new"),
  consoleRetainedFactor: factor("Retained console, share of new"),
  // Electrics
  electricsPerConductor: hours("Terminating a conductor"),
  electricsPerStop: hours("Electrics per stop control"),
  electricsPerDivision: hours("Electrics per division", "Supplies, relay cabinet share, testing."),
  // Dismantling, transport, erection, finishing
  dismantlePerDivision: hours("Dismantling per existing division"),
  dismantlePerPipe: hours("Dismantling and packing per existing pipe"),
  cratePerLoad: hours("Crating per load"),
  loadingPerLoad: hours("Loading and unloading per load", "Crew hours at both ends."),
  erectPerDivision: hours("Erection per division"),
  erectPerPipe: hours("Erection per pipe"),
  finishPerNewStop: hours("Tonal finishing per new, restored or revoiced stop"),
  finishPerExistingStop: hours("Tonal finishing per retained or relocated stop"),
  finishPerDerivedStop: hours("Tonal finishing per extension or borrowing"),
  finishPerPipe: hours("Tonal finishing per pipe"),
  // Design
  designBase: hours("Design and drawings, fixed part"),
  designPerStop: hours("Design and drawings per stop"),
  designPerDivision: hours("Design and drawings per division"),
  designCasePerM2: hours("Case design per m² of new case"),
  managementPercent: num({ title: "Project management", unit: "% of all other hours", max: 50 }),
});

/** Bought-in items and site costs, each an amount per unit (invented demo prices in demo-rates.ts). */
export const itemsSchema = z.object({
  blowerBase: amount({ title: "Blower, fixed part", unit: "per blower" }),
  blowerPerKw: amount({ title: "Blower, per kW of motor", unit: "per kW" }),
  reservoirMaterialsBase: amount({ title: "Reservoir materials, fixed part", unit: "per reservoir", description: "Leather, springs, timber." }),
  reservoirMaterialsPerM3PerMin: amount({ title: "Reservoir materials per m³/min", unit: "per m³/min" }),
  trunkingPerM: amount({ title: "Wind trunk materials", unit: "per m" }),
  tremulant: amount({ title: "Tremulant parts", unit: "each" }),
  chestMaterialsPerChannel: amount({ title: "Chest timber, leather and felt per note channel", unit: "per channel" }),
  chestMaterialsPerStop: amount({ title: "Chest materials per stop (slider, table, stop channel)", unit: "per stop" }),
  palletMagnet: amount({ title: "Pallet magnet", unit: "each", description: "Electric slider chests, one per note." }),
  pipeMagnet: amount({ title: "Pipe magnet or valve unit", unit: "each", description: "Unit chests, one per pipe." }),
  pneumaticMotorPerNote: amount({ title: "Pneumatic motors per note", unit: "per note", description: "Electro-pneumatic and pneumatic action." }),
  sliderSolenoid: amount({ title: "Slider solenoid or stop-action motor", unit: "each" }),
  relayBase: amount({ title: "Solid-state relay, fixed part", unit: "per organ" }),
  relayPerConductor: amount({ title: "Relay per conductor switched", unit: "per conductor" }),
  keyboard: amount({ title: "Manual keyboard", unit: "each" }),
  pedalboard: amount({ title: "Pedalboard", unit: "each" }),
  drawstopMechanical: amount({ title: "Drawstop, mechanical", unit: "each" }),
  drawstopElectric: amount({ title: "Drawstop or tab, electric (solenoid)", unit: "each" }),
  piston: amount({ title: "Piston", unit: "each" }),
  combinationBase: amount({ title: "Combination system, fixed part", unit: "per organ" }),
  combinationPerLevel: amount({ title: "Combination system per memory level", unit: "per level" }),
  swellPedal: amount({ title: "Balanced swell pedal", unit: "each" }),
  swellMotor: amount({ title: "Electric swell-shutter drive", unit: "each" }),
  gildingPerM2: amount({ title: "Gold leaf and size", unit: "per m²" }),
  scaffoldSetup: amount({ title: "Scaffolding erected and struck", unit: "per site" }),
  scaffoldPerWeek: amount({ title: "Scaffolding hire", unit: "per week on site" }),
  crateMaterialsPerLoad: amount({ title: "Crates and packing", unit: "per load" }),
  vehiclePerLoad: amount({ title: "Vehicle, fixed part", unit: "per load" }),
  vehiclePerKm: amount({ title: "Vehicle per km", unit: "per km driven" }),
  travelPerPersonWeek: amount({ title: "Crew travel", unit: "per person-week on site" }),
  lodgingPerPersonWeek: amount({ title: "Crew lodging and subsistence", unit: "per person-week away" }),
});

export const ratesSchema = z.object({
  /** Where the figures come from, e.g. "invented demo values" or "firm's norms 2027". */
  provenance: z.string().min(1).meta({ title: "Where these figures come from" }),
  currency: z.string().regex(/^[A-Z]{3}$/, "an ISO 4217 code such as EUR").meta({ title: "Currency (ISO 4217)" }),
  hourlyRate: recordOf(departments, (d) => amount({ title: `Hourly rate: ${d}`, unit: "per hour" })),
  metalPricePerKg: recordOf(metals, (m) => amount({ title: `Pipe metal: ${m}`, unit: "per kg bought" })),
  woodPricePerM3: recordOf(woods, (w) => amount({ title: `Timber: ${w}`, unit: "per m³ bought" })),
  /** Price per metre of single conductor (multi-core cable priced per core metre). */
  cablePricePerM: amount({ title: "Action cable", unit: "per conductor metre" }),
  items: itemsSchema,
  overheadPercent: percent({ title: "Overheads", description: "Of the direct cost." }),
  contingencyPercent: percent({ title: "Contingency", description: "Of direct cost and overheads." }),
  marginPercent: percent({ title: "Margin", description: "Of direct cost, overheads and contingency." }),
  taxPercent: percent({ title: "Tax", description: "Of the net amount." }),
  /** How the firm reads lengths and weights on pipe tables and drawings: millimetres and kilograms, or inches and pounds. */
  drawingUnits: z.enum(["mm", "in"]).default("mm").meta({ title: "Units of pipe tables and drawings", description: "mm: millimetres and kilograms; in: inches and pounds." }),
  /** Weight fractions of each pipe metal. */
  alloys: recordOf(metals, () => composition),
  woodDensityKgM3: recordOf(woods, (w) => num({ title: `Density: ${w}`, unit: "kg/m³", min: 1 })),
  pipeMetal: z.object({
    thicknessAt8ftCMm: num({ title: "Sheet thickness of a pipe of 155.5 mm diameter (normal-scale 8′ C)", unit: "mm", min: 0.05 }),
    thicknessExponent: num({ title: "Thickness follows diameter to this power", unit: "", max: 2, description: "t = t₈ · (D/155.5)^p; 0.5 takes 1.25 mm at 8′ C to about 0.35 mm at the top of a 61-note rank." }),
    minimumThicknessMm: num({ title: "Thinnest sheet cast", unit: "mm", min: 0.05 }),
    thicknessFactor: recordOf(metals, (m) => num({ title: `Thickness factor: ${m}`, unit: "×", min: 0.1, max: 5, description: "Lead-rich metal is cast thicker." })),
    allowancePercent: recordOf(metals, (m) => num({ title: `Casting, planing and offcut allowance: ${m}`, unit: "%", max: 200 })),
    repairPercent: num({ title: "Metal bought to repair restored pipes", unit: "% of their weight", max: 100 }),
    footLengthMm: bySize("Length of a metal pipe's foot", "mm"),
    capSkirtPerDiameter: num({ title: "Depth of a movable cap's skirt", unit: "× diameter", max: 3 }),
  }),
  woodPipes: z.object({
    boardAt8ftCMm: num({ title: "Board thickness of a wooden pipe 137.8 mm inside (normal-scale 8′ C)", unit: "mm", min: 1 }),
    boardExponent: num({ title: "Board thickness follows inside width to this power", unit: "", max: 2 }),
    minimumBoardMm: num({ title: "Thinnest board", unit: "mm", min: 1 }),
    blockLengthPerSide: num({ title: "Block length", unit: "× inside width", max: 5 }),
    capHeightPerSide: num({ title: "Cap height", unit: "× inside width", max: 5, description: "A cap one board thick across the outside width." }),
    stopperLengthPerSide: num({ title: "Stopper and handle length", unit: "× inside width", max: 5 }),
    allowancePercent: num({ title: "Sawing and planing allowance on pipe timber", unit: "%", max: 200 }),
  }),
  /** Mouth height as a fraction of mouth width, by family, where a stop does not give its own. */
  cutUpByFamily: recordOf(families, (f) => num({ title: `Cut-up: ${f}`, unit: "× mouth width", min: 0.1, max: 0.8 })),
  chest: z.object({
    clearanceMinMm: num({ title: "Clearance beside every pipe", unit: "mm" }),
    clearanceFractionOfDiameter: num({ title: "Further clearance per mm of diameter", unit: "×", max: 2 }),
    endBoardMm: num({ title: "End board", unit: "mm" }),
    passageBoardMm: num({ title: "Passage board", unit: "mm" }),
    heightMm: num({ title: "Chest with its rackboards, under the pipe feet", unit: "mm" }),
    kgPerM2: num({ title: "Weight of a chest", unit: "kg/m²" }),
    /** Where the largest pipes of a row stand: at the outer ends of the chest, or in its centre. */
    bassesAt: z.enum(["ends", "centre"]).default("ends").meta({ title: "Largest pipes stand at", description: "ends: basses at the outer ends of the chest; centre: basses in the middle, the treble outwards." }),
  }),
  wiring: z.object({
    /** Direct-electric chests: relay in the organ, this far from the pipe magnets. */
    relayToChestM: num({ title: "Relay to pipe magnets", unit: "m" }),
    offsetChestRunM: num({ title: "Run to an offset chest", unit: "m" }),
    consoleInternalM: num({ title: "Average conductor inside the console", unit: "m" }),
    conductorsPerStopControl: z.number().int().min(1).max(4).meta({ title: "Conductors per stop control", unit: "conductors" }),
  }),
  wind: z.object({
    chordKeys: num({ title: "Keys held at once on a manual in the full-organ chord", unit: "keys", min: 1, max: 40 }),
    chordKeysPedal: num({ title: "Keys held at once on the pedals", unit: "keys", min: 1, max: 10 }),
    windwayAt8ftCMm: num({ title: "Flue (windway) depth of a 122 mm mouth (normal-scale 8′ C)", unit: "mm", min: 0.05 }),
    windwayExponent: num({ title: "Windway depth follows mouth width to this power", unit: "", max: 2 }),
    dischargeCoefficient: num({ title: "Discharge coefficient of the flue", unit: "", max: 1.5 }),
    reedFlowFactor: num({ title: "A reed's wind against a flue of its scale", unit: "×", max: 10 }),
    leakagePercent: num({ title: "Leakage and reserve on the blower", unit: "%", max: 200 }),
    blowerEfficiency: num({ title: "Blower efficiency (air power ÷ motor power)", unit: "", min: 0.05, max: 1 }),
    pressureMarginMm: num({ title: "Blower pressure above the highest division", unit: "mm water" }),
    trunkMPerDivision: num({ title: "Main trunk per division when not given", unit: "m" }),
    airDensityKgM3: num({ title: "Air density", unit: "kg/m³", min: 0.5, max: 2 }),
    reservoirKgPerM3PerMin: num({ title: "Reservoir weight per m³/min", unit: "kg" }),
  }),
  swellBox: z.object({
    clearanceMm: num({ title: "Inside clearance round the chest and above the pipes", unit: "mm" }),
    wallMm: num({ title: "Wall thickness", unit: "mm", min: 1 }),
    timber: z.enum(woods).meta({ title: "Timber of walls and shutters" }),
  }),
  case: z.object({
    clearanceMm: num({ title: "Case clearance round chests and pipes when no size is given", unit: "mm" }),
    panelMm: num({ title: "Average timber thickness of framing and panels", unit: "mm", min: 1 }),
    framingFactor: num({ title: "Timber for framing, mouldings and roof over the panel area", unit: "×", min: 1, max: 5 }),
  }),
  site: z.object({
    dailyTravelKm: num({ title: "Beyond this distance the crew lodges near the site", unit: "km" }),
    loadCapacityKg: num({ title: "Payload of one load", unit: "kg", min: 100 }),
    drivingKmPerHour: num({ title: "Average driving speed", unit: "km/h", min: 5 }),
    consoleKg: num({ title: "Weight of a console per keyboard", unit: "kg" }),
  }),
  norms: normsSchema,
  programme: z.object({
    hoursPerWeek: z.number().positive().max(80).meta({ title: "Paid hours per week", unit: "h/week" }),
    /** Share of paid hours that goes into the job (0–1]. */
    efficiency: z.number().gt(0).max(1).meta({ title: "Share of paid hours that goes into the job", unit: "×" }),
    crew: recordOf(departments, (d) => z.number().int().min(1).max(50).meta({ title: `Crew: ${d}`, unit: "people" })),
  }),
});

export type Rates = Readonly<z.output<typeof ratesSchema>>;
export type Norms = Rates["norms"];
export type Items = Rates["items"];
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

/** A figure per pipe spread over the size classes, so a norm that became per size class keeps the firm's figure. */
const perSizeClass = (v: unknown) => (typeof v === "number" ? Object.fromEntries(sizeClasses.map((c) => [c, v])) : v);

/**
 * Rates of the first format (saved before the pipe model was corrected) in this one, as
 * `upgradeStop` does for stops: a value whose meaning is unchanged moves to its new place (foot
 * lengths, the cut-up, cleaning and revoicing norms), and a per-pipe norm that became one per size
 * class holds the firm's figure in every class. What the new model reads differently (sheet and board
 * thickness by size class, a swell box per division, transport per trip) is not carried over: the
 * demo default stands in until the firm enters its own. Anything else passes through untouched.
 */
export function upgradeRates(raw: unknown): unknown {
  if (!isPlainObject(raw)) return raw;
  const { footLengthMm, cutUpFraction, sheetThicknessMm: _sheet, boardThicknessMm: _board, ...r } = raw;
  const out: Record<string, unknown> = { ...r };
  if (isPlainObject(footLengthMm)) {
    const pipeMetal = isPlainObject(r.pipeMetal) ? r.pipeMetal : {};
    if (pipeMetal.footLengthMm === undefined) out.pipeMetal = { ...pipeMetal, footLengthMm };
  }
  if (typeof cutUpFraction === "number" && r.cutUpByFamily === undefined) out.cutUpByFamily = Object.fromEntries(families.map((f) => [f, cutUpFraction]));
  if (isPlainObject(r.norms)) {
    const { cleanRetainedPipe, revoicePipe, swellBoxPerDivision: _swell, transportPerTrip: _trip, transportPerThousandPipes: _perThousand, ...norms } = r.norms;
    const n: Record<string, unknown> = { ...norms };
    if (cleanRetainedPipe !== undefined && n.cleanPipe === undefined) n.cleanPipe = cleanRetainedPipe;
    if (revoicePipe !== undefined) {
      if (n.revoiceFluePipe === undefined) n.revoiceFluePipe = revoicePipe;
      if (n.revoiceReedPipe === undefined) n.revoiceReedPipe = revoicePipe;
    }
    for (const [k, v] of Object.entries(n)) {
      const shape = normsSchema.shape[k as keyof typeof normsSchema.shape];
      if (shape && shape instanceof z.ZodObject && "over8" in shape.shape) n[k] = perSizeClass(v);
    }
    out.norms = n;
  }
  return out;
}

/**
 * Validates a firm's rates and norms. Any value left out is taken from `base` (e.g. the firm's
 * stored rates, or DEFAULT_RATES from demo-rates.ts), so a file may carry only what differs; alloy
 * compositions replace the base composition as a whole. Rates of the first format are upgraded first.
 */
export function parseRates(raw: unknown, base: Rates): RatesResult {
  if (raw !== undefined && !isPlainObject(raw)) return { ok: false, messages: ["Rates: expected an object"] };
  const input = upgradeRates(raw);
  const merged = isPlainObject(input) && isPlainObject(input.alloys)
    ? mergeDeep({ ...base, alloys: { ...base.alloys, ...input.alloys } }, { ...input, alloys: undefined })
    : mergeDeep(base, input);
  const r = ratesSchema.safeParse(merged);
  if (r.success) return { ok: true, rates: r.data };
  return { ok: false, messages: r.error.issues.map((i) => `Rates: ${i.path.join(".") || "(top)"}: ${i.message}`) };
}

const zero = <K extends string>(r: Readonly<Record<K, string>>) => Object.fromEntries(Object.keys(r).map((k) => [k, "0.00"])) as Record<K, string>;

/**
 * The rates a role without money:read may hold: the labour norms, crews and chest and wiring rules
 * (what the workshop needs for hours and space), with every price, rate and percentage set to zero.
 */
export function withoutPrices(rates: Rates): Rates {
  return {
    ...rates,
    provenance: "prices withheld",
    hourlyRate: zero(rates.hourlyRate),
    metalPricePerKg: zero(rates.metalPricePerKg),
    woodPricePerM3: zero(rates.woodPricePerM3),
    cablePricePerM: "0.00",
    items: zero(rates.items),
    overheadPercent: "0",
    contingencyPercent: "0",
    marginPercent: "0",
    taxPercent: "0",
  };
}
