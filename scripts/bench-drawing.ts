/**
 * Benchmark of the drawing board's pure parts on the large example (not a timed test), bundled with
 * esbuild as the editor ships it:
 * - a rank's scale changed on the Scales tab, to what the chart and the figures need for their next
 *   paint: the document edit, the estimate (the editor's worker), the parse and plan the drawing tabs
 *   make, and the division's scaling chart — median ≤ 16 ms;
 * - every chest of the large scheme planted in plan (pipe positions, elevation, loads, wind) —
 *   median ≤ 50 ms.
 * Each is printed beside the estimator's own time in the same run (the floor: the figures cannot come
 * sooner than the estimate) and the machine's load, since wall times on a shared machine stretch.
 */
import { readFileSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import { join } from "node:path";
import { DEFAULT_RATES } from "../lib/estimate/demo-rates";
import { estimateScheme, planScheme, schemeSchema } from "../lib/estimate";
import { schemeDocumentSchema, toEstimatorScheme, type SchemeDocument } from "../lib/spec/document";
import { drawingRules, estimateDocument } from "../lib/spec/estimate";
import { scalingChart } from "../lib/drawing/scaling-chart";
import { plantScheme } from "../lib/drawing/chest-planting";
import { updateStop } from "../components/spec/doc-ops";

function median(xs: number[]): number {
  const a = [...xs].sort((x, y) => x - y);
  const m = a.length >> 1;
  return a.length % 2 ? a[m] : (a[m - 1] + a[m]) / 2;
}

/** Median wall time in ms of one call of fn(i), over `runs` calls after `warm` warm-up calls. */
function time(fn: (i: number) => unknown, warm: number, runs: number): number {
  let sink = 0;
  for (let i = 0; i < warm; i++) sink += fn(i) ? 1 : 0;
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = process.hrtime.bigint();
    sink += fn(warm + i) ? 1 : 0;
    t.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  if (sink < 0) console.log(sink);
  return median(t);
}

const tuning = { pitchHz: 440, temperatureC: 18 };
const doc: SchemeDocument = schemeDocumentSchema.parse(JSON.parse(readFileSync(join(process.cwd(), "examples", "large-five-manual.json"), "utf8")));
const rates = DEFAULT_RATES;
const rules = drawingRules(rates);
const parsed = schemeSchema.parse(toEstimatorScheme(doc, tuning));
const plan = planScheme(parsed);

// The rank changed: the first open flue of the first division with one, its deviation stepped 0 → +1 → 0 …
const division = doc.divisions.find((d) => d.stops.some((s) => s.origin === "new" && s.family === "principal")) ?? doc.divisions[0];
const rank = division.stops.find((s) => s.origin === "new" && s.family === "principal") ?? division.stops[0];

const estimatorMs = time(() => estimateScheme(parsed, rates, plan), 20, 60);
const scaleMs = time((i) => {
  const next = updateStop(doc, { ...rank, scale: { ...rank.scale, deviationHt: i % 2 } });
  const figures = estimateDocument(next, tuning, rates);
  const scheme = schemeSchema.parse(toEstimatorScheme(next, tuning));
  const chart = scalingChart(scheme, division.id, rules, planScheme(scheme));
  return figures.ok && chart.lines.length;
}, 5, 40);
const plantMs = time(() => plantScheme(parsed, rules, planScheme(parsed)).length, 3, 25);
const pipes = plantScheme(parsed, rules, plan).reduce((s, d) => s + d.main.rows.reduce((n, r) => n + r.pipes.length, 0) + (d.offset?.rows.reduce((n, r) => n + r.pipes.length, 0) ?? 0), 0);

console.log(`Node ${process.version}; the large example (${doc.divisions.length} divisions, ${pipes} pipes on chests); medians after warm-up.`);
console.log(`estimator alone (the floor)                              ${estimatorMs.toFixed(2).padStart(7)} ms`);
console.log(`change a rank's scale → chart and figures (${division.name} ${rank.name})`.padEnd(56) + ` ${scaleMs.toFixed(2).padStart(7)} ms  ${scaleMs <= 16 ? "meets ≤ 16 ms" : "MISSES ≤ 16 ms"}   (${(scaleMs / estimatorMs).toFixed(1)}× the estimator)`);
console.log(`plant every chest in plan and elevation                  ${plantMs.toFixed(2).padStart(7)} ms  ${plantMs <= 50 ? "meets ≤ 50 ms" : "MISSES ≤ 50 ms"}   (${(plantMs / estimatorMs).toFixed(1)}× the estimator)`);
console.log(`load average while measuring: ${loadavg().map((x) => x.toFixed(1)).join(", ")} on ${cpus().length} cores`);
