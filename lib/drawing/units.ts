/**
 * The units a firm reads its pipe tables and drawings in: millimetres and kilograms, or inches and
 * pounds. 1 in = 25.4 mm and 1 lb = 0.45359237 kg exactly (international yard and pound, 1959;
 * NIST SP 811, Appendix B).
 */
export const drawingUnits = ["mm", "in"] as const;
export type DrawingUnits = (typeof drawingUnits)[number];

export const MM_PER_INCH = 25.4;
export const KG_PER_POUND = 0.45359237;

/** A length given in mm, in the firm's units. */
export function lengthIn(units: DrawingUnits, mm: number): number {
  return units === "mm" ? mm : mm / MM_PER_INCH;
}

/** A length in the firm's units, back in mm. */
export function lengthToMm(units: DrawingUnits, value: number): number {
  return units === "mm" ? value : value * MM_PER_INCH;
}

/** A weight given in kg, in the firm's units. */
export function weightIn(units: DrawingUnits, kg: number): number {
  return units === "mm" ? kg : kg / KG_PER_POUND;
}

export const lengthUnitLabel = (units: DrawingUnits) => (units === "mm" ? "mm" : "in");
export const weightUnitLabel = (units: DrawingUnits) => (units === "mm" ? "kg" : "lb");

/** Decimals that suit a length in these units: whole tenths of a mm, hundredths of an inch. */
export function lengthDecimals(units: DrawingUnits, mm: number): number {
  if (units === "mm") return mm >= 100 ? 0 : 1;
  return mm >= 254 ? 1 : 2;
}

/** Reads a units word from a query string; anything else is the firm's own choice. */
export function parseDrawingUnits(value: string | null | undefined, firmChoice: DrawingUnits): DrawingUnits {
  return value === "mm" || value === "in" ? value : firmChoice;
}

/** 1 ft³ = 0.3048³ m³ exactly (international foot, 1959; NIST SP 811, Appendix B). */
export const M3_PER_CUBIC_FOOT = 0.3048 ** 3;

/** A flow given in m³/min, in the firm's units: m³/min, or cubic feet per minute where it works in inches. */
export function flowIn(units: DrawingUnits, m3PerMin: number): number {
  return units === "mm" ? m3PerMin : m3PerMin / M3_PER_CUBIC_FOOT;
}
export const flowUnitLabel = (units: DrawingUnits) => (units === "mm" ? "m³/min" : "cfm");
