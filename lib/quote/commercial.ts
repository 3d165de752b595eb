/**
 * The commercial part of a quotation, beside the figures the estimator computes: lump sums, provisional
 * sums, priced options, exclusions, a discount, validity, currency, tax and payment stages. One zod
 * schema for the form and the server; every message is the product's own and says where.
 */
import { z } from "zod";
import { currencyProblem } from "./currency";

const MONEY = /^\d{1,12}(\.\d{1,2})?$/;

/** A money amount typed as text: never negative, at most two decimals. */
export function moneyText(what: string) {
  return z
    .string({ error: `${what}: enter an amount such as 1250.00.` })
    .trim()
    .superRefine((v, ctx) => {
      if (v.startsWith("-") || v.startsWith("−")) ctx.addIssue({ code: "custom", message: `${what} cannot be negative.` });
      else if (!MONEY.test(v)) ctx.addIssue({ code: "custom", message: `${what}: enter an amount such as 1250.00, with at most 2 decimals and no thousands separators.` });
    });
}

function percentText(what: string, { allowZero = true } = {}) {
  return z
    .string({ error: `${what}: enter a percentage such as 20.` })
    .trim()
    .superRefine((v, ctx) => {
      if (!/^\d{1,3}(\.\d{1,2})?$/.test(v)) ctx.addIssue({ code: "custom", message: `${what}: enter a percentage such as 12.5, with at most 2 decimals.` });
      else if (Number(v) > 100) ctx.addIssue({ code: "custom", message: `${what} cannot be more than 100 %.` });
      else if (!allowZero && Number(v) === 0) ctx.addIssue({ code: "custom", message: `${what} must be more than 0 %.` });
    });
}

const id = z.string().trim().min(1).max(40);
const text = (what: string, max: number) => z.string({ error: `Give ${what}.` }).trim().min(1, `Give ${what}.`).max(max, `Keep ${what} under ${max} characters.`);

export const lumpSumCategories = ["case", "decoration", "scaffolding", "building", "blower", "electrical", "transport", "other"] as const;
export type LumpSumCategory = (typeof lumpSumCategories)[number];
export const lumpSumCategoryLabels: Readonly<Record<LumpSumCategory, string>> = {
  case: "Casework",
  decoration: "Decoration and pipe-shade gilding",
  scaffolding: "Scaffolding and access",
  building: "Builder's work",
  blower: "Blower and wind supply",
  electrical: "Electrical supplies",
  transport: "Transport and storage",
  other: "Other work",
};

export const taxTreatments = ["standard", "reduced", "zero-rated", "exempt", "reverse-charge"] as const;
export type TaxTreatment = (typeof taxTreatments)[number];
export const taxTreatmentLabels: Readonly<Record<TaxTreatment, string>> = {
  standard: "Standard rate",
  reduced: "Reduced rate",
  "zero-rated": "Zero-rated",
  exempt: "Exempt",
  "reverse-charge": "Reverse charge (the client accounts for the tax)",
};
/** Treatments that charge tax at the given percentage; the others charge none and say why. */
export const taxCharged: ReadonlySet<TaxTreatment> = new Set(["standard", "reduced"]);

export const lumpSumSchema = z.object({
  id,
  category: z.enum(lumpSumCategories, { error: "Choose a category." }),
  description: text("a description", 300),
  quantity: z
    .string({ error: "Quantity: enter a number such as 1." })
    .trim()
    .superRefine((v, ctx) => {
      if (v.startsWith("-")) ctx.addIssue({ code: "custom", message: "Quantity cannot be negative." });
      else if (!/^\d{1,9}(\.\d{1,3})?$/.test(v) || Number(v) === 0) ctx.addIssue({ code: "custom", message: "Quantity: enter a number above 0 with at most 3 decimals, e.g. 1 or 2.5." });
    }),
  unit: text("a unit (item, day, m²…)", 20),
  unitPrice: moneyText("Unit price"),
});

export const provisionalSumSchema = z.object({ id, description: text("a description", 300), amount: moneyText("Provisional sum") });

export const optionSchema = z.object({
  id,
  title: text("the option a title", 160),
  description: z.string().trim().max(1000, "Keep the description under 1000 characters.").default(""),
  price: moneyText("Option price"),
});

export const stageSchema = z.object({ id, label: text("the stage a name", 120), percent: percentText("Stage", { allowZero: false }) });

export const discountSchema = z
  .object({ kind: z.enum(["none", "amount", "percent"], { error: "Choose no discount, an amount or a percentage." }), value: z.string().trim().default("") })
  .superRefine((d, ctx) => {
    if (d.kind === "none") return;
    const r = (d.kind === "amount" ? moneyText("Discount") : percentText("Discount")).safeParse(d.value);
    if (!r.success) for (const i of r.error.issues) ctx.addIssue({ code: "custom", message: i.message, path: ["value"] });
  });

/** Percentages as exact hundredths, so 33.33 + 33.33 + 33.34 is exactly 100 without a float in sight. */
export function hundredths(percent: string): number {
  const [w, f = ""] = percent.trim().split(".");
  return Number(w) * 100 + Number((f + "00").slice(0, 2));
}

export const commercialSchema = z
  .object({
    introduction: z.string().max(4000, "Keep the introduction under 4000 characters.").default(""),
    /** The day work would start, for the programme's dates (yyyy-mm-dd). */
    startDate: z.iso.date("Give the start date as a date like 2027-06-01.").nullable().default(null),
    lumpSums: z.array(lumpSumSchema).max(60, "At most 60 lump sums.").default([]),
    provisionalSums: z.array(provisionalSumSchema).max(30, "At most 30 provisional sums.").default([]),
    options: z.array(optionSchema).max(30, "At most 30 options.").default([]),
    exclusions: z.array(text("the exclusion some words", 500)).max(40, "At most 40 exclusions.").default([]),
    discount: discountSchema.default({ kind: "none", value: "" }),
    validityDays: z.number({ error: "Validity: enter a number of days." }).int("Validity is a whole number of days.").min(1, "Validity must be at least 1 day.").max(365, "Validity can be at most 365 days."),
    currency: z
      .string({ error: "Choose a currency." })
      .trim()
      .superRefine((v, ctx) => {
        const p = currencyProblem(v);
        if (p) ctx.addIssue({ code: "custom", message: `Currency: ${p}.` });
      }),
    tax: z.object({ treatment: z.enum(taxTreatments, { error: "Choose how tax is treated." }), percent: percentText("Tax rate") }),
    stages: z.array(stageSchema).min(1, "Give at least one payment stage.").max(12, "At most 12 payment stages."),
  })
  .superRefine((c, ctx) => {
    if (!c.stages.length || c.stages.some((s) => !/^\d{1,3}(\.\d{1,2})?$/.test(s.percent))) return;
    const sum = c.stages.reduce((s, x) => s + hundredths(x.percent), 0);
    if (sum !== 10000) {
      ctx.addIssue({ code: "custom", path: ["stages"], message: `The payment stages add up to ${(sum / 100).toFixed(2).replace(/\.00$/, "")} %; they must add up to exactly 100 %.` });
    }
  });

export type CommercialInput = z.input<typeof commercialSchema>;
export type Commercial = z.output<typeof commercialSchema>;

/** A new quotation's commercial terms: the trade's usual four stages, 90 days, the rate set's tax. */
export function defaultCommercial({ currency, taxPercent }: { currency: string; taxPercent: string }): Commercial {
  return {
    introduction: "",
    startDate: null,
    lumpSums: [],
    provisionalSums: [],
    options: [],
    exclusions: [
      "Builder's work, making good and redecoration of the building.",
      "Mains electrical supplies to the blower and action, which are to be installed by the client's licensed electrician.",
    ],
    discount: { kind: "none", value: "" },
    validityDays: 90,
    currency,
    tax: { treatment: "standard", percent: taxPercent },
    stages: [
      { id: "signing", label: "On signing the contract", percent: "25" },
      { id: "workshop", label: "On completion of the workshop work", percent: "25" },
      { id: "delivery", label: "On delivery to the building", percent: "25" },
      { id: "completion", label: "On completion", percent: "25" },
    ],
  };
}
