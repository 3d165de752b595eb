/**
 * Safety cautions the estimate carries where it speaks of lead-bearing metal, mains electrics and
 * site work. They defer to local codes, regulations and licensed practice; they are not advice.
 */

export type CautionCode = "lead" | "mains" | "site";

export interface Caution {
  readonly code: CautionCode;
  readonly text: string;
}

export const CAUTION_TEXT: Readonly<Record<CautionCode, string>> = {
  lead:
    "Pipe metal in this scheme contains lead (new alloys or existing pipes). Casting, cutting, soldering, scraping and " +
    "cleaning lead-bearing metal need fume and dust control, washing facilities and any health monitoring that local " +
    "regulations require; follow the applicable occupational-health rules and dispose of waste as they prescribe.",
  mains:
    "The action, relays and blower are mains-powered. Supplies, protection and earthing must be designed, installed and " +
    "tested by a licensed electrician to the local wiring code; these cable lengths are for estimating only.",
  site:
    "Dismantling, erection and finishing involve work at height inside the case and on scaffolds, and heavy lifts. Plan " +
    "access, lifting and supervision under local health-and-safety regulations, with competent, insured contractors.",
};

export function cautionsFor(f: { readonly leadBearing: boolean; readonly electric: boolean; readonly siteWork: boolean }): Caution[] {
  const out: Caution[] = [];
  if (f.leadBearing) out.push({ code: "lead", text: CAUTION_TEXT.lead });
  if (f.electric) out.push({ code: "mains", text: CAUTION_TEXT.mains });
  if (f.siteWork) out.push({ code: "site", text: CAUTION_TEXT.site });
  return out;
}
