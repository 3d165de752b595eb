/**
 * The programme as a timeline picture (SVG) and in words: phases one after another in weeks from the
 * start, the client's target as a dashed line, and lateness said in words with the weeks over — never
 * by colour alone. Pure: the page shows the SVG, the tender embeds it (drawn to PNG on the server).
 */
import type { Programme } from "@/lib/estimate";

const INK = "#1d2433";
const TIN = "#6b737d";
const RULE = "#d9d3c4";
const BRASS = "#b0852f";
const CLASH = "#c2412d";
const FIT = "#2f6b4f";
// The palette in order for the phases: ink, brass, tin, oak, fit (design.md).
const PHASE_FILL = ["#1d2433", "#b0852f", "#8a929c", "#7a5230", "#2f6b4f"];

export function formatLongDate(iso: string): string {
  const [y, m, d] = iso.split("-").map(Number);
  const months = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];
  return `${d} ${months[m! - 1]} ${y}`;
}

export function weeksText(w: number): string {
  const t = Number.isInteger(w) ? String(w) : w.toFixed(1);
  return `${t} ${w === 1 ? "week" : "weeks"}`;
}

/** What the programme says, in words: its length, its completion date and how it stands against the target. */
export function programmeWords(p: Programme): { headline: string; late: boolean; detail: string } {
  const length = `The work takes ${weeksText(p.totalWeeks)} from dismantling to the end of tonal finishing.`;
  if (!p.startDate || !p.completionDate) return { headline: length, late: false, detail: "Give a start date to put dates on the programme." };
  const dated = `${length} Starting on ${formatLongDate(p.startDate)}, it completes on ${formatLongDate(p.completionDate)}.`;
  if (!p.targetDate || p.slackWeeks === undefined) return { headline: dated, late: false, detail: "The client has given no target date." };
  if (p.meetsTarget) {
    return { headline: dated, late: false, detail: `This meets the client's target of ${formatLongDate(p.targetDate)} with ${weeksText(p.slackWeeks)} to spare.` };
  }
  return {
    headline: dated,
    late: true,
    detail: `Late: the programme ends ${weeksText(Math.abs(p.slackWeeks))} after the client's target of ${formatLongDate(p.targetDate)}.`,
  };
}

const esc = (s: string) => s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");

/** The timeline as a self-contained SVG (fonts named, no external references), `width` × auto height in px. */
export function programmeSvg(p: Programme, { width = 720 }: { width?: number } = {}): string {
  const left = 170;
  const right = 24;
  const top = 34;
  const rowH = 30;
  const barH = 16;
  const plotW = width - left - right;
  const targetWeeks = p.targetDate && p.slackWeeks !== undefined ? p.totalWeeks + p.slackWeeks : null;
  const span = Math.max(p.totalWeeks, targetWeeks ?? 0, 1);
  const step = span > 120 ? 20 : span > 60 ? 10 : span > 24 ? 5 : 2;
  const maxW = Math.ceil(span / step) * step;
  const x = (w: number) => left + (w / maxW) * plotW;
  const height = top + p.phases.length * rowH + 58;
  const out: string[] = [];
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" font-family="Inter, 'DejaVu Sans', sans-serif" role="img" aria-label="${esc(programmeWords(p).detail)}">`);
  out.push(`<rect width="${width}" height="${height}" fill="#fffdf8"/>`);
  out.push(`<text x="${left}" y="18" font-size="11" fill="${TIN}">weeks from the start${p.startDate ? ` (${esc(formatLongDate(p.startDate))})` : ""}</text>`);
  for (let w = 0; w <= maxW; w += step) {
    out.push(`<line x1="${x(w).toFixed(1)}" y1="${top - 6}" x2="${x(w).toFixed(1)}" y2="${top + p.phases.length * rowH}" stroke="${RULE}" stroke-width="1"/>`);
    out.push(`<text x="${x(w).toFixed(1)}" y="${top + p.phases.length * rowH + 14}" font-size="10" fill="${TIN}" text-anchor="middle">${w}</text>`);
  }
  let start = 0;
  p.phases.forEach((ph, i) => {
    const y = top + i * rowH;
    out.push(`<text x="${left - 10}" y="${y + rowH / 2 + 4}" font-size="12" fill="${INK}" text-anchor="end">${esc(ph.label)}</text>`);
    const x0 = x(start);
    const x1 = x(start + ph.weeks);
    out.push(`<rect x="${x0.toFixed(1)}" y="${y + (rowH - barH) / 2}" width="${Math.max(1.5, x1 - x0).toFixed(1)}" height="${barH}" rx="2" fill="${PHASE_FILL[i % PHASE_FILL.length]}"/>`);
    const label = weeksText(ph.weeks);
    const inside = x1 - x0 > 70;
    out.push(`<text x="${(inside ? x0 + 6 : x1 + 6).toFixed(1)}" y="${y + rowH / 2 + 4}" font-size="11" fill="${inside ? "#fffdf8" : INK}">${esc(label)}</text>`);
    start += ph.weeks;
  });
  const axisY = top + p.phases.length * rowH;
  const words = programmeWords(p);
  if (targetWeeks !== null) {
    const tx = x(Math.max(0, targetWeeks));
    out.push(`<line x1="${tx.toFixed(1)}" y1="${top - 10}" x2="${tx.toFixed(1)}" y2="${axisY + 2}" stroke="${words.late ? CLASH : FIT}" stroke-width="2" stroke-dasharray="5 4"/>`);
    out.push(`<text x="${tx.toFixed(1)}" y="${top - 14}" font-size="11" font-weight="600" fill="${words.late ? CLASH : FIT}" text-anchor="${tx > width - 120 ? "end" : "middle"}">target ${esc(p.targetDate ? formatLongDate(p.targetDate) : "")}</text>`);
  }
  const endX = x(p.totalWeeks);
  out.push(`<line x1="${endX.toFixed(1)}" y1="${top - 4}" x2="${endX.toFixed(1)}" y2="${axisY + 2}" stroke="${BRASS}" stroke-width="1.5"/>`);
  const summary = !p.completionDate
    ? `Total ${weeksText(p.totalWeeks)}; no start date yet`
    : p.slackWeeks === undefined
      ? `Completion ${formatLongDate(p.completionDate)}`
      : words.late
        ? `Late by ${weeksText(Math.abs(p.slackWeeks))}: completion ${formatLongDate(p.completionDate)}`
        : `Completion ${formatLongDate(p.completionDate)}, ${weeksText(p.slackWeeks)} before the target`;
  out.push(`<text x="${left}" y="${axisY + 38}" font-size="12" font-weight="600" fill="${words.late ? CLASH : INK}">${words.late ? "▲ " : ""}${esc(summary)}</text>`);
  out.push("</svg>");
  return out.join("");
}
