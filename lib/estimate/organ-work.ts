/**
 * The work of the organ as a whole, once its divisions are known: the wind system, the case and
 * its front, the console with its hardware and internal wiring, the relay, design and drawings,
 * and the weights and loads the vehicles carry — each in its own cost centre.
 */
import type { Scheme } from "./scheme";
import type { Rates } from "./rates";
import type { SchemePlan } from "./pipes";
import type { DivisionWorkResult } from "./division-work";
import { bookWindSystem, windNeed, type WindNeed } from "./wind";
import { bookCase, caseOf, type CaseFigures } from "./case";
import { bookConsole } from "./console";
import { bookElectrics, bookRelay, consoleWiring, type Wiring } from "./wiring";
import { bookDesign } from "./design";
import { bookTransport, transportOf, weightsOf, type Transport, type Weights } from "./site";
import { costCentre, type CostCentre } from "./cost-centres";

export interface OrganWorkResult {
  readonly wind: WindNeed & { readonly trunkM: number };
  readonly case: CaseFigures;
  readonly consoleWiring: Wiring;
  readonly weights: Weights;
  readonly transport: Transport;
  /** Centres in this order: coupler action, wind, case, console, electrics, site, design. */
  readonly centres: readonly CostCentre[];
  readonly site: CostCentre;
  readonly design: CostCentre;
}

export function organWork(scheme: Scheme, plan: SchemePlan, dw: DivisionWorkResult, rates: Rates): OrganWorkResult {
  const acc = scheme.accessories;
  const chestsC = costCentre(null, "chests");
  const windC = costCentre(null, "wind");
  const caseC = costCentre(null, "case");
  const consoleC = costCentre(null, "console");
  const electricsC = costCentre(null, "electrics");
  const siteC = costCentre(null, "site");
  const designC = costCentre(null, "design");
  const divisions = dw.divisions;

  // Wind: the full organ's need, reservoirs per pressure, the blower.
  const need = windNeed(
    divisions.map((d) => ({ pressureMm: d.windPressureMm, windPerKeyM3s: d.windPerKeyM3s, pedal: d.keyboard === "pedal", hasChest: d.hasChest })),
    rates.wind,
  );
  const chestDivisions = divisions.filter((d) => d.hasChest).length;
  const { trunkM } = bookWindSystem(need, scheme.wind, acc.tremulants.length, chestDivisions, rates, windC);

  // Case: sized round the longest and the deepest chest and the tallest pipe, unless given.
  let longest = 0;
  let deepest = 0;
  let tallest = 0;
  for (const d of divisions) {
    longest = Math.max(longest, d.chest.main.lengthMm, d.swellBox?.widthMm ?? 0);
    deepest = Math.max(deepest, d.chest.main.depthMm, d.swellBox?.depthMm ?? 0);
    tallest = Math.max(tallest, d.tallestPipeMm);
  }
  const caseFigures = caseOf(scheme.case, { lengthMm: longest, depthMm: deepest }, tallest, rates);
  bookCase(caseFigures, scheme.case, rates, caseC, designC);

  // Console, its internal wiring and the relay.
  const manuals = divisions.filter((d) => d.keyboard === "manual").length;
  const pedalboards = divisions.some((d) => d.keyboard === "pedal") ? 1 : 0;
  const notesOf = (id: string) => plan.divisions.find((d) => d.division.id === id)?.notes ?? 0;
  const actionOf = (id: string) => plan.divisions.find((d) => d.division.id === id)?.division.action;
  const couplerKeys = acc.couplers.reduce((s, cp) => s + notesOf(cp.from), 0);
  const mechanicalCouplerNotes = acc.couplers.reduce((s, cp) => s + (actionOf(cp.to) === "mechanical" ? notesOf(cp.from) : 0), 0);
  const pistons = acc.combination.generalPistons + acc.combination.divisionalPistons * plan.divisions.length;
  bookConsole(
    {
      work: acc.consoleWork, manuals, pedalboards, stopControls: dw.stopControls, couplers: acc.couplers.length, tremulants: acc.tremulants.length,
      pistons, memoryLevels: acc.combination.memoryLevels, mechanicalCouplerNotes, electricStopAction: dw.electricStopAction,
      swellPedals: divisions.filter((d) => d.swellBox).length,
    },
    rates,
    consoleC,
    chestsC,
  );
  const cw = consoleWiring({ electric: dw.anyElectric, couplerKeys, stopControls: dw.stopControls, pistons }, rates.wiring);
  bookElectrics(cw, 0, false, rates, electricsC);
  if (dw.anyElectric) bookRelay(divisions.reduce((s, d) => s + d.wiring.conductors, cw.conductors), electricsC);

  bookDesign({ stops: dw.stopControls, divisions: plan.divisions.length }, rates, designC);

  // Weights and loads: the whole organ out to the site, existing material in to the workshop.
  const caseKg = caseFigures.timberM3 * rates.woodDensityKgM3[scheme.case.timber] + caseFigures.dummyMetalKg;
  const windKg = need.reservoirs.reduce((s, r) => s + r.flowM3PerMin, 0) * rates.wind.reservoirKgPerM3PerMin;
  const weights = weightsOf({
    pipesKg: divisions.reduce((s, d) => s + d.pipesKg, 0),
    chestsKg: divisions.reduce((s, d) => s + d.chestsKg, 0),
    windKg,
    caseKg,
    consoleKg: acc.consoleWork === "retained" ? 0 : (manuals + pedalboards) * rates.site.consoleKg,
    existingToWorkshopKg: divisions.reduce((s, d) => s + d.existingToWorkshopKg, 0),
  });
  const transport = transportOf(weights, scheme.site, rates);
  bookTransport(transport, rates, siteC);

  return {
    wind: { ...need, trunkM: Math.round(trunkM * 10) / 10 },
    case: caseFigures,
    consoleWiring: cw,
    weights,
    transport,
    centres: [chestsC, windC, caseC, consoleC, electricsC, siteC, designC],
    site: siteC,
    design: designC,
  };
}
