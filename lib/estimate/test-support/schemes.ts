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
const treatmentsOwn = ["new", "retained", "restored", "revoiced", "relocated", "prepared", "removed"] as const;
const materialsAll = ["high-tin", "spotted", "common", "zinc", "copper", "pine", "oak", "mahogany"] as const;
const constructionsAll = ["open", "stopped", "half-stopped", "conical", "capped", "reed-full", "reed-half"] as const;

const arbOwnStop = fc.record({
  footage: fc.constantFrom(...FOOTAGES),
  ranks: fc.integer({ min: 1, max: 5 }),
  treatment: fc.constantFrom(...treatmentsOwn),
  material: fc.constantFrom(...materialsAll),
  construction: fc.constantFrom(...constructionsAll),
  offsetHt: fc.integer({ min: -8, max: 6 }),
  halvingOn: fc.integer({ min: 15, max: 20 }),
  offsetBassPipes: fc.integer({ min: 0, max: 12 }),
  shortFrom: fc.option(fc.integer({ min: 1, max: 24 }), { nil: undefined }),
  breakAt: fc.option(fc.integer({ min: 6, max: 40 }), { nil: undefined }),
});

const arbDivision = fc.record({
  keyboard: fc.constantFrom("manual" as const, "pedal" as const),
  action: fc.constantFrom("mechanical", "electro-pneumatic", "electric", "pneumatic") as fc.Arbitrary<DivisionInput["action"]>,
  chest: fc.constantFrom("slider", "pitman", "direct-electric", "ventil") as fc.Arbitrary<DivisionInput["chest"]>,
  chestLayout: fc.constantFrom("chromatic" as const, "c-c-sharp" as const),
  consoleDistanceM: fc.integer({ min: 0, max: 60 }),
  enclosed: fc.boolean(),
  stops: fc.array(arbOwnStop, { minLength: 0, maxLength: 8 }),
  derived: fc.array(fc.record({ kind: fc.constantFrom("extension" as const, "borrowed" as const), pick: fc.nat(), footage: fc.constantFrom(...FOOTAGES) }), { maxLength: 4 }),
  space: fc.option(fc.record({ lengthMm: fc.integer({ min: 500, max: 12000 }), depthMm: fc.integer({ min: 300, max: 5000 }) }), { nil: undefined }),
});

const NOTE_NAMES = ["C", "C#", "D", "D#", "E", "F", "F#", "G", "G#", "A", "A#", "B"];
const noteOf = (midi: number): string => {
  const pc = NOTE_NAMES[midi % 12];
  const oct = Math.floor(midi / 12) - 1;
  return oct >= 3 ? pc.toLowerCase() + "'".repeat(oct - 3) : pc[0].repeat(3 - oct) + pc.slice(1);
};

/** Random valid schemes: one to four divisions, own stops of every treatment, extensions and borrowings. */
export const arbScheme: fc.Arbitrary<Scheme> = fc
  .record({ divisions: fc.array(arbDivision, { minLength: 1, maxLength: 4 }), pitchHz: fc.integer({ min: 415, max: 466 }), temperatureC: fc.integer({ min: 5, max: 30 }), pure: fc.boolean() })
  .map(({ divisions, pitchHz, temperatureC, pure }) => {
    const owners: { id: string; ranks: number; removed: boolean }[] = [];
    const divs: DivisionInput[] = divisions.map((d, di) => {
      const high = d.keyboard === "manual" ? 96 : 67;
      const stops: StopInput[] = d.stops.map((s, si) => {
        const id = `d${di}s${si}`;
        const low = s.shortFrom ? 36 + s.shortFrom : 36;
        const ranks = s.ranks;
        const breakKey = s.breakAt ? Math.min(high, low + s.breakAt) : undefined;
        const rankFootages = Array.from({ length: ranks }, (_, r) => FOOTAGES[Math.min(FOOTAGES.length - 1, FOOTAGES.indexOf(s.footage) + r)]);
        const breaks =
          ranks > 1
            ? [
                { from: noteOf(low), footages: rankFootages },
                ...(breakKey && breakKey > low ? [{ from: noteOf(breakKey), footages: rankFootages.map((f) => FOOTAGES[Math.max(0, FOOTAGES.indexOf(f) - 1)]) }] : []),
              ]
            : undefined;
        owners.push({ id, ranks, removed: s.treatment === "removed" });
        return {
          id, name: `Stop ${id}`, footage: s.footage, ranks, breaks, family: ranks > 1 ? "mixture" : "principal",
          construction: s.construction, material: s.material, treatment: s.treatment,
          scale: { offsetHt: s.offsetHt, halvingOn: s.halvingOn, mouthWidth: 0.25 },
          compass: s.shortFrom ? { low: noteOf(low), high: noteOf(high) } : undefined,
          offsetBassPipes: Math.min(s.offsetBassPipes, high - low + 1),
        };
      });
      return {
        id: `d${di}`, name: `Division ${di}`, keyboard: d.keyboard,
        compass: { low: "C", high: d.keyboard === "manual" ? "c''''" : "g'" },
        action: d.action, chest: d.chest, chestLayout: d.chestLayout, consoleDistanceM: d.consoleDistanceM, enclosed: d.enclosed,
        space: d.space, stops,
      };
    });
    divisions.forEach((d, di) => {
      d.derived.forEach((x, xi) => {
        const candidates = owners.filter((o) => !o.removed && (x.kind === "borrowed" || o.ranks === 1));
        if (!candidates.length) return;
        const src = candidates[x.pick % candidates.length];
        divs[di].stops!.push({ id: `d${di}x${xi}`, name: `Derived ${di}.${xi}`, footage: x.footage, family: "flute", treatment: x.kind, source: src.id });
      });
    });
    return scheme(divs, { tuning: { pitchHz, temperatureC, mutations: pure ? "pure" : "tempered" } });
  });
