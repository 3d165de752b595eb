/**
 * Moving a stop or a division with the keyboard, one key one step, computed from the document
 * rather than from measured screen positions, so keys pressed in quick succession all count.
 * Up and Down move a stop within its division; Left and Right carry it to the neighbouring
 * division (at the same place in the list, or its end); a division moves left or right.
 */
import type { SchemeDocument } from "@/lib/spec/document";
import { findStop, moveDivision, moveStop } from "./doc-ops";

export type Carried = { type: "stop" | "division"; id: string };
export type CarryKey = "ArrowUp" | "ArrowDown" | "ArrowLeft" | "ArrowRight";

export function isCarryKey(key: string): key is CarryKey {
  return key === "ArrowUp" || key === "ArrowDown" || key === "ArrowLeft" || key === "ArrowRight";
}

/** The document after one step, or the same document when the item cannot go that way. */
export function carryStep(doc: SchemeDocument, carried: Carried, key: CarryKey): SchemeDocument {
  if (carried.type === "division") {
    const from = doc.divisions.findIndex((d) => d.id === carried.id);
    if (from < 0) return doc;
    const to = key === "ArrowLeft" || key === "ArrowUp" ? from - 1 : from + 1;
    return moveDivision(doc, from, to);
  }
  const found = findStop(doc, carried.id);
  if (!found) return doc;
  const { division, index } = found;
  if (key === "ArrowUp") return index > 0 ? moveStop(doc, carried.id, division.id, index - 1) : doc;
  if (key === "ArrowDown") return index < division.stops.length - 1 ? moveStop(doc, carried.id, division.id, index + 1) : doc;
  const d = doc.divisions.findIndex((x) => x.id === division.id);
  const next = doc.divisions[key === "ArrowLeft" ? d - 1 : d + 1];
  if (!next) return doc;
  return moveStop(doc, carried.id, next.id, Math.min(index, next.stops.length));
}

/** Where the carried item is now, in words for the screen reader ("position 3 of 8 in the Swell"). */
export function carryPlace(doc: SchemeDocument, carried: Carried): string {
  if (carried.type === "division") {
    const i = doc.divisions.findIndex((d) => d.id === carried.id);
    return `position ${i + 1} of ${doc.divisions.length} divisions`;
  }
  const found = findStop(doc, carried.id);
  return found ? `position ${found.index + 1} of ${found.division.stops.length} in the ${found.division.name}` : "";
}
