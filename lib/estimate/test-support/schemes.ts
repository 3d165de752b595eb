/**
 * Builders and fast-check generators of schemes, for the estimator's tests only (never imported by
 * the library). Generated schemes are valid by construction: ids unique, sources existing, breaks
 * matching ranks.
 */
import fc from "fast-check";
import { schemeSchema, type Scheme, type SchemeInput } from "../scheme";

type DivisionInput = SchemeInput["divisions"][number];
type StopInput = NonNullable<DivisionInput["stops"]>[number];

export function stop(id: string, footage: string | number, extra: Partial<StopInput> = {}): StopInput {
  return { id, name: extra.name ?? id, footage, family: "principal", ...extra };
}

export function manual(id: string, stops: StopInput[], extra: Partial<DivisionInput> = {}): DivisionInput {
  return { id, name: extra.name ?? id, keyboard: "manual", compass: { low: "C", high: "c''''" }, stops, ...extra };
}

export function pedal(id: string, stops: StopInput[], extra: Partial<DivisionInput> = {}): DivisionInput {
  return { id, name: extra.name ?? id, keyboard: "pedal", compass: { low: "C", high: "g'" }, stops, ...extra };
}

/** A parsed scheme from divisions (zod defaults applied). */
export function scheme(divisions: DivisionInput[], extra: Partial<SchemeInput> = {}): Scheme {
  return schemeSchema.parse({ name: "Test scheme (invented)", divisions, ...extra });
}

const FOOTAGES = ["32", "16", "10 2/3", "8", "5 1/3", "4", "2 2/3", "2", "1 3/5", "1 1/3", "1", "2/3", "1/2"];
/** Own stops: where the pipes come from and what is done to existing ones. */
const dispositions = [
  { origin: "new" }, { origin: "existing" }, { origin: "existing", work: ["restored"] }, { origin: "existing", work: ["revoiced"] },
  { origin: "existing", work: ["relocated", "revoiced"] }, { origin: "existing", work: ["restored", "rescaled"], rescaleHt: 2 },
  { origin: "existing", work: ["rescaled"], rescaleHt: -1 }, { origin: "prepared" }, { origin: "removed" },
] as const;
const materialsAll = ["high-tin", "spotted", "common", "zinc", "copper", "pine", "oak", "mahogany"] as const;
const constructionsAll = ["open", "stopped", "half-stopped", "conical", "capped", "reed"] as const;
const resonators = ["full", "half", "quarter", "eighth", "sixteenth"] as const;
const findingsAll = ["feet-collapsing", "split-seams", "wood-split", "tongues-worn"] as const;

const arbOwnStop = fc.record({
  footage: fc.constantFrom(...FOOTAGES),
  ranks: fc.integer({ min: 1, max: 5 }),
  disposition: fc.constantFrom(...dispositions),
  material: fc.constantFrom(...materialsAll),
  construction: fc.constantFrom(...constructionsAll),
  resonator: fc.constantFrom(...resonators),
  fluesAt: fc.option(fc.integer({ min: 12, max: 40 }), { nil: undefined }),
  bass: fc.option(fc.record({ notes: fc.integer({ min: 1, max: 12 }), material: fc.constantFrom(...materialsAll) }), { nil: undefined }),
  condition: fc.subarray([...findingsAll]),
  deviationHt: fc.integer({ min: -8, max: 6 }),
  halvingOn: fc.integer({ min: 15, max: 20 }),
  cutUp: fc.option(fc.double({ min: 0.15, max: 0.45, noNaN: true }), { nil: undefined }),
  offsetBassPipes: fc.integer({ min: 0, max: 12 }),
  shortFrom: fc.option(fc.integer({ min: 1, max: 24 }), { nil: undefined }),
  breakAt: fc.option(fc.integer({ min: 6, max: 40 }), { nil: undefined }),
  progressive: fc.boolean(),
});

const arbDivision = fc.record({
  keyboard: fc.constantFrom("manual" as const, "pedal" as const),
  action: fc.constantFrom("mechanical", "electro-pneumatic", "electric", "pneumatic") as fc.Arbitrary<DivisionInput["action"]>,
  chest: fc.constantFrom("slider", "pitman", "direct-electric", "ventil") as fc.Arbitrary<DivisionInput["chest"]>,
  chestLayout: fc.constantFrom("chromatic" as const, "c-c-sharp" as const),
  chestWork: fc.constantFrom("new" as const, "restored" as const, "retained" as const),
  consoleDistanceM: fc.integer({ min: 0, max: 60 }),
  enclosed: fc.boolean(),
  stops: fc.array(arbOwnStop, { minLength: 0, maxLength: 8 }),
  derived: fc.array(fc.record({ kind: fc.constantFrom("extension" as const, "borrowed" as const), pick: fc.nat(), footage: fc.constantFrom(...FOOTAGES), existing: fc.boolean() }), { maxLength: 4 }),
  space: fc.option(fc.record({ lengthMm: fc.integer({ min: 500, max: 12000 }), depthMm: fc.integer({ min: 300, max: 5000 }) }), { nil: undefined }),
});

const NOTE_NAMES = ["C", "C#", "D", "D#", "E", "F", "F#", "G", "G#", "A", "A#", "B"];
const noteOf = (midi: number): string => {
  const pc = NOTE_NAMES[midi % 12];
  const oct = Math.floor(midi / 12) - 1;
  return oct >= 3 ? pc.toLowerCase() + "'".repeat(oct - 3) : pc[0].repeat(3 - oct) + pc.slice(1);
};

/**
 * Random valid schemes: one to four divisions, own stops of every origin and work, basses of other
 * materials, short reeds breaking to flues, progressive mixtures, extensions and borrowings that the
 * chest rules allow (their ranks on unit chests, borrowings at the rank's own pitch within its compass).
 */
export const arbScheme: fc.Arbitrary<Scheme> = fc
  .record({
    divisions: fc.array(arbDivision, { minLength: 1, maxLength: 4 }), pitchHz: fc.integer({ min: 415, max: 466 }), temperatureC: fc.integer({ min: 5, max: 30 }), pure: fc.boolean(),
    caseWork: fc.constantFrom("new" as const, "restored" as const, "retained" as const, "none" as const),
    windWork: fc.constantFrom("new" as const, "restored" as const, "retained" as const), distanceKm: fc.integer({ min: 0, max: 900 }),
  })
  .map(({ divisions, pitchHz, temperatureC, pure, caseWork, windWork, distanceKm }) => {
    type Owner = { id: string; ranks: number; removed: boolean; unit: boolean; manual: boolean; full: boolean; footage: string };
    const owners: Owner[] = [];
    const divs: DivisionInput[] = divisions.map((d, di) => {
      const high = d.keyboard === "manual" ? 96 : 67;
      const unit = d.chest === "pitman" || d.chest === "direct-electric";
      const stops: StopInput[] = d.stops.map((s, si) => {
        const id = `d${di}s${si}`;
        const low = s.shortFrom ? 36 + s.shortFrom : 36;
        const notes = high - low + 1;
        const ranks = s.ranks;
        const breakKey = s.breakAt ? Math.min(high, low + s.breakAt) : undefined;
        const rankFootages = Array.from({ length: ranks }, (_, r) => FOOTAGES[Math.min(FOOTAGES.length - 1, FOOTAGES.indexOf(s.footage) + r)]);
        const progressive = s.progressive && ranks > 2 && breakKey !== undefined && breakKey > low;
        const breaks =
          ranks > 1
            ? [
                { from: noteOf(low), footages: progressive ? rankFootages.map((f, r) => (r === ranks - 1 ? null : f)) : rankFootages },
                ...(breakKey && breakKey > low ? [{ from: noteOf(breakKey), footages: rankFootages.map((f) => FOOTAGES[Math.max(0, FOOTAGES.indexOf(f) - 1)]) }] : []),
              ]
            : undefined;
        const reed = s.construction === "reed";
        const disposition = s.disposition as { origin: StopInput["origin"]; work?: readonly ("restored" | "revoiced" | "relocated" | "rescaled")[]; rescaleHt?: number };
        const rescale = disposition.rescaleHt !== undefined && Math.abs(disposition.rescaleHt) < notes ? disposition.rescaleHt : 0;
        const work = disposition.work?.filter((w) => w !== "rescaled" || rescale !== 0);
        owners.push({ id, ranks, removed: disposition.origin === "removed", unit, manual: d.keyboard === "manual", full: !s.shortFrom, footage: s.footage });
        const fluesKey = reed && s.fluesAt && low + s.fluesAt < high ? low + s.fluesAt : undefined;
        return {
          id, name: `Stop ${id}`, footage: s.footage, ranks, breaks, family: ranks > 1 ? "mixture" : reed ? "reed" : "principal",
          construction: s.construction, material: s.material, origin: disposition.origin,
          work: work ? [...work] : undefined,
          rescaleHt: work?.includes("rescaled") ? rescale : undefined,
          condition: work?.includes("restored") ? s.condition : undefined,
          resonator: reed ? { length: s.resonator, shape: s.resonator === "full" ? "conical" : "cylindrical" } : undefined,
          fluesFrom: fluesKey ? noteOf(fluesKey) : undefined,
          bass: s.bass && s.bass.notes < notes ? { notes: s.bass.notes, material: s.bass.material } : undefined,
          scale: { deviationHt: s.deviationHt, halvingOn: s.halvingOn, mouthWidth: 0.25, cutUp: s.cutUp },
          compass: s.shortFrom ? { low: noteOf(low), high: noteOf(high) } : undefined,
          offsetBassPipes: Math.min(s.offsetBassPipes, high - low + 1),
        };
      });
      return {
        id: `d${di}`, name: `Division ${di}`, keyboard: d.keyboard,
        compass: { low: "C", high: noteOf(high) },
        action: d.action, chest: d.chest, chestLayout: d.chestLayout, chestWork: d.chestWork, consoleDistanceM: d.consoleDistanceM, enclosed: d.enclosed,
        space: d.space, stops,
      };
    });
    divisions.forEach((d, di) => {
      d.derived.forEach((x, xi) => {
        const candidates = owners.filter((o) => !o.removed && o.unit && (x.kind === "borrowed" ? o.full && (o.manual || d.keyboard === "pedal") : o.ranks === 1));
        if (!candidates.length) return;
        const src = candidates[x.pick % candidates.length];
        divs[di].stops!.push({
          id: `d${di}x${xi}`, name: `Derived ${di}.${xi}`, footage: x.kind === "borrowed" ? src.footage : x.footage, family: "flute", origin: x.kind, source: src.id,
          ...(x.kind === "extension" && x.existing ? { addedPipes: "existing" as const, work: ["restored" as const] } : {}),
        });
      });
    });
    return scheme(divs, {
      tuning: { pitchHz, temperatureC, mutations: pure ? "pure" : "tempered" },
      case: { work: caseWork }, wind: { work: windWork }, site: { distanceKm },
    });
  });

/**
 * The calibration check scheme: a new three-manual mechanical organ of 40 stops in a new case, as
 * the trade's bands describe (docs/estimating-method.md, "Calibration"). Invented; its composition
 * is a usual one for the size, not any real instrument.
 */
export function checkOrgan40(): Scheme {
  const mx = (id: string, name: string, footages: (string | null)[][], from: string[]) =>
    stop(id, footages[0].find((f) => f) ?? "2", {
      name, family: "mixture", ranks: footages[0].length, scale: { deviationHt: -2 },
      breaks: footages.map((f, i) => ({ from: from[i], footages: f })),
    });
  const wood = { material: "oak" as const };
  return scheme(
    [
      manual("gt", [
        stop("gt1", 16, { name: "Bourdon", family: "flute", construction: "stopped", bass: { notes: 12, material: "oak" }, offsetBassPipes: 12 }),
        stop("gt2", 8, { name: "Principal", scale: { deviationHt: 1 } }),
        stop("gt3", 8, { name: "Rohrflöte", family: "flute", construction: "half-stopped" }),
        stop("gt4", 8, { name: "Gamba", family: "string", scale: { deviationHt: -5, mouthWidth: 0.2 } }),
        stop("gt5", 4, { name: "Octave" }),
        stop("gt6", 4, { name: "Spitzflöte", family: "flute", construction: "conical" }),
        stop("gt7", "2 2/3", { name: "Quint", family: "mutation", scale: { deviationHt: -1 } }),
        stop("gt8", 2, { name: "Super Octave" }),
        stop("gt9", 8, { name: "Cornet V", family: "mixture", ranks: 5, compass: { low: "c'", high: "c''''" }, breaks: [{ from: "c'", footages: ["8", "4", "2 2/3", "2", "1 3/5"] }] }),
        mx("gt10", "Mixture IV–V", [["1 1/3", "1", "2/3", "1/2", null], ["2", "1 1/3", "1", "2/3", null], ["2 2/3", "2", "1 1/3", "1", "2/3"], ["4", "2 2/3", "2", "1 1/3", "1"]], ["C", "c", "c'", "c''"]),
        stop("gt11", 8, { name: "Trumpet", family: "reed", construction: "reed", fluesFrom: "c'''" }),
      ], { name: "Great", windPressure: { value: 85, unit: "mm" } }),
      manual("sw", [
        stop("sw1", 8, { name: "Geigen Principal", scale: { deviationHt: -1 } }),
        stop("sw2", 8, { name: "Gedackt", family: "flute", construction: "stopped", ...wood }),
        stop("sw3", 8, { name: "Salicional", family: "string", scale: { deviationHt: -6, mouthWidth: 0.2 } }),
        stop("sw4", 8, { name: "Voix céleste", family: "string", compass: { low: "c", high: "c''''" }, scale: { deviationHt: -6, mouthWidth: 0.2 } }),
        stop("sw5", 4, { name: "Principal" }),
        stop("sw6", 4, { name: "Flûte traversière", family: "flute" }),
        stop("sw7", "2 2/3", { name: "Nazard", family: "mutation", construction: "half-stopped" }),
        stop("sw8", 2, { name: "Flageolet", family: "flute", construction: "conical" }),
        stop("sw9", "1 3/5", { name: "Tierce", family: "mutation" }),
        mx("sw10", "Plein jeu IV", [["2", "1 1/3", "1", "2/3"], ["2 2/3", "2", "1 1/3", "1"], ["4", "2 2/3", "2", "1 1/3"]], ["C", "c'", "c''"]),
        stop("sw11", 16, { name: "Basson", family: "reed", construction: "reed", resonator: { length: "half", shape: "conical" }, offsetBassPipes: 12 }),
        stop("sw12", 8, { name: "Trompette", family: "reed", construction: "reed" }),
        stop("sw13", 8, { name: "Hautbois", family: "reed", construction: "reed", scale: { deviationHt: -4 } }),
      ], { name: "Swell", enclosed: true, swellBox: { widthMm: 4800, depthMm: 2500, heightMm: 3900 }, windPressure: { value: 90, unit: "mm" } }),
      manual("po", [
        stop("po1", 8, { name: "Gedackt", family: "flute", construction: "stopped", ...wood }),
        stop("po2", 4, { name: "Principal" }),
        stop("po3", 4, { name: "Rohrflöte", family: "flute", construction: "half-stopped" }),
        stop("po4", 2, { name: "Octave" }),
        stop("po5", "1 1/3", { name: "Larigot", family: "mutation" }),
        stop("po6", "2 2/3", { name: "Sesquialtera II", family: "mutation", ranks: 2, compass: { low: "c", high: "c''''" }, breaks: [{ from: "c", footages: ["2 2/3", "1 3/5"] }] }),
        mx("po7", "Scharf III", [["1", "2/3", "1/2"], ["1 1/3", "1", "2/3"], ["2", "1 1/3", "1"]], ["C", "c", "c''"]),
        stop("po8", 8, { name: "Cromorne", family: "reed", construction: "reed", resonator: { length: "half", shape: "cylindrical" } }),
        stop("po9", 8, { name: "Regal", family: "reed", construction: "reed", resonator: { length: "eighth", shape: "cylindrical" } }),
      ], { name: "Positive", windPressure: { value: 75, unit: "mm" } }),
      pedal("pd", [
        stop("pd1", 16, { name: "Subbass", family: "flute", construction: "stopped", material: "pine", scale: { deviationHt: 3 } }),
        stop("pd2", 16, { name: "Principal", material: "pine", scale: { deviationHt: 2 } }),
        stop("pd3", 8, { name: "Octave", material: "zinc" }),
        stop("pd4", 8, { name: "Bass Flute", family: "flute", construction: "stopped", material: "pine" }),
        stop("pd5", 4, { name: "Choral Bass" }),
        stop("pd6", 16, { name: "Posaune", family: "reed", construction: "reed", material: "pine", scale: { deviationHt: 2 } }),
        stop("pd7", 8, { name: "Trumpet", family: "reed", construction: "reed", material: "zinc" }),
      ], { name: "Pedal", chestLayout: "chromatic", windPressure: { value: 95, unit: "mm" } }),
    ],
    {
      name: "Calibration check: new three-manual mechanical organ of 40 stops (invented)",
      accessories: {
        couplers: [
          { id: "sw-gt", from: "sw", to: "gt" }, { id: "po-gt", from: "po", to: "gt" }, { id: "sw-po", from: "sw", to: "po" },
          { id: "gt-pd", from: "gt", to: "pd" }, { id: "sw-pd", from: "sw", to: "pd" }, { id: "po-pd", from: "po", to: "pd" },
        ],
        tremulants: [{ id: "t-sw", division: "sw" }, { id: "t-po", division: "po" }],
      },
      case: { work: "new", widthMm: 6200, depthMm: 2600, heightMm: 9000, speakingFrontPipes: 35, dummyPipes: 12, dummyPipeLengthMm: 1800, decorationM2: 6, gildingM2: 2 },
      site: { distanceKm: 150 },
    },
  );
}
