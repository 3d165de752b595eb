/**
 * Design and management: drawings by stops and divisions (case drawings are booked with a new
 * case), and project management as a share of every other hour.
 */
import type { Rates } from "./rates";
import { D } from "./departments";
import type { CostCentre } from "./cost-centres";

export function bookDesign(w: { readonly stops: number; readonly divisions: number }, rates: Rates, centre: CostCentre): void {
  const n = rates.norms;
  centre.hours[D.design] += n.designBase + w.stops * n.designPerStop + w.divisions * n.designPerDivision;
}

/** Project management on the hours booked so far (all other work). */
export function bookManagement(otherHours: number, rates: Rates, centre: CostCentre): void {
  centre.hours[D.management] += (otherHours * rates.norms.managementPercent) / 100;
}
