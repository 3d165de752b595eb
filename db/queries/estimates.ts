import "server-only";
import { and, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { schemeRevisions } from "@/db/schema";
import { can } from "@/lib/roles";
import { AppError } from "@/lib/server/errors";
import type { SessionUser } from "@/lib/server/guard";
import { cached, readCache } from "@/lib/server/read-cache";
import { schemeDocumentSchema, type SchemeDocument } from "@/lib/spec/document";
import { estimateDocument, withoutMoney } from "@/lib/spec/estimate";
import { admitSchemeHead, isUuid, prepareSchemeHead, type SchemeHead } from "./access";
import { currentPricingVersionId, getPricingRates, getRatesOfVersion } from "./rate-sets";

/** The document of exactly this version: from the read cache, or from its revision snapshot. */
async function documentOf(head: SchemeHead): Promise<SchemeDocument> {
  const cached = readCache.documents.get(`${head.id}:${head.version}`);
  if (cached !== undefined) return JSON.parse(cached) as SchemeDocument;
  const [row] = await db
    .select({ document: schemeRevisions.document })
    .from(schemeRevisions)
    .where(and(eq(schemeRevisions.schemeId, head.id), eq(schemeRevisions.version, head.version)))
    .limit(1);
  if (!row) throw new AppError("conflict", "This scheme changed while it was being read; try again.");
  return schemeDocumentSchema.parse(row.document);
}

// loadSchemeHeadFor's row and rule and, in the same round trip, the id of the rate-set version the
// firm prices with now (null: no rate book yet). Prepared once: it runs on every estimate read.
const schemeHeadPricedQuery = prepareSchemeHead("scheme_head_priced", { pricingVersionId: currentPricingVersionId });

async function loadSchemeHeadPricedFor({ user, schemeId }: { user: SessionUser; schemeId: string }): Promise<SchemeHead & { pricingVersionId: string | null }> {
  if (!isUuid(schemeId)) throw new AppError("not_found", "No such scheme.");
  const [row] = await schemeHeadPricedQuery.execute({ schemeId, userId: user.id });
  return admitSchemeHead(user, row);
}

const utf8 = new TextEncoder();

/**
 * GET /api/schemes/:id/estimate as JSON, encoded (UTF-8) once and kept so. An estimate depends only
 * on the scheme version, the project's tuning, the rate-set version (the firm's current set, or the
 * one asked for) and whether the role sees money, so it is computed once per such combination and
 * kept in the read cache; a save, a tuning change or a new rate version make a new key.
 */
export async function getEstimateJsonForUser({ user, schemeId, rateSetId }: { user: SessionUser; schemeId: string; rateSetId?: string | null }): Promise<Uint8Array<ArrayBuffer>> {
  // The scheme's version and the rate-set version it is priced with, read from PostgreSQL in one round
  // trip; the rates themselves are needed only when the estimate is not in the cache yet.
  const { pricingVersionId, ...head } = await loadSchemeHeadPricedFor({ user, schemeId });
  const money = can(user.role, "money:read");
  const ratesKey = rateSetId || !pricingVersionId ? (await getPricingRates({ rateSetId })).versionId : pricingVersionId;
  const key = [head.id, head.version, head.pitchHz, head.temperatureC, ratesKey, money ? "money" : "no-money"].join(":");
  return cached(readCache.estimates, key, async () => {
    const rates = await getRatesOfVersion({ versionId: ratesKey });
    const result = estimateDocument(await documentOf(head), { pitchHz: head.pitchHz, temperatureC: head.temperatureC }, rates);
    if (!result.ok) throw new AppError("invalid", "This scheme cannot be estimated yet.", { document: [...result.messages] });
    return utf8.encode(JSON.stringify({ version: head.version, estimate: money ? result.estimate : withoutMoney(result.estimate) }));
  });
}
