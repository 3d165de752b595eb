/**
 * The internal cost sheet: hours by department and by rank, the rates used, materials, overheads,
 * contingency and margin, and how the quotation's price is built from them. For the firm only: the
 * routes refuse it to the workshop and to clients, and it says so on every page.
 */
import type { FileChild } from "docx";
import { departmentLabels } from "@/lib/estimate";
import { dispositionText, stopTitle } from "@/components/spec/format";
import { formatLongDate, weeksText } from "@/lib/quote/programme-chart";
import { hasWorkParts, type Quotation } from "@/lib/quote/quotation";
import type { DocumentFonts } from "./assets";
import { CLASH, formatCount, heading, houseDocument, moneyCell, para, run, SANS, table, TIN, type Cell } from "./common";

export function costSheetDocument(q: Quotation, fonts: DocumentFonts) {
  const e = q.estimate;
  const m = e.money;
  const cur = m.currency;
  const body: FileChild[] = [];
  body.push(para([run("INTERNAL — CONFIDENTIAL. ", { font: SANS, bold: true, color: CLASH }), run("The firm's working figures: never send this sheet to a client.", { font: SANS, color: CLASH })]));
  body.push(heading(`Cost sheet ${q.number}`));
  body.push(para(`${q.scheme.name} (scheme version ${q.scheme.version}) for ${q.client.clientName}. Priced with "${q.rateSet.name}" version ${q.rateSet.version}, effective ${formatLongDate(q.rateSet.effectiveDate)} — ${q.rateSet.rates.provenance}.`, { style: "Small" }));

  body.push(heading("Summary", 2));
  body.push(table(["", "Amount"], [
    ["Labour", moneyCell(m.labourAmount, cur)],
    ["Materials", moneyCell(m.materialsAmount, cur)],
    ...(m.items.length ? [["Bought-in items and site costs", moneyCell(m.itemsAmount, cur)] as Cell[]] : []),
    [{ text: "Direct cost", bold: true }, moneyCell(m.subtotalAmount, cur, { bold: true })],
    [`Overheads ${m.overhead.percent} % of direct cost`, moneyCell(m.overhead.amount, cur)],
    [`Contingency ${m.contingency.percent} %`, moneyCell(m.contingency.amount, cur)],
    [`Margin ${m.margin.percent} %`, moneyCell(m.margin.amount, cur)],
    [{ text: "Organ works, net (the tender's works line)", bold: true }, moneyCell(m.netAmount, cur, { bold: true })],
    ["Lump sums", moneyCell(q.totals.lumpSumsAmount, cur)],
    ["Provisional sums", moneyCell(q.totals.provisionalAmount, cur)],
    // No discount, no line: a "−0.00" reads as a mistake.
    ...(q.totals.discount.kind === "none" || !/[1-9]/.test(q.totals.discount.amount) ? [] : [["Discount", moneyCell(`-${q.totals.discount.amount}`, cur)] as Cell[]]),
    [{ text: "Net price quoted", bold: true }, moneyCell(q.totals.netAmount, cur, { bold: true })],
    [`Tax (${q.totals.tax.charged ? `${q.totals.tax.percent} %` : q.totals.tax.treatment})`, moneyCell(q.totals.tax.amount, cur)],
    [{ text: "Total price quoted", bold: true }, moneyCell(q.totals.totalAmount, cur, { bold: true })],
  ], [0.7, 0.3], { total: true }));

  body.push(heading("Labour by department", 2));
  body.push(table(["Department", "Hours", "Rate per hour", "Amount"], [
    ...m.labour.map((l): Cell[] => [l.label, { text: formatCount(l.hours, 1), align: "right" }, moneyCell(l.rateAmount, cur), moneyCell(l.amount, cur)]),
    [{ text: "Labour", bold: true }, { text: formatCount(e.totals.hoursTotal, 1), align: "right", bold: true }, "", moneyCell(m.labourAmount, cur, { bold: true })],
  ], [0.4, 0.16, 0.2, 0.24], { total: true }));

  body.push(heading("Hours by division", 2));
  const deps = Object.keys(departmentLabels) as (keyof typeof departmentLabels)[];
  const used = deps.filter((d) => e.totals.hours[d] > 0);
  body.push(table(["Division", "Hours", "Largest departments", "Direct cost"], [
    ...e.divisions.map((d): Cell[] => [
      d.name,
      { text: formatCount(d.hoursTotal, 1), align: "right" },
      { text: used.filter((k) => d.hours[k] > 0).sort((a, b) => d.hours[b] - d.hours[a]).slice(0, 3).map((k) => `${departmentLabels[k]} ${formatCount(d.hours[k], 1)}`).join("; "), color: TIN },
      moneyCell(d.directCostAmount, cur),
    ]),
    [hasWorkParts(e) ? "The organ as a whole (wind, case, console, site, design)" : "Console, wiring and transport", { text: formatCount(e.schemeWide.hoursTotal, 1), align: "right" }, { text: used.filter((k) => e.schemeWide.hours[k] > 0).map((k) => `${departmentLabels[k]} ${formatCount(e.schemeWide.hours[k], 1)}`).join("; "), color: TIN }, moneyCell(e.schemeWide.directCostAmount, cur)],
    [{ text: "All divisions", bold: true }, { text: formatCount(e.totals.hoursTotal, 1), align: "right", bold: true }, "", moneyCell(m.subtotalAmount, cur, { bold: true })],
  ], [0.22, 0.12, 0.44, 0.22], { total: true, fontSize: 16 }));

  body.push(heading("Hours by rank (pipe work)", 2));
  const rankRows: Cell[][] = [];
  for (const d of e.divisions) {
    for (const s of d.stops) {
      if (!s.pipeHours && !s.pipes.total) continue;
      const own = q.scheme.document.divisions.find((x) => x.id === d.id)?.stops.find((x) => x.id === s.id);
      rankRows.push([d.name, stopTitle(own ?? { name: s.name, footage: s.footage, ranks: s.ranks, family: "" }), dispositionText(s), { text: formatCount(s.pipes.new), align: "right" }, { text: formatCount(s.pipes.reused + s.pipes.restored), align: "right" }, { text: s.metalKg ? formatCount(s.metalKg, 1) : "", align: "right" }, { text: formatCount(s.pipeHours, 1), align: "right" }]);
    }
  }
  body.push(table(["Division", "Stop", "Work", "New pipes", "Existing", "Metal kg", "Hours"], rankRows, [0.13, 0.3, 0.13, 0.11, 0.11, 0.11, 0.11], { fontSize: 15 }));

  body.push(heading("Materials", 2));
  body.push(table(["Material", "Quantity", "Price", "Amount"], [
    ...m.materials.map((x): Cell[] => [x.label, { text: `${formatCount(x.quantity, x.unit === "m3" ? 3 : x.unit === "m" ? 0 : 1)} ${x.unit === "m3" ? "m³" : x.unit}`, align: "right" }, moneyCell(x.priceAmount, cur), moneyCell(x.amount, cur)]),
    [{ text: "Materials", bold: true }, "", "", moneyCell(m.materialsAmount, cur, { bold: true })],
  ], [0.4, 0.2, 0.18, 0.22], { total: true }));

  if (m.items.length) {
    body.push(heading("Bought-in items and site costs", 2));
    body.push(table(["Item", "Quantity", "Price", "Amount"], [
      ...m.items.map((x): Cell[] => [x.label, { text: `${formatCount(x.quantity, Number.isInteger(x.quantity) ? 0 : 1)} ${x.unit.replace(/^per /, "")}`, align: "right" }, moneyCell(x.priceAmount, cur), moneyCell(x.amount, cur)]),
      [{ text: "Bought-in items and site costs", bold: true }, "", "", moneyCell(m.itemsAmount, cur, { bold: true })],
    ], [0.4, 0.2, 0.18, 0.22], { total: true, fontSize: 16 }));
  }

  if (hasWorkParts(e)) {
    body.push(heading("Direct cost by part of the work", 2));
    body.push(table(["Part of the work", "Hours", "Direct cost"], [
      ...m.byPackage.map((p): Cell[] => [p.label, { text: formatCount(e.packages.find((x) => x.package === p.package)?.hoursTotal ?? 0, 1), align: "right" }, moneyCell(p.directCostAmount, cur)]),
      [{ text: "Direct cost", bold: true }, { text: formatCount(e.totals.hoursTotal, 1), align: "right", bold: true }, moneyCell(m.subtotalAmount, cur, { bold: true })],
    ], [0.5, 0.2, 0.3], { total: true }));
  }

  body.push(heading("Programme", 2));
  body.push(table(["Phase", "Weeks", "Set by"], e.programme.phases.map((p): Cell[] => [p.label, { text: weeksText(p.weeks), align: "right" }, p.setBy ? departmentLabels[p.setBy] : ""]), [0.4, 0.2, 0.4]));
  return houseDocument(
    { title: `Cost sheet ${q.number}`, subject: "Internal cost sheet — not for the client", headerLeft: `${q.firm.name || "Cost sheet"} — INTERNAL`, headerRight: `Cost sheet ${q.number}`, footerNote: "INTERNAL — not for the client", body },
    fonts,
    q.firm.name || "Stopwright",
  );
}
