import "server-only";
import { and, eq, lt, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { outgoingMail } from "@/db/schema";
import { createTransport, deliverMail } from "./deliver";
import { enqueueMail, getBoss, MAIL_QUEUE } from "./queue";

const g = globalThis as unknown as { stopwrightMailWorker?: boolean };

/** Messages still queued a minute after they were written, with no job waiting for them (the queue was out of reach when they were written). */
async function sweep(): Promise<void> {
  const stranded = await db
    .select({ id: outgoingMail.id })
    .from(outgoingMail)
    .where(
      and(
        eq(outgoingMail.status, "queued"),
        lt(outgoingMail.createdAt, sql`now() - interval '1 minute'`),
        sql`not exists (select 1 from pgboss.job j where j.name = ${MAIL_QUEUE} and j.data->>'mailId' = ${outgoingMail.id}::text and j.state in ('created', 'retry', 'active'))`,
      ),
    )
    .limit(100);
  for (const { id } of stranded) await enqueueMail(id);
}

/**
 * Starts sending queued mail from this server process: once per process (the instrumentation hook
 * calls it at start). A database not yet reachable is tried again every 30 s; nothing here stops the
 * server from serving.
 */
export async function startMailWorker(): Promise<void> {
  if (g.stopwrightMailWorker) return;
  g.stopwrightMailWorker = true;
  try {
    const boss = await getBoss();
    const transport = createTransport();
    await boss.work<{ mailId: string }>(MAIL_QUEUE, { includeMetadata: true, batchSize: 1, pollingIntervalSeconds: 1 }, async ([job]) => {
      if (!job) return;
      await deliverMail({ mailId: job.data.mailId, attempt: job.retryCount + 1, last: job.retryCount >= job.retryLimit }, transport);
    });
    const timer = setInterval(() => void sweep().catch((err) => console.error("mail sweep:", err instanceof Error ? err.message : err)), 60_000);
    timer.unref();
    void sweep().catch(() => {});
  } catch (err) {
    g.stopwrightMailWorker = false;
    console.error(`mail worker did not start (${err instanceof Error ? err.message : String(err)}); trying again in 30 s. Messages stay queued meanwhile.`);
    setTimeout(() => void startMailWorker(), 30_000).unref();
  }
}
