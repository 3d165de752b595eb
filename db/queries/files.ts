import "server-only";
import { randomUUID } from "node:crypto";
import { and, asc, eq, inArray, lt } from "drizzle-orm";
import { db } from "@/db/client";
import { divisions, projectFiles, schemes, stops, users, type Project, type ProjectFile } from "@/db/schema";
import type { Store } from "@/db/scheme-store";
import { storageSettings } from "@/lib/env";
import { acceptedTypes, defaultCategory, typeForName, type FileLink, type SurveyFile, type UploadTicket } from "@/lib/files/kinds";
import type { z } from "zod";
import type { fileUpdateSchema, startUploadSchema } from "@/lib/files/kinds";
import { can } from "@/lib/roles";
import { AppError } from "@/lib/server/errors";
import { inspectFile, sizeProblem } from "@/lib/server/file-check";
import type { SessionUser } from "@/lib/server/guard";
import { deleteObject, fileKeys, objectSize, readObject, signedDownloadUrl, signedUploadUrl, writeObject } from "@/lib/server/storage";
import { assertOpen, isUuid, loadProjectFor } from "./access";

type StartUpload = z.output<typeof startUploadSchema>;
type FileUpdate = z.output<typeof fileUpdateSchema>;

/** An upload link not used within a day is abandoned; its row and any bytes are cleared on the next upload. */
const ABANDONED_AFTER_MS = 24 * 3600 * 1000;

const { uploadKey, originalKey, thumbnailKey } = fileKeys;

const NO_FILE = "No such file.";

/** Checks a link against the scheme as it stands: the scheme belongs to the project, the division or stop is in it. */
async function checkLink(tx: Store, projectId: string, link: FileLink | null, field = "link"): Promise<void> {
  if (!link) return;
  const [scheme] = await tx.select({ id: schemes.id }).from(schemes).where(and(eq(schemes.id, link.schemeId), eq(schemes.projectId, projectId))).limit(1);
  if (!scheme) throw new AppError("invalid", "That scheme is not one of this project's.", { [`${field}.schemeId`]: ["Choose a scheme of this project."] });
  if (link.divisionId) {
    const [d] = await tx.select({ id: divisions.id }).from(divisions).where(and(eq(divisions.schemeId, link.schemeId), eq(divisions.id, link.divisionId))).limit(1);
    if (!d) throw new AppError("invalid", "That division is not in the scheme.", { [`${field}.divisionId`]: ["Choose a division of the scheme."] });
  }
  if (link.stopId) {
    const [s] = await tx.select({ id: stops.id }).from(stops).where(and(eq(stops.schemeId, link.schemeId), eq(stops.id, link.stopId))).limit(1);
    if (!s) throw new AppError("invalid", "That stop is not in the scheme.", { [`${field}.stopId`]: ["Choose a stop of the scheme."] });
  }
}

async function clearAbandoned(projectId: string): Promise<void> {
  const old = await db
    .select({ id: projectFiles.id, uploadKey: projectFiles.uploadKey })
    .from(projectFiles)
    .where(and(eq(projectFiles.projectId, projectId), eq(projectFiles.status, "pending"), lt(projectFiles.createdAt, new Date(Date.now() - ABANDONED_AFTER_MS))));
  for (const f of old) {
    await deleteObject(f.uploadKey);
    await db.delete(projectFiles).where(eq(projectFiles.id, f.id));
  }
}

/**
 * Records an upload about to happen and answers a link the browser PUTs the bytes to. The name and
 * size are checked now to spare a pointless upload; the bytes themselves are checked on completion.
 */
export async function startUpload({ user, projectId, input }: { user: SessionUser; projectId: string; input: StartUpload }): Promise<UploadTicket> {
  const project = await loadProjectFor({ user, projectId });
  assertOpen(project);
  const { maxBytes } = storageSettings();
  const type = typeForName(input.name);
  if (!type) throw new AppError("invalid", `"${input.name}" is not a file Stopwright keeps: send JPEG, PNG or WebP photos and PDF drawings or documents.`, { name: ["Send a .jpg, .png, .webp or .pdf file."] });
  const tooBig = sizeProblem(input.name, input.size, maxBytes);
  if (tooBig) throw new AppError("invalid", tooBig, { size: [tooBig] });
  await checkLink(db, projectId, input.link);
  await clearAbandoned(projectId);
  const id = randomUUID();
  await db.insert(projectFiles).values({
    id,
    projectId,
    uploadKey: uploadKey(projectId, id),
    originalName: input.name,
    category: input.category ?? defaultCategory(type),
    caption: input.caption,
    schemeId: input.link?.schemeId ?? null,
    divisionId: input.link?.divisionId ?? null,
    stopId: input.link?.stopId ?? null,
    uploadedById: user.id,
  });
  return { fileId: id, uploadUrl: await signedUploadUrl(uploadKey(projectId, id)), expiresInSeconds: 15 * 60, maxBytes };
}

/** A file row with the project it belongs to, for a user who may see it; 404 for anyone else. */
async function loadFileFor({ user, fileId, tx = db, lock = false, pending = false }: { user: SessionUser; fileId: string; tx?: Store; lock?: boolean; pending?: boolean }): Promise<{ file: ProjectFile; project: Project }> {
  if (!isUuid(fileId)) throw new AppError("not_found", NO_FILE);
  const query = tx.select().from(projectFiles).where(eq(projectFiles.id, fileId)).limit(1);
  const [file] = lock ? await query.for("update") : await query;
  if (!file || (!pending && file.status !== "ready")) throw new AppError("not_found", NO_FILE);
  let project: Project;
  try {
    project = await loadProjectFor({ user, projectId: file.projectId, tx });
  } catch {
    throw new AppError("not_found", NO_FILE);
  }
  if (user.role === "client" && !file.sharedWithClient) throw new AppError("not_found", NO_FILE);
  return { file, project };
}

/**
 * Checks what arrived for a pending upload — size, then real type by content and that its name
 * agrees — and only then stores it under its final key with a thumbnail and records it as done.
 * Whatever fails is deleted, row and bytes, and the answer says why. The bytes are copied from the
 * checked buffer, so a second PUT to the old upload link cannot swap them afterwards.
 */
export async function completeUpload({ user, fileId }: { user: SessionUser; fileId: string }): Promise<SurveyFile> {
  const { maxBytes } = storageSettings();
  const outcome = await db.transaction(async (tx) => {
    const { file, project } = await loadFileFor({ user, fileId, tx, lock: true, pending: true });
    assertOpen(project);
    if (file.status === "ready") return { ok: true as const, file };
    const refuse = async (message: string) => {
      await deleteObject(file.uploadKey);
      await tx.delete(projectFiles).where(eq(projectFiles.id, file.id));
      return { ok: false as const, message };
    };
    const size = await objectSize(file.uploadKey);
    if (size === null) return refuse(`Nothing arrived for "${file.originalName}"; upload it again.`);
    // The size first, from the store's own record, so an oversized file is never read into memory.
    const tooBig = sizeProblem(file.originalName, size, maxBytes);
    if (tooBig) return refuse(tooBig);
    const bytes = await readObject(file.uploadKey);
    const checked = await inspectFile(file.originalName, bytes, maxBytes);
    if (!checked.ok) return refuse(checked.message);
    const key = originalKey(file.projectId, file.id, acceptedTypes[checked.type].extensions[0]);
    await writeObject(key, bytes, checked.type);
    const thumb = checked.thumbnail ? thumbnailKey(file.projectId, file.id) : null;
    if (thumb) await writeObject(thumb, checked.thumbnail!, "image/jpeg");
    await deleteObject(file.uploadKey);
    const [row] = await tx
      .update(projectFiles)
      .set({ status: "ready", objectKey: key, thumbnailKey: thumb, contentType: checked.type, sizeBytes: bytes.length, width: checked.width, height: checked.height, completedAt: new Date() })
      .where(eq(projectFiles.id, file.id))
      .returning();
    return { ok: true as const, file: row! };
  });
  // The refusal is answered after the transaction, so the deletion of the row is committed.
  if (!outcome.ok) throw new AppError("invalid", outcome.message, { file: [outcome.message] });
  return toRead(outcome.file, user);
}

// ── reading ─────────────────────────────────────────────────────────────────────────────────────

type Names = { schemes: Map<string, { name: string; shared: boolean }>; divisions: Map<string, string>; stops: Map<string, string> };

async function namesFor(rows: ProjectFile[]): Promise<Names> {
  const ids = [...new Set(rows.map((r) => r.schemeId).filter((x): x is string => !!x))];
  if (!ids.length) return { schemes: new Map(), divisions: new Map(), stops: new Map() };
  const [s, d, st] = await Promise.all([
    db.select({ id: schemes.id, name: schemes.name, shared: schemes.sharedWithClient }).from(schemes).where(inArray(schemes.id, ids)),
    db.select({ schemeId: divisions.schemeId, id: divisions.id, name: divisions.name }).from(divisions).where(inArray(divisions.schemeId, ids)),
    db.select({ schemeId: stops.schemeId, id: stops.id, name: stops.name }).from(stops).where(inArray(stops.schemeId, ids)),
  ]);
  return {
    schemes: new Map(s.map((x) => [x.id, { name: x.name, shared: x.shared }])),
    divisions: new Map(d.map((x) => [`${x.schemeId}/${x.id}`, x.name])),
    stops: new Map(st.map((x) => [`${x.schemeId}/${x.id}`, x.name])),
  };
}

function toSurveyFile(f: ProjectFile, user: SessionUser, names: Names, uploaders: Map<string, string>): SurveyFile {
  const type = f.contentType as keyof typeof acceptedTypes;
  const scheme = f.schemeId ? names.schemes.get(f.schemeId) : undefined;
  // A committee member is not told the names of schemes the firm has not shared.
  const showLink = scheme && (user.role !== "client" || scheme.shared);
  const divisionName = f.divisionId ? (names.divisions.get(`${f.schemeId}/${f.divisionId}`) ?? null) : null;
  const stopName = f.stopId ? (names.stops.get(`${f.schemeId}/${f.stopId}`) ?? null) : null;
  return {
    id: f.id,
    projectId: f.projectId,
    name: f.originalName,
    contentType: type,
    category: f.category,
    sizeBytes: f.sizeBytes ?? 0,
    width: f.width,
    height: f.height,
    caption: f.caption,
    sharedWithClient: f.sharedWithClient,
    link: showLink
      ? {
          schemeId: f.schemeId!,
          divisionId: f.divisionId ?? undefined,
          stopId: f.stopId ?? undefined,
          schemeName: scheme.name,
          divisionName,
          stopName,
          // The division or stop was deleted from the scheme since the file was linked.
          missing: (!!f.divisionId && divisionName === null) || (!!f.stopId && stopName === null),
        }
      : null,
    uploadedByName: f.uploadedById ? (uploaders.get(f.uploadedById) ?? null) : null,
    createdAt: (f.completedAt ?? f.createdAt).toISOString(),
    thumbnailUrl: f.thumbnailKey ? `/api/files/${f.id}/content?variant=thumbnail` : null,
    url: `/api/files/${f.id}/content`,
  };
}

async function readMany(rows: ProjectFile[], user: SessionUser): Promise<SurveyFile[]> {
  const uploaderIds = [...new Set(rows.map((r) => r.uploadedById).filter((x): x is string => !!x))];
  const [names, uploaders] = await Promise.all([
    namesFor(rows),
    uploaderIds.length ? db.select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, uploaderIds)) : Promise.resolve([]),
  ]);
  const byId = new Map(uploaders.map((u) => [u.id, u.name]));
  return rows.map((r) => toSurveyFile(r, user, names, byId));
}

async function toRead(file: ProjectFile, user: SessionUser): Promise<SurveyFile> {
  return (await readMany([file], user))[0]!;
}

export async function listFilesForUser({ user, projectId, schemeId, stopId, divisionId }: { user: SessionUser; projectId: string; schemeId?: string; stopId?: string; divisionId?: string }): Promise<SurveyFile[]> {
  await loadProjectFor({ user, projectId });
  if (schemeId && !isUuid(schemeId)) return [];
  const rows = await db
    .select()
    .from(projectFiles)
    .where(
      and(
        eq(projectFiles.projectId, projectId),
        eq(projectFiles.status, "ready"),
        user.role === "client" ? eq(projectFiles.sharedWithClient, true) : undefined,
        schemeId ? eq(projectFiles.schemeId, schemeId) : undefined,
        stopId ? eq(projectFiles.stopId, stopId) : undefined,
        divisionId ? eq(projectFiles.divisionId, divisionId) : undefined,
      ),
    )
    .orderBy(asc(projectFiles.createdAt));
  return readMany(rows, user);
}

export async function getFileForUser({ user, fileId }: { user: SessionUser; fileId: string }): Promise<SurveyFile> {
  const { file } = await loadFileFor({ user, fileId });
  return toRead(file, user);
}

export async function updateFile({ user, fileId, patch }: { user: SessionUser; fileId: string; patch: FileUpdate }): Promise<SurveyFile> {
  if (patch.sharedWithClient !== undefined && !can(user.role, "files:share")) {
    throw new AppError("forbidden", "Only the tonal director, the estimator or an administrator shares files with the committee.");
  }
  const updated = await db.transaction(async (tx) => {
    const { file, project } = await loadFileFor({ user, fileId, tx, lock: true });
    assertOpen(project);
    if (patch.link !== undefined) await checkLink(tx, project.id, patch.link);
    const [row] = await tx
      .update(projectFiles)
      .set({
        ...(patch.caption !== undefined ? { caption: patch.caption } : {}),
        ...(patch.category !== undefined ? { category: patch.category } : {}),
        ...(patch.sharedWithClient !== undefined ? { sharedWithClient: patch.sharedWithClient } : {}),
        ...(patch.link !== undefined ? { schemeId: patch.link?.schemeId ?? null, divisionId: patch.link?.divisionId ?? null, stopId: patch.link?.stopId ?? null } : {}),
      })
      .where(eq(projectFiles.id, file.id))
      .returning();
    return row!;
  });
  return toRead(updated, user);
}

export async function deleteFile({ user, fileId }: { user: SessionUser; fileId: string }): Promise<void> {
  const { file, project } = await loadFileFor({ user, fileId });
  assertOpen(project);
  await db.delete(projectFiles).where(eq(projectFiles.id, file.id));
  for (const key of [file.objectKey, file.thumbnailKey]) if (key) await deleteObject(key);
}

/** A short-lived link to the bytes, issued only after the access check above. */
export async function fileContentLink({ user, fileId, variant, attachment }: { user: SessionUser; fileId: string; variant: "original" | "thumbnail"; attachment: boolean }): Promise<string> {
  const { file } = await loadFileFor({ user, fileId });
  if (variant === "thumbnail") {
    if (!file.thumbnailKey) throw new AppError("not_found", "This file has no thumbnail.");
    return signedDownloadUrl(file.thumbnailKey, { fileName: `thumbnail-${file.originalName.replace(/\.[^.]+$/, "")}.jpg`, contentType: "image/jpeg", attachment: false });
  }
  return signedDownloadUrl(file.objectKey!, { fileName: file.originalName, contentType: file.contentType!, attachment });
}

export type LinkTarget = { schemeId: string; schemeName: string; divisions: { id: string; name: string; stops: { id: string; name: string; footage: string | number; ranks: number; family: string }[] }[] };

/** The schemes of a project the user may see, with their divisions and stops in order: what a file may be linked to. */
export async function listLinkTargets({ user, projectId }: { user: SessionUser; projectId: string }): Promise<LinkTarget[]> {
  await loadProjectFor({ user, projectId });
  const schemeRows = await db
    .select({ id: schemes.id, name: schemes.name })
    .from(schemes)
    .where(and(eq(schemes.projectId, projectId), user.role === "client" ? eq(schemes.sharedWithClient, true) : undefined))
    .orderBy(asc(schemes.createdAt));
  if (!schemeRows.length) return [];
  const ids = schemeRows.map((s) => s.id);
  const [divisionRows, stopRows] = await Promise.all([
    db.select({ schemeId: divisions.schemeId, id: divisions.id, name: divisions.name }).from(divisions).where(inArray(divisions.schemeId, ids)).orderBy(asc(divisions.position)),
    db.select({ schemeId: stops.schemeId, divisionId: stops.divisionId, id: stops.id, name: stops.name, props: stops.props }).from(stops).where(inArray(stops.schemeId, ids)).orderBy(asc(stops.position)),
  ]);
  return schemeRows.map((s) => ({
    schemeId: s.id,
    schemeName: s.name,
    divisions: divisionRows
      .filter((d) => d.schemeId === s.id)
      .map((d) => ({
        id: d.id,
        name: d.name,
        stops: stopRows
          .filter((st) => st.schemeId === s.id && st.divisionId === d.id)
          .map((st) => {
            const p = st.props as { footage?: string | number; ranks?: number; family?: string };
            return { id: st.id, name: st.name, footage: p.footage ?? "", ranks: p.ranks ?? 1, family: p.family ?? "" };
          }),
      })),
  }));
}
