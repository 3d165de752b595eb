import "server-only";
import PgBoss from "pg-boss";
import { db } from "@/db/client";
import { outgoingMail, outgoingMailAttachments } from "@/db/schema";
import { env } from "@/lib/env";
import type { MailLink } from "./compose";

/** The pg-boss queue that carries one job per message: { mailId }. */
export const MAIL_QUEUE = "outgoing-mail";

/**
 * Retries of a message the SMTP server did not take: 8 more tries, waiting 30 s and doubling
 * (30 s, 1 min, 2 min … about 2 h in all) before the message is marked failed.
 */
export const MAIL_RETRY = { retryLimit: 8, retryDelay: 30, retryBackoff: true, expireInSeconds: 300 } as const;

export type MailAttachment = { filename: string; contentType: string; content: Buffer | Uint8Array };

export type MailMessage = {
  /** What kind of message, for the outbox list: "invitation", "scheme-shared", "quotation" … */
  kind: string;
  to: string | readonly string[];
  subject: string;
  text: string;
  html?: string;
  attachments?: readonly MailAttachment[];
  /** The links the message carries (also in its text), listed on the Outgoing mail page. */
  links?: readonly MailLink[];
};

// One pg-boss per server process, shared by the instrumentation hook (the worker) and route handlers,
// which Next bundles as separate module instances: hence globalThis.
const g = globalThis as unknown as { stopwrightBoss?: Promise<PgBoss> };

/** The started pg-boss of this process (its tables live in the "pgboss" schema of the app's database). */
export function getBoss(): Promise<PgBoss> {
  if (!g.stopwrightBoss) {
    g.stopwrightBoss = (async () => {
      const boss = new PgBoss({ connectionString: env().DATABASE_URL, max: 3, application_name: "stopwright-mail" });
      boss.on("error", (err) => console.error("mail queue:", err instanceof Error ? err.message : err));
      await boss.start();
      if (!(await boss.getQueue(MAIL_QUEUE))) await boss.createQueue(MAIL_QUEUE, { name: MAIL_QUEUE, ...MAIL_RETRY });
      return boss;
    })();
    // A database that was not ready is tried again on the next call.
    g.stopwrightBoss.catch(() => {
      g.stopwrightBoss = undefined;
    });
  }
  return g.stopwrightBoss;
}

/** Hands one outbox message to the queue. Never throws: a queue that cannot be reached is logged, and the sweep picks the message up. */
export async function enqueueMail(mailId: string): Promise<void> {
  try {
    const boss = await getBoss();
    await boss.send(MAIL_QUEUE, { mailId }, MAIL_RETRY);
  } catch (err) {
    console.error(`mail ${mailId}: not handed to the queue yet (${err instanceof Error ? err.message : String(err)}); it stays queued and is picked up later.`);
  }
}

/**
 * Records a message in the outbox and queues it for sending. Returns at once: delivery happens in
 * the mail worker, with retries, so a slow or absent mail server never holds up or breaks the request
 * that caused the message. Returns the outbox id, or null (logged) when even the outbox could not be
 * written — the caller's own work stands either way.
 */
export async function queueMail(message: MailMessage): Promise<string | null> {
  const to = (typeof message.to === "string" ? [message.to] : [...message.to]).map((a) => a.trim()).filter(Boolean);
  if (!to.length) return null;
  try {
    const id = await db.transaction(async (tx) => {
      const [row] = await tx
        .insert(outgoingMail)
        .values({ kind: message.kind, to, subject: message.subject, text: message.text, html: message.html ?? null, links: [...(message.links ?? [])] })
        .returning({ id: outgoingMail.id });
      const attachments = message.attachments ?? [];
      if (attachments.length) {
        await tx.insert(outgoingMailAttachments).values(
          attachments.map((a) => ({ mailId: row!.id, filename: a.filename, contentType: a.contentType, content: Buffer.from(a.content), sizeBytes: a.content.byteLength })),
        );
      }
      return row!.id;
    });
    void enqueueMail(id);
    return id;
  } catch (err) {
    console.error(`mail "${message.subject}" to ${to.join(", ")} could not be queued:`, err instanceof Error ? err.message : err);
    return null;
  }
}
