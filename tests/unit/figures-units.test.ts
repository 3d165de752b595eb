// The editor's figures give chest sizes in the firm's drawing units, as the Chests tab does.
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { columnFiguresOf } from "@/components/spec/board-figures";
import { FiguresPanel } from "@/components/spec/figures-panel";
import { estimateScheme, parseSchemeFile } from "@/lib/estimate";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";

function exampleEstimate() {
  const file = readFileSync(join(__dirname, "../../examples/small-two-manual.json"), "utf8");
  const parsed = parseSchemeFile(file, DEFAULT_RATES);
  if (!parsed.ok) throw new Error(parsed.messages.join("; "));
  return estimateScheme(parsed.scheme, parsed.rates);
}

describe("chest sizes in the editor's figures", () => {
  const estimate = exampleEstimate();
  const first = estimate.divisions.find((d) => d.chest.main.rows > 0)!;
  // 1 in = 25.4 mm exactly (the international yard and pound agreement, 1959).

  it("are in millimetres for a firm that draws in millimetres", () => {
    const text = renderToStaticMarkup(createElement(FiguresPanel, { figures: { ok: true, estimate, ms: 1 }, showMoney: false, units: "mm" })).replace(/<[^<>]*>/g, "");
    expect(text).toContain(`Needs ${Math.round(first.chest.main.lengthMm).toLocaleString("en-GB").replace(/,/g, "\u202f")} × `);
    expect(columnFiguresOf({ ok: true, estimate, ms: 1 }, "mm").get(first.id)!.words).toMatch(/^Needs [\d\u202f]+ × [\d\u202f]+ mm/);
  });

  it("are in inches, in the panel and on the column, for a firm that draws in inches", () => {
    const text = renderToStaticMarkup(createElement(FiguresPanel, { figures: { ok: true, estimate, ms: 1 }, showMoney: false, units: "in" })).replace(/<[^<>]*>/g, "");
    const words = columnFiguresOf({ ok: true, estimate, ms: 1 }, "in").get(first.id)!.words;
    expect(words).toMatch(/^Needs [\d.\u202f]+ × [\d.\u202f]+ in/);
    const [length, depth] = words.match(/^Needs ([\d.\u202f]+) × ([\d.\u202f]+) in/)!.slice(1).map((x) => Number(x.replace(/\u202f/g, "")));
    expect(length).toBeCloseTo(first.chest.main.lengthMm / 25.4, 0);
    expect(depth).toBeCloseTo(first.chest.main.depthMm / 25.4, 0);
    expect(text).toContain(words);
    expect(text).not.toMatch(/Needs [^;]* mm/);
  });
});
