/**
 * Horizontal stacked bars, one per scheme, drawn as plain SVG with visx (scales, shapes, axis): it
 * renders on the server into the page, scales with the page and prints sharp. Colour never carries
 * the meaning alone: the legend names each part in words, each bar part has a title with its value,
 * and the tables beside the charts give every number.
 */
import { AxisBottom } from "@visx/axis";
import { Group } from "@visx/group";
import { scaleBand, scaleLinear } from "@visx/scale";
import { Bar } from "@visx/shape";

/** The palette in Stopwright's chart order: ink, brass, tin, oak, fit, caution, then lighter tints of the same for longer series. */
export const CHART_COLOURS = ["#1d2433", "#b0852f", "#8a929c", "#7a5230", "#2f6b4f", "#b7791f", "#5a6478", "#d9b873", "#c9ced4", "#b08a66", "#7fae96"] as const;

export type Series = { key: string; label: string };
export type StackRow = { label: string; values: Record<string, number> };

export function StackedBars({ title, series, rows, format, testId }: { title: string; series: readonly Series[]; rows: readonly StackRow[]; format: (n: number) => string; testId?: string }) {
  const width = 640;
  const left = 150;
  const right = 16;
  const barHeight = 26;
  const top = 8;
  const height = top + rows.length * (barHeight + 12) + 28;
  const total = (r: StackRow) => series.reduce((s, x) => s + Math.max(0, r.values[x.key] ?? 0), 0);
  const max = Math.max(1, ...rows.map(total));
  const x = scaleLinear({ domain: [0, max], range: [0, width - left - right], nice: true });
  const y = scaleBand({ domain: rows.map((r) => r.label), range: [top, height - 28], padding: 0.3 });
  return (
    <figure className="space-y-2" data-testid={testId}>
      <figcaption className="text-sm font-semibold">{title}</figcaption>
      <svg viewBox={`0 0 ${width} ${height}`} className="h-auto w-full" role="img" aria-label={`${title}: ${rows.map((r) => `${r.label} ${format(total(r))}`).join("; ")}`}>
        <Group left={left}>
          {rows.map((r) => {
            let offset = 0;
            return (
              <g key={r.label}>
                <text x={-8} y={(y(r.label) ?? 0) + y.bandwidth() / 2} textAnchor="end" dominantBaseline="middle" fontSize={12} fill="#1d2433">
                  {r.label.length > 22 ? `${r.label.slice(0, 21)}…` : r.label}
                </text>
                {series.map((s, i) => {
                  const v = Math.max(0, r.values[s.key] ?? 0);
                  const w = x(v);
                  const bar = (
                    <Bar key={s.key} x={x(offset)} y={y(r.label) ?? 0} width={w} height={y.bandwidth()} fill={CHART_COLOURS[i % CHART_COLOURS.length]} stroke="#f7f4ec" strokeWidth={1}>
                      <title>{`${r.label} — ${s.label}: ${format(v)}`}</title>
                    </Bar>
                  );
                  offset += v;
                  return bar;
                })}
                <text x={x(offset) + 6} y={(y(r.label) ?? 0) + y.bandwidth() / 2} dominantBaseline="middle" fontSize={11} fill="#44403c">{format(total(r))}</text>
              </g>
            );
          })}
          <AxisBottom top={height - 28} scale={x} numTicks={5} tickFormat={(v) => format(Number(v))} stroke="#8a929c" tickStroke="#8a929c" tickLabelProps={{ fontSize: 10, fill: "#6b737d" }} />
        </Group>
      </svg>
      <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs" aria-label={`Legend of ${title}`}>
        {series.map((s, i) => (
          <li key={s.key} className="flex items-center gap-1.5">
            <span aria-hidden="true" className="inline-block h-3 w-3 rounded-sm" style={{ background: CHART_COLOURS[i % CHART_COLOURS.length] }} />
            {s.label}
          </li>
        ))}
      </ul>
    </figure>
  );
}
