/**
 * A division's scaling chart as plain SVG with visx, like the comparison page's charts: each rank a
 * line of its deviation from the normal scale (semitones) across the compass, the normal scale the
 * zero line. Lines differ by dash as well as colour, each is named at its right end and in the
 * legend, measured pipes are open circles with their fitted line dashed beside them.
 */
import { AxisBottom, AxisLeft } from "@visx/axis";
import { Group } from "@visx/group";
import { scaleLinear } from "@visx/scale";
import { LinePath } from "@visx/shape";
import { CHART_COLOURS } from "@/components/compare/stacked-bars";
import { noteText, footageText, romanNumeral } from "@/components/spec/format";
import { midiToNote } from "@/lib/estimate/notes";
import type { ScaleLine, ScalingChart } from "@/lib/drawing/scaling-chart";

const DASHES = ["", "6 3", "2 3", "8 3 2 3", "1 2", "10 4"];

export type MeasuredPoint = { keyMidi: number; deviationHt: number; note: string };
export type Overlay = { stopId: string; measured: readonly MeasuredPoint[]; fitted: { deviationHt: number; halvingOn: number } | null };

/** Semitones as the trade writes a deviation: +2, −1.5, 0 (a true minus sign). */
export function signedHt(n: number): string {
  const r = Math.round(n * 10) / 10;
  return r > 0 ? `+${r}` : r < 0 ? `−${Math.abs(r)}` : "0";
}

export function lineLabel(l: Pick<ScaleLine, "stopName" | "footageText" | "rank" | "ranks">): string {
  return l.ranks > 1 ? `${l.stopName} ${romanNumeral(l.ranks)}, rank ${l.rank}` : `${l.stopName} ${footageText(l.footageText)}`;
}

export function ScalingChartSvg({
  chart, selected, overlay, testId, pipeTableHref,
}: {
  chart: ScalingChart;
  selected?: string;
  overlay?: Overlay | null;
  testId?: string;
  /** Where a rank's pipe table opens: its name on the chart and in the legend link there. */
  pipeTableHref?: (stopId: string) => string;
}) {
  const width = 760;
  const height = 340;
  const margin = { top: 14, right: 150, bottom: 34, left: 44 };
  const all = chart.lines.flatMap((l) => l.points.map((p) => p.deviationHt)).concat(overlay?.measured.map((m) => m.deviationHt) ?? []);
  const lo = Math.floor(Math.min(-2, ...all) - 0.5);
  const hi = Math.ceil(Math.max(2, ...all) + 0.5);
  const x = scaleLinear({ domain: [chart.lowKey, chart.highKey], range: [0, width - margin.left - margin.right] });
  const y = scaleLinear({ domain: [lo, hi], range: [height - margin.top - margin.bottom, 0], nice: true });
  const cTicks = Array.from({ length: chart.highKey - chart.lowKey + 1 }, (_, i) => chart.lowKey + i).filter((k) => k % 12 === 0);
  const fittedLine = overlay?.fitted
    ? [chart.lowKey, chart.highKey].map((k) => ({ k, d: overlay.fitted!.deviationHt + (k - 36) * (1 - 16 / (overlay.fitted!.halvingOn - 1)) }))
    : null;
  // Labels at the right end, nudged apart so they do not overprint.
  const ends = chart.lines
    .map((l, i) => ({ l, i, yEnd: y(l.points[l.points.length - 1]?.deviationHt ?? 0) }))
    .sort((a, b) => a.yEnd - b.yEnd);
  for (let j = 1; j < ends.length; j++) if (ends[j].yEnd - ends[j - 1].yEnd < 11) ends[j].yEnd = ends[j - 1].yEnd + 11;
  const describe = chart.lines.map((l) => {
    const first = l.points[0]?.deviationHt ?? 0;
    const last = l.points[l.points.length - 1]?.deviationHt ?? 0;
    return `${lineLabel(l)}: ${first.toFixed(1)} at ${midiToNote(l.points[0]?.keyMidi ?? 36)} to ${last.toFixed(1)} semitones at ${midiToNote(l.points[l.points.length - 1]?.keyMidi ?? 96)}`;
  });
  return (
    <figure className="space-y-2" data-testid={testId ?? `scaling-chart-${chart.divisionId}`}>
      <div className="overflow-x-auto">
      <svg viewBox={`0 0 ${width} ${height}`} className="h-auto w-full min-w-[34rem]" role="img" aria-label={`Scales of the ${chart.divisionName}, semitones from the normal scale. ${describe.join("; ")}`}>
        <Group left={margin.left} top={margin.top}>
          {y.ticks(8).map((t) => (
            <line key={t} x1={0} x2={x(chart.highKey)} y1={y(t)} y2={y(t)} stroke={t === 0 ? "#1d2433" : "#d8d4c8"} strokeWidth={t === 0 ? 1 : 0.5} />
          ))}
          {cTicks.map((k) => <line key={k} x1={x(k)} x2={x(k)} y1={0} y2={y(lo)} stroke="#e4e0d4" strokeWidth={0.5} />)}
          <text x={x(chart.highKey) + 4} y={y(0)} dy="0.32em" fontSize={10} fill="#6b737d">normal</text>
          {chart.lines.map((l, i) => {
            const on = selected === l.stopId;
            const colour = CHART_COLOURS[i % CHART_COLOURS.length];
            return (
              <g key={`${l.stopId}:${l.rank}`} opacity={selected && !on ? 0.45 : 1}>
                <LinePath data={[...l.points]} x={(p) => x(p.keyMidi)} y={(p) => y(p.deviationHt)} stroke={colour} strokeWidth={on ? 2.6 : 1.4} strokeDasharray={DASHES[i % DASHES.length]} fill="none">
                </LinePath>
                <title>{lineLabel(l)}</title>
              </g>
            );
          })}
          {ends.map(({ l, i, yEnd }) => {
            const label = (
              <text key={`label-${l.stopId}:${l.rank}`} x={x(chart.highKey) + 34} y={yEnd} dy="0.32em" fontSize={10} fill={CHART_COLOURS[i % CHART_COLOURS.length]} fontWeight={selected === l.stopId ? 700 : 400} textDecoration={pipeTableHref ? "underline" : undefined}>
                {lineLabel(l).length > 22 ? `${lineLabel(l).slice(0, 21)}…` : lineLabel(l)}
              </text>
            );
            // On the chart itself a rank's name opens its pipe table (the legend has the same link for the keyboard).
            return pipeTableHref ? <a key={`link-${l.stopId}:${l.rank}`} href={pipeTableHref(l.stopId)} tabIndex={-1} aria-hidden="true">{label}</a> : label;
          })}
          {fittedLine && (
            <LinePath data={fittedLine} x={(p) => x(p.k)} y={(p) => y(p.d)} stroke="#b0852f" strokeWidth={1.5} strokeDasharray="4 4" fill="none" />
          )}
          {overlay?.measured.map((m) => (
            <g key={m.keyMidi} data-testid="measured-point">
              <circle cx={x(m.keyMidi)} cy={y(m.deviationHt)} r={4.5} fill="#f7f4ec" stroke="#c2412d" strokeWidth={1.6} />
              <title>{`measured ${noteText(m.note)}: ${m.deviationHt.toFixed(1)} semitones`}</title>
            </g>
          ))}
          <AxisLeft scale={y} numTicks={8} stroke="#8a929c" tickStroke="#8a929c" tickFormat={(v) => signedHt(Number(v))} tickLabelProps={{ fontSize: 10, fill: "#6b737d" }} label="semitones from normal" labelProps={{ fontSize: 10, fill: "#6b737d", textAnchor: "middle" }} labelOffset={22} />
          <AxisBottom top={y(lo)} scale={x} tickValues={cTicks} tickFormat={(v) => noteText(midiToNote(Number(v)))} stroke="#8a929c" tickStroke="#8a929c" tickLabelProps={{ fontSize: 10, fill: "#6b737d" }} />
        </Group>
      </svg>
      </div>
      <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs" aria-label={`Legend of the ${chart.divisionName}'s scales`}>
        {chart.lines.map((l, i) => (
          <li key={`${l.stopId}:${l.rank}`} className="flex items-center gap-1.5">
            <svg width="22" height="8" aria-hidden="true"><line x1="0" x2="22" y1="4" y2="4" stroke={CHART_COLOURS[i % CHART_COLOURS.length]} strokeWidth="2" strokeDasharray={DASHES[i % DASHES.length]} /></svg>
            {pipeTableHref && l.kind !== "extension" ? (
              <a href={pipeTableHref(l.stopId)} className="underline decoration-tin-light underline-offset-2 hover:text-brass-dark" aria-label={`Pipe table of ${lineLabel(l)}`}>{lineLabel(l)}</a>
            ) : (
              lineLabel(l)
            )}
            <span className="text-tin">
              {" "}
              {l.kind === "extension" ? "(its rank's scale)" : `${signedHt(l.scale.deviationHt)} ht, halving on ${l.scale.halvingOn}`}
            </span>
          </li>
        ))}
        {overlay && overlay.measured.length > 0 && (
          <li className="flex items-center gap-1.5"><svg width="12" height="12" aria-hidden="true"><circle cx="6" cy="6" r="4" fill="#f7f4ec" stroke="#c2412d" strokeWidth="1.6" /></svg> measured pipes</li>
        )}
        {fittedLine && (
          <li className="flex items-center gap-1.5"><svg width="22" height="8" aria-hidden="true"><line x1="0" x2="22" y1="4" y2="4" stroke="#b0852f" strokeWidth="1.5" strokeDasharray="4 4" /></svg> fitted scale</li>
        )}
      </ul>
    </figure>
  );
}
