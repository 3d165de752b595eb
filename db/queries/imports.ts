import "server-only";
import type { z } from "zod";
import { db } from "@/db/client";
import { loadDocument } from "@/db/scheme-store";
import { AppError } from "@/lib/server/errors";
import type { SessionUser } from "@/lib/server/guard";
import type { SchemeDocument, SchemeRead } from "@/lib/spec/document";
import { summarise, type importRequestSchema, type ImportPreview } from "@/lib/spec/import";
import { readSchemeFile } from "@/lib/spec/scheme-file";
import { readStopListCsv } from "@/lib/spec/stop-list-csv";
import { assertOpen, loadProjectFor, loadSchemeFor } from "./access";
import { createScheme, saveScheme } from "./schemes";

type ImportInput = z.output<typeof importRequestSchema>;

const baseName = (fileName: string) => fileName.replace(/\.[^.]+$/, "").trim() || "Imported stop list";

/** Reads the file against its target without saving anything; a bad file answers every problem. */
async function prepare({ user, projectId, input }: { user: SessionUser; projectId: string; input: ImportInput }) {
  const project = await loadProjectFor({ user, projectId });
  assertOpen(project);
  const tuning = { pitchHz: project.pitchHz, temperatureC: project.temperatureC };
  let base: { document: SchemeDocument; schemeId: string; schemeName: string; version: number } | undefined;
  if (input.target.kind === "replace") {
    const { scheme, project: owner } = await loadSchemeFor({ user, schemeId: input.target.schemeId });
    if (owner.id !== project.id) throw new AppError("not_found", "No such scheme.");
    if (scheme.status !== "draft") {
      throw new AppError("conflict", `"${scheme.name}" is no longer a draft; import the file as a new scheme, or set the scheme back to Draft first.`);
    }
    base = { document: await loadDocument(db, scheme), schemeId: scheme.id, schemeName: scheme.name, version: scheme.version };
  }
  // A replaced draft keeps its own name and description; only its divisions and stops (and, from a scheme file, accessories) change.
  const name = base?.schemeName ?? (input.target.kind === "new" ? input.target.name : undefined);
  const read =
    input.format === "csv"
      ? readStopListCsv(input.text, { name: name || baseName(input.fileName), description: base?.document.description, base: base?.document })
      : readSchemeFile(input.text, { name, tuning });
  if (read.ok && base) read.document = { ...read.document, name: base.schemeName, description: base.document.description };
  return { read, base };
}

export async function previewImport(args: { user: SessionUser; projectId: string; input: ImportInput }): Promise<ImportPreview> {
  const { read, base } = await prepare(args);
  if (!read.ok) return { ok: false, problems: read.problems, notes: read.notes };
  return {
    ok: true,
    notes: read.notes,
    summary: summarise(read.document),
    target: base ? { kind: "replace", schemeId: base.schemeId, schemeName: base.schemeName, version: base.version } : { kind: "new", name: read.document.name },
  };
}

/** Saves an import: a new scheme, or a new revision of the draft. A bad file saves nothing (422 with every problem). */
export async function commitImport(args: { user: SessionUser; projectId: string; input: ImportInput }): Promise<SchemeRead> {
  const { user, projectId, input } = args;
  const { read, base } = await prepare(args);
  if (!read.ok) {
    throw new AppError("invalid", `"${input.fileName}" has problems; nothing was imported.`, { file: read.problems.map((p) => p.message) }, { problems: read.problems, notes: read.notes });
  }
  const note = `imported from ${input.fileName}`.slice(0, 200);
  if (base) {
    const version = input.target.kind === "replace" && input.target.version ? input.target.version : base.version;
    return saveScheme({ user, schemeId: base.schemeId, version, document: read.document, note });
  }
  return createScheme({ user, projectId, name: read.document.name, description: read.document.description, document: read.document });
}
