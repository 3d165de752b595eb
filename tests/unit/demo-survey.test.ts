import { describe, expect, it } from "vitest";
import { restoreScheme } from "@/db/demo-scenario";
import { fitScale } from "@/lib/drawing/scale-fit";
import { parseCompass } from "@/lib/estimate/notes";
import { parseFootage, semitonesAbove8ft } from "@/lib/estimate/pitch";
import { schemeDocumentSchema } from "@/lib/spec/document";

describe("the demo's survey of St Aldric's 1908 ranks", () => {
  const doc = schemeDocumentSchema.parse(restoreScheme);
  const surveyed = doc.divisions.flatMap((d) => d.stops.filter((s) => s.survey?.length).map((s) => ({ d, s })));

  it("gives each surveyed rank the scale fitted to its measurements, with a scatter a survey would show", () => {
    expect(surveyed.length).toBeGreaterThanOrEqual(5);
    for (const { d, s } of surveyed) {
      const r = fitScale({
        measurements: s.survey!,
        referenceSemitones: semitonesAbove8ft(parseFootage(s.footage)!),
        wooden: ["pine", "oak", "mahogany"].includes(s.material),
        compass: parseCompass(s.compass ?? d.compass)!,
        currentHalvingOn: s.scale.halvingOn,
      });
      if (!r.ok) throw new Error(`${s.name}: ${r.problems[0]!.message}`);
      expect({ stop: s.name, deviationHt: r.deviationHt, halvingOn: r.halvingOn }).toEqual({ stop: s.name, deviationHt: s.scale.deviationHt, halvingOn: s.scale.halvingOn });
      expect(r.warnings, s.name).toEqual([]);
    }
  });
});
