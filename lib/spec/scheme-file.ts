/**
 * Scheme files in and out (docs/scheme-format.md): the same JSON the command line estimates, written
 * from a saved document under the project's tuning, and read back into a document for an import.
 * Pure: no I/O.
 */
import { checkDocument } from "./validate";
import type { SchemeDocument, Tuning } from "./document";
import type { ImportProblem } from "./stop-list-csv";

/** The scheme file of a document: `npm run estimate -- FILE` gives the same estimate as the app. */
export function toSchemeFile(doc: SchemeDocument, tuning: Tuning) {
  return {
    name: doc.name,
    description: doc.description,
    tuning: { pitchHz: tuning.pitchHz, temperatureC: tuning.temperatureC, mutations: "tempered" as const },
    divisions: doc.divisions,
    accessories: doc.accessories,
    case: doc.case,
    wind: doc.wind,
    site: doc.site,
  };
}

export type FileRead = { ok: true; document: SchemeDocument; notes: string[] } | { ok: false; problems: ImportProblem[]; notes: string[] };

/** Line and column of a JSON syntax error, from the offset the engine reports, for the person fixing the file. */
function whereInText(text: string, message: string): string {
  const m = /position (\d+)/.exec(message);
  if (!m) return "";
  const before = text.slice(0, Number(m[1]));
  const line = before.split("\n").length;
  return ` near line ${line}`;
}

/**
 * Reads a scheme file into a document. The file's own name is kept unless `name` is given; its
 * tuning and rates are not imported (the project's tuning and the firm's rates apply), and the
 * notes say so when they differ.
 */
export function readSchemeFile(text: string, opts: { name?: string; tuning: Tuning }): FileRead {
  const notes: string[] = [];
  let value: unknown;
  try {
    value = JSON.parse(text.replace(/^\uFEFF/, ""));
  } catch (e) {
    return { ok: false, problems: [{ message: `The file is not valid JSON${whereInText(text, (e as Error).message)}; a scheme file is one JSON object (docs/scheme-format.md).` }], notes };
  }
  if (typeof value !== "object" || value === null || Array.isArray(value)) {
    return { ok: false, problems: [{ message: "The file holds no scheme: a scheme file is one JSON object with a name and its divisions." }], notes };
  }
  const file = value as Record<string, unknown>;
  const tuning = file.tuning as { pitchHz?: unknown; temperatureC?: unknown } | undefined;
  if (tuning && typeof tuning === "object") {
    if (typeof tuning.pitchHz === "number" && tuning.pitchHz !== opts.tuning.pitchHz) notes.push(`The file is tuned to A = ${tuning.pitchHz} Hz; the project's A = ${opts.tuning.pitchHz} Hz applies.`);
    if (typeof tuning.temperatureC === "number" && tuning.temperatureC !== opts.tuning.temperatureC) notes.push(`The file's design temperature is ${tuning.temperatureC} °C; the project's ${opts.tuning.temperatureC} °C applies.`);
  }
  if (file.rates !== undefined) notes.push("The file's rates and norms were not imported: the firm's own rates price every scheme.");
  if (file.programme !== undefined) notes.push("The file's programme dates were not imported.");
  const raw = {
    name: opts.name?.trim() || file.name, description: file.description ?? "", divisions: file.divisions, accessories: file.accessories,
    case: file.case, wind: file.wind, site: file.site,
  };
  const check = checkDocument(raw);
  if (check.ok) return { ok: true, document: check.document, notes };
  const problems = Object.entries(check.fields).flatMap(([path, messages]) => messages.map((message) => ({ column: path, message })));
  return { ok: false, problems, notes };
}
