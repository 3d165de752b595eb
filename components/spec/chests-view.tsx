"use client";
import { useMemo } from "react";
import { ChestDrawing } from "./chest-drawing";
import type { DrawingRules } from "@/lib/spec/estimate";
import { layChest } from "./chest-layout";
import type { Figures } from "./use-figures";

/** A drawing of every division's chest, from the same figures the editor shows. */
export function ChestsView({ figures, rates }: { figures: Figures; rates: DrawingRules }) {
  const drawings = useMemo(() => {
    if (!figures.ok) return null;
    return figures.estimate.divisions.map((d) => ({ d, plan: layChest(figures.scheme, d.id, rates) }));
  }, [figures, rates]);
  if (!figures.ok || !drawings) {
    return (
      <div className="panel p-4 text-sm text-caution" data-testid="chests">
        The drawings wait for the scheme to be complete: {figures.ok ? "" : figures.messages[0]}
      </div>
    );
  }
  return (
    <div className="space-y-4" data-testid="chests">
      {drawings.map(({ d, plan }) => (
        <ChestDrawing key={d.id} divisionName={d.name} plan={plan} need={d.chest.main} space={d.chest.space} fit={d.chest.fit} />
      ))}
    </div>
  );
}
