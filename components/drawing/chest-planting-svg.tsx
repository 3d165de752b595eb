/**
 * A division's chests drawn in ink on paper from its planting (lib/drawing/chest-planting.ts): in
 * plan, pipe by pipe to scale with the space in the case dashed; and in elevation, every pipe's
 * standing height against the clear height in the case. No hooks: plain SVG that prints.
 */
import type { DivisionPlanting, PlantedChest, PlantedRow } from "@/lib/drawing/chest-planting";
import { lengthUnitLabel, type DrawingUnits } from "@/lib/drawing/units";
import { lengthNumber } from "@/components/spec/chest-words";

const INK = "#1d2433";
const TIN = "#6b737d";
const CLASH = "#c2412d";
const OAK = "#7a5230";
const CARD = "#fffdf8";

function Rows({ rows, length }: { rows: readonly PlantedRow[]; length: number }) {
  return (
    <>
      {rows.map((r, i) => (
        <g key={i}>
          <title>{r.label}</title>
          {i > 0 && <line x1={0} x2={length} y1={r.y} y2={r.y} stroke={TIN} strokeWidth={0.6} vectorEffect="non-scaling-stroke" opacity={0.35} />}
          {r.pipes.map((p, j) => {
            const dash = p.state === "prepared" ? "3 2" : undefined;
            // Existing pipes (kept, restored, reused) are drawn hatched-grey, new ones in ink.
            const old = p.state !== "new" && p.state !== "prepared";
            return p.wood ? (
              <rect key={j} x={p.x - p.size / 2} y={p.y - p.size / 2} width={p.size} height={p.size} fill={old ? "#efe6da" : "none"} stroke={OAK} strokeWidth={0.9} strokeDasharray={dash} vectorEffect="non-scaling-stroke" />
            ) : (
              <circle key={j} cx={p.x} cy={p.y} r={p.size / 2} fill={old ? "#e6e8ea" : "none"} stroke={INK} strokeWidth={0.8} strokeDasharray={dash} vectorEffect="non-scaling-stroke" />
            );
          })}
        </g>
      ))}
    </>
  );
}

/** The plan: the main chest with its sides, rows and passage board, the space dashed, and any offset chest below. */
export function ChestPlanSvg({
  planting, space, clash, words, units,
}: {
  planting: DivisionPlanting;
  space: { lengthMm: number; depthMm: number } | null;
  clash: boolean;
  words: string;
  units: DrawingUnits;
}) {
  const plan = planting.main;
  const name = planting.divisionName;
  const u = lengthUnitLabel(units);
  const w = Math.max(plan.lengthMm, space?.lengthMm ?? 0, planting.offset?.lengthMm ?? 0);
  const h = Math.max(plan.depthMm, space?.depthMm ?? 0);
  const m = Math.max(w, 800) * 0.06;
  const font = Math.max(w, 800) / 55;
  const offsetGap = planting.offset ? m * 1.2 : 0;
  const offsetH = planting.offset ? planting.offset.depthMm + font * 1.5 : 0;
  const spaceColour = clash ? CLASH : TIN;
  return (
    <svg viewBox={`0 0 ${w + 2 * m} ${h + 2 * m + offsetGap + offsetH}`} className="h-auto w-full bg-paper" role="img" aria-label={`Chest of the ${name}: ${words}`} style={{ maxHeight: "60vh" }} data-testid={`chest-plan-${name}`}>
      <g transform={`translate(${m} ${m})`}>
        <rect x={0} y={0} width={plan.lengthMm} height={plan.depthMm} fill={CARD} stroke={INK} strokeWidth={1.4} vectorEffect="non-scaling-stroke" />
        {plan.passageMm > 0 && (
          <rect x={0} y={plan.depthMm - plan.passageMm} width={plan.lengthMm} height={plan.passageMm} fill="#efe9dc" stroke={INK} strokeWidth={0.6} vectorEffect="non-scaling-stroke" />
        )}
        {plan.splitMm !== null && (
          <>
            <line x1={plan.splitMm} x2={plan.splitMm} y1={0} y2={plan.depthMm} stroke={INK} strokeWidth={0.8} strokeDasharray="8 3 2 3" vectorEffect="non-scaling-stroke" />
            <text x={plan.splitMm / 2} y={plan.depthMm + font * 1.1} fontSize={font * 0.8} textAnchor="middle" fill={TIN}>C side</text>
            <text x={(plan.splitMm + plan.lengthMm) / 2} y={plan.depthMm + font * 1.1} fontSize={font * 0.8} textAnchor="middle" fill={TIN}>C♯ side</text>
          </>
        )}
        <Rows rows={plan.rows} length={plan.lengthMm} />
        {space && (
          <rect x={0} y={0} width={space.lengthMm} height={space.depthMm} fill="none" stroke={spaceColour} strokeWidth={clash ? 2.2 : 1.4} strokeDasharray="10 6" vectorEffect="non-scaling-stroke" data-testid={`chest-space-${name}`} data-fits={clash ? "no" : "yes"} />
        )}
        {/* Drawn after the space's outline, on a halo of the board's colour, so a dashed edge crossing it does not strike it through. */}
        {plan.passageMm > 0 && (
          <text x={plan.lengthMm / 2} y={plan.depthMm - plan.passageMm / 2} fontSize={font * 0.8} textAnchor="middle" dominantBaseline="middle" fill={TIN}
            stroke="#efe9dc" strokeWidth={font * 0.35} paintOrder="stroke" strokeLinejoin="round">passage board</text>
        )}
        <g fontSize={font} fill={INK} className="num">
          <line x1={0} x2={plan.lengthMm} y1={-m * 0.45} y2={-m * 0.45} stroke={INK} strokeWidth={0.7} vectorEffect="non-scaling-stroke" />
          <line x1={0} x2={0} y1={-m * 0.65} y2={-m * 0.25} stroke={INK} strokeWidth={0.7} vectorEffect="non-scaling-stroke" />
          <line x1={plan.lengthMm} x2={plan.lengthMm} y1={-m * 0.65} y2={-m * 0.25} stroke={INK} strokeWidth={0.7} vectorEffect="non-scaling-stroke" />
          <text x={plan.lengthMm / 2} y={-m * 0.6} textAnchor="middle">{lengthNumber(plan.lengthMm, units)} {u} needed</text>
          <text x={w + m * 0.15} y={plan.depthMm / 2} dominantBaseline="middle" fontSize={font * 0.85}>{lengthNumber(plan.depthMm, units)}</text>
          {space && (
            <text x={space.lengthMm} y={Math.max(space.depthMm, plan.depthMm) + font * 2.3} textAnchor="end" fill={spaceColour} fontSize={font * 0.85}>
              space {lengthNumber(space.lengthMm, units)} × {lengthNumber(space.depthMm, units)} {u}
            </text>
          )}
        </g>
        {planting.offset && (
          <g transform={`translate(0 ${h + offsetGap})`}>
            <text x={0} y={-font * 0.4} fontSize={font * 0.85} fill={TIN}>
              offset bass chest, stands elsewhere in the case and is conveyanced from the main chest: {lengthNumber(planting.offset.lengthMm, units)} × {lengthNumber(planting.offset.depthMm, units)} {u}
            </text>
            <rect x={0} y={0} width={planting.offset.lengthMm} height={planting.offset.depthMm} fill={CARD} stroke={INK} strokeWidth={1.2} vectorEffect="non-scaling-stroke" />
            <Rows rows={planting.offset.rows} length={planting.offset.lengthMm} />
          </g>
        )}
      </g>
    </svg>
  );
}

function Front({ chest, dx, available, chestHeightMm }: { chest: PlantedChest; dx: number; available: number | null; chestHeightMm: number }) {
  // Back rows first, so the front rows' pipes stand before them, as one sees them from the front.
  return (
    <g transform={`translate(${dx} 0)`}>
      <rect x={0} y={0} width={chest.lengthMm} height={chestHeightMm} fill="#efe9dc" stroke={INK} strokeWidth={1.2} vectorEffect="non-scaling-stroke" />
      {chest.rows.map((r, i) => (
        <g key={i} opacity={0.45 + (0.55 * (i + 1)) / chest.rows.length}>
          <title>{r.label}</title>
          {r.pipes.map((p, j) => {
            const tall = available !== null && p.heightMm > available;
            return (
              <rect key={j} x={p.x - p.size / 2} y={-p.heightMm} width={p.size} height={p.heightMm} fill={tall ? "#f5d9d2" : CARD} stroke={tall ? CLASH : p.wood ? OAK : INK} strokeWidth={tall ? 1.1 : 0.6} strokeDasharray={p.state === "prepared" ? "3 2" : undefined} vectorEffect="non-scaling-stroke" data-too-tall={tall ? "yes" : undefined} />
            );
          })}
        </g>
      ))}
    </g>
  );
}

/** The elevation: every pipe's standing height over its chest, the clear height in the case as a dashed line. */
export function ChestElevationSvg({ planting, chestHeightMm, units }: { planting: DivisionPlanting; chestHeightMm: number; units: DrawingUnits }) {
  const { main, offset, elevation } = planting;
  const name = planting.divisionName;
  const u = lengthUnitLabel(units);
  const gap = offset ? Math.max(main.lengthMm, 800) * 0.08 : 0;
  const w = main.lengthMm + (offset ? gap + offset.lengthMm : 0);
  const top = Math.max(elevation.tallestMm, elevation.availableMm ?? 0);
  const m = Math.max(w, top, 800) * 0.05;
  const font = Math.max(w, top, 800) / 55;
  const tooTall = elevation.tooTall.length > 0;
  const words = elevation.availableMm === null
    ? `tallest pipe ${lengthNumber(elevation.tallestMm, units)} ${u}; height in the case not yet given`
    : tooTall
      ? `tallest pipe ${lengthNumber(elevation.tallestMm, units)} ${u}, clear height ${lengthNumber(elevation.availableMm, units)} ${u}: ${elevation.tooTall.length} ${elevation.tooTall.length === 1 ? "rank is" : "ranks are"} too tall`
      : `tallest pipe ${lengthNumber(elevation.tallestMm, units)} ${u}, clear height ${lengthNumber(elevation.availableMm, units)} ${u}: every pipe stands`;
  return (
    <svg
      viewBox={`${-m} ${-top - m - font * 1.5} ${w + 2 * m} ${top + chestHeightMm + 2 * m + font * 1.5}`}
      className="h-auto w-full bg-paper"
      role="img"
      aria-label={`Elevation of the ${name}: ${words}`}
      style={{ maxHeight: "50vh" }}
      data-testid={`chest-elevation-${name}`}
    >
      <Front chest={main} dx={0} available={elevation.availableMm} chestHeightMm={chestHeightMm} />
      {offset && <Front chest={offset} dx={main.lengthMm + gap} available={elevation.availableMm} chestHeightMm={chestHeightMm} />}
      {offset && <text x={main.lengthMm + gap} y={chestHeightMm + font * 1.2} fontSize={font * 0.8} fill={TIN}>offset chest</text>}
      {elevation.availableMm !== null && (
        <g data-testid={`chest-height-${name}`} data-fits={tooTall ? "no" : "yes"}>
          <line x1={-m * 0.5} x2={w + m * 0.5} y1={-elevation.availableMm} y2={-elevation.availableMm} stroke={tooTall ? CLASH : TIN} strokeWidth={tooTall ? 2 : 1.3} strokeDasharray="10 6" vectorEffect="non-scaling-stroke" />
          <text x={w + m * 0.5} y={-elevation.availableMm - font * 0.4} textAnchor="end" fontSize={font * 0.85} fill={tooTall ? CLASH : TIN} className="num">
            clear height {lengthNumber(elevation.availableMm, units)} {u}
          </text>
        </g>
      )}
      <text x={0} y={chestHeightMm + font * 1.2} fontSize={font * 0.8} fill={TIN}>chest and rackboards</text>
    </svg>
  );
}
