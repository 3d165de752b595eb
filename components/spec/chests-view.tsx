"use client";
import { useMemo } from "react";
import type { SchemeDocument, Tuning } from "@/lib/spec/document";
import type { DrawingRules } from "@/lib/spec/estimate";
import { plantScheme } from "@/lib/drawing/chest-planting";
import { ChestBoard } from "@/components/drawing/chest-board";
import { useDrawingScheme } from "./drawing-scheme";
import type { Figures } from "./use-figures";

/** Every division's chests in plan and elevation, their loads and wind, from the same figures the editor shows. */
export function ChestsView({ doc, tuning, figures, rates }: { doc: SchemeDocument; tuning: Tuning; figures: Figures | null; rates: DrawingRules }) {
  // Planted here, only while the drawings are open: the figures come from the worker, the pipe positions from the same rules.
  const parsed = useDrawingScheme(doc, tuning, figures);
  const drawings = useMemo(() => {
    if (!figures?.ok || !parsed) return null;
    const planted = new Map(plantScheme(parsed.scheme, rates, parsed.plan).map((p) => [p.divisionId, p]));
    return figures.estimate.divisions.map((d) => ({ d, planting: planted.get(d.id) ?? null }));
  }, [parsed, figures, rates]);
  if (!figures) return <div className="panel p-4 text-sm text-tin" data-testid="chests" aria-busy="true">Working out the chests…</div>;
  if (!figures.ok || !drawings) {
    return (
      <div className="panel p-4 text-sm text-caution" data-testid="chests">
        The drawings wait for the scheme to be complete: {figures.ok ? "" : figures.messages[0]}
      </div>
    );
  }
  return (
    <div className="space-y-4" data-testid="chests">
      {drawings.map(({ d, planting }) => (
        <ChestBoard
          key={d.id}
          divisionName={d.name}
          planting={planting}
          need={d.chest.main}
          space={d.chest.space}
          fit={d.chest.fit}
          windM3PerMin={d.windM3PerMin}
          chestHeightMm={rates.chest.heightMm}
          units={rates.drawingUnits}
        />
      ))}
    </div>
  );
}
