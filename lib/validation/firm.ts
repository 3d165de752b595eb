/** The firm's details as the admin page edits them: one schema for the form and the server. */
import { z } from "zod";

const line = (what: string, max: number) => z.string().trim().max(max, `Keep ${what} under ${max} characters.`);

export const firmDetailsSchema = z.object({
  name: z.string().trim().min(1, "Give the firm's name, as it should appear on tenders.").max(160, "Keep the name under 160 characters."),
  address: line("the address", 600).default(""),
  email: z.union([z.literal(""), z.string().trim().toLowerCase().email("Enter an e-mail address such as office@firm.example.")]).default(""),
  phone: line("the telephone number", 60).default(""),
  website: line("the website", 200).default(""),
  registration: line("the registration line", 300).default(""),
});

/** Logo: keep, remove, or a new PNG or SVG file sent as base64 (at most 512 KiB). */
export const LOGO_MAX_BYTES = 512 * 1024;
export const logoChangeSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("keep") }),
  z.object({ kind: z.literal("remove") }),
  z.object({
    kind: z.literal("upload"),
    type: z.enum(["image/png", "image/svg+xml"], { error: "The logo must be a PNG or SVG file." }),
    base64: z.string().min(1, "The logo file is empty.").max(Math.ceil((LOGO_MAX_BYTES * 4) / 3) + 4, "The logo file is larger than 512 KiB."),
  }),
]);

export const saveFirmSchema = z.object({
  version: z.number().int().min(1),
  details: firmDetailsSchema,
  logo: logoChangeSchema.default({ kind: "keep" }),
});

export type FirmDetailsInput = z.input<typeof firmDetailsSchema>;
export type SaveFirmInput = z.input<typeof saveFirmSchema>;
