// Keyboard moves are steps on the document: every key counts, in order, however fast it comes.
import { describe, expect, it } from "vitest";
import { carryPlace, carryStep, type CarryKey } from "@/components/spec/keyboard-carry";
import type { SchemeDocument } from "@/lib/spec/document";
import { smallDocument } from "../support/fixtures";
import { schemeDocumentSchema } from "@/lib/spec/document";

const doc = (): SchemeDocument => schemeDocumentSchema.parse(smallDocument("Carry test"));
const layout = (d: SchemeDocument) => d.divisions.map((x) => [x.name, x.stops.map((s) => s.name)] as const);
const steps = (d: SchemeDocument, carried: { type: "stop" | "division"; id: string }, keys: CarryKey[]) => keys.reduce((acc, k) => carryStep(acc, carried, k), d);

describe("carrying with the keyboard", () => {
  it("moves a stop one place per key within its division, and stops at the ends", () => {
    const d = doc();
    const great = d.divisions[0]!;
    const first = great.stops[0]!;
    const down2 = steps(d, { type: "stop", id: first.id }, ["ArrowDown", "ArrowDown"]);
    expect(down2.divisions[0]!.stops[2]!.id).toBe(first.id);
    const n = great.stops.length;
    const toEnd = steps(d, { type: "stop", id: first.id }, Array(n + 3).fill("ArrowDown"));
    expect(toEnd.divisions[0]!.stops.at(-1)!.id).toBe(first.id);
    expect(carryStep(d, { type: "stop", id: first.id }, "ArrowUp")).toBe(d);
  });

  it("carries a stop to the next division at the same place, and back", () => {
    const d = doc();
    const stop = d.divisions[0]!.stops[1]!;
    const right = carryStep(d, { type: "stop", id: stop.id }, "ArrowRight");
    const target = right.divisions[1]!;
    expect(target.stops.findIndex((s) => s.id === stop.id)).toBe(Math.min(1, d.divisions[1]!.stops.length));
    expect(right.divisions[0]!.stops.some((s) => s.id === stop.id)).toBe(false);
    const back = carryStep(right, { type: "stop", id: stop.id }, "ArrowLeft");
    expect(layout(back)).toEqual(layout(d));
    // No division to the left of the first.
    expect(carryStep(d, { type: "stop", id: stop.id }, "ArrowLeft")).toBe(d);
  });

  it("keeps every stop exactly once whatever the keys", () => {
    let d = doc();
    const ids = d.divisions.flatMap((x) => x.stops.map((s) => s.id)).sort();
    const keys: CarryKey[] = ["ArrowRight", "ArrowDown", "ArrowDown", "ArrowLeft", "ArrowUp", "ArrowRight", "ArrowRight", "ArrowDown"];
    for (const id of ids.slice(0, 3)) d = steps(d, { type: "stop", id }, keys);
    expect(d.divisions.flatMap((x) => x.stops.map((s) => s.id)).sort()).toEqual(ids);
  });

  it("moves a division left and right, and says where things are", () => {
    const d = doc();
    const last = d.divisions.at(-1)!;
    const left = carryStep(d, { type: "division", id: last.id }, "ArrowLeft");
    expect(left.divisions.at(-2)!.id).toBe(last.id);
    expect(carryPlace(left, { type: "division", id: last.id })).toBe(`position ${d.divisions.length - 1} of ${d.divisions.length} divisions`);
    const stop = d.divisions[0]!.stops[0]!;
    expect(carryPlace(d, { type: "stop", id: stop.id })).toBe(`position 1 of ${d.divisions[0]!.stops.length} in the ${d.divisions[0]!.name}`);
  });
});
