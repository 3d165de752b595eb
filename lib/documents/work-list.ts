/**
 * The workshop's work list: every rank to make, restore, revoice or relocate, with its pipe count,
 * material and budgeted hours, in the order the shop takes it — new pipes first (metal pipe shop,
 * wood shop, reeds), then restoration, revoicing and moving, and within each the largest pipes first,
 * since the big sheets and boards are planned and cut first. No prices.
 */
import type { FileChild } from "docx";
import { departmentLabels, type StopEstimate } from "@/lib/estimate";
import { dispositionText, materialLabels, pitchBesideName } from "@/components/spec/format";
import { weeksText } from "@/lib/quote/programme-chart";
import type { Quotation } from "@/lib/quote/quotation";
import type { DocumentFonts } from "./assets";
import { formatCount, heading, houseDocument, para, table, TIN, type Cell } from "./common";

const WOODS = new Set(["pine", "oak", "mahogany"]);

export type WorkItem = {
  readonly group: string;
  readonly division: string;
  readonly stop: StopEstimate;
  readonly pitch: string;
  readonly material: string;
  readonly family: string;
};

const GROUPS = [
  "New metal pipes (metal pipe shop)",
  "New wooden pipes (wood shop)",
  "New reeds (metal pipe shop resonators, reed making)",
  "Restoration",
  "Revoicing",
  "Moving, re-erecting and re-scaling",
] as const;

/** The ranks the shop works on, grouped and in the order it takes them. Pure, for the document and its test. */
export function workItems(q: Quotation): WorkItem[] {
  const items: (WorkItem & { order: number })[] = [];
  const byId = new Map(q.scheme.document.divisions.flatMap((d) => d.stops.map((s) => [s.id, s] as const)));
  // An extension's new pipes are made like its rank's: follow the sources to the stop that owns the rank.
  const rootOf = (id: string) => {
    let s = byId.get(id);
    for (let i = 0; s && (s.origin === "extension" || s.origin === "borrowed") && s.source && i < 16; i++) s = byId.get(s.source) ?? s;
    return s;
  };
  for (const d of q.estimate.divisions) {
    const doc = q.scheme.document.divisions.find((x) => x.id === d.id);
    for (const s of d.stops) {
      const own = doc?.stops.find((x) => x.id === s.id);
      const src = own ? rootOf(own.id) : undefined;
      if (!own || !src) continue;
      const reed = src.family === "reed" || src.construction === "reed";
      const wood = WOODS.has(src.material);
      // The shop's first task on the rank decides its group: making new pipes, then restoring, revoicing, moving or re-scaling.
      let group: number;
      if ((s.origin === "new" || s.origin === "extension") && s.pipes.new > 0) group = reed ? 2 : wood ? 1 : 0;
      else if (s.work.includes("restored")) group = 3;
      else if (s.work.includes("revoiced")) group = 4;
      else if (s.work.includes("relocated") || s.work.includes("rescaled")) group = 5;
      else continue;
      items.push({ group: GROUPS[group]!, division: d.name, stop: s, pitch: pitchBesideName(own), material: materialLabels[src.material], family: src.family, order: group });
    }
  }
  return items
    .sort((a, b) => a.order - b.order || (b.stop.longestSpeakingLengthMm ?? 0) - (a.stop.longestSpeakingLengthMm ?? 0))
    .map(({ order: _o, ...rest }) => rest);
}

export function workListDocument(q: Quotation, fonts: DocumentFonts) {
  const e = q.estimate;
  const items = workItems(q);
  const body: FileChild[] = [heading(`Work list — ${q.scheme.name}`)];
  body.push(para(`${q.client.projectName}. Quotation ${q.number}, scheme version ${q.scheme.version}. Hours are the budget from the firm's labour norms; record the actual hours against them.`, { style: "Small" }));
  let n = 0;
  for (const g of GROUPS) {
    const rows = items.filter((i) => i.group === g);
    if (!rows.length) continue;
    body.push(heading(g, 2));
    body.push(table(["No.", "Division", "Stop", "Work", "Pipes", "Material", "Metal kg / wood m³", "Hours"], rows.map((i): Cell[] => [
      { text: `${++n}.`, align: "right", color: TIN },
      i.division,
      `${i.stop.name} ${i.pitch}`,
      dispositionText(i.stop),
      { text: formatCount(i.group === GROUPS[3] ? i.stop.pipes.restored : i.stop.origin === "new" || i.stop.origin === "extension" ? i.stop.pipes.new : i.stop.pipes.reused), align: "right" },
      i.material,
      { text: i.stop.metalKg ? `${formatCount(i.stop.metalKg, 1)} kg` : i.stop.woodM3 ? `${formatCount(i.stop.woodM3, 3)} m³` : "", align: "right" },
      { text: formatCount(i.stop.pipeHours, 1), align: "right" },
    ]), [0.06, 0.11, 0.25, 0.1, 0.08, 0.14, 0.15, 0.11], { fontSize: 15 }));
  }
  body.push(heading("Chests, action and console", 2));
  body.push(table(["Division", "Chest work", "Chest needed (length × depth)", "Chest and action hours"], e.divisions.map((d): Cell[] => {
    const doc = q.scheme.document.divisions.find((x) => x.id === d.id)!;
    return [d.name, doc.chestWork === "new" ? "New" : doc.chestWork === "restored" ? "Restored" : "Retained", { text: d.chest.main.rows ? `${formatCount(d.chest.main.lengthMm)} × ${formatCount(d.chest.main.depthMm)} mm` : "", align: "right" }, { text: formatCount(d.hours.chestAction, 1), align: "right" }];
  }), [0.25, 0.2, 0.3, 0.25]));
  body.push(heading("Hours by department", 2));
  body.push(table(["Department", "Budgeted hours"], [
    ...(Object.keys(departmentLabels) as (keyof typeof departmentLabels)[]).filter((k) => e.totals.hours[k] > 0).map((k): Cell[] => [departmentLabels[k], { text: formatCount(e.totals.hours[k], 1), align: "right" }]),
    [{ text: "All departments", bold: true }, { text: formatCount(e.totals.hoursTotal, 1), align: "right", bold: true }],
  ], [0.6, 0.4], { total: true }));
  body.push(heading("Programme", 2));
  body.push(table(["Phase", "Weeks"], e.programme.phases.map((p): Cell[] => [p.label, { text: weeksText(p.weeks), align: "right" }]), [0.6, 0.4]));
  body.push(heading("Safety", 2));
  for (const c of e.cautions) body.push(para(c.text));
  return houseDocument(
    { title: `Work list ${q.number}`, subject: "Workshop work list", headerLeft: q.firm.name || "Work list", headerRight: `Work list ${q.number}`, footerNote: `${q.number} · workshop copy`, body },
    fonts,
    q.firm.name || "Stopwright",
  );
}
