/**
 * Benchmark of the estimator (not a timed test): the small and large examples and a generated scheme
 * twice the large one's size. Prints medians, the cost of doubling, and the ratio to the floor — a bare
 * loop over typed arrays computing only the per-pipe formulas (frequency, diameter, speaking length,
 * mouth width, sheet mass) for the large scheme's pipes.
 * Targets: large ≤ 1.0 ms median and ≤ 20× the recurrence floor (the estimator itself steps by ratios);
 * 2× size ≤ 2.3× time. A spreadsheet recalculating the same pipes takes 110–200 ms.
 * Then the estimator's desk: issuing a quotation of the large example (estimate, totals and
 * the snapshot as stored) median ≤ 100 ms, and writing its tender (.docx, fonts and the programme
 * picture included) median ≤ 300 ms, each beside the estimator's own time in the same run.
 */
import { writeDocument } from "../lib/documents";
import { exampleQuotation } from "../lib/quote/example";
import { DEFAULT_RATES } from "../lib/estimate/demo-rates";
import { readFileSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import { join } from "node:path";

/** The examples, found from the working directory (the bench runs bundled, away from its source). */
const EXAMPLES = join(process.cwd(), "examples");
import { estimateScheme, formGeometry, parseSchemeFile, planScheme, speedOfSoundMPerS, type Rates, type Scheme, type SchemePlan } from "@/lib/estimate";

/** The geometry constants of a segment's pipes. */
function geometryOf(plan: SchemePlan, form: number, rates: Rates) {
  const f = plan.forms[form];
  return formGeometry(f, plan.stops[f.stop].stop, rates);
}

function load(file: string): { scheme: Scheme; rates: Rates } {
  const r = parseSchemeFile(readFileSync(join(EXAMPLES, file), "utf8"), DEFAULT_RATES);
  if (!r.ok) throw new Error(`${file}: ${r.messages.join("; ")}`);
  return { scheme: r.scheme, rates: r.rates };
}

/** The scheme with every division twice over (ids suffixed), so exactly twice the pipes and stops. */
function doubled(s: Scheme): Scheme {
  const copy = (suffix: string) =>
    s.divisions.map((d) => ({
      ...d, id: d.id + suffix, name: d.name + suffix,
      stops: d.stops.map((st) => ({ ...st, id: st.id + suffix, source: st.source === undefined ? undefined : st.source + suffix })),
    }));
  const couplers = (suffix: string) => s.accessories.couplers.map((c) => ({ ...c, id: c.id + suffix, from: c.from + suffix, to: c.to + suffix }));
  const tremulants = (suffix: string) => s.accessories.tremulants.map((t) => ({ ...t, id: t.id + suffix, division: t.division + suffix }));
  return {
    ...s, name: s.name + " ×2",
    divisions: [...copy(""), ...copy(" B")],
    accessories: { ...s.accessories, couplers: [...couplers(""), ...couplers(" B")], tremulants: [...tremulants(""), ...tremulants(" B")] },
  };
}

function median(xs: number[]): number {
  const a = [...xs].sort((x, y) => x - y);
  const m = a.length >> 1;
  return a.length % 2 ? a[m] : (a[m - 1] + a[m]) / 2;
}

/** Median wall time in ms of one call of fn, over `runs` calls after `warm` warm-up calls. */
function time(fn: () => unknown, warm: number, runs: number): number {
  let sink = 0;
  for (let i = 0; i < warm; i++) sink += fn() ? 1 : 0;
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = process.hrtime.bigint();
    sink += fn() ? 1 : 0;
    t.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  if (sink < 0) console.log(sink);
  return median(t);
}

/** Typed arrays of the per-pipe inputs of a scheme, for the floor loop. */
function floorInputs(scheme: Scheme, rates: Rates) {
  const plan = planScheme(scheme);
  const n = plan.segments.reduce((s, g) => s + g.count, 0);
  const semis = new Float64Array(n), offset = new Float64Array(n), halving = new Float64Array(n), divisor = new Float64Array(n);
  const corr = new Float64Array(n), mouth = new Float64Array(n), thick = new Float64Array(n);
  let i = 0;
  for (const seg of plan.segments) {
    const g = geometryOf(plan, seg.form, rates);
    for (let k = 0; k < seg.count; k++, i++) {
      semis[i] = seg.fromKey + k - 36 + seg.shift;
      offset[i] = g.deviationHt;
      halving[i] = g.halvingOn - 1;
      divisor[i] = g.divisor;
      corr[i] = g.correctionPerDiameter;
      mouth[i] = g.mouthWidthFraction;
      thick[i] = rates.pipeMetal.thicknessAt8ftCMm;
    }
  }
  return { n, semis, offset, halving, divisor, corr, mouth, thick, c: speedOfSoundMPerS(scheme.tuning.temperatureC), pitchHz: scheme.tuning.pitchHz };
}

type FloorInputs = ReturnType<typeof floorInputs>;

/** The same pipes as runs (segments) in typed arrays, for a floor that steps f and D by ratios as the estimator does. */
function runInputs(scheme: Scheme, rates: Rates) {
  const plan = planScheme(scheme);
  const m = plan.segments.length;
  const f0 = new Float64Array(m), d0 = new Float64Array(m), ratio = new Float64Array(m), count = new Int32Array(m);
  const cOverDiv = new Float64Array(m), corr = new Float64Array(m), mouth = new Float64Array(m);
  const c = speedOfSoundMPerS(scheme.tuning.temperatureC);
  plan.segments.forEach((seg, j) => {
    const g = geometryOf(plan, seg.form, rates);
    const s0 = seg.fromKey - 36 + seg.shift;
    f0[j] = scheme.tuning.pitchHz * Math.pow(2, (s0 - 33) / 12);
    d0[j] = 155.5 * Math.pow(2, -(g.referenceSemitones - g.deviationHt) / 16) * Math.pow(2, -(s0 - g.referenceSemitones) / (g.halvingOn - 1));
    ratio[j] = g.ratio;
    count[j] = seg.count;
    cOverDiv[j] = (1000 * c) / g.divisor;
    corr[j] = g.correctionPerDiameter;
    mouth[j] = g.mouthWidthFraction;
  });
  return { m, f0, d0, ratio, count, cOverDiv, corr, mouth, thick: rates.pipeMetal.thicknessAt8ftCMm };
}

function runFloorLoop(x: ReturnType<typeof runInputs>): number {
  const step = Math.pow(2, 1 / 12);
  let total = 0;
  for (let j = 0; j < x.m; j++) {
    let f = x.f0[j];
    let d = x.d0[j];
    for (let i = 0; i < x.count[j]; i++) {
      const len = x.cOverDiv[j] / f - x.corr[j] * d;
      total += len + x.mouth[j] * Math.PI * d + Math.PI * d * len * x.thick * 8.9e-6;
      f *= step;
      d *= x.ratio[j];
    }
  }
  return total;
}

function floorLoop(x: FloorInputs): number {
  let total = 0;
  for (let i = 0; i < x.n; i++) {
    const f = x.pitchHz * Math.pow(2, (x.semis[i] - 33) / 12);
    const d = 155.5 * Math.pow(2, -(x.semis[i] - x.offset[i]) / x.halving[i]);
    const len = (1000 * x.c) / (x.divisor[i] * f) - x.corr[i] * d;
    const mouthW = x.mouth[i] * Math.PI * d;
    const massKg = Math.PI * d * len * x.thick[i] * 8.9e-6;
    total += len + mouthW + massKg;
  }
  return total;
}

function main(): number {
  const small = load("small-two-manual.json");
  const large = load("large-five-manual.json");
  const big = { scheme: doubled(large.scheme), rates: large.rates };
  const cases = [
    { label: "small (two manuals and pedal)", ...small },
    { label: "large (five manuals and pedal)", ...large },
    { label: "generated 2× large", ...big },
  ];
  const results = cases.map((c) => {
    const e = estimateScheme(c.scheme, c.rates);
    const ms = time(() => estimateScheme(c.scheme, c.rates), 300, 400);
    return { ...c, ms, pipes: e.totals.pipes.total + e.totals.pipes.prepared, stops: e.totals.stops };
  });
  const fin = floorInputs(large.scheme, large.rates);
  const floorMs = time(() => floorLoop(fin), 500, 1000);
  const rin = runInputs(large.scheme, large.rates);
  const runFloorMs = time(() => runFloorLoop(rin), 500, 1000);

  console.log(`Node ${process.version}; medians of single calls after warm-up.`);
  for (const r of results) console.log(`${r.label.padEnd(34)} ${String(r.stops).padStart(4)} stops ${String(r.pipes).padStart(6)} pipe positions  ${r.ms.toFixed(3).padStart(8)} ms`);
  const [, l, b] = results;
  const doubling = b.ms / l.ms;
  const ratio = l.ms / floorMs;
  console.log(`floor: bare per-pipe loop over typed arrays (${fin.n} pipes)  ${floorMs.toFixed(3)} ms`);
  console.log(`floor with the estimator's recurrences (steps f and D by ratios per run)  ${runFloorMs.toFixed(3)} ms`);
  console.log("");
  const recurrence = l.ms / runFloorMs;
  console.log(`large at most 1.0 ms median:          ${l.ms.toFixed(3)} ms   ${l.ms <= 1 ? "meets target" : "MISSES target"}`);
  console.log(`at most 20× the recurrence floor:     ${recurrence.toFixed(1)}×     ${recurrence <= 20 ? "meets target" : "MISSES target"}`);
  console.log(`doubling costs at most 2.3×:          ${doubling.toFixed(2)}×     ${doubling <= 2.3 ? "meets target" : "MISSES target"}`);
  console.log(`ratio to the bare per-pipe floor:     ${ratio.toFixed(2)}×`);
  return l.ms;
}

async function desk(estimatorMs: number): Promise<void> {
  const file = JSON.parse(readFileSync(join(EXAMPLES, "large-five-manual.json"), "utf8"));
  // Issuing: the estimate and totals are computed afresh and the snapshot serialised, as the server stores it.
  const issueMs = time(() => JSON.stringify(exampleQuotation(file)).length, 5, 30);
  const q = exampleQuotation(file);
  await writeDocument("tender", q); // loads the fonts and the SVG renderer once
  const runs: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < 15; i++) {
    const t0 = process.hrtime.bigint();
    const c0 = process.cpuUsage();
    await writeDocument("tender", q);
    const c = process.cpuUsage(c0);
    runs.push(Number(process.hrtime.bigint() - t0) / 1e6);
    cpu.push((c.user + c.system) / 1000);
  }
  const tenderMs = median(runs);
  console.log("");
  console.log(`issue a quotation (large: estimate, totals, snapshot)   ${issueMs.toFixed(1).padStart(7)} ms  ${issueMs <= 100 ? "meets ≤ 100 ms" : "MISSES ≤ 100 ms"}   (${(issueMs / estimatorMs).toFixed(0)}× the estimator's ${estimatorMs.toFixed(2)} ms)`);
  console.log(`write the tender (large, .docx with fonts and picture)  ${tenderMs.toFixed(1).padStart(7)} ms  ${tenderMs <= 300 ? "meets ≤ 300 ms" : "MISSES ≤ 300 ms"}   (${(tenderMs / estimatorMs).toFixed(0)}× the estimator's ${estimatorMs.toFixed(2)} ms; CPU ${median(cpu).toFixed(1)} ms)`);
  // Wall times on a shared machine stretch with its load; say what the load was.
  console.log(`load average while measuring: ${loadavg().map((x) => x.toFixed(1)).join(", ")} on ${cpus().length} cores`);
}

const largeMs = main();
void desk(largeMs);
