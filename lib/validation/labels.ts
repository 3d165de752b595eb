/**
 * The one place a field gets the name people know it by, for every zod message ("Ranks: at least 1").
 * Keyed by the field's path without list positions, matched from the most specific end:
 * `windPressure.value` beats `value`, `swellBox.widthMm` beats `widthMm`. A key with no entry is
 * written out from its camelCase name with its unit ("dummyPipeLengthMm" → "Dummy pipe length (mm)"),
 * so a new field reads sensibly before anyone adds it here. Pure.
 */
import { MSG_NOT_FOOTAGE } from "@/lib/estimate/pitch";

export const fieldLabels: Readonly<Record<string, string>> = {
  // A scheme: divisions and stops (the editor's forms, the API's scheme documents, scheme files)
  footage: "Pitch",
  ranks: "Ranks",
  family: "Family",
  construction: "Construction",
  material: "Material",
  origin: "Pipes",
  work: "Work",
  addedPipes: "The notes it adds",
  rescaleHt: "Pipes move",
  deviationHt: "Deviation",
  halvingOn: "Halves on note",
  mouthWidth: "Mouth width",
  cutUp: "Cut-up",
  offsetBassPipes: "Basses offset",
  "compass.low": "Lowest note",
  "compass.high": "Highest note",
  "divisions.compass.low": "Compass from",
  "divisions.compass.high": "Compass to",
  keyboard: "Played from",
  "windPressure.value": "Wind pressure",
  "windPressure.unit": "Wind pressure unit",
  windPressure: "Wind pressure",
  action: "Action",
  chest: "Chest",
  chestLayout: "Chest layout",
  chestWork: "Chests and action",
  consoleDistanceM: "Cable run to console (m)",
  "swellBox.widthMm": "Swell box width (mm)",
  "swellBox.depthMm": "Swell box depth (mm)",
  "swellBox.heightMm": "Swell box height (mm)",
  "space.lengthMm": "Space for the chest, length (mm)",
  "space.depthMm": "Space for the chest, depth (mm)",
  "case.work": "Case",
  "case.widthMm": "Case width (mm)",
  "case.depthMm": "Case depth (mm)",
  "case.heightMm": "Case height (mm)",
  speakingFrontPipes: "Speaking front pipes",
  dummyPipes: "Dummy front pipes",
  dummyPipeLengthMm: "Dummy pipe length (mm)",
  frontMetal: "Front metal",
  decorationM2: "Carved decoration (m²)",
  gildingM2: "Gilding (m²)",
  "wind.work": "Reservoirs and trunks",
  blower: "Blower",
  trunkLengthM: "Main trunk (m)",
  distanceKm: "Distance from the workshop (km)",
  lodging: "Crew lodging",
  consoleWork: "Console",
  memoryLevels: "Memory levels",
  generalPistons: "General pistons",
  divisionalPistons: "Divisional pistons",
  // Projects, people, the committee
  clientName: "Client",
  venue: "Venue",
  location: "Location",
  instrument: "Instrument",
  targetDate: "Target date",
  pitchHz: "Pitch (Hz)",
  temperatureC: "Temperature (°C)",
  email: "E-mail",
  password: "Password",
  confirm: "Repeat the password",
  role: "Role",
  body: "Comment",
  schemeId: "Scheme",
  rateSetId: "Rate set",
  // Quotations
  validityDays: "Valid for (days)",
  "lumpSums.unitPrice": "Unit price",
  "lumpSums.quantity": "Quantity",
  "stages.percent": "Share of the price (%)",
};

/** Better words than "not valid" for a value that fits none of a field's shapes (zod's unions). */
export const fieldHints: Readonly<Record<string, string>> = {
  footage: MSG_NOT_FOOTAGE.replace(/^is /, ""),
};

const units: Readonly<Record<string, string>> = { Mm: "mm", M: "m", Km: "km", M2: "m²", Hz: "Hz", C: "°C", Kg: "kg", Pct: "%" };

/** "dummyPipeLengthMm" → "Dummy pipe length (mm)". */
export function humanise(key: string): string {
  const unit = /(Mm|Km|M2|Hz|Kg|Pct|M|C)$/.exec(key)?.[1];
  const stem = unit && key.length > unit.length ? key.slice(0, -unit.length) : key;
  const words = stem.replace(/([a-z0-9])([A-Z])/g, "$1 $2").toLowerCase();
  const text = words.charAt(0).toUpperCase() + words.slice(1);
  return unit && stem !== key ? `${text} (${units[unit]})` : text;
}

// Keys that say nothing on their own: the field is named by the key above them.
const generic = new Set(["value", "_", "root"]);

function lookup<T>(table: Readonly<Record<string, T>>, path: readonly PropertyKey[]): T | undefined {
  const keys = path.filter((k): k is string => typeof k === "string");
  for (let start = 0; start < keys.length; start++) {
    const hit = table[keys.slice(start).join(".")];
    if (hit !== undefined) return hit;
  }
  return undefined;
}

/** The field's name for a message, or undefined for the input as a whole. */
export function fieldLabel(path: readonly PropertyKey[]): string | undefined {
  const known = lookup(fieldLabels, path);
  if (known) return known;
  const keys = path.filter((k): k is string => typeof k === "string" && !generic.has(k));
  const last = keys[keys.length - 1];
  return last ? humanise(last) : undefined;
}

export function fieldHint(path: readonly PropertyKey[]): string | undefined {
  return lookup(fieldHints, path);
}
