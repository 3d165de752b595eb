/**
 * Fractional position keys for divisions and stops: a move rewrites the moved item's key only,
 * never the whole list. Pure.
 */
import { generateKeyBetween } from "fractional-indexing";

/** Indices of a longest strictly increasing subsequence of keys (undefined entries are skipped). */
function longestIncreasing(keys: readonly (string | undefined)[]): Set<number> {
  const tails: number[] = []; // tails[k] = index of the smallest tail of an increasing run of length k+1
  const prev = new Array<number>(keys.length).fill(-1);
  keys.forEach((key, i) => {
    if (key === undefined) return;
    let lo = 0;
    let hi = tails.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (keys[tails[mid]!]! < key) lo = mid + 1;
      else hi = mid;
    }
    if (lo > 0) prev[i] = tails[lo - 1]!;
    tails[lo] = i;
  });
  const keep = new Set<number>();
  let i = tails.length ? tails[tails.length - 1]! : -1;
  while (i >= 0) {
    keep.add(i);
    i = prev[i]!;
  }
  return keep;
}

/**
 * Keys for `ids` in this order. Items whose old key still sits in order keep it; the others get a
 * key between their kept neighbours. So moving one stop changes one key.
 */
export function assignPositions(ids: readonly string[], previous: ReadonlyMap<string, string>): Map<string, string> {
  const old = ids.map((id) => previous.get(id));
  const keep = longestIncreasing(old);
  const out = new Map<string, string>();
  let last: string | null = null;
  for (let i = 0; i < ids.length; i++) {
    if (keep.has(i)) {
      last = old[i]!;
      out.set(ids[i]!, last);
      continue;
    }
    let next: string | null = null;
    for (let j = i + 1; j < ids.length; j++) {
      if (keep.has(j)) {
        next = old[j]!;
        break;
      }
    }
    last = generateKeyBetween(last, next);
    out.set(ids[i]!, last);
  }
  return out;
}
