/**
 * "1234567" → "1,234,567" with the separator given, in one pass over the digits. (The usual
 * /\B(?=(\d{3})+(?!\d))/ look-ahead rescans to the end from every position: quadratic.) Pure.
 */
export function groupThousands(digits: string, separator: string): string {
  let out = "";
  for (let i = 0; i < digits.length; i++) {
    if (i > 0 && (digits.length - i) % 3 === 0) out += separator;
    out += digits[i];
  }
  return out;
}
