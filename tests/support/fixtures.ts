import type { SchemeDocumentInput } from "@/lib/spec/document";

/** A small invented scheme for tests: a Great of four stops and a Pedal with an extension. */
export function smallDocument(name = "Scheme A"): SchemeDocumentInput {
  return {
    name,
    description: "Test scheme (invented).",
    divisions: [
      {
        id: "gt",
        name: "Great",
        keyboard: "manual",
        compass: { low: "C", high: "c''''" },
        stops: [
          { id: "gt-od", name: "Open Diapason", footage: "8", family: "principal" },
          { id: "gt-pr", name: "Principal", footage: "4", family: "principal" },
          { id: "gt-12", name: "Twelfth", footage: "2 2/3", family: "mutation" },
          { id: "gt-15", name: "Fifteenth", footage: "2", family: "principal" },
        ],
      },
      {
        id: "ped",
        name: "Pedal",
        keyboard: "pedal",
        compass: { low: "C", high: "g'" },
        // An extended rank needs a unit chest.
        action: "electro-pneumatic",
        chest: "pitman",
        stops: [
          { id: "ped-bd", name: "Bourdon", footage: "16", family: "flute", construction: "stopped", material: "pine" },
          { id: "ped-bass", name: "Bass Flute", footage: "8", family: "flute", construction: "stopped", material: "pine", origin: "extension", source: "ped-bd" },
        ],
      },
    ],
    accessories: { couplers: [{ id: "gt-ped", from: "gt", to: "ped", octave: 0 }] },
  };
}
