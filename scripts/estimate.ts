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
    pad("Console, transport (scheme)", 30, true), pad("", 5), pad("", 6), pad("", 7), pad("", 7), pad("", 6), pad("", 15), pad("", 5),
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
  lines.push("");
  lines.push(`Money (${cur})`);
  const row = (label: string, amount: string) => lines.push(`  ${pad(label, 44, true)} ${pad(money(amount), 16)}`);
  for (const l of e.money.labour) row(`${l.label}: ${l.hours.toFixed(1)} h at ${l.rateAmount}`, l.amount);
  for (const m of e.money.materials) row(`${m.label}: ${m.quantity} ${m.unit} at ${m.priceAmount}`, m.amount);
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
