/**
 * The console: its making (keyboards, stop controls, couplers, pistons, combination system) and its
 * hardware bought in — keyboards, pedalboard, drawstops (mechanical, or with solenoids where the
 * stop action is electric), pistons, the combination system, swell pedals — and mechanical couplers'
 * coupler machine (booked with the chests and action). A new console buys everything; a restored one keeps its keyboards and stop
 * controls and buys what a combination system needs; a retained one buys nothing.
 */
import type { Scheme } from "./scheme";
import type { Rates } from "./rates";
import { D } from "./departments";
import { ITEM, type CostCentre } from "./cost-centres";

export interface ConsoleWork {
  readonly work: Scheme["accessories"]["consoleWork"];
  readonly manuals: number;
  readonly pedalboards: number;
  readonly stopControls: number;
  readonly couplers: number;
  readonly tremulants: number;
  readonly pistons: number;
  readonly memoryLevels: number;
  /** Notes coupled mechanically (Σ over couplers into mechanical divisions of the keys coupled). */
  readonly mechanicalCouplerNotes: number;
  readonly electricStopAction: boolean;
  readonly swellPedals: number;
}

export function bookConsole(c: ConsoleWork, rates: Rates, centre: CostCentre, action: CostCentre): void {
  const n = rates.norms;
  const f = c.work === "new" ? 1 : c.work === "restored" ? n.consoleRestoredFactor : n.consoleRetainedFactor;
  const combination = c.pistons > 0 || c.memoryLevels > 0;
  centre.hours[D.console] +=
    f * ((c.manuals + c.pedalboards) * n.consolePerKeyboard + c.stopControls * n.consolePerStopControl + c.couplers * n.consolePerCoupler +
      c.tremulants * n.consolePerTremulant + c.pistons * n.consolePerPiston) + (combination && c.work !== "retained" ? n.combinationSystem : 0);
  action.hours[D.chestAction] += f * c.mechanicalCouplerNotes * n.couplerMechanicalPerNote;
  const it = centre.items;
  if (c.work === "new") {
    it[ITEM.keyboard] += c.manuals;
    it[ITEM.pedalboard] += c.pedalboards;
    const controls = c.stopControls + c.couplers + c.tremulants;
    it[c.electricStopAction ? ITEM.drawstopElectric : ITEM.drawstopMechanical] += controls;
    it[ITEM.swellPedal] += c.swellPedals;
  }
  if (c.work !== "retained" && combination) {
    it[ITEM.piston] += c.pistons;
    it[ITEM.combinationBase] += 1;
    it[ITEM.combinationPerLevel] += c.memoryLevels;
  }
}
