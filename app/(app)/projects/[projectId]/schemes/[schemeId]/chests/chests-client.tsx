"use client";
import { ChestsView } from "@/components/spec/chests-view";
import { useFigures } from "@/components/spec/use-figures";
import type { SchemeDocument, Tuning } from "@/lib/spec/document";

export function ChestsClient({ document, tuning }: { document: SchemeDocument; tuning: Tuning }) {
  const figures = useFigures(document, tuning);
  return <ChestsView figures={figures} />;
}
