"use client";
import { ChestsView } from "@/components/spec/chests-view";
import { useFigures } from "@/components/spec/use-figures";
import type { Rates } from "@/lib/estimate";
import type { SchemeDocument, Tuning } from "@/lib/spec/document";

export function ChestsClient({ document, tuning, rates }: { document: SchemeDocument; tuning: Tuning; rates: Rates }) {
  const figures = useFigures(document, tuning, rates);
  return <ChestsView figures={figures} rates={rates} />;
}
