// The estimate worker is sent a new document as the difference from the one it holds: built on that
// one, the patch must give back exactly the new document, and a move must not send untouched divisions.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { enlargeScheme } from "@/db/demo-scenario";
import { applyPatch, patchOf } from "@/components/spec/doc-patch";
import { moveDivision, moveStop, removeDivision, removeStop, setAccessories, updateDivision } from "@/components/spec/doc-ops";
import { schemeDocumentSchema, type SchemeDocument } from "@/lib/spec/document";

const base: SchemeDocument = schemeDocumentSchema.parse(enlargeScheme);
const stopIds = base.divisions.flatMap((d) => d.stops.map((s) => s.id));
const divisionIds = base.divisions.map((d) => d.id);

// One edit of the kinds the editor makes, chosen by fast-check.
const edit = fc.oneof(
  fc.record({ kind: fc.constant("move" as const), stop: fc.constantFrom(...stopIds), to: fc.constantFrom(...divisionIds), index: fc.nat(40) }),
  fc.record({ kind: fc.constant("remove" as const), stop: fc.constantFrom(...stopIds) }),
  fc.record({ kind: fc.constant("order" as const), from: fc.nat(divisionIds.length - 1), to: fc.nat(divisionIds.length - 1) }),
  fc.record({ kind: fc.constant("drop-division" as const), division: fc.constantFrom(...divisionIds) }),
  fc.record({ kind: fc.constant("rename" as const), division: fc.constantFrom(...divisionIds), name: fc.string({ minLength: 1, maxLength: 12 }) }),
  fc.record({ kind: fc.constant("details" as const), description: fc.option(fc.string(), { nil: undefined }) }),
  fc.record({ kind: fc.constant("accessories" as const) }),
);

function step(doc: SchemeDocument, e: { kind: string; [k: string]: unknown }): SchemeDocument {
  switch (e.kind) {
    case "move": return moveStop(doc, e.stop as string, e.to as string, e.index as number);
    case "remove": return removeStop(doc, e.stop as string);
    case "order": return moveDivision(doc, e.from as number, e.to as number);
    case "drop-division": return removeDivision(doc, e.division as string);
    case "rename": {
      const d = doc.divisions.find((x) => x.id === e.division);
      return d ? updateDivision(doc, { ...d, name: e.name as string }) : doc;
    }
    case "details": {
      const { description: _, ...rest } = doc;
      return e.description === undefined ? (rest as SchemeDocument) : { ...doc, description: e.description as string };
    }
    default: return setAccessories(doc, { ...doc.accessories, couplers: [] });
  }
}

describe("document patches for the estimate worker", () => {
  it("give back the new document exactly, over any run of edits and undos", () => {
    fc.assert(
      fc.property(fc.array(edit, { minLength: 1, maxLength: 8 }), fc.array(fc.nat(8), { maxLength: 4 }), (edits, undos) => {
        // The worker holds `held`; the page sends each next document (edits, then steps back as undo does) as a patch on it.
        const docs = edits.reduce<SchemeDocument[]>((all, e) => [...all, step(all[all.length - 1]!, e)], [base]);
        const sent = [...docs.slice(1), ...undos.map((i) => docs[Math.min(i, docs.length - 1)]!)];
        // The page diffs against its own object of the held document; the worker has a copy (postMessage clones).
        let pageHeld = base;
        let workerHeld = structuredClone(base);
        for (const next of sent) {
          workerHeld = applyPatch(workerHeld, structuredClone(patchOf(pageHeld, next)));
          expect(workerHeld).toEqual(next);
          pageHeld = next;
        }
      }),
      { numRuns: 200 },
    );
  });

  it("sends a move of a stop to another division as its two divisions and the others' ids", () => {
    const [from, to, ...rest] = base.divisions;
    const moved = moveStop(base, from!.stops[0]!.id, to!.id, 0);
    const patch = patchOf(base, moved);
    expect(patch.set).toEqual({});
    expect(patch.unset).toEqual([]);
    expect(patch.divisions!.filter((d) => typeof d !== "string").map((d) => (d as { id: string }).id)).toEqual([from!.id, to!.id]);
    expect(patch.divisions!.slice(2)).toEqual(rest.map((d) => d.id));
    // Far smaller than the whole document, which is what a structured clone would copy.
    expect(JSON.stringify(patch).length).toBeLessThan(JSON.stringify(moved).length);
  });

  it("sends nothing for the same document, and refuses a patch on a base without its divisions", () => {
    expect(patchOf(base, base)).toEqual({ set: {}, unset: [], divisions: null });
    const other = moveStop(base, base.divisions[0]!.stops[0]!.id, base.divisions[1]!.id, 0);
    expect(() => applyPatch({ ...base, divisions: [] }, patchOf(base, other))).toThrow(/does not have/);
  });
});
