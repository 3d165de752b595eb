"use client";
import { ChestsView } from "@/components/spec/chests-view";
import { drawingRulesOf, useFigures, type FigureSource } from "@/components/spec/use-figures";
import type { SchemeDocument, Tuning } from "@/lib/spec/document";

export function ChestsClient({ document, tuning, source }: { document: SchemeDocument; tuning: Tuning; source: FigureSource }) {
  const { figures } = useFigures(document, tuning, source);
  return <ChestsView doc={document} tuning={tuning} figures={figures} rates={drawingRulesOf(source)} />;
}
