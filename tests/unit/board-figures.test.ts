// The board's per-column figures keep their identity while their content is the same, so a move
// redraws the two columns it touched and no other.
import { describe, expect, it } from "vitest";
import { keepUnchanged, pipesWords, type ColumnFigures } from "@/components/spec/board-figures";

const column = (over: Partial<ColumnFigures> = {}): ColumnFigures => ({
  notes: 56,
  pipesTotal: 280,
  fit: "fit",
  hasChest: true,
  words: "Chest 2400 × 900 mm in 2600 × 1000 mm.",
  pipesText: { a: "56 pipes", b: "no pipes" },
  ...over,
});

describe("column figures across an edit", () => {
  it("keep the earlier object of a column whose figures are equal in every field", () => {
    const before = new Map([["gt", column()], ["sw", column({ notes: 58 })]]);
    const after = keepUnchanged(before, new Map([["gt", column()], ["sw", column({ notes: 58 })]]));
    expect(after.get("gt")).toBe(before.get("gt"));
    expect(after.get("sw")).toBe(before.get("sw"));
  });

  it("take the new object when any field differs, the pipes of one stop included", () => {
    const before = new Map([["gt", column()]]);
    const changes: Partial<ColumnFigures>[] = [
      { notes: 61 },
      { pipesTotal: 281 },
      { fit: "clash" },
      { hasChest: false },
      { words: "Chest 2500 × 900 mm in 2400 × 1000 mm: 100 mm too long." },
      { pipesText: { a: "56 pipes", b: "12 prepared" } },
      { pipesText: { a: "56 pipes" } },
      { pipesText: { a: "56 pipes", b: "no pipes", c: "61 pipes" } },
    ];
    for (const change of changes) {
      const next = column(change);
      expect(keepUnchanged(before, new Map([["gt", next]])).get("gt"), JSON.stringify(change)).toBe(next);
    }
  });

  it("take a division new to the board as it comes", () => {
    const next = column();
    expect(keepUnchanged(new Map(), new Map([["ch", next]])).get("ch")).toBe(next);
  });
});

describe("a card's pipe count", () => {
  it("says what the stop has: pipes, none (borrowed), prepared for, removed", () => {
    expect(pipesWords({ total: 61, prepared: 0, kind: "own" })).toBe("61 pipes");
    expect(pipesWords({ total: 1, prepared: 0, kind: "own" })).toBe("1 pipe");
    expect(pipesWords({ total: 0, prepared: 0, kind: "borrowed" })).toBe("no pipes");
    expect(pipesWords({ total: 0, prepared: 56, kind: "prepared" })).toBe("56 prepared");
    expect(pipesWords({ total: 0, prepared: 0, kind: "removed" })).toBe("removed");
    expect(pipesWords(undefined)).toBe("– pipes");
  });
});
