/** Project shapes shared by forms, the API and the pages. Pure. */
import { z } from "zod";
import { cleanName } from "@/lib/validation/names";
import { emailField } from "@/lib/validation/text";
import type { SchemeRead } from "./document";

export const projectStatuses = ["enquiry", "design", "tender", "contracted", "workshop", "site", "complete"] as const;
export type ProjectStatus = (typeof projectStatuses)[number];
export const projectStatusLabels: Record<ProjectStatus, string> = {
  enquiry: "Enquiry",
  design: "Design",
  tender: "Tender",
  contracted: "Contracted",
  workshop: "In the workshop",
  site: "On site",
  complete: "Complete",
};

/**
 * A completion date: a real calendar day (zod refuses 2027-02-30) in years a job can have.
 * PostgreSQL has no year 0 and the trade no jobs before 1900, so both ends are bounded.
 */
export const targetDateSchema = z
  .string()
  .max(10, { abort: true, error: "Use a date like 2028-09-30." })
  .pipe(z.iso.date("Use a date like 2028-09-30."))
  .refine((d) => d >= "1900-01-01" && d <= "2199-12-31", "Use a date between 1900 and 2199.");

export const projectInputSchema = z.object({
  name: cleanName(z.string().trim().min(1, "Give the project a name.").max(160)),
  clientName: cleanName(z.string().trim().min(1, "Name the client (church, school, hall…).").max(160)),
  venue: z.string().trim().max(160).default(""),
  location: z.string().trim().max(160).default(""),
  instrument: z.string().trim().max(300).default(""),
  status: z.enum(projectStatuses).default("enquiry"),
  /** ISO date (YYYY-MM-DD) or null. */
  targetDate: targetDateSchema.nullable().default(null),
  pitchHz: z.number({ error: "Pitch is a number in Hz." }).min(380, "Pitch below 380 Hz is not supported.").max(480, "Pitch above 480 Hz is not supported.").default(440),
  temperatureC: z.number({ error: "Temperature is a number in °C." }).min(-10, "Use a temperature from −10 to 40 °C.").max(40, "Use a temperature from −10 to 40 °C.").default(18),
  notes: z.string().max(4000, "Keep the notes under 4000 characters.").default(""),
});
export type ProjectInput = z.input<typeof projectInputSchema>;
export const projectPatchSchema = projectInputSchema.partial();

/** The status alone, for the roles that manage where a project stands but not its details. */
export const projectStatusSchema = z.object({ status: z.enum(projectStatuses, { error: "Choose one of the project statuses." }) });

export type ProjectSummary = {
  id: string;
  name: string;
  clientName: string;
  venue: string;
  location: string;
  instrument: string;
  status: ProjectStatus;
  targetDate: string | null;
  archived: boolean;
  schemeCount: number;
  updatedAt: string;
};

export type ProjectMember = { id: string; name: string; email: string; role: string };

export type ProjectRead = ProjectSummary & { pitchHz: number; temperatureC: number; notes: string; members: ProjectMember[] };

/** A scheme as a project's list shows it: its row, without the document. */
export type SchemeSummary = Omit<SchemeRead, "projectId" | "updatedByName" | "tuning" | "document"> & {
  stopCount: number;
  divisionCount: number;
};

export const archiveSchema = z.object({ archived: z.boolean() });
export const memberSchema = z.object({ email: emailField });
