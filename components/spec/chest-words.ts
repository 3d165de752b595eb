import { lengthDecimals, lengthIn, lengthUnitLabel, type DrawingUnits } from "@/lib/drawing/units";
import { formatNumber } from "./format";

type Fit = { fits: boolean; lengthMarginMm: number; depthMarginMm: number } | null;

/** A length in the firm's units as a drawing writes it: "3 420" (mm) or "134.6" (in), without the unit. */
export function lengthNumber(mm: number, units: DrawingUnits = "mm"): string {
  return units === "mm" ? formatNumber(Math.round(mm)) : formatNumber(lengthIn(units, mm), lengthDecimals(units, Math.abs(mm)));
}

/** "Needs 3 420 × 1 180 mm; space 3 000 × 1 200 mm — does not fit by 420 mm in length." In the firm's units. */
export function chestWords(need: { lengthMm: number; depthMm: number }, space: { lengthMm: number; depthMm: number } | null, fit: Fit, units: DrawingUnits = "mm"): string {
  const u = lengthUnitLabel(units);
  const L = (mm: number) => lengthNumber(mm, units);
  const needs = `Needs ${L(need.lengthMm)} × ${L(need.depthMm)} ${u}`;
  if (!space || !fit) return `${needs}; space in the case not yet given.`;
  const has = `space ${L(space.lengthMm)} × ${L(space.depthMm)} ${u}`;
  if (fit.fits) return `${needs}; ${has} — fits, ${L(fit.lengthMarginMm)} ${u} to spare in length.`;
  const short: string[] = [];
  if (fit.lengthMarginMm < 0) short.push(`${L(-fit.lengthMarginMm)} ${u} in length`);
  if (fit.depthMarginMm < 0) short.push(`${L(-fit.depthMarginMm)} ${u} in depth`);
  return `${needs}; ${has} — does not fit by ${short.join(" and ")}.`;
}

export type FitState = "fit" | "clash" | "unknown";
export function fitState(fit: Fit, hasChest: boolean): FitState {
  if (!hasChest || !fit) return "unknown";
  return fit.fits ? "fit" : "clash";
}
