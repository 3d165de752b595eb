import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { formatMoney } from "@/components/spec/format";
import { FiguresPanel } from "@/components/spec/figures-panel";
import { estimateScheme, parseSchemeFile } from "@/lib/estimate";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { currencySymbol } from "@/lib/quote/currency";
import { formatAmount } from "@/lib/quote/totals";

describe("the one money formatter", () => {
  it("groups thousands with narrow spaces, keeps the cents as computed and never signs a zero", () => {
    expect(formatAmount("1234567.5")).toBe("1\u202f234\u202f567.50");
    expect(formatAmount("-12.30")).toBe("−12.30");
    expect(formatAmount("-0.00")).toBe("0.00");
    expect(formatAmount("-0")).toBe("0.00");
  });

  it("puts the currency sign the pages use before it, with a sign for a rise or a fall", () => {
    expect(formatMoney("1200", "EUR")).toBe(`€1\u202f200.00`);
    expect(formatMoney("1200", "CHF")).toBe(`CHF 1\u202f200.00`);
    expect(formatMoney("-5.10", "GBP")).toBe("−£5.10");
    expect(formatMoney("5.10", "GBP", { signed: true })).toBe("+£5.10");
    expect(formatMoney("-0.00", "EUR", { signed: true })).toBe("€0.00");
  });

  it("is the one the figures panel uses", () => {
    const file = readFileSync(join(__dirname, "../../examples/small-two-manual.json"), "utf8");
    const parsed = parseSchemeFile(file, { ...DEFAULT_RATES, currency: "GBP" });
    if (!parsed.ok) throw new Error(parsed.messages.join("; "));
    const estimate = estimateScheme(parsed.scheme, { ...parsed.rates, currency: "GBP" });
    const html = renderToStaticMarkup(createElement(FiguresPanel, { figures: { ok: true, estimate, ms: 1 }, showMoney: true, units: "mm" }));
    const text = html.replace(/<[^<>]*>/g, "|");
    for (const amount of [estimate.money.labourAmount, estimate.money.materialsAmount, estimate.money.totalAmount]) {
      expect(text).toContain(`${currencySymbol("GBP")}${formatAmount(amount)}`);
    }
    expect(text).not.toContain("GBP ");
  });
});
