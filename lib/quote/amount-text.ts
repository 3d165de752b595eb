/**
 * Money as text: the product's one formatter, with nothing else in the module, so the editor and
 * the documents load it without the quotation's arithmetic. Pure.
 */
import { groupThousands } from "@/lib/spec/digits";

/**
 * "1 000 000.01" with thin spaces between thousands: never through a float, never rounded further.
 * A zero is never signed ("−0.00" reads as a mistake).
 */
export function formatAmount(amount: string): string {
  const negative = amount.startsWith("-") && /[1-9]/.test(amount);
  const [whole, fraction = "00"] = amount.replace(/^-/, "").split(".");
  return `${negative ? "−" : ""}${groupThousands(whole!, "\u202f")}.${fraction.padEnd(2, "0")}`;
}
