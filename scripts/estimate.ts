/**
 * Command line: `npm run estimate -- FILE.json [--summary]`.
 * Prints the whole estimate as JSON, or with --summary a readable table of totals per division,
 * the money lines, the programme and the cautions. A bad file prints its validation messages on
 * stderr and exits 1.
 */
import { DEFAULT_RATES } from "../lib/estimate/demo-rates";
import { readFileSync } from "node:fs";
import { estimateScheme, parseSchemeFile, type Estimate } from "@/lib/estimate";
import { groupThousands } from "@/lib/spec/digits";

const USAGE = "usage: npm run estimate -- FILE.json [--summary]";

function pad(s: string | number, n: number, left = false): string {
  const t = String(s);
  return left ? t.padEnd(n) : t.padStart(n);
}

function money(a: string): string {
  const [whole, cents] = a.split(".");
  const neg = whole.startsWith("-");
  const digits = groupThousands(neg ? whole.slice(1) : whole, ",");
  return `${neg ? "-" : ""}${digits}.${cents}`;
}

function summary(e: Estimate): string {
  const cur = e.money.currency;
  const lines: string[] = [];
  lines.push(e.schemeName);
  lines.push(`A = ${e.tuning.pitchHz} Hz, ${e.tuning.temperatureC} °C (c = ${e.tuning.speedOfSoundMPerS} m/s), mutations ${e.tuning.mutations}; rates: ${e.ratesProvenance}`);
  lines.push("");
  const head = [
    pad("Division", 30, true), pad("Stops", 5), pad("New", 6), pad("Reused", 7), pad("Restor.", 7), pad("Pipes", 6),
    pad("Chest L×D mm", 15), pad("Fits", 5), pad("Hours", 9), pad("Metal kg", 9), pad("Wood m³", 8), pad("Wire m", 7), pad(`Direct ${cur}`, 14),
  ].join(" ");
  lines.push(head);
  lines.push("-".repeat(head.length));
  for (const d of e.divisions) {
    const metal = Object.values(d.metalKg).reduce((s, x) => s + Math.round(x * 10), 0) / 10;
    const wood = Object.values(d.woodM3).reduce((s, x) => s + Math.round(x * 1000), 0) / 1000;
    const fit = d.chest.fit === null ? "—" : d.chest.fit.fits ? "yes" : "NO";
    lines.push([
      pad(d.name, 30, true), pad(d.stops.filter((s) => s.kind !== "removed").length, 5), pad(d.pipes.new, 6), pad(d.pipes.reused, 7),
      pad(d.pipes.restored, 7), pad(d.pipes.total, 6), pad(`${Math.round(d.chest.main.lengthMm)}×${Math.round(d.chest.main.depthMm)}`, 15),
      pad(fit, 5), pad(d.hoursTotal.toFixed(1), 9), pad(metal.toFixed(1), 9), pad(wood.toFixed(3), 8), pad(d.wiring.conductorLengthM, 7),
      pad(money(d.directCostAmount), 14),
    ].join(" "));
  }
  const w = e.schemeWide;
  lines.push([
    pad("Organ as a whole", 30, true), pad("", 5), pad("", 6), pad("", 7), pad("", 7), pad("", 6), pad("", 15), pad("", 5),
    pad(w.hoursTotal.toFixed(1), 9), pad("", 9), pad("", 8), pad(w.wiring.conductorLengthM, 7), pad(money(w.directCostAmount), 14),
  ].join(" "));
  lines.push("-".repeat(head.length));
  const t = e.totals;
  lines.push([
    pad("Total", 30, true), pad(t.stops, 5), pad(t.pipes.new, 6), pad(t.pipes.reused, 7), pad(t.pipes.restored, 7), pad(t.pipes.total, 6),
    pad("", 15), pad("", 5), pad(t.hoursTotal.toFixed(1), 9), pad(t.metalTotalKg.toFixed(1), 9),
    pad((Object.values(t.woodM3).reduce((s, x) => s + Math.round(x * 1000), 0) / 1000).toFixed(3), 8), pad(t.wiring.conductorLengthM, 7),
    pad(money(e.money.subtotalAmount), 14),
  ].join(" "));
  lines.push(`Ranks ${t.ranks}; prepared-for pipes ${t.pipes.prepared}; pipes removed ${t.pipes.removed}; wiring ${t.wiring.conductors} conductors, ${t.wiring.conductorLengthKm} km.`);
  lines.push(`${t.hoursPerStop} hours a stop. Pipe metal in the organ ${t.metalTotalKg} kg, to buy ${t.metalBoughtTotalKg} kg (new pipes with casting allowance, repairs).`);
  lines.push("");
  lines.push(`Parts of the work`);
  for (const p of e.packages) {
    const cost = e.money.byPackage.find((b) => b.package === p.package)?.directCostAmount ?? "0.00";
    lines.push(`  ${pad(p.label, 30, true)} ${pad(p.hoursTotal.toFixed(1), 9)} h  ${pad(money(cost), 14)} ${cur}`);
  }
  lines.push("");
  const wind = e.wind;
  lines.push(`Wind: ${wind.blowerM3PerMin} m³/min at ${wind.blowerPressureMm} mm, blower motor ${wind.blowerKw} kW; reservoirs ${wind.reservoirs.map((r) => `${r.pressureMm} mm ${r.flowM3PerMin} m³/min`).join(", ")}; trunk ${wind.trunkM} m.`);
  const c = e.case;
  lines.push(
    c.work === "none"
      ? "Case: not part of the work."
      : `Case: ${c.work}, ${c.widthMm}×${c.depthMm}×${c.heightMm} mm (${c.sized}), ${c.surfaceM2} m² of casework; ${c.frontPipes} front pipes${c.dummyPipes ? `, ${c.dummyPipes} of them dummies (${c.dummyMetalKg} kg)` : ""}.`,
  );
  for (const d of e.divisions) if (d.swellBox) lines.push(`Swell box, ${d.name}: ${d.swellBox.widthMm}×${d.swellBox.depthMm}×${d.swellBox.heightMm} mm (${d.swellBox.sized}), walls ${d.swellBox.wallM2} m², shutters ${d.swellBox.shutterM2} m², ${d.swellBox.mechanism} drive.`);
  const st = e.site;
  lines.push(
    `Site: ${st.transport.distanceKm} km away; ${st.transport.loadsOut} load(s) out, ${st.transport.loadsIn} in (organ ${st.weights.totalKg} kg, existing material ${st.weights.existingToWorkshopKg} kg); ` +
      `${st.time.weeks} weeks on site, ${st.time.personWeeks} person-weeks${st.time.lodging ? ", crew lodging" : ""}${st.time.scaffold ? ", scaffolding" : ""}.`,
  );
  lines.push("");
  lines.push(`Money (${cur})`);
  const row = (label: string, amount: string) => lines.push(`  ${pad(label, 44, true)} ${pad(money(amount), 16)}`);
  for (const l of e.money.labour) row(`${l.label}: ${l.hours.toFixed(1)} h at ${l.rateAmount}`, l.amount);
  for (const m of e.money.materials) row(`${m.label}: ${m.quantity} ${m.unit} at ${m.priceAmount}`, m.amount);
  for (const i of e.money.items) row(`${i.label}: ${i.quantity} at ${i.priceAmount} ${i.unit}`, i.amount);
  row("Subtotal", e.money.subtotalAmount);
  row(`Overhead ${e.money.overhead.percent}%`, e.money.overhead.amount);
  row(`Contingency ${e.money.contingency.percent}%`, e.money.contingency.amount);
  row(`Margin ${e.money.margin.percent}%`, e.money.margin.amount);
  row("Net", e.money.netAmount);
  row(`Tax ${e.money.tax.percent}%`, e.money.tax.amount);
  row("Total", e.money.totalAmount);
  lines.push("");
  lines.push("Programme (weeks)");
  for (const p of e.programme.phases) lines.push(`  ${pad(p.label, 24, true)} ${pad(p.weeks.toFixed(1), 7)}${p.setBy && p.byDepartment.length > 1 ? `  (set by ${p.setBy})` : ""}`);
  lines.push(`  ${pad("Total", 24, true)} ${pad(e.programme.totalWeeks.toFixed(1), 7)}`);
  if (e.programme.startDate) {
    const target = e.programme.targetDate
      ? `; target ${e.programme.targetDate}: ${e.programme.meetsTarget ? "met" : "MISSED"}, ${e.programme.slackWeeks} weeks ${(e.programme.slackWeeks ?? 0) >= 0 ? "to spare" : "late"}`
      : "";
    lines.push(`  from ${e.programme.startDate} to ${e.programme.completionDate}${target}`);
  }
  lines.push("");
  lines.push("Cautions");
  for (const c of e.cautions) lines.push(`  - ${c.text}`);
  return lines.join("\n");
}

function main(): number {
  const args = process.argv.slice(2);
  const file = args.find((a) => !a.startsWith("--"));
  const unknown = args.filter((a) => a.startsWith("--") && a !== "--summary");
  if (!file || unknown.length) {
    process.stderr.write(`${unknown.length ? `unknown option ${unknown.join(", ")}\n` : ""}${USAGE}\n`);
    return 1;
  }
  let text: string;
  try {
    text = readFileSync(file, "utf8");
  } catch (e) {
    process.stderr.write(`cannot read ${file}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}\n`);
    return 1;
  }
  const r = parseSchemeFile(text, DEFAULT_RATES);
  if (!r.ok) {
    process.stderr.write(`${file}: the scheme has ${r.messages.length} problem${r.messages.length === 1 ? "" : "s"}:\n`);
    for (const m of r.messages) process.stderr.write(`  ${m}\n`);
    return 1;
  }
  const e = estimateScheme(r.scheme, r.rates);
  process.stdout.write(args.includes("--summary") ? summary(e) + "\n" : JSON.stringify(e, null, 2) + "\n");
  return 0;
}

process.exitCode = main();
