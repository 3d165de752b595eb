import "server-only";
import { and, asc, eq, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { quotations, quoteCounters, schemeRevisions, schemes, users, type Project, type Quotation as QuotationRow } from "@/db/schema";
import { commercialSchema, defaultCommercial, type Commercial } from "@/lib/quote/commercial";
import { listsQuotation, maySeeTotal } from "@/lib/quote/access";
import {
  addDays, buildQuotation, readQuotationSnapshot, effectiveStatus, formatQuoteNumber, QuotationError, type Quotation, type QuoteStatus,
} from "@/lib/quote/quotation";
import { AppError } from "@/lib/server/errors";
import type { SessionUser } from "@/lib/server/guard";
import { schemeDocumentSchema } from "@/lib/spec/document";
import { assertOpen, isUuid, loadProjectFor } from "./access";
import { firmDetailsOf, getFirm } from "./firm";
import { getPricingRates, getRateSetVersionById } from "./rate-sets";

export function todayIso(): string {
  return new Date().toISOString().slice(0, 10);
}

export type QuotationSummary = {
  id: string;
  number: string;
  status: QuoteStatus;
  schemeId: string | null;
  schemeName: string;
  schemeVersion: number;
  validUntil: string | null;
  issuedAt: string | null;
  sentAt: string | null;
  /** Null for roles that may not see money, and for a committee member until the tender was sent. */
  totalAmount: string | null;
  currency: string;
  updatedAt: string;
};

export type QuotationRead = QuotationSummary & {
  version: number;
  projectId: string;
  rateSetId: string | null;
  rateSetName: string;
  rateSetVersion: number;
  /** The quotation as priced: frozen when issued, afresh from its scheme revision and rate version while a draft. */
  quotation: Quotation;
};

function toIso(d: Date | null): string | null {
  return d ? d.toISOString() : null;
}

/** The next number of the year, in one statement: safe with several servers. */
async function nextNumber(tx: Pick<typeof db, "insert">, year: number): Promise<string> {
  const [row] = await tx
    .insert(quoteCounters)
    .values({ year, last: 1 })
    .onConflictDoUpdate({ target: quoteCounters.year, set: { last: sql`${quoteCounters.last} + 1` } })
    .returning({ last: quoteCounters.last });
  return formatQuoteNumber(year, row!.last);
}

async function loadQuotationRow({ user, quotationId }: { user: SessionUser; quotationId: string }) {
  if (!isUuid(quotationId)) throw new AppError("not_found", "No such quotation.");
  const [row] = await db.select().from(quotations).where(eq(quotations.id, quotationId)).limit(1);
  if (!row) throw new AppError("not_found", "No such quotation.");
  const project = await loadProjectFor({ user, projectId: row.projectId });
  if (!listsQuotation(user.role, row.sentAt !== null, row.status)) throw new AppError("not_found", "No such quotation.");
  return { row, project };
}

/** Builds the quotation object of a draft from its scheme revision and rate-set version, as of now. */
async function draftQuotation(row: QuotationRow, project: Project, commercial: Commercial): Promise<{ quotation: Quotation; rateSetId: string; rateSetName: string }> {
  if (!row.schemeId) throw new AppError("conflict", "The scheme of this draft quotation was deleted; make a new quotation.");
  const [[rev], [scheme], rates, firm, [author]] = await Promise.all([
    db.select().from(schemeRevisions).where(and(eq(schemeRevisions.schemeId, row.schemeId), eq(schemeRevisions.version, row.schemeVersion))).limit(1),
    db.select().from(schemes).where(eq(schemes.id, row.schemeId)).limit(1),
    row.rateSetVersionId ? getRateSetVersionById({ id: row.rateSetVersionId }) : Promise.reject(new AppError("conflict", "The rate-set version of this draft was deleted; make a new quotation.")),
    getFirm(),
    row.createdById ? db.select({ name: users.name, email: users.email }).from(users).where(eq(users.id, row.createdById)).limit(1) : Promise.resolve([]),
  ]);
  if (!rev || !scheme) throw new AppError("conflict", "The scheme revision of this draft no longer exists; make a new quotation.");
  const document = schemeDocumentSchema.parse(rev.document);
  const quotation = buildQuotation({
    number: row.number,
    status: row.status,
    issuedOn: null,
    validUntil: null,
    preparedBy: { name: author?.name ?? "", email: author?.email ?? "" },
    firm: firmDetailsOf(firm),
    client: { projectName: project.name, clientName: project.clientName, venue: project.venue, location: project.location, instrument: project.instrument, targetDate: project.targetDate },
    scheme: { id: scheme.id, name: document.name, description: document.description, version: row.schemeVersion, tuning: { pitchHz: project.pitchHz, temperatureC: project.temperatureC }, document },
    rateSet: { name: rates.setName, version: rates.version, effectiveDate: rates.effectiveDate, rates: rates.rates },
    commercial,
  });
  return { quotation, rateSetId: rates.setId, rateSetName: rates.setName };
}

function summaryOf(row: QuotationRow, q: Quotation | null, schemeName: string, user: SessionUser): QuotationSummary {
  return {
    id: row.id,
    number: row.number,
    status: effectiveStatus(row.status, row.validUntil, todayIso()),
    schemeId: row.schemeId,
    schemeName,
    schemeVersion: row.schemeVersion,
    validUntil: row.validUntil,
    issuedAt: toIso(row.issuedAt),
    sentAt: toIso(row.sentAt),
    totalAmount: q && maySeeTotal(user.role, row.sentAt !== null) ? q.totals.totalAmount : null,
    currency: (row.commercial as Commercial).currency,
    updatedAt: row.updatedAt.toISOString(),
  };
}

async function toRead(row: QuotationRow, project: Project, user: SessionUser): Promise<QuotationRead> {
  if (row.snapshot) {
    const q = readQuotationSnapshot(row.snapshot);
    return {
      ...summaryOf(row, q, q.scheme.name, user), version: row.version, projectId: row.projectId,
      rateSetId: null, rateSetName: q.rateSet.name, rateSetVersion: q.rateSet.version, quotation: q,
    };
  }
  const commercial = commercialSchema.parse(row.commercial);
  const { quotation, rateSetId, rateSetName } = await draftQuotation(row, project, commercial);
  return { ...summaryOf(row, quotation, quotation.scheme.name, user), version: row.version, projectId: row.projectId, rateSetId, rateSetName, rateSetVersion: quotation.rateSet.version, quotation };
}

function asInvalid(err: unknown): never {
  if (err instanceof QuotationError) throw new AppError("invalid", err.message, err.fields);
  throw err;
}

export async function createQuotation({ user, projectId, schemeId, rateSetId }: { user: SessionUser; projectId: string; schemeId: string; rateSetId?: string | null }): Promise<QuotationRead> {
  const project = await loadProjectFor({ user, projectId });
  assertOpen(project);
  if (!isUuid(schemeId)) throw new AppError("invalid", "Choose a scheme of this project.", { schemeId: ["Choose a scheme of this project."] });
  const [scheme] = await db.select().from(schemes).where(and(eq(schemes.id, schemeId), eq(schemes.projectId, projectId))).limit(1);
  if (!scheme) throw new AppError("invalid", "Choose a scheme of this project.", { schemeId: ["Choose a scheme of this project."] });
  const rates = await getPricingRates({ rateSetId: rateSetId ?? null }).catch((err) => {
    if (err instanceof AppError && err.code === "not_found") throw new AppError("invalid", "Choose a rate set of the rate book.", { rateSetId: ["Choose a rate set of the rate book."] });
    throw err;
  });
  const commercial = defaultCommercial({ currency: rates.rates.currency, taxPercent: rates.rates.taxPercent });
  // Price it before anything is stored: a scheme that cannot be estimated gets its messages and no number.
  const trial = { schemeId, schemeVersion: scheme.version, rateSetVersionId: rates.versionId, number: "(new)", status: "draft", createdById: user.id } as QuotationRow;
  await draftQuotation(trial, project, commercial).catch(asInvalid);
  const row = await db.transaction(async (tx) => {
    const number = await nextNumber(tx, new Date().getUTCFullYear());
    const [inserted] = await tx
      .insert(quotations)
      .values({ projectId, schemeId, schemeVersion: scheme.version, rateSetVersionId: rates.versionId, number, commercial, createdById: user.id })
      .returning();
    return inserted!;
  });
  return toRead(row, project, user).catch(asInvalid);
}

export async function listQuotationsForProject({ user, projectId }: { user: SessionUser; projectId: string }): Promise<QuotationSummary[]> {
  await loadProjectFor({ user, projectId });
  const rows = await db
    .select({ q: quotations, schemeName: schemes.name })
    .from(quotations)
    .leftJoin(schemes, eq(schemes.id, quotations.schemeId))
    .where(eq(quotations.projectId, projectId))
    .orderBy(asc(quotations.createdAt));
  return rows
    .filter(({ q }) => listsQuotation(user.role, q.sentAt !== null, q.status))
    .map(({ q, schemeName }) => {
      const snap = q.snapshot as Quotation | null;
      return summaryOf(q, snap, snap?.scheme.name ?? schemeName ?? "(deleted scheme)", user);
    });
}

export async function getQuotationForUser({ user, quotationId }: { user: SessionUser; quotationId: string }): Promise<QuotationRead> {
  const { row, project } = await loadQuotationRow({ user, quotationId });
  return toRead(row, project, user).catch(asInvalid);
}

/** The quotation object a document is written from, after the caller checked who may have which document. */
export async function getQuotationForDocument({ user, quotationId }: { user: SessionUser; quotationId: string }): Promise<{ read: QuotationRead; sent: boolean }> {
  const { row, project } = await loadQuotationRow({ user, quotationId });
  return { read: await toRead(row, project, user).catch(asInvalid), sent: row.sentAt !== null };
}

/** Changes the commercial terms of a draft, against the version it was based on. */
export async function saveCommercial({ user, quotationId, version, commercial }: { user: SessionUser; quotationId: string; version: number; commercial: Commercial }): Promise<QuotationRead> {
  const { row, project } = await loadQuotationRow({ user, quotationId });
  assertOpen(project);
  if (row.status !== "draft") throw new AppError("conflict", `Quotation ${row.number} is ${row.status}; its terms are frozen. Make a new quotation to change them.`);
  // Price it first: a discount larger than the works is refused with its field, and nothing is saved.
  await draftQuotation(row, project, commercial).catch(asInvalid);
  const updated = await db.transaction(async (tx) => {
    const [locked] = await tx.select().from(quotations).where(eq(quotations.id, quotationId)).for("update");
    if (locked!.version !== version) throw new AppError("conflict", `Someone saved quotation ${row.number} after the version you started from; reload to see their change.`, undefined, { currentVersion: locked!.version });
    if (locked!.status !== "draft") throw new AppError("conflict", `Quotation ${row.number} was issued meanwhile; its terms are frozen.`);
    const [u] = await tx.update(quotations).set({ commercial, version: locked!.version + 1, updatedAt: new Date() }).where(eq(quotations.id, quotationId)).returning();
    return u!;
  });
  return toRead(updated, project, user);
}

/** Issues a draft: its snapshot is taken now and never changes after. */
export async function issueQuotation({ user, quotationId, version }: { user: SessionUser; quotationId: string; version: number }): Promise<QuotationRead> {
  const { row, project } = await loadQuotationRow({ user, quotationId });
  assertOpen(project);
  if (row.status !== "draft") throw new AppError("conflict", `Quotation ${row.number} is already ${row.status}.`);
  const commercial = commercialSchema.parse(row.commercial);
  const [issuer] = await db.select({ name: users.name, email: users.email }).from(users).where(eq(users.id, user.id)).limit(1);
  const { quotation } = await draftQuotation(row, project, commercial).catch(asInvalid);
  const issuedOn = todayIso();
  const validUntil = addDays(issuedOn, commercial.validityDays);
  const snapshot: Quotation = { ...quotation, status: "issued", issuedOn, validUntil, preparedBy: { name: issuer?.name ?? user.name, email: issuer?.email ?? user.email } };
  const updated = await db.transaction(async (tx) => {
    const [locked] = await tx.select().from(quotations).where(eq(quotations.id, quotationId)).for("update");
    if (locked!.version !== version) throw new AppError("conflict", `Someone changed quotation ${row.number} after the version you started from; review it and issue again.`, undefined, { currentVersion: locked!.version });
    if (locked!.status !== "draft") throw new AppError("conflict", `Quotation ${row.number} was issued meanwhile.`);
    const [u] = await tx
      .update(quotations)
      .set({ status: "issued", snapshot, validUntil, issuedAt: new Date(), issuedById: user.id, version: locked!.version + 1, updatedAt: new Date() })
      .where(eq(quotations.id, quotationId))
      .returning();
    return u!;
  });
  return toRead(updated, project, user);
}

/** Records the client's answer to an issued quotation that has not lapsed. */
export async function decideQuotation({ user, quotationId, outcome }: { user: SessionUser; quotationId: string; outcome: "accepted" | "declined" }): Promise<QuotationRead> {
  const { row, project } = await loadQuotationRow({ user, quotationId });
  const status = effectiveStatus(row.status, row.validUntil, todayIso());
  if (status === "lapsed") throw new AppError("conflict", `Quotation ${row.number} lapsed on ${row.validUntil}; make a new quotation from the current scheme and rates.`);
  if (status !== "issued") throw new AppError("conflict", `Quotation ${row.number} is ${status}; only an issued quotation can be accepted or declined.`);
  const [updated] = await db
    .update(quotations)
    .set({ status: outcome, decidedAt: new Date(), version: row.version + 1, updatedAt: new Date() })
    .where(and(eq(quotations.id, quotationId), eq(quotations.status, "issued")))
    .returning();
  if (!updated) throw new AppError("conflict", `Quotation ${row.number} changed meanwhile; reload it.`);
  return toRead(updated, project, user);
}

/**
 * Marks an issued quotation as sent to the committee (the first sending's time is kept): from then on
 * its members find the tender and its price. Refused, with nothing recorded, for a quotation that is
 * not open to sending or a project without committee. Returns the quotation as it now stands and the
 * recipients, whom the caller mails after this has stood.
 */
export async function markQuotationSent<R>({ user, quotationId, recipientsOf }: { user: SessionUser; quotationId: string; recipientsOf: (projectId: string) => Promise<R[]> }): Promise<{ read: QuotationRead; project: Project; recipients: R[] }> {
  const { row, project } = await loadQuotationRow({ user, quotationId });
  assertOpen(project);
  const status = effectiveStatus(row.status, row.validUntil, todayIso());
  if (status === "draft") throw new AppError("conflict", `Quotation ${row.number} is a draft; issue it before sending the tender.`);
  if (status === "lapsed") throw new AppError("conflict", `Quotation ${row.number} lapsed on ${row.validUntil}; make a new quotation before sending a tender.`);
  if (status !== "issued") throw new AppError("conflict", `Quotation ${row.number} was ${status}; the committee has already answered it.`);
  const recipients = await recipientsOf(project.id);
  if (!recipients.length) throw new AppError("conflict", "The project has no committee member to send the tender to; invite the committee from the project page first.");
  const [updated] = await db
    .update(quotations)
    .set({ sentAt: row.sentAt ?? new Date(), updatedAt: new Date() })
    .where(and(eq(quotations.id, quotationId), eq(quotations.status, "issued")))
    .returning();
  if (!updated) throw new AppError("conflict", `Quotation ${row.number} changed meanwhile; reload it.`);
  return { read: await toRead(updated, project, user), project, recipients };
}

/** The latest tender sent to the committee for a scheme (its number, price and validity), or null. */
export async function sentTenderOfScheme({ schemeId }: { schemeId: string }): Promise<{ number: string; totalAmount: string; currency: string; validUntil: string | null; status: QuoteStatus } | null> {
  const rows = await db
    .select()
    .from(quotations)
    .where(and(eq(quotations.schemeId, schemeId), sql`${quotations.sentAt} is not null`))
    .orderBy(sql`${quotations.sentAt} desc`)
    .limit(1);
  const row = rows[0];
  const snap = row?.snapshot as Quotation | null | undefined;
  if (!row || !snap) return null;
  return { number: row.number, totalAmount: snap.totals.totalAmount, currency: snap.commercial.currency, validUntil: row.validUntil, status: effectiveStatus(row.status, row.validUntil, todayIso()) };
}
