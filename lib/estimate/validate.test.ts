import { DEFAULT_RATES } from "./demo-rates";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parseScheme, parseSchemeFile } from "./validate";

type RawStop = Record<string, unknown>;
type RawDivision = { id: string; name: string; keyboard: string; compass: { low: string; high: string }; stops: RawStop[] };
const base = (): { name: string; divisions: RawDivision[] } => ({
  name: "Validation test (invented)",
  divisions: [
    {
      id: "gt", name: "Great", keyboard: "manual", compass: { low: "C", high: "c''''" },
      stops: [{ id: "p8", name: "Principal", footage: "8", family: "principal" }],
    },
  ],
});

function messagesOf(input: unknown): string[] {
  const r = parseScheme(input);
  if (r.ok) throw new Error("expected the scheme to be refused");
  return r.messages;
}

describe("parseScheme", () => {
  it("accepts a good scheme and fills in defaults", () => {
    const r = parseScheme(base());
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.scheme.tuning.pitchHz).toBe(440);
      expect(r.scheme.divisions[0].stops[0].origin).toBe("new");
      expect(r.scheme.divisions[0].stops[0].work).toEqual([]);
    }
  });

  it("names division and stop when an extension's source does not exist", () => {
    const s = base();
    s.divisions[0].stops.push({ id: "m", name: "Mixture IV", footage: "2", family: "mixture", ranks: 4,
      breaks: [{ from: "C", footages: ["2", "1 1/3", "1", "2/3"] }], treatment: "extension", source: "x" });
    expect(messagesOf(s)).toContain('Division "Great", stop "Mixture IV": extension source "x" does not exist');
  });

  it("reports a compass upside down", () => {
    const s = base();
    s.divisions[0].compass = { low: "c''''", high: "C" };
    expect(messagesOf(s)).toEqual([`Division "Great": compass runs downward (c'''' to C); give the lowest note first`]);
  });

  it("reports a footage that is not a footage", () => {
    const s = base();
    s.divisions[0].stops[0].footage = "2.67";
    expect(messagesOf(s)[0]).toMatch(/^Division "Great", stop "Principal": footage: "2.67" is not a footage/);
  });

  it("reports mixture breaks whose footages do not match the ranks, and a mixture with no breaks", () => {
    const s = base();
    s.divisions[0].stops.push(
      { id: "m", name: "Mixture IV", footage: "1 1/3", family: "mixture", ranks: 4, breaks: [{ from: "C", footages: ["1 1/3", "1", "2/3"] }] },
      { id: "n", name: "Cymbal III", footage: "1/2", family: "mixture", ranks: 3 },
    );
    const m = messagesOf(s);
    expect(m).toContain('Division "Great", stop "Mixture IV": the break at C gives 3 footages for 4 ranks');
    expect(m).toContain(`Division "Great", stop "Cymbal III": a mixture of 3 ranks needs breaks giving each rank's footage`);
  });

  it("gives every message at once, not only the first", () => {
    const s = base();
    s.divisions[0].compass = { low: "c''''", high: "C" };
    s.divisions[0].stops.push(
      { id: "e", name: "Bass Flute", footage: "8", family: "flute", treatment: "extension", source: "nope" },
      { id: "b", name: "Borrowed", footage: "8", family: "flute", treatment: "borrowed" },
      { id: "p8", name: "Twin", footage: "4", family: "principal" },
    );
    expect(messagesOf(s).length).toBeGreaterThanOrEqual(4);
  });

  it("reports shape errors by field, naming division and stop", () => {
    const s = base();
    s.divisions[0].stops[0].family = "bogus";
    s.divisions[0].stops[0].ranks = 0;
    const m = messagesOf(s);
    expect(m.some((x) => x.startsWith('Division "Great", stop "Principal": family:'))).toBe(true);
    expect(m.some((x) => x.startsWith('Division "Great", stop "Principal": ranks:'))).toBe(true);
  });

  it("reports circular sources, self-reference, removed sources and extensions of mixtures", () => {
    const s = base();
    s.divisions[0].stops.push(
      { id: "a", name: "A", footage: "4", family: "flute", treatment: "extension", source: "b" },
      { id: "b", name: "B", footage: "2", family: "flute", treatment: "extension", source: "a" },
      { id: "c", name: "C", footage: "2", family: "flute", treatment: "extension", source: "c" },
      { id: "r", name: "Gone", footage: "4", family: "flute", treatment: "removed" },
      { id: "d", name: "D", footage: "2", family: "flute", treatment: "borrowed", source: "r" },
      { id: "m", name: "Mixture II", footage: "2", family: "mixture", ranks: 2, breaks: [{ from: "C", footages: ["2", "1 1/3"] }] },
      { id: "x", name: "X", footage: "1", family: "mixture", treatment: "extension", source: "m" },
    );
    const m = messagesOf(s);
    expect(m).toContain('Division "Great", stop "A": extension source "b" leads round in a circle');
    expect(m).toContain('Division "Great", stop "C": a stop cannot draw on itself');
    expect(m).toContain('Division "Great", stop "D": borrowed source "r" is removed');
    expect(m).toContain('Division "Great", stop "X": extension source "m" has 2 ranks; an extension draws on a single rank');
  });

  it("reports a stop compass beyond its division's and couplers to missing divisions", () => {
    const s = { ...base(), accessories: { couplers: [{ id: "sw-gt", from: "sw", to: "gt" }] } };
    s.divisions[0].stops[0].compass = { low: "CC", high: "c''''" };
    const m = messagesOf(s);
    expect(m).toContain(`Division "Great", stop "Principal": compass CC–c'''' goes beyond the division's C–c''''`);
    expect(m).toContain('Coupler "sw-gt": division "sw" does not exist');
  });

  it("reports text that is not JSON", () => {
    expect(messagesOf("{ not json")[0]).toMatch(/^The file is not valid JSON/);
  });

  it("never throws, whatever it is given", () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        const r = parseScheme(v);
        return r.ok || (r.messages.length > 0 && r.messages.every((m) => typeof m === "string" && m.length > 0));
      }),
      { numRuns: 300 },
    );
    fc.assert(
      fc.property(fc.string(), (t) => {
        parseScheme(t);
        return true;
      }),
    );
  });
});

describe("parseSchemeFile", () => {
  it("takes the defaults when a file carries no rates", () => {
    const r = parseSchemeFile(JSON.stringify(base()), DEFAULT_RATES);
    expect(r.ok && r.rates).toBe(DEFAULT_RATES);
  });

  it("merges the rates a file carries over the defaults", () => {
    const r = parseSchemeFile({ ...base(), rates: { currency: "GBP", hourlyRate: { voicing: "80.00" } } }, DEFAULT_RATES);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.rates.currency).toBe("GBP");
      expect(r.rates.hourlyRate.voicing).toBe("80.00");
      expect(r.rates.hourlyRate.erection).toBe(DEFAULT_RATES.hourlyRate.erection);
    }
  });

  it("reports bad rates alongside bad scheme messages", () => {
    const s = base();
    s.divisions[0].compass = { low: "c''''", high: "C" };
    const r = parseSchemeFile({ ...s, rates: { taxPercent: 20 } }, DEFAULT_RATES);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.messages.some((m) => m.startsWith('Division "Great"'))).toBe(true);
      expect(r.messages.some((m) => m.startsWith("Rates: taxPercent:"))).toBe(true);
    }
  });
});
