/**
 * The tender the firm sends to the client's committee, written from a quotation object alone (frozen
 * when issued): cover, introduction, the specification in the trade's stop-list layout, the scope of
 * works derived from the treatments, technical notes, the programme (table and picture), the price,
 * options, provisional sums, payment stages, exclusions, validity, safety cautions and an acceptance
 * form. No internal rates, hours or margins appear in it.
 */
import { AlignmentType, ImageRun, PageBreak, Paragraph, type FileChild } from "docx";
import {
  actionLabels, chestTypeLabels, compassText, couplerName, dispositionMark, dispositionText, pitchBesideName, stopTitle, windText, workLabels, type DispositionMark,
} from "@/components/spec/format";
import { programmeWords, formatLongDate, weeksText } from "@/lib/quote/programme-chart";
import { taxTreatmentLabels } from "@/lib/quote/commercial";
import { hasWorkParts, type Quotation } from "@/lib/quote/quotation";
import type { DocumentFonts } from "./assets";
import {
  brassRule, bullet, coverTitle, signatureLine, currencyPrefix, formatCount, formatMoney, heading, houseDocument, moneyCell, para, run, SANS, spacer, table, TIN, SOFT, BRASS, CLASH,
  type Cell,
} from "./common";

export interface TenderPictures {
  /** The programme timeline drawn to PNG (see lib/quote/programme-chart.ts). */
  readonly programme: { readonly png: Buffer; readonly width: number; readonly height: number } | null;
}

/** "slider chest", "direct electric chest". */
function chestWords(chest: keyof typeof chestTypeLabels): string {
  const label = chestTypeLabels[chest].toLowerCase();
  return /chest/.test(label) ? label : `${label} chest`;
}

const CAUTION_GENERAL =
  "Organ building and installation involve work at height inside the case and on scaffolds, heavy lifts, lead-bearing pipe metal and " +
  "mains-powered equipment. The firm plans this work under the health-and-safety regulations that apply at the building, and the client " +
  "is asked to tell the firm of any known hazards there (asbestos, fragile floors, restricted access). Electrical supplies are to be installed " +
  "and tested by a licensed electrician to the local wiring code. Nothing in this tender replaces local codes, regulations, risk assessments " +
  "or licensed practice.";

function fit(d: Quotation["estimate"]["divisions"][number]): string {
  const f = d.chest.fit;
  if (!d.chest.space || !f) return "The space in the case has not been measured yet.";
  if (f.fits) return `Fits the space available (${formatCount(d.chest.space.lengthMm)} × ${formatCount(d.chest.space.depthMm)} mm) with ${formatCount(f.lengthMarginMm)} mm of length and ${formatCount(f.depthMarginMm)} mm of depth to spare.`;
  const short: string[] = [];
  if (f.lengthMarginMm < 0) short.push(`${formatCount(-f.lengthMarginMm)} mm more length`);
  if (f.depthMarginMm < 0) short.push(`${formatCount(-f.depthMarginMm)} mm more depth`);
  return `Does not fit the space available (${formatCount(d.chest.space.lengthMm)} × ${formatCount(d.chest.space.depthMm)} mm): it needs ${short.join(" and ")}; the layout will be resolved before the contract.`;
}

/** Stops numbered through the organ, as stop lists number them. */
function numbering(q: Quotation): Map<string, number> {
  const m = new Map<string, number>();
  let n = 0;
  for (const d of q.scheme.document.divisions) for (const s of d.stops) m.set(s.id, ++n);
  return m;
}

function cover(q: Quotation): FileChild[] {
  const out: FileChild[] = [];
  const f = q.firm;
  if (f.logo) {
    const h = 64;
    const w = Math.round((f.logo.width / f.logo.height) * h);
    out.push(new Paragraph({ children: [new ImageRun({ type: "png", data: Buffer.from(f.logo.png, "base64"), transformation: { width: Math.min(w, 320), height: Math.min(w, 320) === w ? h : Math.round((320 / w) * h) }, altText: { id: "1", name: "logo", title: `${f.name} logo`, description: `${f.name} logo` } })], spacing: { after: 120 } }));
  }
  out.push(para(f.name, { run: { font: SANS, size: 22, bold: true }, after: 40 }));
  for (const line of [...f.address.split("\n"), [f.phone, f.email].filter(Boolean).join(" · "), f.website].filter((l) => l.trim())) {
    out.push(para(line, { run: { font: SANS, size: 17, color: SOFT }, after: 0 }));
  }
  out.push(spacer(1600));
  out.push(para("Tender", { run: { font: SANS, size: 20, bold: true, color: BRASS, allCaps: true }, after: 80 }));
  out.push(coverTitle(q.scheme.name));
  out.push(para(`for ${q.client.clientName}`, { style: "Lead", after: 40 }));
  out.push(brassRule());
  const details: [string, string][] = [
    ["Project", q.client.projectName],
    ["Building", [q.client.venue, q.client.location].filter(Boolean).join(", ")],
    ["The organ", q.client.instrument],
    ["Quotation", q.number],
    ["Issued", q.issuedOn ? formatLongDate(q.issuedOn) : "Draft — not yet issued"],
    ["Valid until", q.validUntil ? formatLongDate(q.validUntil) : `${q.commercial.validityDays} days from issue`],
    ["Prepared by", [q.preparedBy.name, q.preparedBy.email].filter(Boolean).join(", ")],
    ["Total price", `${currencyPrefix(q.totals.currency)}${formatMoney(q.totals.totalAmount)}${q.totals.tax.charged ? ` including tax at ${q.totals.tax.percent} %` : ""}`],
  ];
  out.push(table(null, details.filter(([, v]) => v).map(([k, v]) => [{ text: k, color: TIN }, { text: v, bold: k === "Total price" || k === "Quotation" }]), [0.28, 0.72], { fontSize: 19 }));
  if (q.status === "draft") out.push(para("DRAFT — for discussion within the firm; figures may change before issue.", { before: 300, run: { font: SANS, bold: true, color: CLASH } }));
  if (f.registration) out.push(para(f.registration, { before: 1200, run: { font: SANS, size: 14, color: TIN } }));
  return out;
}

function introduction(q: Quotation): FileChild[] {
  const e = q.estimate;
  const text = q.commercial.introduction.trim()
    ? q.commercial.introduction.trim().split(/\n{2,}/)
    : [
        `Thank you for inviting ${q.firm.name || "us"} to tender for the work on the organ at ${[q.client.venue, q.client.location].filter(Boolean).join(", ") || "your building"}. ` +
          `This document sets out the instrument we propose (${q.scheme.name}), the work it involves, how long it will take and what it will cost.`,
        `The finished organ will have ${e.totals.stops} speaking stops and controls on ${e.divisions.length} divisions, with ${formatCount(e.totals.pipes.total)} pipes, ` +
          `of which ${formatCount(e.totals.pipes.new)} are new and ${formatCount(e.totals.pipes.reused + e.totals.pipes.restored)} are existing pipes kept, restored or revoiced.`,
      ];
  return [heading("Introduction"), ...text.map((t) => para(t.replace(/\n/g, " ")))];
}

function specification(q: Quotation, no: Map<string, number>): FileChild[] {
  const out: FileChild[] = [heading("1. Specification")];
  out.push(para(`Pitch a′ = ${q.scheme.tuning.pitchHz} Hz at ${q.scheme.tuning.temperatureC} °C, equal temperament.`, { style: "Small" }));
  const doc = q.scheme.document;
  const est = new Map(q.estimate.divisions.map((d) => [d.id, d]));
  for (const d of doc.divisions) {
    const e = est.get(d.id);
    out.push(heading(d.name.toUpperCase(), 2));
    out.push(para(`Compass ${compassText(d.compass)}, ${e?.notes ?? ""} notes · ${actionLabels[d.action]} action · ${chestWords(d.chest)} · wind ${windText(d.windPressure)}${d.enclosed ? " · enclosed in a swell box" : ""}`, { run: { italics: true, color: SOFT, size: 19 } }));
    const rows: Cell[][] = d.stops.map((s) => {
      const note: string[] = [];
      if (s.compass) note.push(`from ${compassText(s.compass).split("–")[0]}`);
      if (s.source && no.has(s.source)) note.push(s.origin === "extension" ? `extension of no. ${no.get(s.source)}` : `from no. ${no.get(s.source)}`);
      const sp = e?.stops.find((x) => x.id === s.id);
      return [
        { text: `${no.get(s.id)}.`, align: "right", color: TIN },
        { text: `${s.name}${note.length ? ` (${note.join("; ")})` : ""}`, strike: s.origin === "removed" },
        { text: pitchBesideName(s), align: "right" },
        { text: dispositionText(s), color: SOFT },
        { text: sp ? formatCount(sp.pipes.total + sp.pipes.prepared) : "", align: "right" },
      ];
    });
    if (e) rows.push([{ text: "" }, { text: `${d.name}: ${e.stops.filter((s) => s.origin !== "removed").length} stops`, bold: true }, { text: "" }, { text: "pipes", color: TIN }, { text: formatCount(e.pipes.total), align: "right", bold: true }]);
    out.push(table(["No.", "Stop", "Pitch", "Work", "Pipes"], rows, [0.07, 0.5, 0.11, 0.19, 0.13], { total: !!e, fontSize: 18 }));
  }
  const acc = doc.accessories;
  let next = no.size;
  if (acc.couplers.length || acc.tremulants.length) {
    out.push(heading("COUPLERS AND ACCESSORIES", 2));
    const rows: Cell[][] = [
      ...acc.couplers.map((c): Cell[] => [{ text: `${++next}.`, align: "right", color: TIN }, couplerName(c, doc.divisions)]),
      ...acc.tremulants.map((t): Cell[] => [{ text: `${++next}.`, align: "right", color: TIN }, `Tremulant (${doc.divisions.find((d) => d.id === t.division)?.name ?? "?"})`]),
    ];
    out.push(table(null, rows, [0.07, 0.93], { fontSize: 18 }));
  }
  const c = acc.combination;
  out.push(heading("CONSOLE", 2));
  out.push(para([
    `Console ${workLabels[acc.consoleWork].toLowerCase()}.`,
    c.generalPistons ? ` ${c.generalPistons} general pistons.` : "",
    c.divisionalPistons ? ` ${c.divisionalPistons} divisional pistons to each division.` : "",
    c.memoryLevels ? ` A combination system with ${c.memoryLevels} memory levels.` : "",
  ].join("")));
  const t = q.estimate.totals;
  out.push(table(null, [
    ["Stops and controls", { text: formatCount(t.stops), align: "right" }],
    ["Ranks", { text: formatCount(t.ranks), align: "right" }],
    ["Pipes in the finished organ", { text: formatCount(t.pipes.total), align: "right", bold: true }],
    ["of which new", { text: formatCount(t.pipes.new), align: "right" }],
    ["existing pipes kept or revoiced", { text: formatCount(t.pipes.reused), align: "right" }],
    ["existing pipes restored", { text: formatCount(t.pipes.restored), align: "right" }],
    ...(t.pipes.prepared ? [["prepared for (pipes to be added later)", { text: formatCount(t.pipes.prepared), align: "right" }] as Cell[]] : []),
  ], [0.7, 0.3], { fontSize: 18 }));
  return out;
}

const SCOPE_ORDER: readonly (readonly [DispositionMark, string])[] = [
  ["new", "New stops, made in our workshop"],
  ["restored", "Existing stops to be restored"],
  ["revoiced", "Existing stops to be revoiced"],
  ["relocated", "Existing stops to be moved"],
  ["rescaled", "Existing stops to be re-scaled"],
  ["retained", "Existing stops kept as they are, cleaned and regulated"],
  ["extension", "Extensions (pipes added to an existing rank)"],
  ["borrowed", "Stops borrowed from another division (no pipes)"],
  ["prepared", "Prepared for (space, wind and wiring now, pipes later)"],
  ["removed", "Stops to be removed"],
];

/** The organ's own parts of the work, as the estimate priced them: only those it has a cost for. */
function organParts(q: Quotation): string[] {
  const e = q.estimate;
  if (!hasWorkParts(e)) return [];
  const priced = new Set(e.money.byPackage.filter((p) => p.directCostAmount !== "0.00").map((p) => p.package));
  const doc = q.scheme.document;
  const out: string[] = [];
  if (priced.has("wind")) {
    const reservoirs = e.wind.reservoirs.length;
    out.push(
      `Wind system ${workLabels[doc.wind.work].toLowerCase()}: ${doc.wind.blower === "new" ? `a new blower of about ${formatCount(e.wind.blowerM3PerMin, 1)} m³/min at ${formatCount(e.wind.blowerPressureMm)} mm water column (${formatCount(e.wind.blowerKw, 1)} kW)` : "the existing blower kept"}` +
        `, ${reservoirs} reservoir${reservoirs === 1 ? "" : "s"} (one for each wind pressure), trunking${doc.accessories.tremulants.length ? " and tremulants" : ""}.`,
    );
  }
  if (priced.has("swellBoxes")) out.push("Swell boxes with their shutters and swell mechanism.");
  if (priced.has("case") && doc.case.work !== "none") {
    const c = e.case;
    const front = [c.frontPipes ? `${formatCount(c.frontPipes)} speaking front pipes polished` : "", c.dummyPipes ? `${formatCount(c.dummyPipes)} new display pipes` : "", doc.case.decorationM2 ? "carved decoration" : "", doc.case.gildingM2 ? "gilding" : ""].filter(Boolean);
    out.push(`Case ${workLabels[doc.case.work].toLowerCase()}, about ${formatCount(c.widthMm)} mm wide, ${formatCount(c.depthMm)} mm deep and ${formatCount(c.heightMm)} mm high${front.length ? `; ${front.join(", ")}` : ""}.`);
  }
  if (priced.has("site")) {
    const t = e.site.transport;
    const time = e.site.time;
    const parts = [`${t.loadsOut + t.loadsIn} load${t.loadsOut + t.loadsIn === 1 ? "" : "s"} by road over ${formatCount(t.distanceKm)} km`, time.scaffold ? "scaffolding and access for the work on site" : "", `about ${weeksText(time.weeks)} on site${time.lodging ? ", the crew lodging near the building" : ""}`].filter(Boolean);
    out.push(`Site: ${parts.join("; ")}.`);
  }
  if (priced.has("design")) out.push("Design, drawings and management of the project.");
  return out;
}

function scopeOfWorks(q: Quotation): FileChild[] {
  const out: FileChild[] = [heading("2. Scope of works")];
  out.push(para("What happens to every stop, as the specification above gives it. Pipe counts are those of the finished organ."));
  const est = new Map(q.estimate.divisions.flatMap((d) => d.stops.map((s) => [`${d.id}/${s.id}`, s] as const)));
  for (const [mark, title] of SCOPE_ORDER) {
    const items = q.scheme.document.divisions.flatMap((d) => d.stops.filter((s) => dispositionMark(s) === mark).map((s) => ({ d, s, e: est.get(`${d.id}/${s.id}`) })));
    if (!items.length) continue;
    out.push(heading(title, 3));
    for (const { d, s, e } of items) {
      const pipes = e ? (mark === "new" || mark === "extension" ? e.pipes.new || e.pipes.total : mark === "removed" ? e.pipes.removed : mark === "prepared" ? e.pipes.prepared : e.pipes.total) : 0;
      // A stop with more than one kind of work says all of them ("Existing: restored, revoiced").
      const more = s.origin === "existing" && s.work.length > 1 ? ` (${dispositionText(s).replace(/^Existing: /, "")})` : "";
      out.push(bullet([run(`${d.name}: `, { color: SOFT }), run(`${stopTitle(s)}${more}`), run(pipes ? ` — ${formatCount(pipes)} pipes` : "", { color: SOFT })]));
    }
  }
  out.push(heading("Windchests, action and console", 3));
  for (const d of q.scheme.document.divisions) {
    out.push(bullet(`${d.name}: windchests and action ${workLabels[d.chestWork].toLowerCase()}; ${actionLabels[d.action].toLowerCase()} action${d.enclosed ? "; swell box and shutters" : ""}.`));
  }
  out.push(bullet(`Console ${workLabels[q.scheme.document.accessories.consoleWork].toLowerCase()}.`));
  out.push(bullet("Dismantling and packing, transport to and from our workshop, erection in the building, and tonal finishing on site."));
  const parts = organParts(q);
  if (parts.length) {
    out.push(heading("Wind, case, site and design", 3));
    for (const p of parts) out.push(bullet(p));
  }
  return out;
}

function technicalNotes(q: Quotation): FileChild[] {
  const out: FileChild[] = [heading("3. Technical notes")];
  for (const d of q.estimate.divisions) {
    const doc = q.scheme.document.divisions.find((x) => x.id === d.id)!;
    out.push(heading(d.name, 3));
    out.push(para(`${actionLabels[doc.action]} action on a ${chestWords(doc.chest)} (${doc.chestLayout === "chromatic" ? "chromatic" : "C and C♯ sides"}); wind pressure ${formatCount(d.windPressureMm)} mm water column (${formatCount(d.windPressurePa)} Pa).`, { after: 60 }));
    if (d.chest.main.rows) out.push(para(`Chest space needed: ${formatCount(d.chest.main.lengthMm)} mm long and ${formatCount(d.chest.main.depthMm)} mm deep${d.chest.offset ? `, with an offset chest for the basses of ${formatCount(d.chest.offset.lengthMm)} × ${formatCount(d.chest.offset.depthMm)} mm` : ""}. ${fit(d)}`, { after: 60 }));
  }
  const w = q.estimate.totals.wiring;
  if (w.conductors) out.push(para(`Electric and electro-pneumatic action needs about ${formatCount(w.conductors)} conductors, some ${formatCount(w.conductorLengthKm, 1)} km in all.`));
  return out;
}

function programme(q: Quotation, pictures: TenderPictures): FileChild[] {
  const p = q.estimate.programme;
  const out: FileChild[] = [heading("4. Programme")];
  let start = 0;
  const rows: Cell[][] = p.phases.map((ph) => {
    const from = start;
    start += ph.weeks;
    return [ph.label, { text: weeksText(ph.weeks), align: "right" }, { text: `${formatCount(from, 1)}–${formatCount(start, 1)}`, align: "right" }];
  });
  rows.push([{ text: "From start to completion", bold: true }, { text: weeksText(p.totalWeeks), align: "right", bold: true }, { text: p.completionDate ? `completion ${formatLongDate(p.completionDate)}` : "", align: "right" }]);
  out.push(table(["Phase", "Duration", "Weeks from the start"], rows, [0.5, 0.2, 0.3], { total: true }));
  if (pictures.programme) {
    const width = 600;
    const height = Math.round((pictures.programme.height / pictures.programme.width) * width);
    out.push(new Paragraph({ children: [new ImageRun({ type: "png", data: pictures.programme.png, transformation: { width, height }, altText: { id: "2", name: "programme", title: "Programme timeline", description: programmeWords(p).detail } })], spacing: { before: 160, after: 120 }, alignment: AlignmentType.CENTER }));
  }
  const words = programmeWords(p);
  out.push(para(words.headline));
  out.push(para(words.late ? [run("▲ ", { color: CLASH }), run(words.detail, { bold: true })] : words.detail));
  out.push(para("The programme assumes access to the building as agreed, and is confirmed when the contract is signed.", { style: "Small" }));
  return out;
}

function price(q: Quotation): FileChild[] {
  const t = q.totals;
  const cur = t.currency;
  const out: FileChild[] = [heading("5. Price")];
  const rows: Cell[][] = [];
  rows.push([{ text: "The organ works as specified", bold: true, span: 2 }, { text: "" }]);
  for (const w of t.works) rows.push([{ text: `   ${w.label}` }, "", moneyCell(w.amount, cur)]);
  rows.push([{ text: "Organ works", italic: true }, "", moneyCell(t.worksAmount, cur, { bold: true })]);
  if (t.lumpSums.length) {
    rows.push([{ text: "Further work at fixed prices", bold: true, span: 2 }, { text: "" }]);
    for (const l of t.lumpSums) rows.push([`   ${l.description} (${l.categoryLabel.toLowerCase()})`, { text: `${l.quantity} × ${formatMoney(l.unitPrice)} per ${l.unit}`, align: "right", color: SOFT }, moneyCell(l.amount, cur)]);
  }
  if (t.provisionalSums.length) rows.push([{ text: "Provisional sums (section 7)" }, "", moneyCell(t.provisionalAmount, cur)]);
  rows.push([{ text: "Subtotal", bold: true }, "", moneyCell(t.subtotalAmount, cur, { bold: true })]);
  if (t.discount.kind !== "none") rows.push([t.discount.kind === "percent" ? `Discount of ${t.discount.value} % on the organ works and fixed-price work` : "Discount", "", moneyCell(`-${t.discount.amount}`, cur)]);
  rows.push([{ text: "Net price", bold: true }, "", moneyCell(t.netAmount, cur, { bold: true })]);
  rows.push([t.tax.charged ? `Tax at ${t.tax.percent} %` : `Tax: ${taxTreatmentLabels[t.tax.treatment].toLowerCase()}`, "", moneyCell(t.tax.amount, cur)]);
  rows.push([{ text: "Total price", bold: true }, "", moneyCell(t.totalAmount, cur, { bold: true })]);
  out.push(table(["", "", `Amount (${cur})`], rows, [0.56, 0.2, 0.24], { total: true, fontSize: 18 }));
  out.push(para(`All amounts in ${cur}. Every total is the sum of the lines above it, to the cent.`, { style: "Small", before: 80 }));
  return out;
}

function options(q: Quotation): FileChild[] {
  const t = q.totals;
  const out: FileChild[] = [heading("6. Options")];
  if (!t.options.length) return [...out, para("No options are offered with this tender.")];
  out.push(para("These may be added to the work at the prices below. They are not included in the total price above.", { keepNext: true }));
  out.push(table(["Option", "Price", t.tax.charged ? `With tax (${t.tax.percent} %)` : "Tax", ], t.options.map((o) => [
    { text: [run(o.title, { font: SANS, size: 18, bold: true }), ...(o.description ? [run(` — ${o.description}`, { font: SANS, size: 18, color: SOFT })] : [])] },
    moneyCell(o.price, t.currency),
    t.tax.charged ? moneyCell(o.totalAmount, t.currency) : { text: "none", align: "right" },
  ]), [0.56, 0.22, 0.22], { fontSize: 18 }));
  return out;
}

function provisional(q: Quotation): FileChild[] {
  const t = q.totals;
  const out: FileChild[] = [heading("7. Provisional sums")];
  if (!t.provisionalSums.length) return [...out, para("This tender carries no provisional sums.")];
  out.push(para("Provisional sums are allowances for work whose extent cannot be known until the organ is dismantled. They are included in the price, charged at the actual cost, and not discounted.", { keepNext: true }));
  out.push(table(["Allowance for", "Amount"], [...t.provisionalSums.map((p): Cell[] => [p.description, moneyCell(p.amount, t.currency)]), [{ text: "Provisional sums", bold: true }, moneyCell(t.provisionalAmount, t.currency, { bold: true })]], [0.76, 0.24], { total: true }));
  return out;
}

function stages(q: Quotation): FileChild[] {
  const t = q.totals;
  return [
    heading("8. Payment stages"),
    para("The total price is paid in stages. Each stage is its percentage of the total, rounded down to the cent; the last stage takes the remainder, so the stages add up to the total exactly.", { keepNext: true }),
    table(["Stage", "Share", "Amount"], [
      ...t.stages.map((s): Cell[] => [s.label, { text: `${s.percent} %`, align: "right" }, moneyCell(s.amount, t.currency)]),
      [{ text: "Total price", bold: true }, { text: "100 %", align: "right", bold: true }, moneyCell(t.totalAmount, t.currency, { bold: true })],
    ], [0.56, 0.16, 0.28], { total: true }),
  ];
}

function exclusionsAndValidity(q: Quotation): FileChild[] {
  const out: FileChild[] = [heading("9. Exclusions")];
  if (q.commercial.exclusions.length) {
    out.push(para("The price does not include:"));
    for (const x of q.commercial.exclusions) out.push(bullet(x));
  } else out.push(para("No exclusions."));
  out.push(heading("10. Validity and terms"));
  out.push(para(
    `This tender is valid for ${q.commercial.validityDays} days${q.validUntil ? `, until ${formatLongDate(q.validUntil)}` : " from its date of issue"}. ` +
      `Prices are in ${q.totals.currency}${q.totals.tax.charged ? `; tax is charged at ${q.totals.tax.percent} %` : `; tax: ${taxTreatmentLabels[q.totals.tax.treatment].toLowerCase()}`}. ` +
      "After that date we will gladly confirm or update it.",
  ));
  return out;
}

function safety(q: Quotation): FileChild[] {
  const out: FileChild[] = [heading("11. Safety")];
  out.push(para(CAUTION_GENERAL));
  for (const c of q.estimate.cautions) out.push(bullet(c.text));
  return out;
}

function acceptance(q: Quotation): FileChild[] {
  const t = q.totals;
  const out: FileChild[] = [new Paragraph({ children: [new PageBreak()] }), heading("12. Acceptance")];
  out.push(para(`We accept tender ${q.number} from ${q.firm.name || "the organ builder"} for ${q.scheme.name}, at the total price of ${currencyPrefix(t.currency)}${formatMoney(t.totalAmount)}${t.tax.charged ? " including tax" : ""}, paid in the stages set out in section 8${t.options.length ? ", with the options ticked below" : ""}.`));
  if (t.options.length) {
    for (const o of t.options) out.push(para([run("☐  ", { font: SANS }), run(`${o.title} — ${currencyPrefix(t.currency)}${formatMoney(o.price)}${t.tax.charged ? " plus tax" : ""}`)], { indent: 240, after: 60 }));
  }
  out.push(spacer(200));
  for (const who of [`For ${q.client.clientName}`, `For ${q.firm.name || "the organ builder"}`]) {
    out.push(para(who, { run: { bold: true }, before: 240 }));
    for (const field of ["Name", "Position", "Signature", "Date"]) out.push(signatureLine(field));
  }
  return out;
}

/** The tender as a docx Document; pack it with Packer.toBuffer. */
export function tenderDocument(q: Quotation, fonts: DocumentFonts, pictures: TenderPictures) {
  const no = numbering(q);
  return houseDocument(
    {
      title: `Tender ${q.number} — ${q.scheme.name}`,
      subject: `Tender for ${q.client.clientName}`,
      headerLeft: q.firm.name || "Tender",
      headerRight: `Tender ${q.number}`,
      footerNote: `${q.number}${q.status === "draft" ? " · DRAFT" : q.issuedOn ? ` · issued ${formatLongDate(q.issuedOn)}` : ""}`,
      cover: cover(q),
      body: [
        ...introduction(q), ...specification(q, no), ...scopeOfWorks(q), ...technicalNotes(q), ...programme(q, pictures), ...price(q),
        ...options(q), ...provisional(q), ...stages(q), ...exclusionsAndValidity(q), ...safety(q), ...acceptance(q),
      ],
    },
    fonts,
    q.firm.name || "Stopwright",
  );
}
