import "server-only";
import { eq, sql } from "drizzle-orm";
import nodemailer, { type Transporter } from "nodemailer";
import { db } from "@/db/client";
import { outgoingMail, outgoingMailAttachments } from "@/db/schema";
import { mailSettings } from "@/lib/env";

/** An SMTP transport from the settings (lib/env.ts: SMTP_HOST, SMTP_PORT, SMTP_SECURITY, SMTP_USER, SMTP_PASSWORD). */
export function createTransport(): Transporter {
  const s = mailSettings();
  return nodemailer.createTransport({
    host: s.host,
    port: s.port,
    secure: s.security === "tls",
    requireTLS: s.security === "starttls",
    ignoreTLS: s.security === "none",
    auth: s.user ? { user: s.user, pass: s.password } : undefined,
    // A mail server that does not answer fails this try within seconds; the queue retries later.
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
}

export type Attempt = { mailId: string; /** 1 for the first try. */ attempt: number; /** No retry follows a failure of this try. */ last: boolean };

/**
 * One try at sending one outbox message. Records the outcome on the message (sent, or the error and
 * whether it will be retried) and throws on failure so the queue schedules the retry.
 */
export async function deliverMail({ mailId, attempt, last }: Attempt, transport: Transporter): Promise<"sent" | "skipped"> {
  const [mail] = await db.select().from(outgoingMail).where(eq(outgoingMail.id, mailId)).limit(1);
  // Gone, or sent by an earlier try whose acknowledgement was lost: nothing to do.
  if (!mail || mail.status === "sent") return "skipped";
  const attachments = await db.select().from(outgoingMailAttachments).where(eq(outgoingMailAttachments.mailId, mailId));
  try {
    const info = await transport.sendMail({
      from: mailSettings().from,
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      html: mail.html ?? undefined,
      attachments: attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, content: a.content })),
      headers: { "X-Stopwright-Mail-Id": mail.id },
    });
    await db
      .update(outgoingMail)
      .set({ status: "sent", attempts: sql`${outgoingMail.attempts} + 1`, lastAttemptAt: new Date(), sentAt: new Date(), lastError: null, messageId: info.messageId ?? null })
      .where(eq(outgoingMail.id, mailId));
    return "sent";
  } catch (err) {
    const reason = err instanceof Error ? err.message : String(err);
    await db
      .update(outgoingMail)
      .set({ status: last ? "failed" : "queued", attempts: sql`${outgoingMail.attempts} + 1`, lastAttemptAt: new Date(), lastError: reason })
      .where(eq(outgoingMail.id, mailId));
    console.warn(`mail ${mailId} "${mail.subject}" to ${mail.to.join(", ")}: try ${attempt} failed (${reason}); ${last ? "no more tries: marked failed" : "will retry"}.`);
    throw err;
  }
}
