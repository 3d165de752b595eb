import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { assignPositions } from "@/lib/spec/ordering";

function keysInOrder(ids: string[], keys: Map<string, string>) {
  const list = ids.map((id) => keys.get(id)!);
  return list.every((k, i) => i === 0 || list[i - 1]! < k);
}

describe("assignPositions", () => {
  it("gives a fresh list keys in order", () => {
    const ids = ["a", "b", "c", "d"];
    const keys = assignPositions(ids, new Map());
    expect(keysInOrder(ids, keys)).toBe(true);
  });

  it("moving one item rewrites only that item's key", () => {
    const ids = ["a", "b", "c", "d", "e"];
    const first = assignPositions(ids, new Map());
    const moved = ["a", "d", "b", "c", "e"];
    const second = assignPositions(moved, first);
    expect(keysInOrder(moved, second)).toBe(true);
    const changed = moved.filter((id) => second.get(id) !== first.get(id));
    expect(changed).toEqual(["d"]);
  });

  it("keeps any sequence of moves, inserts and deletions in order (property)", () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.nat(30), fc.nat(30), fc.boolean()), { maxLength: 60 }), (moves) => {
        let ids = Array.from({ length: 8 }, (_, i) => `s${i}`);
        let keys = assignPositions(ids, new Map());
        let next = 8;
        for (const [from, to, insert] of moves) {
          if (insert) ids.splice(to % (ids.length + 1), 0, `s${next++}`);
          else if (ids.length) {
            const [item] = ids.splice(from % ids.length, 1);
            ids.splice(to % (ids.length + 1), 0, item!);
          }
          const before = keys;
          keys = assignPositions(ids, keys);
          if (!keysInOrder(ids, keys)) return false;
          // A single move or insert never rewrites more than one existing key.
          const rewritten = ids.filter((id) => before.has(id) && before.get(id) !== keys.get(id));
          if (rewritten.length > 1) return false;
        }
        ids = ids.slice(1);
        return keysInOrder(ids, assignPositions(ids, keys));
      }),
    );
  });
});
