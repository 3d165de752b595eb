/**
 * The scheme document the editor edits and the API saves: the estimator's scheme model
 * (lib/estimate/scheme.ts) without the tuning, which belongs to the project, plus a description.
 * Stops of the first format (a `treatment` word) are read through the scheme model's upgrade.
 * Pure: shared by the browser (forms, live figures) and the server (validation before saving).
 */
import { z } from "zod";
import "@/lib/validation/messages";
import { accessoriesSchema, caseSchema, divisionSchema, siteSchema, windSchema, type SchemeInput } from "@/lib/estimate/scheme";

export const schemeStatuses = ["draft", "proposed", "preferred", "accepted", "withdrawn"] as const;
export type SchemeStatus = (typeof schemeStatuses)[number];

export const schemeDocumentSchema = z.object({
  name: z.string().trim().min(1, "Give the scheme a name.").max(120),
  description: z.string().max(4000, "Keep the description under 4000 characters.").default(""),
  divisions: z.array(divisionSchema).max(16, "At most 16 divisions.").default([]),
  accessories: accessoriesSchema.prefault({}),
  /** The case and its front, the wind system and the site: the organ's work beyond its divisions. */
  case: caseSchema.prefault({}),
  wind: windSchema.prefault({}),
  site: siteSchema.prefault({}),
});
export type SchemeDocumentInput = z.input<typeof schemeDocumentSchema>;
export type SchemeDocument = z.output<typeof schemeDocumentSchema>;
export type DocDivision = SchemeDocument["divisions"][number];
export type DocStop = DocDivision["stops"][number];

/** A scheme version: a positive whole number within PostgreSQL's integer column (2^31 − 1). */
export const revisionNumber = z.number({ error: "A version is a whole number." }).int("A version is a whole number.").min(1, "Versions start at 1.").max(2_147_483_647, "No scheme has that many versions.");

export const saveSchemeSchema = z.object({
  /** The version the edit was based on; a stale one is refused with 409. */
  version: revisionNumber,
  document: schemeDocumentSchema,
  /** Optional words for the revision list ("moved the Trompette to the Swell"). */
  note: z.string().max(200).optional(),
});

export type Tuning = { pitchHz: number; temperatureC: number };

/** What GET /api/schemes/:id answers (and PUT on success). */
export type SchemeRead = {
  id: string;
  projectId: string;
  name: string;
  description: string;
  status: SchemeStatus;
  sharedWithClient: boolean;
  version: number;
  copiedFromId: string | null;
  updatedAt: string;
  updatedByName: string | null;
  tuning: Tuning;
  document: SchemeDocument;
};

/** The estimator's input for a document under a project's tuning. */
export function toEstimatorScheme(doc: SchemeDocument, tuning: Tuning): SchemeInput {
  return {
    name: doc.name,
    tuning: { pitchHz: tuning.pitchHz, temperatureC: tuning.temperatureC, mutations: "tempered" },
    divisions: doc.divisions,
    accessories: doc.accessories,
    case: doc.case,
    wind: doc.wind,
    site: doc.site,
  };
}

export const newSchemeSchema = z.object({
  name: z.string().trim().min(1, "Give the scheme a name.").max(120),
  description: z.string().max(4000).default(""),
  /** Optional starting document (e.g. an imported scheme file); empty otherwise. */
  document: z.unknown().optional(),
});
export const duplicateSchemeSchema = z.object({ name: z.string().trim().min(1, "Give the copy a name.").max(120) });
export const schemeMetaSchema = z
  .object({ status: z.enum(schemeStatuses).optional(), sharedWithClient: z.boolean().optional() })
  .refine((v) => v.status !== undefined || v.sharedWithClient !== undefined, "Nothing to change.");
export const restoreSchema = z.object({ version: revisionNumber });
