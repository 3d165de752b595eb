/**
 * Common stops the tonal director starts from. The firm extends this list with its own: add an entry
 * with a unique key; every field is a stop property (lib/estimate/scheme.ts) and becomes the form's
 * starting values. Scales are deviations in semitones from the normal scale at the stop's own C
 * (+ wider, − narrower).
 */
import type { z } from "zod";
import type { stopFormSchema } from "@/lib/estimate/scheme";

export type StopFields = Omit<z.input<typeof stopFormSchema>, "id">;
export type StopPreset = { key: string; label: string; group: string; stop: StopFields };

const normal = { deviationHt: 0, halvingOn: 17, mouthWidth: 0.25 };
const full = { length: "full", shape: "conical" } as const;

export const stopPresets: readonly StopPreset[] = [
  // Principals
  { key: "open-diapason-16", label: "Open Diapason 16′", group: "Principals", stop: { name: "Open Diapason", footage: "16", family: "principal", construction: "open", material: "spotted", scale: { ...normal, deviationHt: -1 }, bass: { notes: 12, material: "zinc" } } },
  { key: "open-diapason-8", label: "Open Diapason 8′", group: "Principals", stop: { name: "Open Diapason", footage: "8", family: "principal", construction: "open", material: "spotted", scale: { ...normal, deviationHt: 1 } } },
  { key: "open-diapason-8-zinc", label: "Open Diapason 8′, zinc basses", group: "Principals", stop: { name: "Open Diapason", footage: "8", family: "principal", construction: "open", material: "spotted", scale: { ...normal, deviationHt: 1 }, bass: { notes: 12, material: "zinc" } } },
  { key: "principal-8", label: "Principal 8′", group: "Principals", stop: { name: "Principal", footage: "8", family: "principal", construction: "open", material: "spotted", scale: normal } },
  { key: "principal-4", label: "Principal 4′", group: "Principals", stop: { name: "Principal", footage: "4", family: "principal", construction: "open", material: "spotted", scale: normal } },
  { key: "octave-4", label: "Octave 4′", group: "Principals", stop: { name: "Octave", footage: "4", family: "principal", construction: "open", material: "spotted", scale: normal } },
  { key: "fifteenth-2", label: "Fifteenth 2′", group: "Principals", stop: { name: "Fifteenth", footage: "2", family: "principal", construction: "open", material: "spotted", scale: { ...normal, deviationHt: -1 } } },
  // Mutations and mixtures
  { key: "twelfth", label: "Twelfth 2⅔′", group: "Mutations and mixtures", stop: { name: "Twelfth", footage: "2 2/3", family: "mutation", construction: "open", material: "spotted", scale: { ...normal, deviationHt: -2 } } },
  { key: "tierce", label: "Tierce 1⅗′", group: "Mutations and mixtures", stop: { name: "Tierce", footage: "1 3/5", family: "mutation", construction: "open", material: "spotted", scale: { ...normal, deviationHt: -1 } } },
  { key: "larigot", label: "Larigot 1⅓′", group: "Mutations and mixtures", stop: { name: "Larigot", footage: "1 1/3", family: "mutation", construction: "open", material: "spotted", scale: { ...normal, deviationHt: -2 } } },
  {
    key: "mixture-iv",
    label: "Mixture IV",
    group: "Mutations and mixtures",
    stop: {
      name: "Mixture",
      footage: "1 1/3",
      ranks: 4,
      family: "mixture",
      construction: "open",
      material: "spotted",
      scale: { ...normal, deviationHt: -3 },
      // Breaks back an octave-and-fifth in steps, each rank its own footage per range (an invented composition).
      breaks: [
        { from: "C", footages: ["1 1/3", "1", "2/3", "1/2"] },
        { from: "c", footages: ["2", "1 1/3", "1", "2/3"] },
        { from: "c'", footages: ["2 2/3", "2", "1 1/3", "1"] },
        { from: "c''", footages: ["4", "2 2/3", "2", "1 1/3"] },
      ],
    },
  },
  {
    key: "mixture-iii-v",
    label: "Mixture III–V (progressive)",
    group: "Mutations and mixtures",
    stop: {
      name: "Mixture",
      footage: "2",
      ranks: 5,
      family: "mixture",
      construction: "open",
      material: "spotted",
      scale: { ...normal, deviationHt: -2 },
      // Three ranks in the bass, a fourth from tenor c, a fifth from middle c (an invented composition).
      breaks: [
        { from: "C", footages: ["2", "1 1/3", "1", null, null] },
        { from: "c", footages: ["2 2/3", "2", "1 1/3", "1", null] },
        { from: "c'", footages: ["4", "2 2/3", "2", "1 1/3", "1"] },
      ],
    },
  },
  {
    key: "sesquialtera-ii",
    label: "Sesquialtera II",
    group: "Mutations and mixtures",
    stop: { name: "Sesquialtera", footage: "2 2/3", ranks: 2, family: "mutation", construction: "open", material: "spotted", scale: { ...normal, deviationHt: -1 }, compass: { low: "c", high: "c''''" }, breaks: [{ from: "c", footages: ["2 2/3", "1 3/5"] }] },
  },
  // Flutes
  { key: "bourdon-16", label: "Bourdon 16′", group: "Flutes", stop: { name: "Bourdon", footage: "16", family: "flute", construction: "stopped", material: "pine", scale: { ...normal, deviationHt: 2 } } },
  { key: "stopped-diapason-8", label: "Stopped Diapason 8′", group: "Flutes", stop: { name: "Stopped Diapason", footage: "8", family: "flute", construction: "stopped", material: "pine", scale: { ...normal, deviationHt: 1 } } },
  { key: "gedackt-8-capped", label: "Gedackt 8′, capped metal, wooden bass", group: "Flutes", stop: { name: "Gedackt", footage: "8", family: "flute", construction: "capped", material: "spotted", scale: { ...normal, deviationHt: 1 }, bass: { notes: 12, material: "oak", construction: "stopped" } } },
  { key: "chimney-flute-8", label: "Chimney Flute 8′", group: "Flutes", stop: { name: "Chimney Flute", footage: "8", family: "flute", construction: "half-stopped", material: "spotted", scale: normal } },
  { key: "chimney-flute-4", label: "Chimney Flute 4′", group: "Flutes", stop: { name: "Chimney Flute", footage: "4", family: "flute", construction: "half-stopped", material: "spotted", scale: normal } },
  { key: "harmonic-flute-4", label: "Harmonic Flute 4′", group: "Flutes", stop: { name: "Harmonic Flute", footage: "4", family: "flute", construction: "open", material: "spotted", scale: { ...normal, deviationHt: 1 } } },
  { key: "open-wood-16", label: "Open Wood 16′", group: "Flutes", stop: { name: "Open Wood", footage: "16", family: "flute", construction: "open", material: "pine", scale: { ...normal, deviationHt: 3 } } },
  // Strings
  { key: "salicional-8", label: "Salicional 8′", group: "Strings", stop: { name: "Salicional", footage: "8", family: "string", construction: "open", material: "spotted", scale: { ...normal, deviationHt: -5, mouthWidth: 0.2 } } },
  { key: "voix-celeste-8", label: "Voix Céleste 8′", group: "Strings", stop: { name: "Voix Céleste", footage: "8", family: "string", construction: "open", material: "spotted", scale: { ...normal, deviationHt: -5, mouthWidth: 0.2 }, compass: { low: "c", high: "c''''" } } },
  { key: "viola-da-gamba-8", label: "Viola da Gamba 8′", group: "Strings", stop: { name: "Viola da Gamba", footage: "8", family: "string", construction: "open", material: "high-tin", scale: { ...normal, deviationHt: -6, mouthWidth: 0.2 } } },
  // Reeds
  { key: "trumpet-8", label: "Trumpet 8′", group: "Reeds", stop: { name: "Trumpet", footage: "8", family: "reed", construction: "reed", resonator: full, material: "spotted", scale: normal } },
  { key: "trumpet-8-flue-top", label: "Trumpet 8′, flue trebles", group: "Reeds", stop: { name: "Trumpet", footage: "8", family: "reed", construction: "reed", resonator: full, material: "spotted", scale: normal, fluesFrom: "c'''" } },
  { key: "trompette-8", label: "Trompette 8′", group: "Reeds", stop: { name: "Trompette", footage: "8", family: "reed", construction: "reed", resonator: full, material: "spotted", scale: normal } },
  { key: "oboe-8", label: "Oboe 8′", group: "Reeds", stop: { name: "Oboe", footage: "8", family: "reed", construction: "reed", resonator: full, material: "spotted", scale: { ...normal, deviationHt: -3 } } },
  { key: "clarinet-8", label: "Clarinet 8′", group: "Reeds", stop: { name: "Clarinet", footage: "8", family: "reed", construction: "reed", resonator: { length: "half", shape: "cylindrical" }, material: "spotted", scale: { ...normal, deviationHt: -4 } } },
  { key: "vox-humana-8", label: "Vox Humana 8′", group: "Reeds", stop: { name: "Vox Humana", footage: "8", family: "reed", construction: "reed", resonator: { length: "eighth", shape: "cylindrical" }, material: "spotted", scale: { ...normal, deviationHt: -2 } } },
  { key: "regal-8", label: "Regal 8′", group: "Reeds", stop: { name: "Regal", footage: "8", family: "reed", construction: "reed", resonator: { length: "sixteenth", shape: "cylindrical" }, material: "spotted", scale: { ...normal, deviationHt: -4 } } },
  { key: "trombone-16", label: "Trombone 16′", group: "Reeds", stop: { name: "Trombone", footage: "16", family: "reed", construction: "reed", resonator: full, material: "zinc", scale: { ...normal, deviationHt: 1 }, bass: { notes: 12, material: "pine" } } },
];

export function findPreset(key: string): StopPreset | undefined {
  return stopPresets.find((p) => p.key === key);
}

/** Starting values for a new division of each kind: a 61-note manual or a 32-note pedal. */
export const divisionPresets = {
  manual: { keyboard: "manual", compass: { low: "C", high: "c''''" } },
  pedal: { keyboard: "pedal", compass: { low: "C", high: "g'" } },
} as const;
