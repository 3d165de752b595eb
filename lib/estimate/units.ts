/**
 * Unit conversions, from NIST SP 811 (Guide for the Use of the SI), Appendix B:
 * 1 inch of water (conventional) = 249.0889 Pa; 1 mm of water (conventional) = 9.80665 Pa; 1 ft = 0.3048 m.
 */
export const PA_PER_INCH_WATER = 249.0889;
export const PA_PER_MM_WATER = 9.80665;
export const M_PER_FT = 0.3048;

/** Wind pressure in mm water column, from a value in mm or inches. */
export function windPressureMm(p: { readonly value: number; readonly unit: "mm" | "in" }): number {
  return p.unit === "mm" ? p.value : (p.value * PA_PER_INCH_WATER) / PA_PER_MM_WATER;
}

export function mmWaterToPa(mm: number): number {
  return mm * PA_PER_MM_WATER;
}

export function ftToMm(ft: number): number {
  return ft * M_PER_FT * 1000;
}
