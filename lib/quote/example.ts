/**
 * An invented quotation built from an example scheme file, for the document tests, the benchmark and
 * the command line: the invented demo firm, an invented client, the demo rates and commercial terms
 * with lump sums, a provisional sum, options and four stages. Pure; every figure in it is invented.
 */
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { schemeDocumentSchema } from "@/lib/spec/document";
import { defaultCommercial, type Commercial } from "./commercial";
import { buildQuotation, type Quotation } from "./quotation";

export function exampleCommercial(currency = "EUR"): Commercial {
  return {
    ...defaultCommercial({ currency, taxPercent: DEFAULT_RATES.taxPercent }),
    startDate: "2028-03-06",
    introduction: "",
    // Work the estimate does not price itself (it prices the case, wind system, scaffolding and transport).
    lumpSums: [
      { id: "store", category: "transport", description: "Dry storage of the dismantled organ while the hall is refurbished", quantity: "10", unit: "week", unitPrice: "180.00" },
      { id: "stencil", category: "decoration", description: "Stencilled patterns on the front pipes, restored", quantity: "1", unit: "item", unitPrice: "7400.00" },
    ],
    provisionalSums: [{ id: "woodworm", description: "Replacing wooden pipes found beyond repair when the chests are opened", amount: "6500.00" }],
    options: [
      { id: "cymbel", title: "Cymbelstern", description: "Twelve tuned bells on a star, from a drawstop", price: "4850.00" },
      { id: "trumpet", title: "Prepared-for Trumpet 8′ completed", description: "Make and voice the prepared Trumpet now", price: "21400.00" },
    ],
    discount: { kind: "percent", value: "2.5" },
  };
}

/** A quotation of a scheme file's document (tuning and programme dates from the file). */
export function exampleQuotation(
  schemeFile: { name: string; tuning?: { pitchHz: number; temperatureC: number }; programme?: { start: string; target?: string }; divisions: unknown; accessories?: unknown; case?: unknown; wind?: unknown; site?: unknown },
  overrides: Partial<Commercial> = {},
): Quotation {
  const { case: caseWork, wind, site } = schemeFile;
  const document = schemeDocumentSchema.parse({ name: schemeFile.name, description: "", divisions: schemeFile.divisions, accessories: schemeFile.accessories, case: caseWork, wind, site });
  const commercial = { ...exampleCommercial(), ...(schemeFile.programme ? { startDate: schemeFile.programme.start } : {}), ...overrides };
  return buildQuotation({
    number: "Q-2028-0001",
    status: "issued",
    issuedOn: "2028-01-10",
    validUntil: "2028-04-09",
    preparedBy: { name: "Ines Harrowby", email: "estimates@corvinlathe.example" },
    firm: {
      name: "Corvin Lathe Organ Builders (demo firm)",
      address: "Unit 4, Saltmarsh Yard\nWexmoor (invented address)",
      email: "office@corvinlathe.example",
      phone: "+44 0000 000000 (invented)",
      website: "corvinlathe.example",
      registration: "An invented firm for Stopwright's demonstration. Registered nowhere.",
      logo: null,
    },
    client: {
      projectName: "Example project (invented)", clientName: "An invented client", venue: "An invented hall", location: "Nowhere (invented)",
      instrument: "The example instrument (invented)", targetDate: schemeFile.programme?.target ?? null,
    },
    scheme: { id: "00000000-0000-4000-8000-000000000001", name: document.name, description: document.description, version: 1, tuning: { pitchHz: schemeFile.tuning?.pitchHz ?? 440, temperatureC: schemeFile.tuning?.temperatureC ?? 18 }, document },
    rateSet: { name: "Standard rates", version: 1, effectiveDate: "2028-01-01", rates: DEFAULT_RATES },
    commercial,
  });
}
