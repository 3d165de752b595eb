import { readFileSync, writeFileSync } from "node:fs";
import { exampleQuotation } from "./lib/quote/example";
import { writeDocument } from "./lib/documents";
(async () => {
  const q = exampleQuotation(JSON.parse(readFileSync(process.argv[2] ?? "examples/large-five-manual.json", "utf8")));
  for (const k of ["tender", "cost-sheet", "work-list"] as const) writeFileSync(`/tmp/wt9-${k}.docx`, await writeDocument(k, q));
})();
