/** An import of a stop list (CSV) or scheme file (JSON) into a project: the request and the preview. Pure. */
import { z } from "zod";
import type { SchemeDocument } from "./document";
import type { Origin, PipeWork } from "@/lib/estimate/scheme";
import type { ImportProblem } from "./stop-list-csv";

/** Far above any organ's stop list (a 250-stop CSV is about 100 kB), so a runaway file is refused early. */
export const IMPORT_MAX_CHARS = 2_000_000;

export const importFormats = ["csv", "json"] as const;
export type ImportFormat = (typeof importFormats)[number];

export function formatForFileName(name: string): ImportFormat | null {
  if (/\.csv$/i.test(name)) return "csv";
  if (/\.json$/i.test(name)) return "json";
  return null;
}

export const importRequestSchema = z.object({
  format: z.enum(importFormats, "Choose a .csv stop list or a .json scheme file."),
  fileName: z.string().trim().min(1).max(200),
  text: z.string().max(IMPORT_MAX_CHARS, "The file is larger than 2 MB; a stop list is far smaller. Is it the right file?"),
  target: z.discriminatedUnion("kind", [
    z.object({ kind: z.literal("new"), name: z.string().trim().max(120).optional() }),
    z.object({
      kind: z.literal("replace"),
      schemeId: z.uuid("Choose the draft whose document the file replaces."),
      /** The version the preview was made against; a scheme saved since is refused with 409. */
      version: z.number().int().min(1).optional(),
    }),
  ]),
});
export type ImportRequest = z.input<typeof importRequestSchema>;

export type ImportSummary = {
  name: string;
  divisions: { name: string; keyboard: string; stops: { name: string; footage: string | number; ranks: number; family: string; origin: Origin; work: PipeWork[] }[] }[];
  stopCount: number;
};

export type ImportPreview =
  | { ok: true; notes: string[]; summary: ImportSummary; target: { kind: "new"; name: string } | { kind: "replace"; schemeId: string; schemeName: string; version: number } }
  | { ok: false; notes: string[]; problems: ImportProblem[] };

export function summarise(doc: SchemeDocument): ImportSummary {
  return {
    name: doc.name,
    divisions: doc.divisions.map((d) => ({
      name: d.name,
      keyboard: d.keyboard,
      stops: d.stops.map((s) => ({ name: s.name, footage: s.footage, ranks: s.ranks, family: s.family, origin: s.origin, work: [...s.work] })),
    })),
    stopCount: doc.divisions.reduce((n, d) => n + d.stops.length, 0),
  };
}
