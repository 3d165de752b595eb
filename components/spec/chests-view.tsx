"use client";
import { useMemo } from "react";
import type { SchemeDocument, Tuning } from "@/lib/spec/document";
import type { DrawingRules } from "@/lib/spec/estimate";
import { ChestDrawing } from "./chest-drawing";
import { layChest } from "./chest-layout";
import { useDrawingScheme } from "./drawing-scheme";
import type { Figures } from "./use-figures";

/** A drawing of every division's chest, from the same figures the editor shows. */
export function ChestsView({ doc, tuning, figures, rates }: { doc: SchemeDocument; tuning: Tuning; figures: Figures | null; rates: DrawingRules }) {
  // Drawn here, only while the drawings are open: the figures come from the worker, the pipe positions from the same rules.
  const parsed = useDrawingScheme(doc, tuning, figures);
  const drawings = useMemo(() => {
    if (!figures?.ok || !parsed) return null;
    return figures.estimate.divisions.map((d) => ({ d, plan: layChest(parsed.scheme, d.id, rates) }));
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
      {drawings.map(({ d, plan }) => (
        <ChestDrawing key={d.id} divisionName={d.name} plan={plan} need={d.chest.main} space={d.chest.space} fit={d.chest.fit} />
      ))}
    </div>
  );
}
