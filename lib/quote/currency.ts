/**
 * Currencies: ISO 4217 codes as the platform's Intl data knows them (Node.js and browsers ship the
 * same CLDR list), so a typing slip such as "EUO" is refused rather than printed on a tender.
 */
const known: ReadonlySet<string> = new Set(
  typeof Intl.supportedValuesOf === "function" ? Intl.supportedValuesOf("currency") : ["EUR", "GBP", "USD", "CHF"],
);

export function isKnownCurrency(code: string): boolean {
  return known.has(code);
}

/** Null when the code is a currency; otherwise what is wrong, in the product's words. */
export function currencyProblem(code: string): string | null {
  if (!/^[A-Z]{3}$/.test(code)) return `"${code.slice(0, 20)}" is not a currency code: use three capital letters, e.g. EUR or GBP`;
  if (!isKnownCurrency(code)) return `"${code}" is not a known ISO 4217 currency code (e.g. EUR, GBP, USD, CHF)`;
  return null;
}

/** "€", "£", "US$" where the sign is unambiguous in English; otherwise the code itself ("CHF"). */
export function currencySign(code: string): string {
  return ({ EUR: "€", GBP: "£", USD: "US$", JPY: "¥" } as Record<string, string>)[code] ?? code;
}

/** The sign as pages put it before an amount: "€1 200.00", "CHF 1 200.00". */
export function currencySymbol(code: string): string {
  const sign = currencySign(code);
  return sign === code ? `${code} ` : sign;
}
