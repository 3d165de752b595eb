import { describe, expect, it } from "vitest";
import { checkDivisionInDocument, checkDocument } from "@/lib/spec/validate";
import { smallDocument } from "../support/fixtures";

describe("checkDocument", () => {
  it("accepts a sound document and fills in the scheme model's defaults", () => {
    const res = checkDocument(smallDocument());
    expect(res.ok).toBe(true);
    if (res.ok) expect(res.document.divisions[0]!.stops[0]).toMatchObject({ ranks: 1, origin: "new", work: [], material: "spotted" });
  });

  it("accepts an empty document: a scheme starts with no divisions", () => {
    expect(checkDocument({ name: "Blank" }).ok).toBe(true);
  });

  it("names the division and stop of each problem and keys it by its path", () => {
    const doc = smallDocument();
    doc.divisions![0]!.compass = { low: "c''''", high: "C" };
    doc.divisions![1]!.stops![1]!.source = "gt-mx";
    const res = checkDocument(doc, "document.");
    expect(res.ok).toBe(false);
    if (res.ok) return;
    expect(res.fields["document.divisions.0.compass"]![0]).toMatch(/^Division "Great": compass runs downward/);
    expect(res.fields["document.divisions.1.stops.1.source"]![0]).toBe('Division "Pedal", stop "Bass Flute": extension source "gt-mx" does not exist');
  });

  it("refuses a footage that is not one (3′ is no harmonic of 64′), naming the stop", () => {
    const doc = smallDocument();
    doc.divisions![0]!.stops![2]!.footage = "3";
    const res = checkDocument(doc);
    expect(res.ok).toBe(false);
    if (!res.ok) expect(res.fields["divisions.0.stops.2.footage"]![0]).toMatch(/^Division "Great", stop "Twelfth": Pitch: "3" is not a footage/);
  });

  it("words shape errors the same way before any consistency check", () => {
    const doc = smallDocument();
    (doc.divisions![0]!.stops![0] as { ranks: number }).ranks = 0;
    const res = checkDocument(doc);
    expect(res.ok).toBe(false);
    if (!res.ok) expect(res.fields["divisions.0.stops.0.ranks"]![0]).toMatch(/^Division "Great", stop "Open Diapason": Ranks: at least 1$/);
  });
});

describe("documents saved in the first format", () => {
  it("read their stops' treatments as where the pipes come from and the work on them", () => {
    const doc = smallDocument();
    (doc.divisions![0]!.stops![0] as Record<string, unknown>).treatment = "relocated";
    (doc.divisions![1]!.stops![1] as Record<string, unknown>) = { ...doc.divisions![1]!.stops![1]!, origin: undefined, treatment: "extension" };
    const res = checkDocument(doc);
    expect(res.ok).toBe(true);
    if (!res.ok) return;
    expect(res.document.divisions[0]!.stops[0]).toMatchObject({ origin: "existing", work: ["relocated"] });
    expect(res.document.divisions[0]!.stops[0]).not.toHaveProperty("treatment");
    expect(res.document.divisions[1]!.stops[1]).toMatchObject({ origin: "extension", source: "ped-bd" });
  });
});

describe("a division checked where it stands (the division form's check)", () => {
  const parsed = () => {
    const res = checkDocument(smallDocument());
    if (!res.ok) throw new Error("fixture");
    return res.document;
  };

  it("says a reversed compass once, without the follow-on messages about its stops", () => {
    const doc = smallDocument();
    doc.divisions![0]!.compass = { low: "c''''", high: "C" };
    doc.divisions![0]!.stops![0]!.offsetBassPipes = 12;
    const res = checkDocument(doc);
    expect(res.ok).toBe(false);
    if (res.ok) return;
    expect(Object.keys(res.fields)).toEqual(["divisions.0.compass"]);
    expect(Object.values(res.fields).flat().join(" ")).not.toMatch(/offset bass/);
  });

  it("keys the problem by the division's own field, worded for the place it is shown", () => {
    const doc = parsed();
    const great = { ...doc.divisions[0]!, compass: { low: "c''''", high: "C" } };
    const { fields, stops } = checkDivisionInDocument(doc, great);
    expect(fields).toEqual({ compass: ["Compass runs downward (c'''' to C); give the lowest note first"] });
    expect(stops).toEqual([]);
  });

  it("names the stops a narrower compass would break, and passes a sound division", () => {
    const doc = parsed();
    const pedal = doc.divisions[1]!;
    expect(checkDivisionInDocument(doc, pedal)).toEqual({ fields: {}, stops: [] });
    const withOffset = { ...pedal, compass: { low: "C", high: "E" }, stops: pedal.stops.map((s, i) => (i === 0 ? { ...s, offsetBassPipes: 12 } : s)) };
    const { fields, stops } = checkDivisionInDocument(doc, withOffset);
    expect(fields).toEqual({});
    expect(stops.join(" ")).toMatch(/^Bourdon: 12 offset bass pipes, but the stop has only 5 notes/);
  });

  it("checks a new division against the stops it would draw on in the others", () => {
    const doc = parsed();
    const added = { ...doc.divisions[1]!, id: "echo", name: "Echo", stops: [{ ...doc.divisions[1]!.stops[1]!, id: "echo-b", source: "nowhere" }] };
    expect(checkDivisionInDocument(doc, added).stops).toEqual(['Bass Flute: Extension source "nowhere" does not exist']);
  });
});
