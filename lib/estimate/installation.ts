/**
 * Dismantling the existing organ and erecting the new one, per division: dismantling and packing
 * by existing division and pipe; erection by division and by pipe standing in the organ. (Relocated
 * pipes' re-erection is booked with their pipe work; the case's erection with the case.)
 */
import type { Rates } from "./rates";
import { D } from "./departments";
import type { CostCentre } from "./cost-centres";

export interface InstallationWork {
  /** Existing pipes taken down (reused, restored and removed). */
  readonly existingPipes: number;
  /** Whether anything existing is taken down in this division (pipes, or chests kept). */
  readonly existing: boolean;
  readonly pipesInOrgan: number;
  readonly hasChest: boolean;
}

export function bookInstallation(w: InstallationWork, rates: Rates, centre: CostCentre): void {
  const n = rates.norms;
  if (w.existing) centre.hours[D.dismantling] += n.dismantlePerDivision + w.existingPipes * n.dismantlePerPipe;
  if (w.pipesInOrgan > 0 || w.hasChest) centre.hours[D.erection] += n.erectPerDivision + w.pipesInOrgan * n.erectPerPipe;
}
