import "server-only";
import { LRUCache } from "lru-cache";

/**
 * Answers derived from a scheme version, kept in this process's memory: a scheme document's JSON
 * by (scheme, version), and an estimate's JSON by (scheme, version, tuning, rate set, role's view).
 * Every key carries the version read from PostgreSQL in the same request, and a saved version is
 * never rewritten, so a stale entry can never be served, and several server instances each keep
 * their own. Bounded by size (characters); the least recently used entries go first.
 */
function textCache(maxChars: number) {
  return new LRUCache<string, string>({ maxSize: maxChars, sizeCalculation: (v, k) => v.length + k.length });
}

const g = globalThis as unknown as { stopwrightReadCache?: { documents: LRUCache<string, string>; estimates: LRUCache<string, string> } };
// About 64 MB each at two bytes a character: some 500 large (150-stop) scheme versions.
export const readCache = (g.stopwrightReadCache ??= { documents: textCache(32_000_000), estimates: textCache(32_000_000) });

const inFlight = new WeakMap<LRUCache<string, string>, Map<string, Promise<string | null>>>();

/** The cached text for `key`, or `make()`'s, made once however many requests ask at the same moment. */
export async function cachedText(cache: LRUCache<string, string>, key: string, make: () => Promise<string | null>): Promise<string | null> {
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  let pending = inFlight.get(cache);
  if (!pending) inFlight.set(cache, (pending = new Map()));
  const running = pending.get(key);
  if (running) return running;
  const promise = make().then((text) => {
    if (text !== null) cache.set(key, text);
    return text;
  });
  pending.set(key, promise);
  try {
    return await promise;
  } finally {
    pending.delete(key);
  }
}
