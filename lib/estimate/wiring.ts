/**
 * Wiring of electric and electro-pneumatic action: a conductor per key per chest it feeds, a set of
 * conductors per stop control, and on direct-electric chests a conductor per pipe magnet (from a
 * relay standing in the organ). Length is Σ conductors × their run. Per-pipe magnets are why large
 * instruments reach kilometres: a large four-manual electric organ has about ten miles (≈16 km) of
 * cable — common practice, no source. Mechanical and pneumatic divisions need none of this.
 * Electrics hours: a termination per conductor, per stop, per division; the relay bought in.
 */
import type { Rates } from "./rates";
import { D } from "./departments";
import { ITEM, MATERIAL_LINE, type CostCentre } from "./cost-centres";

type WiringNorms = Rates["wiring"];

export function isElectricAction(action: string): boolean {
  return action === "electric" || action === "electro-pneumatic";
}

/** A key feed: the keys of a division carried to a chest (its own, a unit rank's, another division's). */
export interface KeyFeed {
  readonly keys: number;
  readonly runM: number;
}

export interface DivisionWiringInput {
  readonly electric: boolean;
  readonly directElectric: boolean;
  readonly consoleDistanceM: number;
  /** Feeds of this division's keys: its own chest, plus one per unit rank or other division it plays. */
  readonly keyFeeds: readonly KeyFeed[];
  readonly stopControls: number;
  /** Pipe positions on this division's chest (direct-electric: one magnet each). */
  readonly pipeMagnets: number;
  /** Pipes on offset chests, each on a magnet of its own. */
  readonly offsetPipes: number;
}

export interface Wiring {
  readonly conductors: number;
  readonly conductorLengthM: number;
}

const NONE: Wiring = { conductors: 0, conductorLengthM: 0 };

/** Conductors and their length in metres for one division. */
export function divisionWiring(w: DivisionWiringInput, n: WiringNorms): Wiring {
  if (!w.electric) return NONE;
  let conductors = 0;
  let lengthM = 0;
  for (const f of w.keyFeeds) {
    conductors += f.keys;
    lengthM += f.keys * f.runM;
  }
  const stopConductors = w.stopControls * n.conductorsPerStopControl;
  conductors += stopConductors;
  lengthM += stopConductors * w.consoleDistanceM;
  if (w.directElectric) {
    conductors += w.pipeMagnets;
    lengthM += w.pipeMagnets * n.relayToChestM;
  }
  conductors += w.offsetPipes;
  lengthM += w.offsetPipes * n.offsetChestRunM;
  return { conductors, conductorLengthM: Math.round(lengthM) };
}

export interface ConsoleWiringInput {
  readonly electric: boolean;
  /** Σ over couplers of the keys coupled. */
  readonly couplerKeys: number;
  readonly stopControls: number;
  readonly pistons: number;
}

/** Conductors inside the console: coupler switching per key, one per stop control and per piston to the combination system. */
export function consoleWiring(c: ConsoleWiringInput, n: WiringNorms): Wiring {
  if (!c.electric) return NONE;
  const conductors = c.couplerKeys + c.stopControls + c.pistons;
  return { conductors, conductorLengthM: Math.round(conductors * n.consoleInternalM) };
}

/** Books a division's (or the console's) electrics: terminations, per stop, per division, and the cable. */
export function bookElectrics(w: Wiring, stops: number, perDivision: boolean, rates: Rates, centre: CostCentre): void {
  if (w.conductors === 0) return;
  const n = rates.norms;
  centre.hours[D.electrics] += w.conductors * n.electricsPerConductor + stops * n.electricsPerStop + (perDivision ? n.electricsPerDivision : 0);
  centre.materials[MATERIAL_LINE.cable] += w.conductorLengthM;
}

/** The relay, bought in: a fixed part and a price per conductor it switches. */
export function bookRelay(conductors: number, centre: CostCentre): void {
  if (conductors === 0) return;
  centre.items[ITEM.relayBase] += 1;
  centre.items[ITEM.relayPerConductor] += conductors;
}
