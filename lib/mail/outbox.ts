import "server-only";
import { and, desc, eq, inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { outgoingMail, outgoingMailAttachments } from "@/db/schema";
import { AppError } from "@/lib/server/errors";
import { isUuid } from "@/db/queries/access";
import { enqueueMail } from "./queue";

import type { OutboxMessage } from "./types";

/** The newest messages of the outbox, as the admin's Outgoing mail page lists them. */
export async function listOutgoingMail({ limit = 200 }: { limit?: number } = {}): Promise<OutboxMessage[]> {
  const rows = await db.select().from(outgoingMail).orderBy(desc(outgoingMail.createdAt)).limit(limit);
  const files = rows.length
    ? await db
        .select({ id: outgoingMailAttachments.id, mailId: outgoingMailAttachments.mailId, filename: outgoingMailAttachments.filename, contentType: outgoingMailAttachments.contentType, sizeBytes: outgoingMailAttachments.sizeBytes })
        .from(outgoingMailAttachments)
        .where(inArray(outgoingMailAttachments.mailId, rows.map((r) => r.id)))
    : [];
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    to: r.to,
    subject: r.subject,
    text: r.text,
    links: r.links,
    status: r.status,
    attempts: r.attempts,
    lastError: r.lastError,
    createdAt: r.createdAt.toISOString(),
    lastAttemptAt: r.lastAttemptAt?.toISOString() ?? null,
    sentAt: r.sentAt?.toISOString() ?? null,
    attachments: files.filter((f) => f.mailId === r.id).map(({ mailId: _m, ...f }) => f),
  }));
}

export async function getMailAttachment({ mailId, attachmentId }: { mailId: string; attachmentId: string }) {
  if (!isUuid(mailId) || !isUuid(attachmentId)) throw new AppError("not_found", "No such attachment.");
  const [file] = await db
    .select()
    .from(outgoingMailAttachments)
    .where(and(eq(outgoingMailAttachments.id, attachmentId), eq(outgoingMailAttachments.mailId, mailId)))
    .limit(1);
  if (!file) throw new AppError("not_found", "No such attachment.");
  return file;
}

/** Sends a failed message again, from the first try. */
export async function resendMail({ mailId }: { mailId: string }): Promise<void> {
  if (!isUuid(mailId)) throw new AppError("not_found", "No such message.");
  const [row] = await db
    .update(outgoingMail)
    .set({ status: "queued", lastError: null })
    .where(and(eq(outgoingMail.id, mailId), eq(outgoingMail.status, "failed")))
    .returning({ id: outgoingMail.id });
  if (!row) {
    const [exists] = await db.select({ status: outgoingMail.status }).from(outgoingMail).where(eq(outgoingMail.id, mailId)).limit(1);
    if (!exists) throw new AppError("not_found", "No such message.");
    throw new AppError("conflict", exists.status === "sent" ? "This message was already sent." : "This message is still queued; it is tried again by itself.");
  }
  await enqueueMail(mailId);
}
