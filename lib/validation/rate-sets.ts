/** Requests to the rate book's API. The rates themselves are checked field by field by lib/rates-book. */
import { z } from "zod";

export const isoDate = z.iso.date("Give the effective date as a date like 2027-01-31.");

export const newRateSetSchema = z.object({
  name: z.string().trim().min(1, "Give the rate set a name.").max(120, "Keep the name under 120 characters."),
  /** The set to copy; the current one when absent. */
  copyFrom: z.uuid("Choose a rate set to copy.").nullable().optional(),
});

export const saveRatesSchema = z.object({
  /** The version the edit was based on; a stale one is refused with 409. */
  version: z.number().int().min(1),
  effectiveDate: isoDate,
  note: z.string().trim().max(300, "Keep the note under 300 characters.").default(""),
  /** Every rate as the form holds it (text or numbers), nested as the estimator's rates are. */
  rates: z.record(z.string(), z.unknown(), { error: "Send the rates as an object." }),
});

export const importRatesSchema = z.object({
  version: z.number().int().min(1),
  /** The CSV file's text, as a spreadsheet saved it. At most 1 MiB. */
  csv: z.string().max(1024 * 1024, "The file is larger than 1 MiB; a rate set is far smaller."),
  /** False: only check and preview. True: save, if and only if every row is good. */
  commit: z.boolean().default(false),
  note: z.string().trim().max(300).default(""),
});
