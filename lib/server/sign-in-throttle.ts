import "server-only";
import { createHash } from "node:crypto";
import { RateLimiterPostgres, RateLimiterRes } from "rate-limiter-flexible";
import { pool } from "@/db/client";

/**
 * Failed sign-ins, counted in PostgreSQL (rate-limiter-flexible), so the count holds across server
 * instances and restarts. Per account: 10 failures in 15 minutes pause that account's sign-in for
 * 15 minutes. Per address: 30 failures in 15 minutes pause sign-in from there for 15 minutes, so
 * one machine cannot try many accounts. Both pauses end by themselves; a correct password during a
 * pause is refused too, or the pause would not stop guessing. Only wrong passwords count.
 */
export const throttleRules = {
  account: { points: 10, durationS: 15 * 60, blockS: 15 * 60 },
  address: { points: 30, durationS: 15 * 60, blockS: 15 * 60 },
} as const;

type Which = keyof typeof throttleRules;

function limiter(which: Which) {
  const rule = throttleRules[which];
  return new RateLimiterPostgres({
    storeClient: pool,
    storeType: "pool",
    tableName: "sign_in_throttle", // created by the migrations (db/schema.ts)
    tableCreated: true,
    keyPrefix: `sign-in-${which}`,
    points: rule.points,
    duration: rule.durationS,
    blockDuration: rule.blockS,
  });
}

const g = globalThis as unknown as { stopwrightThrottle?: Record<Which, RateLimiterPostgres> };
const limiters = (g.stopwrightThrottle ??= { account: limiter("account"), address: limiter("address") });

/** Keys are hashes: the table never holds an e-mail address or an IP address in clear. */
function key(value: string): string {
  return createHash("sha256").update(value).digest("hex");
}

function minutes(ms: number): string {
  const m = Math.max(1, Math.ceil(ms / 60_000));
  return m === 1 ? "1 minute" : `${m} minutes`;
}

function pausedMessage(which: Which, ms: number): string {
  return which === "account"
    ? `Too many failed sign-ins for this account. Sign-in is paused for ${minutes(ms)}; try again then, or ask your administrator.`
    : `Too many failed sign-ins from your network address. Sign-in from here is paused for ${minutes(ms)}; try again then.`;
}

export type Attempt = { email: string; address: string };

/** Why sign-in is paused now for this account or address, or null when it may go ahead. */
export async function signInPause({ email, address }: Attempt): Promise<string | null> {
  const [account, from] = await Promise.all([limiters.account.get(key(email)), limiters.address.get(key(address))]);
  if (account && account.consumedPoints > throttleRules.account.points) return pausedMessage("account", account.msBeforeNext);
  if (from && from.consumedPoints > throttleRules.address.points) return pausedMessage("address", from.msBeforeNext);
  return null;
}

/** Counts one wrong password against one limiter; the failure that reaches the limit starts a full pause. */
async function countFailure(which: Which, k: string): Promise<string | null> {
  const rule = throttleRules[which];
  try {
    const res = await limiters[which].consume(k);
    if (res.consumedPoints < rule.points) return null;
    await limiters[which].block(k, rule.blockS);
    return pausedMessage(which, rule.blockS * 1000);
  } catch (err) {
    // A RateLimiterRes means "already over the limit"; anything else is the database failing.
    if (err instanceof RateLimiterRes) return pausedMessage(which, err.msBeforeNext);
    throw err;
  }
}

/** Counts a wrong password; returns the pause message when this failure started a pause. */
export async function recordFailedSignIn({ email, address }: Attempt): Promise<string | null> {
  const [account, from] = await Promise.all([countFailure("account", key(email)), countFailure("address", key(address))]);
  return account ?? from;
}

/** The account's owner got in: its failures are forgotten (the address's are not). */
export async function recordSuccessfulSignIn({ email }: Pick<Attempt, "email">): Promise<void> {
  await limiters.account.delete(key(email));
}
