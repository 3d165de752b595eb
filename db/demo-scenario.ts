// The invented demo scenario: an invented parish, its invented organ and two alternative schemes.
// Every name, place and figure here is made up for the demo.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import type { SchemeDocumentInput } from "../lib/spec/document";

type StopIn = SchemeDocumentInput["divisions"] extends (infer D)[] | undefined ? (D extends { stops?: (infer S)[] } ? S : never) : never;

function stop(id: string, name: string, footage: string, family: StopIn["family"], more: Partial<StopIn> = {}): StopIn {
  return { id, name, footage, family, ...more };
}

const manual = { keyboard: "manual" as const, compass: { low: "C", high: "c''''" } };
/** The 1908 pipes, restored; each stop adds what the survey found. */
const restored = { origin: "existing", work: ["restored"] } as const satisfies Partial<StopIn>;
const pedal = { keyboard: "pedal" as const, compass: { low: "C", high: "f'" } };

/**
 * Invented survey measurements of the 1908 ranks (outside diameters; the Bourdon's inside sides), mm.
 * Each rank's `scale` below is the one Stopwright fits to them (tests/unit/demo-survey.test.ts).
 */
export const SURVEY = {
  "gt-od": [{ note: "C", sizeMm: 170.9 }, { note: "c", sizeMm: 99.7 }, { note: "c'", sizeMm: 60.3 }, { note: "c''", sizeMm: 35.5 }, { note: "c'''", sizeMm: 21.4 }],
  "gt-du": [{ note: "C", sizeMm: 129.8 }, { note: "c", sizeMm: 78.7 }, { note: "c'", sizeMm: 45.8 }, { note: "c''", sizeMm: 27.7 }, { note: "c'''", sizeMm: 16.2 }],
  "gt-pr": [{ note: "C", sizeMm: 93 }, { note: "c", sizeMm: 54.8 }, { note: "c'", sizeMm: 33 }, { note: "c''", sizeMm: 19.3 }],
  "sw-sa": [{ note: "c", sizeMm: 72.2 }, { note: "c'", sizeMm: 42 }, { note: "c''", sizeMm: 25.4 }, { note: "c'''", sizeMm: 14.8 }],
  "ped-bd": [{ note: "C", sizeMm: 233.2 }, { note: "G", sizeMm: 170.5 }, { note: "c", sizeMm: 139.2 }, { note: "c'", sizeMm: 81.4 }],
} as const satisfies Record<string, { note: string; sizeMm: number }[]>;
const surveyed = (id: keyof typeof SURVEY) => ({ survey: SURVEY[id].map((m) => ({ ...m })) });

/** Scheme A: the 1908 two-manual organ of St Aldric's restored much as it stands. */
export const restoreScheme: SchemeDocumentInput = {
  name: "A — Restore as found",
  description: "Clean and restore the existing two-manual organ; pneumatic action converted to electro-pneumatic; no tonal change. (Invented demo scheme.)",
  divisions: [
    {
      id: "gt", name: "Great", ...manual, action: "electro-pneumatic", chest: "slider", windPressure: { value: 89, unit: "mm" },
      // The clear height is measured from the chest to the case roof (invented, like every figure here).
      consoleDistanceM: 6, space: { lengthMm: 6200, depthMm: 1450, heightMm: 3200 }, chestWork: "restored",
      stops: [
        stop("gt-od", "Open Diapason", "8", "principal", { ...restored, ...surveyed("gt-od"), condition: ["feet-collapsing", "split-seams"], scale: { deviationHt: 2 }, offsetBassPipes: 12, bass: { notes: 7, material: "zinc" } }),
        stop("gt-cl", "Clarabella", "8", "flute", { ...restored, condition: ["wood-split"], construction: "open", material: "pine", bass: { notes: 12, material: "pine", construction: "stopped" } }),
        stop("gt-du", "Dulciana", "8", "string", { ...restored, ...surveyed("gt-du"), scale: { deviationHt: -4 } }),
        stop("gt-pr", "Principal", "4", "principal", { ...restored, ...surveyed("gt-pr"), condition: ["feet-collapsing"] }),
        stop("gt-hf", "Harmonic Flute", "4", "flute", { ...restored }),
        stop("gt-15", "Fifteenth", "2", "principal", { ...restored, condition: ["tops-torn"] }),
        stop("gt-tr", "Trumpet", "8", "reed", { origin: "existing", work: ["restored", "revoiced"], condition: ["tongues-worn"], construction: "reed", fluesFrom: "c'''" }),
      ],
    },
    {
      id: "sw", name: "Swell", ...manual, action: "electro-pneumatic", chest: "slider", windPressure: { value: 95, unit: "mm" },
      enclosed: true, swellBox: { widthMm: 5900, depthMm: 1900, heightMm: 3400 }, consoleDistanceM: 9, space: { lengthMm: 5800, depthMm: 1650, heightMm: 2950 }, chestWork: "restored",
      stops: [
        stop("sw-ob", "Open Diapason", "8", "principal", { ...restored, offsetBassPipes: 12, bass: { notes: 12, material: "pine", construction: "stopped" } }),
        stop("sw-lg", "Lieblich Gedackt", "8", "flute", { ...restored, condition: ["woodworm"], construction: "stopped", material: "pine" }),
        stop("sw-sa", "Salicional", "8", "string", { ...restored, ...surveyed("sw-sa"), scale: { deviationHt: -6, mouthWidth: 0.2 } }),
        stop("sw-vc", "Voix Céleste", "8", "string", { ...restored, scale: { deviationHt: -6, mouthWidth: 0.2 }, compass: { low: "c", high: "c''''" } }),
        stop("sw-ge", "Gemshorn", "4", "principal", { ...restored, construction: "conical" }),
        stop("sw-mx", "Mixture", "1 1/3", "mixture", { ...restored, condition: ["feet-collapsing"], ranks: 3, breaks: [
          { from: "C", footages: ["1 1/3", "1", "2/3"] },
          { from: "c'", footages: ["2 2/3", "2", "1 1/3"] },
        ] }),
        stop("sw-cb", "Cornopean", "8", "reed", { ...restored, condition: ["tongues-worn", "resonators-damaged"], construction: "reed" }),
        stop("sw-ob2", "Oboe", "8", "reed", { ...restored, condition: ["tongues-worn"], construction: "reed" }),
      ],
    },
    {
      id: "ped", name: "Pedal", ...pedal, action: "electro-pneumatic", chest: "pitman", chestLayout: "chromatic",
      windPressure: { value: 100, unit: "mm" }, consoleDistanceM: 12, space: { lengthMm: 7800, depthMm: 1000, heightMm: 4500 }, chestWork: "restored", passageBoard: false,
      stops: [
        stop("ped-bd", "Bourdon", "16", "flute", { ...restored, ...surveyed("ped-bd"), condition: ["wood-split"], construction: "stopped", material: "pine" }),
        stop("ped-bf", "Bass Flute", "8", "flute", { origin: "extension", source: "ped-bd", addedPipes: "existing", work: ["restored"], construction: "stopped", material: "pine" }),
      ],
    },
  ],
  accessories: {
    consoleWork: "restored",
    couplers: [
      { id: "sw-gt", from: "sw", to: "gt", octave: 0 },
      { id: "sw-ped", from: "sw", to: "ped", octave: 0 },
      { id: "gt-ped", from: "gt", to: "ped", octave: 0 },
      { id: "sw-oct", from: "sw", to: "sw", octave: 1 },
    ],
    tremulants: [{ id: "sw-trem", division: "sw" }],
    combination: { memoryLevels: 8, generalPistons: 6, divisionalPistons: 4 },
  },
  // The 1908 case stays and is restored in place; its front pipes (the Great Open Diapason basses) are cleaned and re-gilded.
  case: { work: "restored", widthMm: 4800, depthMm: 2600, heightMm: 7000, timber: "pine", speakingFrontPipes: 23, gildingM2: 2.5 },
  wind: { work: "restored", blower: "new" },
  site: { distanceKm: 35, scaffold: true },
};

/** Scheme B: the same organ rebuilt and enlarged with a new Choir and a fuller Pedal. */
export const enlargeScheme: SchemeDocumentInput = {
  ...restoreScheme,
  name: "B — Rebuild and enlarge",
  description: "Scheme A plus a new enclosed Choir, a Great mixture and new Pedal basses on an enlarged chest. (Invented demo scheme.)",
  divisions: [
    {
      ...restoreScheme.divisions![0]!,
      // The new Choir box stands over the back of the Great: 2 700 mm clear above its chest, so the
      // Trumpet's bass resonators need mitring or another place, and the added rows cost depth.
      space: { lengthMm: 6200, depthMm: 1450, heightMm: 2700 },
      stops: [
        ...restoreScheme.divisions![0]!.stops!.slice(0, 6),
        stop("gt-12", "Twelfth", "2 2/3", "mutation"),
        stop("gt-mx", "Mixture", "1 1/3", "mixture", { ranks: 4, breaks: [
          { from: "C", footages: ["1 1/3", "1", "2/3", "1/2"] },
          { from: "c", footages: ["2", "1 1/3", "1", "2/3"] },
          { from: "c'", footages: ["2 2/3", "2", "1 1/3", "1"] },
          { from: "c''", footages: ["4", "2 2/3", "2", "1 1/3"] },
        ] }),
        restoreScheme.divisions![0]!.stops![6]!,
      ],
    },
    restoreScheme.divisions![1]!,
    {
      id: "ch", name: "Choir", ...manual, action: "electro-pneumatic", chest: "slider", windPressure: { value: 75, unit: "mm" },
      enclosed: true, consoleDistanceM: 8, space: { lengthMm: 5800, depthMm: 1350, heightMm: 2800 },
      stops: [
        stop("ch-sd", "Stopped Diapason", "8", "flute", { construction: "stopped", material: "oak" }),
        stop("ch-dl", "Dulciana", "8", "string", { origin: "existing", work: ["relocated", "revoiced"], scale: { deviationHt: -4 } }),
        stop("ch-cf", "Chimney Flute", "4", "flute", { construction: "half-stopped" }),
        stop("ch-na", "Nazard", "2 2/3", "mutation", { construction: "half-stopped" }),
        stop("ch-pi", "Piccolo", "2", "flute"),
        stop("ch-ti", "Tierce", "1 3/5", "mutation"),
        stop("ch-cr", "Clarinet", "8", "reed", { construction: "reed", resonator: { length: "half", shape: "cylindrical" } }),
      ],
    },
    {
      // The same Pedal space as scheme A: the new basses and the Trombone do not fit its depth, and the
      // Open Wood and Trombone basses stand taller than its 4 500 mm.
      ...restoreScheme.divisions![2]!,
      stops: [
        stop("ped-ow", "Open Wood", "16", "flute", { material: "pine", scale: { deviationHt: 4 }, offsetBassPipes: 0 }),
        ...restoreScheme.divisions![2]!.stops!,
        stop("ped-pr", "Principal", "8", "principal", { material: "zinc" }),
        stop("ped-tb", "Trombone", "16", "reed", { construction: "reed", material: "zinc", bass: { notes: 12, material: "pine" } }),
        stop("ped-tp", "Trumpet", "8", "reed", { origin: "extension", source: "ped-tb", construction: "reed", material: "zinc" }),
      ],
    },
  ],
  accessories: {
    ...restoreScheme.accessories!,
    consoleWork: "new",
    couplers: [
      ...restoreScheme.accessories!.couplers!,
      { id: "ch-gt", from: "ch", to: "gt", octave: 0 },
      { id: "ch-ped", from: "ch", to: "ped", octave: 0 },
      { id: "sw-ch", from: "sw", to: "ch", octave: 0 },
    ],
    tremulants: [{ id: "sw-trem", division: "sw" }, { id: "ch-trem", division: "ch" }],
    combination: { memoryLevels: 256, generalPistons: 8, divisionalPistons: 6 },
  },
  // A larger organ needs more wind: new reservoirs and trunking as well as the new blower.
  wind: { work: "new", blower: "new" },
};

/** The large invented example (five manuals and pedal, about 150 stops) from examples/. */
const largeExample = JSON.parse(readFileSync(join(__dirname, "../examples/large-five-manual.json"), "utf8")) as SchemeDocumentInput;

export const demoProjects = [
  {
    project: {
      name: "St Aldric's, Wexmoor — organ rebuild",
      clientName: "Parochial Church Council of St Aldric, Wexmoor (invented)",
      venue: "St Aldric's Church (invented)",
      location: "Wexmoor (invented town)",
      instrument: "Two-manual organ of 1908 by an unrecorded builder, pneumatic action (invented)",
      status: "design" as const,
      targetDate: "2028-09-30",
      pitchHz: 440,
      temperatureC: 15,
      notes: "Committee wants a decision by Easter. Gallery access by fixed ladder only: plan lifting. (Invented.)",
    },
    schemes: [restoreScheme, enlargeScheme],
    shared: [true, true],
  },
  {
    project: {
      name: "Hallam Grove School chapel — new organ",
      clientName: "Hallam Grove School (invented)",
      venue: "School chapel (invented)",
      location: "Carrow Vale (invented town)",
      instrument: "New two-manual organ, mechanical action (invented)",
      status: "enquiry" as const,
      targetDate: null,
      pitchHz: 440,
      temperatureC: 18,
      notes: "",
    },
    schemes: [] as SchemeDocumentInput[],
    shared: [] as boolean[],
  },
  {
    project: {
      name: "Vellmar Conservatory — Great Hall organ",
      clientName: "Vellmar Conservatory of Music (invented)",
      venue: "Great Hall (invented)",
      location: "Vellmar (invented city)",
      instrument: "Five-manual concert organ, electric action, partly reusing an earlier instrument (invented)",
      status: "tender" as const,
      targetDate: "2033-06-30",
      pitchHz: 440,
      temperatureC: 18,
      notes: "Large example scheme for trying the editor at full size. (Invented.)",
    },
    schemes: [{ ...largeExample, name: "Concert scheme", description: "Five manuals and pedal, about 150 stops. (Invented demo scheme.)" }],
    shared: [false],
  },
];

/**
 * What St Aldric's committee has said so far (all invented): comments, some on one stop, a firm note,
 * and two of the three members' preferences. Schemes by index in the project's list; authors by e-mail.
 */
export const demoDiscussion = {
  project: "St Aldric's, Wexmoor — organ rebuild",
  comments: [
    { scheme: 0, author: "committee@staldric.example", stopId: null, body: "The PCC likes keeping the 1908 voices. Could the restoration be done in two phases to spread the cost?" },
    { scheme: 1, author: "adviser@staldric.example", stopId: "gt-mx", body: "A four-rank Mixture will be bright in this building. Would three ranks, breaking at c', sit better with the Open Diapason?" },
    { scheme: 1, author: "tonal@corvinlathe.example", stopId: "gt-mx", body: "We can make it three ranks; the breaks would follow the Swell Mixture. We will show both on site." },
    { scheme: 1, author: "rector@staldric.example", stopId: "ped-ow", body: "Where would the Open Wood stand? The north aisle is already tight." },
  ],
  notes: [{ scheme: 1, author: "estimates@corvinlathe.example", stopId: "ped-ow", body: "The Pedal basses do not fit the depth: price conveyancing to an offset chest before the next meeting." }],
  preferences: [
    { author: "committee@staldric.example", scheme: 0, note: "Keeps what we have, within the appeal's reach." },
    { author: "adviser@staldric.example", scheme: 1, note: "The Choir and a proper Pedal make it a teaching instrument." },
  ],
  /** A fourth person invited but not yet joined: the link is in the Outgoing mail page. */
  invitation: { email: "treasurer@staldric.example", name: "Owen Pellow" },
};
