import { describe, expect, it } from "vitest";
import { estimateScheme, parseScheme, type Programme } from "@/lib/estimate";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { programmeSvg, programmeWords } from "./programme-chart";

function programme(dates?: { start: string; target?: string }): Programme {
  const r = parseScheme({
    name: "Test",
    ...(dates ? { programme: dates } : {}),
    divisions: [{ id: "gt", name: "Great", keyboard: "manual", compass: { low: "C", high: "c''''" }, stops: [{ id: "p", name: "Principal", footage: "8", family: "principal" }, { id: "o", name: "Octave", footage: "4", family: "principal" }] }],
  });
  if (!r.ok) throw new Error(r.messages.join("; "));
  return estimateScheme(r.scheme, DEFAULT_RATES).programme;
}

describe("the programme in words and as a picture", () => {
  it("says a late programme is late, in words, with the weeks over", () => {
    const p = programme({ start: "2028-01-03", target: "2028-01-10" });
    expect(p.meetsTarget).toBe(false);
    const words = programmeWords(p);
    expect(words.late).toBe(true);
    const over = Math.abs(p.slackWeeks!);
    expect(words.detail).toBe(`Late: the programme ends ${Number.isInteger(over) ? over : over.toFixed(1)} weeks after the client's target of 10 January 2028.`);
    const svg = programmeSvg(p);
    expect(svg).toContain(`Late by ${Number.isInteger(over) ? over : over.toFixed(1)} weeks`);
    expect(svg).toContain("target 10 January 2028");
  });

  it("gives the weeks to spare when the programme meets the target, and asks for a start date when there is none", () => {
    const ok = programmeWords(programme({ start: "2028-01-03", target: "2030-01-10" }));
    expect(ok.late).toBe(false);
    expect(ok.detail).toMatch(/^This meets the client's target of 10 January 2030 with [\d.]+ weeks to spare\.$/);
    const undated = programmeWords(programme());
    expect(undated.detail).toBe("Give a start date to put dates on the programme.");
  });

  it("draws every phase as a bar, labelled with its weeks, in a self-contained SVG", () => {
    const p = programme({ start: "2028-01-03", target: "2029-01-10" });
    const svg = programmeSvg(p);
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    for (const ph of p.phases) expect(svg).toContain(`>${ph.label}<`);
    expect(svg).not.toMatch(/href=|<script/);
  });
});
