/**
 * Windchests and action of one division, by chest and action type: note channels and sliders on
 * slider chests, a valve per pipe on unit chests (pitman, direct-electric), duplexes; key action by
 * trackers and rollerboards, pallet magnets or pneumatic motors; stop action by traces or solenoids.
 * So a mechanical and an electric slider chest of the same size cost differently: trackers against
 * magnets, wiring and a relay. Restored and retained chests take a share of new.
 */
import type { Division } from "./scheme";
import type { Rates } from "./rates";
import { D } from "./departments";
import { ITEM, scaleCentre, type CostCentre } from "./cost-centres";

export interface ChestWork {
  readonly chest: Division["chest"];
  readonly action: Division["action"];
  readonly chestWork: Division["chestWork"];
  /** Keys of the division's compass. */
  readonly notes: number;
  /** Stops with a row on the chest (sliders / stop actions), prepared ones included. */
  readonly chestStops: number;
  /** Pipe positions on the main chest, prepared ones included. */
  readonly positions: number;
  readonly offsetPipes: number;
  /** Ranks duplexed to play from a second keyboard. */
  readonly duplexStops: number;
  /** Stop action by solenoids: electric or electro-pneumatic action, or a combination system. */
  readonly electricStopAction: boolean;
}

/** Books a division's chests and action into `centre` (its own "chests" centre, scaled as a whole for restored or retained chests). */
export function bookChestsAndAction(w: ChestWork, rates: Rates, centre: CostCentre): void {
  const n = rates.norms;
  const h = centre.hours;
  const it = centre.items;
  const unit = w.chest === "pitman" || w.chest === "direct-electric";
  const directElectric = w.chest === "direct-electric";
  const channels = directElectric ? 0 : w.notes;
  h[D.chestAction] +=
    channels * n.chestPerNoteChannel + w.chestStops * n.chestPerStop + w.positions * n.chestPerPipe + w.offsetPipes * n.offsetChestPerPipe +
    (unit ? w.positions * n.chestPerPipeMagnet : 0) + w.duplexStops * (w.notes * n.duplexPerNote + n.duplexPerStop);
  it[ITEM.chestMaterialsPerChannel] += channels + w.duplexStops * w.notes;
  it[ITEM.chestMaterialsPerStop] += w.chestStops + w.duplexStops;

  // Key action: none on a direct-electric chest (the relay drives the pipe magnets).
  if (!directElectric) {
    if (w.action === "mechanical") h[D.chestAction] += w.notes * n.keyActionMechanicalPerNote;
    else if (w.action === "electric") {
      h[D.chestAction] += w.notes * n.keyActionElectricPerNote;
      it[ITEM.palletMagnet] += w.notes;
    } else {
      h[D.chestAction] += w.notes * n.keyActionPneumaticPerNote;
      it[ITEM.pneumaticMotorPerNote] += w.notes;
    }
  } else it[ITEM.pipeMagnet] += w.positions;
  // Offset basses of an electric or electro-pneumatic division stand on magnets of their own.
  if (w.action !== "mechanical" && w.action !== "pneumatic") it[ITEM.pipeMagnet] += w.offsetPipes;

  // Stop action: traces or solenoids on slider and ventil chests; on unit chests it is switched in the relay or the stop channels.
  const sliders = w.chestStops + w.duplexStops;
  if (!unit) {
    if (w.electricStopAction) {
      h[D.chestAction] += sliders * n.stopActionElectricPerStop;
      it[ITEM.sliderSolenoid] += sliders;
    } else h[D.chestAction] += sliders * n.stopActionMechanicalPerStop;
  } else if (w.chest === "pitman") h[D.chestAction] += w.chestStops * n.stopActionElectricPerStop;

  if (w.chestWork !== "new") scaleCentre(centre, w.chestWork === "restored" ? n.chestRestoredFactor : n.chestRetainedFactor);
}
