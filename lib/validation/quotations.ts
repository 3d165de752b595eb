/** Requests to the quotations API; the commercial terms are lib/quote/commercial.ts's schema. */
import { z } from "zod";
import { commercialSchema } from "@/lib/quote/commercial";

export const newQuotationSchema = z.object({
  schemeId: z.string({ error: "Choose a scheme of this project." }).min(1, "Choose a scheme of this project."),
  /** The rate set to price with; the firm's current set when absent. */
  rateSetId: z.string().nullable().optional(),
});

export const saveQuotationSchema = z.object({ version: z.number().int().min(1), commercial: commercialSchema });
export const issueQuotationSchema = z.object({ version: z.number().int().min(1) });
export const decisionSchema = z.object({ outcome: z.enum(["accepted", "declined"], { error: "Record the answer as accepted or declined." }) });
