// Undo and redo say what they took back or put again: the revision notes and the editor's status line use these words.
import { describe, expect, it } from "vitest";
import { historyReducer, initHistory, nextRedo, nextUndo } from "@/components/spec/history";
import { schemeDocumentSchema, type SchemeDocument } from "@/lib/spec/document";

// Read through the document's own schema, so the case, wind and site get their defaults as a saved document does.
const doc = (name: string): SchemeDocument =>
  schemeDocumentSchema.parse({ name, description: "", divisions: [], accessories: { consoleWork: "new", couplers: [], tremulants: [], combination: { memoryLevels: 0, generalPistons: 0, divisionalPistons: 0 } } });

describe("history", () => {
  const a = doc("A");
  const b = doc("B");
  const c = doc("C");
  const edited = [
    { type: "edit" as const, doc: b, label: "Moved the Trumpet 8′ from the Great to the Swell" },
    { type: "edit" as const, doc: c, label: "Added Tierce 1⅗′ to the Choir" },
  ].reduce(historyReducer, initHistory(a));

  it("labels an undo with the edit it took back, and a redo with the edit it put again", () => {
    const undone = historyReducer(edited, { type: "undo" });
    expect(undone.present).toBe(b);
    expect(undone.label).toBe("Undid: Added Tierce 1⅗′ to the Choir");
    const twice = historyReducer(undone, { type: "undo" });
    expect(twice.present).toBe(a);
    expect(twice.label).toBe("Undid: Moved the Trumpet 8′ from the Great to the Swell");
    const redone = historyReducer(twice, { type: "redo" });
    expect(redone.present).toBe(b);
    expect(redone.label).toBe("Redid: Moved the Trumpet 8′ from the Great to the Swell");
  });

  it("tells the buttons what they would do, and nothing at the ends", () => {
    expect(nextUndo(edited)).toBe("Added Tierce 1⅗′ to the Choir");
    expect(nextRedo(edited)).toBeNull();
    const undone = historyReducer(edited, { type: "undo" });
    expect(nextRedo(undone)).toBe("Added Tierce 1⅗′ to the Choir");
    expect(nextUndo(initHistory(a))).toBeNull();
    expect(historyReducer(initHistory(a), { type: "undo" })).toEqual(initHistory(a));
  });

  it("forgets what could be redone after a new edit", () => {
    const undone = historyReducer(edited, { type: "undo" });
    const branched = historyReducer(undone, { type: "edit", doc: c, label: "Renamed" });
    expect(branched.future).toEqual([]);
    expect(nextUndo(branched)).toBe("Renamed");
  });
});
