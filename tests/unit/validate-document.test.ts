import { describe, expect, it } from "vitest";
import { checkDocument } from "@/lib/spec/validate";
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
    if (!res.ok) expect(res.fields["divisions.0.stops.2.footage"]![0]).toMatch(/^Division "Great", stop "Twelfth": footage: "3" is not a footage/);
  });

  it("words shape errors the same way before any consistency check", () => {
    const doc = smallDocument();
    (doc.divisions![0]!.stops![0] as { ranks: number }).ranks = 0;
    const res = checkDocument(doc);
    expect(res.ok).toBe(false);
    if (!res.ok) expect(res.fields["divisions.0.stops.0.ranks"]![0]).toMatch(/^Division "Great", stop "Open Diapason": ranks: /);
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
