import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { estimateScheme, parseSchemeFile } from "@/lib/estimate";
import { layChest } from "@/components/spec/chest-layout";
import { drawingRules } from "@/lib/spec/estimate";

describe("the chest drawing and the figures", () => {
  it("draw from rules that hold no price, labour norm, crew or percentage", () => {
    const keys: string[] = [];
    const walk = (v: unknown, path: string) => {
      if (!v || typeof v !== "object") return;
      for (const [k, x] of Object.entries(v)) {
        keys.push(`${path}${k}`);
        walk(x, `${path}${k}.`);
      }
    };
    walk(drawingRules(DEFAULT_RATES), "");
    expect(keys).toContain("chest.clearanceMinMm");
    expect(keys.filter((k) => /price|amount|rate|norm|crew|percent|margin|items|programme/i.test(k))).toEqual([]);
  });

  for (const file of ["small-two-manual.json", "large-five-manual.json"]) {
    it(`agree on every chest of ${file}: length, depth, halves, rows and the offset chests`, () => {
      const r = parseSchemeFile(readFileSync(join(__dirname, "../../examples", file), "utf8"), DEFAULT_RATES);
      if (!r.ok) throw new Error(r.messages.join("\n"));
      const e = estimateScheme(r.scheme, r.rates);
      for (const d of e.divisions) {
        // Drawn as a reader without money:read gets it, from the drawing rules alone.
        const plan = layChest(r.scheme, d.id, drawingRules(r.rates));
        if (d.chest.main.rows === 0 && !d.chest.offset) {
          expect(plan, d.name).toBeNull();
          continue;
        }
        expect(plan!.lengthMm, d.name).toBeCloseTo(d.chest.main.lengthMm, 1);
        expect(plan!.depthMm, d.name).toBeCloseTo(d.chest.main.depthMm, 1);
        expect(plan!.rows.length, d.name).toBe(d.chest.main.rows);
        expect(plan!.splitMm, d.name).toBe(d.chest.main.halvesMm?.[0] ?? null);
        expect(plan!.offset?.lengthMm ?? null, d.name).toBe(d.chest.offset?.lengthMm ?? null);
        // Every pipe the drawing places stands inside the chest it draws.
        for (const row of plan!.rows) for (const p of row.pipes) {
          expect(p.x - p.size / 2, `${d.name} ${row.label} ${p.key}`).toBeGreaterThanOrEqual(-1e-6);
          expect(p.x + p.size / 2, `${d.name} ${row.label} ${p.key}`).toBeLessThanOrEqual(plan!.lengthMm + 1e-6);
        }
      }
    });
  }
});
