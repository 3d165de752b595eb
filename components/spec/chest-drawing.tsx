/** Plan view of a division's chest in ink on paper: every pipe to scale, the space in the case dashed. */
import { StateMark } from "@/components/ui/state-mark";
import type { ChestPlan, LaidRow } from "./chest-layout";
import { chestWords } from "./chest-words";
import { formatNumber } from "./format";

type Fit = { fits: boolean; lengthMarginMm: number; depthMarginMm: number } | null;

const INK = "#1d2433";
const TIN = "#6b737d";
const CLASH = "#c2412d";
const OAK = "#7a5230";

function Rows({ rows, dx, dy, length }: { rows: LaidRow[]; dx: number; dy: number; length: number }) {
  return (
    <g transform={`translate(${dx} ${dy})`}>
      {rows.map((r, i) => (
        <g key={i}>
          <title>{r.label}</title>
          {i > 0 && <line x1={0} x2={length} y1={r.y} y2={r.y} stroke={TIN} strokeWidth={0.6} vectorEffect="non-scaling-stroke" opacity={0.35} />}
          {r.pipes.map((p, j) =>
            p.wood ? (
              <rect
                key={j}
                x={p.x - p.size / 2}
                y={p.y - p.size / 2}
                width={p.size}
                height={p.size}
                fill="none"
                stroke={OAK}
                strokeWidth={0.9}
                strokeDasharray={p.prepared ? "3 2" : undefined}
                vectorEffect="non-scaling-stroke"
              />
            ) : (
              <circle
                key={j}
                cx={p.x}
                cy={p.y}
                r={p.size / 2}
                fill="none"
                stroke={INK}
                strokeWidth={0.8}
                strokeDasharray={p.prepared ? "3 2" : undefined}
                vectorEffect="non-scaling-stroke"
              />
            ),
          )}
        </g>
      ))}
    </g>
  );
}

export function ChestDrawing({
  divisionName,
  plan,
  need,
  space,
  fit,
}: {
  divisionName: string;
  plan: ChestPlan | null;
  /** The estimator's figures for the main chest (the words use these). */
  need: { lengthMm: number; depthMm: number };
  space: { lengthMm: number; depthMm: number } | null;
  fit: Fit;
}) {
  const words = chestWords(need, space, fit);
  const clash = fit !== null && !fit.fits;
  if (!plan) {
    return (
      <figure className="panel p-4" data-testid={`chest-${divisionName}`}>
        <figcaption className="font-serif text-lg font-semibold">{divisionName}</figcaption>
        <p className="mt-1 text-sm text-tin">No pipes stand on this division&apos;s chest yet.</p>
      </figure>
    );
  }
  const w = Math.max(plan.lengthMm, space?.lengthMm ?? 0);
  const h = Math.max(plan.depthMm, space?.depthMm ?? 0);
  const m = Math.max(w, 800) * 0.06;
  const font = Math.max(w, 800) / 55;
  const offsetGap = plan.offset ? m * 1.2 : 0;
  const offsetH = plan.offset ? plan.offset.depthMm + font * 1.5 : 0;
  const vbW = w + 2 * m;
  const vbH = h + 2 * m + offsetGap + offsetH;
  const spaceColour = clash ? CLASH : TIN;
  return (
    <figure className="panel p-4" data-testid={`chest-${divisionName}`}>
      <figcaption className="mb-2 flex flex-wrap items-baseline gap-x-3">
        <span className="font-serif text-lg font-semibold">{divisionName}</span>
        <span className="text-xs text-tin">plan view, front at the bottom · {plan.layout === "chromatic" ? "chromatic chest" : "C and C♯ half-chests"}</span>
      </figcaption>
      <svg
        viewBox={`0 0 ${vbW} ${vbH}`}
        className="h-auto w-full bg-paper"
        role="img"
        aria-label={`Chest of the ${divisionName}: ${words}`}
        style={{ maxHeight: "60vh" }}
      >
        <g transform={`translate(${m} ${m})`}>
          {/* The chest the ranks need: solid ink. */}
          <rect x={0} y={0} width={plan.lengthMm} height={plan.depthMm} fill="#fffdf8" stroke={INK} strokeWidth={1.4} vectorEffect="non-scaling-stroke" />
          {plan.passageMm > 0 && (
            <>
              <rect x={0} y={plan.depthMm - plan.passageMm} width={plan.lengthMm} height={plan.passageMm} fill="#efe9dc" stroke={INK} strokeWidth={0.6} vectorEffect="non-scaling-stroke" />
              <text x={plan.lengthMm / 2} y={plan.depthMm - plan.passageMm / 2} fontSize={font * 0.8} textAnchor="middle" dominantBaseline="middle" fill={TIN}>
                passage board
              </text>
            </>
          )}
          {plan.splitMm !== null && (
            <line x1={plan.splitMm} x2={plan.splitMm} y1={0} y2={plan.depthMm} stroke={INK} strokeWidth={0.8} strokeDasharray="8 3 2 3" vectorEffect="non-scaling-stroke" />
          )}
          <Rows rows={plan.rows} dx={0} dy={0} length={plan.lengthMm} />
          {/* The space in the case: dashed, clash-coloured when exceeded. */}
          {space && (
            <rect
              x={0}
              y={0}
              width={space.lengthMm}
              height={space.depthMm}
              fill="none"
              stroke={spaceColour}
              strokeWidth={clash ? 2.2 : 1.4}
              strokeDasharray="10 6"
              vectorEffect="non-scaling-stroke"
              data-testid={`chest-space-${divisionName}`}
              data-fits={clash ? "no" : "yes"}
            />
          )}
          {/* Dimensions */}
          <g fontSize={font} fill={INK} className="num">
            <line x1={0} x2={plan.lengthMm} y1={-m * 0.45} y2={-m * 0.45} stroke={INK} strokeWidth={0.7} vectorEffect="non-scaling-stroke" />
            <line x1={0} x2={0} y1={-m * 0.65} y2={-m * 0.25} stroke={INK} strokeWidth={0.7} vectorEffect="non-scaling-stroke" />
            <line x1={plan.lengthMm} x2={plan.lengthMm} y1={-m * 0.65} y2={-m * 0.25} stroke={INK} strokeWidth={0.7} vectorEffect="non-scaling-stroke" />
            <text x={plan.lengthMm / 2} y={-m * 0.6} textAnchor="middle">{formatNumber(Math.round(need.lengthMm))} mm needed</text>
            <text x={w + m * 0.15} y={plan.depthMm / 2} dominantBaseline="middle" fontSize={font * 0.85}>
              {formatNumber(Math.round(need.depthMm))}
            </text>
            {space && (
              <text x={space.lengthMm} y={space.depthMm + font * 1.2} textAnchor="end" fill={spaceColour} fontSize={font * 0.85}>
                space {formatNumber(Math.round(space.lengthMm))} × {formatNumber(Math.round(space.depthMm))}
              </text>
            )}
          </g>
          {plan.offset && (
            <g transform={`translate(0 ${h + offsetGap})`}>
              <text x={0} y={-font * 0.4} fontSize={font * 0.85} fill={TIN}>
                offset bass chest, stands elsewhere in the case: {formatNumber(Math.round(plan.offset.lengthMm))} × {formatNumber(Math.round(plan.offset.depthMm))} mm
              </text>
              <rect x={0} y={0} width={plan.offset.lengthMm} height={plan.offset.depthMm} fill="#fffdf8" stroke={INK} strokeWidth={1.2} vectorEffect="non-scaling-stroke" />
              <Rows rows={plan.offset.rows} dx={0} dy={0} length={plan.offset.lengthMm} />
            </g>
          )}
        </g>
      </svg>
      <p className={`mt-2 flex items-start gap-1.5 text-sm ${clash ? "font-semibold text-clash" : space ? "text-fit" : "text-ink-soft"}`} data-testid={`chest-words-${divisionName}`}>
        <StateMark kind={clash ? "clash" : space ? "fit" : "unknown"} className="mt-0.5 h-4 w-4" />
        <span>{words}</span>
      </p>
      <details className="mt-2 text-xs text-ink-soft">
        <summary className="cursor-pointer text-tin">Rows, back to front ({plan.rows.length})</summary>
        <ol className="mt-1 columns-2 gap-6 sm:columns-3">
          {plan.rows.map((r, i) => (
            <li key={i} className="num">{r.label} · {formatNumber(Math.round(r.depth))} mm</li>
          ))}
        </ol>
      </details>
      <p className="mt-1 text-xs text-tin">Circles: metal pipes; squares: wooden pipes (outside size); dashed: prepared for. Drawn to scale from the estimator&apos;s pipe diameters.</p>
    </figure>
  );
}
