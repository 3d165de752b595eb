// Patterns that cannot freeze the server: the footage parser on the input that once blocked it for
// 7 s, the length bound in front of it, the lint rule that keeps such patterns out of the code,
// and the digit grouping that replaced a quadratic look-ahead.
import { ESLint } from "eslint";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { footageSchema, parseFootage } from "@/lib/estimate";
import { groupThousands } from "@/lib/spec/digits";

describe("footage text", () => {
  it("reads the footages the trade writes, with or without a unit, as before", () => {
    for (const [text, num, den] of [
      ["8", 8, 1], ["8'", 8, 1], [" 8 ft ", 8, 1], ["16 '", 16, 1], ["2 2/3′", 8, 3], ["2⅔", 8, 3], ["1 3/5 ft", 8, 5], ["10⅔'", 32, 3], ["1/2", 1, 2],
    ] as const) {
      expect(parseFootage(text), text).toEqual({ num, den });
    }
    for (const text of ["", "ft", "8x", "8 ft ft", "0", "3", "2 2/3 x"]) expect(parseFootage(text), text).toBeNull();
  });

  it("refuses the 84 KiB footage that used to block the server, without scanning it", () => {
    const attack = `1${" ".repeat(80_000)}x`;
    const started = performance.now();
    expect(parseFootage(attack)).toBeNull();
    expect(parseFootage(`${" ".repeat(80_000)}8'`)).toBeNull();
    // A hang guard with a wide margin, not a speed target: the old pattern took ~7 s here.
    expect(performance.now() - started).toBeLessThan(500);
    const parsed = footageSchema.safeParse(attack);
    expect(parsed.success).toBe(false);
    expect(parsed.error!.issues.map((i) => i.message)).toEqual([expect.stringMatching(/too long for a footage/)]);
  });
});

describe("the lint rule against super-linear patterns", () => {
  it("reports the old footage pattern and passes the new one", async () => {
    const eslint = new ESLint({ overrideConfigFile: "eslint.config.mjs" });
    const lint = async (code: string) => (await eslint.lintText(code, { filePath: "lib/pattern-sample.ts" }))[0]!.messages.map((m) => m.ruleId);
    expect(await lint(`export const unit = /\\s*(?:'|ft)$/;\n`)).toContain("regexp/no-super-linear-move");
    expect(await lint(`export const grouping = /\\B(?=(\\d{3})+(?!\\d))/g;\n`)).toContain("regexp/no-super-linear-move");
    expect(await lint(`export const unit = /(?:'|ft)$/;\n`)).toEqual([]);
  }, 30_000);
});

describe("groupThousands", () => {
  it("groups like Intl.NumberFormat (en-US) for any whole number, exactly", () => {
    fc.assert(
      fc.property(fc.bigInt({ min: 0n, max: 10n ** 40n }), (n) => {
        expect(groupThousands(n.toString(), ",")).toBe(n.toLocaleString("en-US"));
      }),
    );
  });

  it("takes one pass: a million digits group at once", () => {
    const digits = "9".repeat(1_000_000);
    const grouped = groupThousands(digits, ",");
    expect(grouped.length).toBe(1_000_000 + 333_333);
  });
});
