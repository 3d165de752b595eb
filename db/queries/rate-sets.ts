import "server-only";
import { and, asc, desc, eq, sql } from "drizzle-orm";
import { LRUCache } from "lru-cache";
import { db } from "@/db/client";
import { rateSets, rateSetVersions, users, type RateSet, type RateSetVersion } from "@/db/schema";
import { parseRates, ratesSchema, type Rates } from "@/lib/estimate";
import { DEFAULT_RATES } from "@/lib/estimate/demo-rates";
import { AppError } from "@/lib/server/errors";
import type { SessionUser } from "@/lib/server/guard";
import { isUuid } from "./access";

export const FIRST_SET_NAME = "Standard rates";

export type RateSetSummary = {
  id: string;
  name: string;
  isCurrent: boolean;
  version: number;
  effectiveDate: string;
  currency: string;
  provenance: string;
  updatedAt: string;
};

export type RateVersionRead = {
  id: string;
  version: number;
  effectiveDate: string;
  note: string;
  authorName: string | null;
  createdAt: string;
  rates: Rates;
};

function today(): string {
  return new Date().toISOString().slice(0, 10);
}

/**
 * Stored rates read through the estimator's schema. A version saved before the schema gained a rate
 * reads with that rate's demo default filled in, however deep it sits (the estimator's own deep
 * merge, parseRates), so a new norm never makes old rate sets unreadable.
 */
function readRates(raw: unknown): Rates {
  const r = ratesSchema.safeParse(raw);
  if (r.success) return r.data;
  const merged = parseRates(raw, DEFAULT_RATES);
  if (merged.ok) return merged.rates;
  throw new AppError("internal", "A stored rate set no longer matches the estimator's rates; an administrator must re-save it.");
}

/**
 * A firm always has a rate book: the first time one is needed, the invented demo set is stored as
 * the current "Standard rates", version 1, for the firm to replace with its own figures.
 */
export async function ensureRateBook(): Promise<void> {
  const [any] = await db.select({ id: rateSets.id }).from(rateSets).limit(1);
  if (any) return;
  await db.transaction(async (tx) => {
    const [set] = await tx.insert(rateSets).values({ name: FIRST_SET_NAME, isCurrent: true }).onConflictDoNothing().returning();
    if (set) await tx.insert(rateSetVersions).values({ rateSetId: set.id, version: 1, effectiveDate: today(), rates: DEFAULT_RATES, note: "invented demo values" });
  });
}

export async function listRateSets(): Promise<RateSetSummary[]> {
  await ensureRateBook();
  const rows = await db
    .select({ set: rateSets, v: rateSetVersions })
    .from(rateSets)
    .innerJoin(rateSetVersions, and(eq(rateSetVersions.rateSetId, rateSets.id), eq(rateSetVersions.version, rateSets.version)))
    .orderBy(desc(rateSets.isCurrent), asc(rateSets.name));
  return rows.map(({ set, v }) => {
    const rates = v.rates as Partial<Rates>;
    return {
      id: set.id, name: set.name, isCurrent: set.isCurrent, version: set.version, effectiveDate: v.effectiveDate,
      currency: String(rates.currency ?? ""), provenance: String(rates.provenance ?? ""), updatedAt: set.updatedAt.toISOString(),
    };
  });
}

async function loadSet(id: string): Promise<RateSet> {
  if (!isUuid(id)) throw new AppError("not_found", "No such rate set.");
  const [set] = await db.select().from(rateSets).where(eq(rateSets.id, id)).limit(1);
  if (!set) throw new AppError("not_found", "No such rate set.");
  return set;
}

function versionRead(v: RateSetVersion, authorName: string | null): RateVersionRead {
  return { id: v.id, version: v.version, effectiveDate: v.effectiveDate, note: v.note, authorName, createdAt: v.createdAt.toISOString(), rates: readRates(v.rates) };
}

export async function getRateSetVersion({ rateSetId, version }: { rateSetId: string; version: number }): Promise<RateVersionRead> {
  await loadSet(rateSetId);
  const [row] = await db
    .select({ v: rateSetVersions, authorName: users.name })
    .from(rateSetVersions)
    .leftJoin(users, eq(users.id, rateSetVersions.authorId))
    .where(and(eq(rateSetVersions.rateSetId, rateSetId), eq(rateSetVersions.version, version)))
    .limit(1);
  if (!row) throw new AppError("not_found", `This rate set has no version ${version}.`);
  return versionRead(row.v, row.authorName ?? null);
}

export async function getRateSet({ rateSetId }: { rateSetId: string }) {
  const set = await loadSet(rateSetId);
  const current = await getRateSetVersion({ rateSetId, version: set.version });
  const versions = await db
    .select({ version: rateSetVersions.version, effectiveDate: rateSetVersions.effectiveDate, note: rateSetVersions.note, createdAt: rateSetVersions.createdAt, authorName: users.name })
    .from(rateSetVersions)
    .leftJoin(users, eq(users.id, rateSetVersions.authorId))
    .where(eq(rateSetVersions.rateSetId, rateSetId))
    .orderBy(desc(rateSetVersions.version));
  return {
    set: { id: set.id, name: set.name, isCurrent: set.isCurrent, version: set.version },
    current,
    versions: versions.map((v) => ({ ...v, authorName: v.authorName ?? null, createdAt: v.createdAt.toISOString() })),
  };
}

/** Frozen all the way down: one parsed object is shared by every request that prices with it. */
function deepFreeze<T>(value: T): T {
  if (value && typeof value === "object" && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const v of Object.values(value)) deepFreeze(v);
  }
  return value;
}

/**
 * Parsed rates by rate-set version id. A version row is never changed once written (every edit is a
 * new version with a new id), so its parsed rates can be kept for as long as the process lives; the
 * id always comes from the database in the same request, so a new version is never missed.
 */
const parsedRates = new LRUCache<string, Promise<Rates>>({ max: 64 });

/** The rates of one stored version, parsed once per process (the zod parse of the whole rates object
 * and the transfer of its JSON otherwise fall on every priced request). */
export function getRatesOfVersion({ versionId }: { versionId: string }): Promise<Rates> {
  let rates = parsedRates.get(versionId);
  if (!rates) {
    rates = db
      .select({ rates: rateSetVersions.rates })
      .from(rateSetVersions)
      .where(eq(rateSetVersions.id, versionId))
      .limit(1)
      .then(([row]) => {
        if (!row) throw new AppError("conflict", "The rate book changed while it was being read; try again.");
        return deepFreeze(readRates(row.rates));
      });
    parsedRates.set(versionId, rates);
    rates.catch(() => parsedRates.delete(versionId));
  }
  return rates;
}

/**
 * The version a scheme is priced with when no set is named: the current set's latest version, or, when
 * no set is marked current (e.g. the current one was just renamed away), the oldest set's. One
 * subquery, so a read can fetch it in the same round trip as its scheme (`db/queries/estimates.ts`).
 */
export const currentPricingVersionId = sql<string | null>`(select v.id from ${rateSets} s join ${rateSetVersions} v on v.rate_set_id = s.id and v.version = s.version order by s.is_current desc, s.created_at asc limit 1)`;

const pricingColumns = {
  setId: rateSets.id,
  setName: rateSets.name,
  versionId: rateSetVersions.id,
  version: rateSetVersions.version,
  effectiveDate: rateSetVersions.effectiveDate,
};

/** The rates a scheme is priced with: the chosen set's latest version, or the current set's. */
export async function getPricingRates({ rateSetId }: { rateSetId?: string | null } = {}): Promise<{ setId: string; setName: string; versionId: string; version: number; effectiveDate: string; rates: Rates }> {
  if (rateSetId && !isUuid(rateSetId)) throw new AppError("not_found", "No such rate set.");
  const find = () =>
    db
      .select(pricingColumns)
      .from(rateSets)
      .innerJoin(rateSetVersions, and(eq(rateSetVersions.rateSetId, rateSets.id), eq(rateSetVersions.version, rateSets.version)))
      // The set asked for, or the one rule for the set priced with by default.
      .where(rateSetId ? eq(rateSets.id, rateSetId) : eq(rateSetVersions.id, currentPricingVersionId))
      .limit(1);
  let [row] = await find();
  if (!row && !rateSetId) {
    await ensureRateBook();
    [row] = await find();
  }
  if (!row) throw new AppError("not_found", "No such rate set.");
  return { ...row, rates: await getRatesOfVersion({ versionId: row.versionId }) };
}

export async function getRateSetVersionById({ id }: { id: string }) {
  const [row] = await db
    .select({ set: rateSets, v: rateSetVersions })
    .from(rateSetVersions)
    .innerJoin(rateSets, eq(rateSets.id, rateSetVersions.rateSetId))
    .where(eq(rateSetVersions.id, id))
    .limit(1);
  if (!row) throw new AppError("not_found", "The rate-set version this quotation was priced with no longer exists.");
  return { setId: row.set.id, setName: row.set.name, versionId: row.v.id, version: row.v.version, effectiveDate: row.v.effectiveDate, rates: readRates(row.v.rates) };
}

export async function createRateSet({ user, name, copyFrom }: { user: SessionUser; name: string; copyFrom?: string | null }) {
  const source = await getPricingRates({ rateSetId: copyFrom ?? null });
  return db.transaction(async (tx) => {
    const [set] = await tx.insert(rateSets).values({ name }).onConflictDoNothing().returning();
    if (!set) throw new AppError("invalid", `A rate set called "${name}" already exists.`, { name: [`A rate set called "${name}" already exists.`] });
    await tx.insert(rateSetVersions).values({ rateSetId: set.id, version: 1, effectiveDate: today(), rates: source.rates, note: `copied from "${source.setName}" version ${source.version}`, authorId: user.id });
    return set;
  });
}

/** Every saved change is a new version, written against the version the editor started from (409 when stale). */
export async function saveRateSetVersion({ user, rateSetId, basedOn, effectiveDate, note, rates }: { user: SessionUser; rateSetId: string; basedOn: number; effectiveDate: string; note: string; rates: Rates }) {
  await loadSet(rateSetId);
  return db.transaction(async (tx) => {
    const [set] = await tx.select().from(rateSets).where(eq(rateSets.id, rateSetId)).for("update");
    if (set!.version !== basedOn) {
      throw new AppError("conflict", `Someone saved version ${set!.version} of "${set!.name}" after the version ${basedOn} you started from; nothing was saved. Reload to see their figures.`, undefined, { currentVersion: set!.version });
    }
    const version = set!.version + 1;
    await tx.insert(rateSetVersions).values({ rateSetId, version, effectiveDate, rates, note, authorId: user.id });
    await tx.update(rateSets).set({ version, updatedAt: new Date() }).where(eq(rateSets.id, rateSetId));
    return { version };
  });
}

export async function makeRateSetCurrent({ rateSetId }: { rateSetId: string }) {
  await loadSet(rateSetId);
  await db.transaction(async (tx) => {
    await tx.update(rateSets).set({ isCurrent: false }).where(eq(rateSets.isCurrent, true));
    await tx.update(rateSets).set({ isCurrent: true, updatedAt: new Date() }).where(eq(rateSets.id, rateSetId));
  });
}
