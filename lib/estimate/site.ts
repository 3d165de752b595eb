/**
 * The site: weights (loads on chests and galleries, and what the vehicles carry), transport by
 * distance and number of loads, crating and loading, scaffolding by the weeks on site, crew travel
 * and lodging by the person-weeks on site.
 */
import type { Scheme } from "./scheme";
import type { Rates } from "./rates";
import { D } from "./departments";
import { ITEM, type CostCentre } from "./cost-centres";
import type { Programme } from "./programme";

export interface Weights {
  /** Pipes standing in the finished organ, new and existing: metal and timber, kg. */
  readonly pipesKg: number;
  readonly chestsKg: number;
  readonly windKg: number;
  readonly caseKg: number;
  readonly consoleKg: number;
  readonly totalKg: number;
  /** Existing material taken to the workshop, kg. */
  readonly existingToWorkshopKg: number;
}

export interface Transport {
  readonly distanceKm: number;
  /** Loads from the workshop to the site, and from the site to the workshop (existing material). */
  readonly loadsOut: number;
  readonly loadsIn: number;
  readonly kmDriven: number;
}

const r1 = (x: number) => Math.round(x * 10) / 10;

export function weightsOf(parts: Omit<Weights, "totalKg">): Weights {
  const t = parts.pipesKg + parts.chestsKg + parts.windKg + parts.caseKg + parts.consoleKg;
  return {
    pipesKg: r1(parts.pipesKg), chestsKg: r1(parts.chestsKg), windKg: r1(parts.windKg), caseKg: r1(parts.caseKg), consoleKg: r1(parts.consoleKg),
    totalKg: r1(t), existingToWorkshopKg: r1(parts.existingToWorkshopKg),
  };
}

/** Loads each way and the kilometres driven (there and back for every load). */
export function transportOf(weights: Weights, site: Scheme["site"], rates: Rates): Transport {
  const cap = rates.site.loadCapacityKg;
  const loadsOut = weights.totalKg > 0 ? Math.ceil(weights.totalKg / cap) : 0;
  const loadsIn = weights.existingToWorkshopKg > 0 ? Math.ceil(weights.existingToWorkshopKg / cap) : 0;
  return { distanceKm: site.distanceKm, loadsOut, loadsIn, kmDriven: (loadsOut + loadsIn) * 2 * site.distanceKm };
}

/** Crating, loading and driving hours and the vehicles: known before the programme. */
export function bookTransport(t: Transport, rates: Rates, centre: CostCentre): void {
  const n = rates.norms;
  const loads = t.loadsOut + t.loadsIn;
  centre.hours[D.transport] += loads * (n.cratePerLoad + n.loadingPerLoad) + t.kmDriven / rates.site.drivingKmPerHour;
  centre.items[ITEM.crateMaterialsPerLoad] += loads;
  centre.items[ITEM.vehiclePerLoad] += loads;
  centre.items[ITEM.vehiclePerKm] += t.kmDriven;
}

export interface SiteTime {
  /** Weeks on site: dismantling, erection and tonal finishing. */
  readonly weeks: number;
  /** Σ over those phases of weeks × the crew in them. */
  readonly personWeeks: number;
  readonly lodging: boolean;
  readonly scaffold: boolean;
}

const ON_SITE = [["dismantle", "dismantling"], ["erection", "erection"], ["finishing", "tonalFinishing"]] as const;

/** Time on site from the programme, and whether the crew lodges there. */
export function siteTimeOf(p: Programme, site: Scheme["site"], rates: Rates): SiteTime {
  let weeks = 0;
  let personWeeks = 0;
  for (const [phase, dep] of ON_SITE) {
    const w = p.phases.find((x) => x.id === phase)?.weeks ?? 0;
    weeks += w;
    personWeeks += w * rates.programme.crew[dep];
  }
  return { weeks: r1(weeks), personWeeks: r1(personWeeks), lodging: site.lodging ?? site.distanceKm > rates.site.dailyTravelKm, scaffold: site.scaffold };
}

/** Scaffolding, travel and lodging: booked once the programme gives the weeks on site. */
export function bookSiteTime(s: SiteTime, centre: CostCentre): void {
  if (s.scaffold && s.weeks > 0) {
    centre.items[ITEM.scaffoldSetup] += 1;
    centre.items[ITEM.scaffoldPerWeek] += s.weeks;
  }
  centre.items[ITEM.travelPerPersonWeek] += s.personWeeks;
  if (s.lodging) centre.items[ITEM.lodgingPerPersonWeek] += s.personWeeks;
}
