import "server-only";
import { LRUCache } from "lru-cache";

/**
 * Answers derived from a scheme version, kept in this process's memory: a scheme document's JSON
 * by (scheme, version), and an estimate's JSON, already encoded as UTF-8 bytes, by (scheme,
 * version, tuning, rate set, role's view). Every key carries the version read from PostgreSQL in
 * the same request, and a saved version is never rewritten, so a stale entry can never be served,
 * and several server instances each keep their own. Bounded by size; the least recently used go first.
 */
const g = globalThis as unknown as { stopwrightReadCache?: { documents: LRUCache<string, string>; estimates: LRUCache<string, Uint8Array<ArrayBuffer>> } };
// About 64 MB each (two bytes a character for the documents): some 500 large 150-stop scheme versions.
export const readCache = (g.stopwrightReadCache ??= {
  documents: new LRUCache<string, string>({ maxSize: 32_000_000, sizeCalculation: (v, k) => v.length + k.length }),
  estimates: new LRUCache<string, Uint8Array<ArrayBuffer>>({ maxSize: 64_000_000, sizeCalculation: (v, k) => v.byteLength + k.length }),
});

const inFlight = new WeakMap<object, Map<string, Promise<unknown>>>();

/** The cached value for `key`, or `make()`'s, made once however many requests ask at the same moment. */
export async function cached<V extends object>(cache: LRUCache<string, V>, key: string, make: () => Promise<V>): Promise<V> {
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  let pending = inFlight.get(cache);
  if (!pending) inFlight.set(cache, (pending = new Map()));
  const running = pending.get(key) as Promise<V> | undefined;
  if (running) return running;
  const promise = make().then((value) => {
    cache.set(key, value);
    return value;
  });
  pending.set(key, promise);
  try {
    return await promise;
  } finally {
    pending.delete(key);
  }
}
