import { formatNumber } from "./format";

type Fit = { fits: boolean; lengthMarginMm: number; depthMarginMm: number } | null;

/** "Needs 3 420 × 1 180 mm; space 3 000 × 1 200 mm — does not fit by 420 mm in length." */
export function chestWords(need: { lengthMm: number; depthMm: number }, space: { lengthMm: number; depthMm: number } | null, fit: Fit): string {
  const needs = `Needs ${formatNumber(Math.round(need.lengthMm))} × ${formatNumber(Math.round(need.depthMm))} mm`;
  if (!space || !fit) return `${needs}; space in the case not yet given.`;
  const has = `space ${formatNumber(Math.round(space.lengthMm))} × ${formatNumber(Math.round(space.depthMm))} mm`;
  if (fit.fits) return `${needs}; ${has} — fits, ${formatNumber(Math.round(fit.lengthMarginMm))} mm to spare in length.`;
  const short: string[] = [];
  if (fit.lengthMarginMm < 0) short.push(`${formatNumber(Math.round(-fit.lengthMarginMm))} mm in length`);
  if (fit.depthMarginMm < 0) short.push(`${formatNumber(Math.round(-fit.depthMarginMm))} mm in depth`);
  return `${needs}; ${has} — does not fit by ${short.join(" and ")}.`;
}

export type FitState = "fit" | "clash" | "unknown";
export function fitState(fit: Fit, hasChest: boolean): FitState {
  if (!hasChest || !fit) return "unknown";
  return fit.fits ? "fit" : "clash";
}
