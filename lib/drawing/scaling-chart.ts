/**
 * What a division's scaling chart draws: each rank's pipes as their deviation from the normal scale
 * in semitones (scale-fit.ts, `deviationHt`), key by key across the compass, from the same per-pipe
 * geometry as the pipe tables. Pure.
 */
import { pipesOfStop, type GeometryRules, type PipeState } from "@/lib/estimate/geometry";
import { frequencyHz } from "@/lib/estimate/pitch";
import type { SchemePlan } from "@/lib/estimate/pipes";
import type { Scheme } from "@/lib/estimate/scheme";
import { deviationHt } from "./scale-fit";

export interface ScalePoint {
  readonly keyMidi: number;
  readonly key: string;
  /** Semitones wider (+) or narrower (−) than the normal scale at this pipe. */
  readonly deviationHt: number;
  readonly state: PipeState;
}

export interface ScaleLine {
  readonly stopId: string;
  readonly stopName: string;
  /** Mixtures: the rank, from 1; 1 for a single rank. */
  readonly rank: number;
  readonly ranks: number;
  readonly footageText: string;
  readonly kind: SchemePlan["stops"][number]["kind"];
  /** The stop's own scale as set (extensions draw on their rank's). */
  readonly scale: Scheme["divisions"][number]["stops"][number]["scale"];
  readonly wooden: boolean;
  readonly points: readonly ScalePoint[];
}

export interface ScalingChart {
  readonly divisionId: string;
  readonly divisionName: string;
  readonly lowKey: number;
  readonly highKey: number;
  readonly lines: readonly ScaleLine[];
}

/** Pipes a rank's line shows: its own (made, kept or prepared), not those it shares or borrows. */
const DRAWN: ReadonlySet<PipeState> = new Set(["new", "reused", "restored", "prepared"]);

/** The scaling chart of one division of a planned scheme. */
export function scalingChart(scheme: Scheme, divisionId: string, rules: GeometryRules, plan: SchemePlan): ScalingChart {
  const di = scheme.divisions.findIndex((d) => d.id === divisionId);
  const dp = plan.divisions[di];
  const c8 = frequencyHz(36, scheme.tuning.pitchHz);
  const lines: ScaleLine[] = [];
  for (const si of dp.stops) {
    const sp = plan.stops[si];
    if (sp.kind === "borrowed" || sp.kind === "removed") continue;
    const byRank = new Map<number, ScalePoint[]>();
    for (const p of pipesOfStop(scheme, sp.stop.id, rules, plan)) {
      if (!DRAWN.has(p.state)) continue;
      // Semitones above 8′ C from the pipe's own frequency: right for mutations and mixture breaks alike.
      const s = 12 * Math.log2(p.frequencyHz / c8);
      const pts = byRank.get(p.rank) ?? [];
      pts.push({ keyMidi: p.keyMidi, key: p.key, deviationHt: deviationHt(s, p.diameterMm), state: p.state });
      byRank.set(p.rank, pts);
    }
    const ranks = byRank.size;
    for (const [rank, points] of byRank)
      lines.push({
        stopId: sp.stop.id, stopName: sp.stop.name, rank, ranks, footageText: sp.footageText, kind: sp.kind, scale: sp.stop.scale,
        wooden: ["pine", "oak", "mahogany"].includes(sp.stop.material), points,
      });
  }
  return { divisionId, divisionName: dp.division.name, lowKey: dp.lowKey, highKey: dp.highKey, lines };
}
