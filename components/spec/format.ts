/** How the trade writes pitches, compasses and what happens to each stop: shared by the editor, the stop list and the drawings. */
// The scheme's words, its types and the pitch module alone: the editor's first scripts use this
// module, and the scheme model or the estimator's barrel would bring zod and the whole estimator with it
// (they run in the figures worker).
import type { Finding, Origin, PipeWork } from "@/lib/estimate/scheme";
import { findings, origins, pipeWorks, type actions, type chestTypes, type constructions, type families, type materials, type resonatorLengths } from "@/lib/estimate/scheme-terms";
import { formatFootage, parseFootage } from "@/lib/estimate/pitch";
import { formatAmount } from "@/lib/quote/amount-text";
import { currencySymbol } from "@/lib/quote/currency";

type StopLike = { footage: string | number; ranks?: number; family: string; breaks?: readonly { footages: readonly (string | number | null)[] }[] };

const ROMAN: ReadonlyArray<[number, string]> = [
  [10, "X"], [9, "IX"], [5, "V"], [4, "IV"], [1, "I"],
];

/** Ranks of a mixture in Roman numerals, as stop lists write them: 4 → "IV". Stops have at most 12 ranks. */
export function romanNumeral(n: number): string {
  let rest = Math.max(0, Math.floor(n));
  let out = "";
  for (const [value, letters] of ROMAN) {
    while (rest >= value) {
      out += letters;
      rest -= value;
    }
  }
  return out;
}

const SUPERSCRIPT = "⁰¹²³⁴⁵⁶⁷⁸⁹";
const SUBSCRIPT = "₀₁₂₃₄₅₆₇₈₉";
const digitsIn = (n: string, set: string) => n.replace(/\d/g, (d) => set[Number(d)]!);

/**
 * "2 2/3" → "2⅔′"; a fraction with no single glyph (4 4/7) is built the same way, from superscript
 * and subscript digits around the fraction slash (U+2044): "4⁴⁄₇′". Text that is not a footage is
 * shown as typed, so a mistake stays visible.
 */
export function footageText(footage: string | number): string {
  const f = parseFootage(footage);
  if (!f) return `${String(footage).trim()}?`;
  const text = formatFootage(f); // "8", "2⅔", or "4 4/7" where no glyph exists
  const slash = text.indexOf("/");
  if (slash < 0) return `${text}′`;
  const space = text.lastIndexOf(" ", slash);
  const whole = space >= 0 ? text.slice(0, space) : "";
  return `${whole}${digitsIn(text.slice(space + 1, slash), SUPERSCRIPT)}\u2044${digitsIn(text.slice(slash + 1), SUBSCRIPT)}′`;
}

export function isValidFootage(footage: string | number): boolean {
  return parseFootage(footage) !== null;
}

/** Fewest and most ranks sounding on one key of a mixture's breaks (they differ in a progressive mixture, III–V). */
export function rankSpan(stop: StopLike): [number, number] {
  const ranks = stop.ranks ?? 1;
  if (!stop.breaks?.length) return [ranks, ranks];
  const sounding = stop.breaks.map((b) => b.footages.filter((f) => f !== null && f !== "").length);
  return [Math.min(...sounding), Math.max(...sounding)];
}

/** A stop's pitch as a stop list gives it: "8′", "2⅔′", a mixture's ranks "IV" or "III–V", a compound stop "2⅔′ II". */
export function pitchText(stop: StopLike): string {
  const ranks = stop.ranks ?? 1;
  if (stop.family === "mixture") {
    const [lo, hi] = rankSpan(stop);
    return lo !== hi && lo > 0 ? `${romanNumeral(lo)}–${romanNumeral(hi)}` : romanNumeral(Math.max(ranks, 1));
  }
  if (ranks > 1) return `${footageText(stop.footage)} ${romanNumeral(ranks)}`;
  return footageText(stop.footage);
}

/** Roman rank marks compared as written: "IV-VI" and "IV–VI" alike, case aside. */
const rankMark = (text: string) => text.replace(/-/g, "–").toUpperCase();

/** Whether a stop's name already ends in its ranks ("Mixture III", "Sesquialtera II", "Plein Jeu III-V"). */
function nameCarriesRanks(stop: StopLike & { name: string }): boolean {
  const name = stop.name.trim();
  const space = name.lastIndexOf(" ");
  if (space < 0) return false;
  const last = rankMark(name.slice(space + 1));
  const ranks = Math.max(stop.ranks ?? 1, 1);
  if (stop.family !== "mixture") return ranks > 1 && last === romanNumeral(ranks);
  const [lo, hi] = rankSpan(stop);
  return [romanNumeral(ranks), romanNumeral(hi), `${romanNumeral(lo)}–${romanNumeral(hi)}`].map(rankMark).includes(last);
}

/**
 * The pitch to print beside a stop's name: pitchText, or only the footage when the name already
 * carries the ranks ("Mixture III" 1⅓′, "Sesquialtera II" 2⅔′), so the ranks are not said twice.
 */
export function pitchBesideName(stop: StopLike & { name: string }): string {
  return nameCarriesRanks(stop) ? footageText(stop.footage) : pitchText(stop);
}

/** A stop named with its pitch, as stop lists and tenders print it: "Principal 8′", "Mixture IV", "Mixture III 1⅓′". */
export function stopTitle(stop: StopLike & { name: string }): string {
  return `${stop.name.trim()} ${pitchBesideName(stop)}`;
}

/** Helmholtz names with typographic primes: c'''' → c⁗ is not used by the trade; primes stay separate. */
export function noteText(note: string): string {
  return note.replace(/'/g, "′").replace(/#/g, "♯").replace(/(?<=[a-gA-G])b(?=′|$)/, "♭");
}

export function compassText(c: { low: string; high: string }): string {
  return `${noteText(c.low)}–${noteText(c.high)}`;
}

/** Where a stop's pipes come from. */
export const originLabels: Record<Origin, string> = {
  new: "New",
  existing: "Existing",
  extension: "Extension",
  borrowed: "Borrowed",
  prepared: "Prepared for",
  removed: "Removed",
};

/** Work on existing pipes. */
export const pipeWorkLabels: Record<PipeWork, string> = {
  restored: "Restored",
  revoiced: "Revoiced",
  relocated: "Relocated",
  rescaled: "Re-scaled",
};

/** What a survey found in an existing rank. */
export const findingLabels: Record<Finding, string> = {
  "feet-collapsing": "Feet collapsing",
  "split-seams": "Split seams",
  "mouths-damaged": "Mouths damaged",
  "tops-torn": "Tops torn or split",
  "wood-split": "Wood split or glue failed",
  woodworm: "Woodworm",
  "tongues-worn": "Reed tongues worn",
  "resonators-damaged": "Resonators damaged",
};

export const resonatorLengthLabels: Record<(typeof resonatorLengths)[number], string> = {
  full: "Full length",
  half: "Half length",
  quarter: "Quarter length",
  eighth: "Eighth length",
  sixteenth: "Sixteenth length",
};

/** The mark a stop carries: its origin, or for existing pipes the main work on them. */
export type DispositionMark = "new" | "retained" | "restored" | "revoiced" | "relocated" | "rescaled" | "extension" | "borrowed" | "prepared" | "removed";

type DispositionLike = { origin: Origin; work?: readonly PipeWork[]; addedPipes?: "new" | "existing" };

export function dispositionMark(stop: DispositionLike): DispositionMark {
  if (stop.origin !== "existing") return stop.origin;
  const work = stop.work ?? [];
  for (const w of pipeWorkOrder) if (work.includes(w)) return w;
  return "retained";
}

/** What happens to a stop in words: "New", "Existing: restored, revoiced", "Existing, kept as it is", "Extension (existing pipes)". */
export function dispositionText(stop: DispositionLike): string {
  const work = [...(stop.work ?? [])].sort((a, b) => pipeWorkOrder.indexOf(a) - pipeWorkOrder.indexOf(b)).map((w) => pipeWorkLabels[w].toLowerCase());
  if (stop.origin === "existing") return work.length ? `Existing: ${work.join(", ")}` : "Existing, kept as it is";
  if (stop.origin === "extension" && stop.addedPipes === "existing") return `Extension (existing pipes${work.length ? `, ${work.join(", ")}` : ""})`;
  return originLabels[stop.origin];
}

export const familyLabels: Record<(typeof families)[number], string> = {
  principal: "Principal",
  flute: "Flute",
  string: "String",
  reed: "Reed",
  hybrid: "Hybrid",
  mutation: "Mutation",
  mixture: "Mixture",
};

export const constructionLabels: Record<(typeof constructions)[number], string> = {
  open: "Open",
  stopped: "Stopped",
  "half-stopped": "Half-stopped (chimney)",
  conical: "Conical",
  capped: "Capped (speaks as stopped)",
  reed: "Reed",
};

export const materialLabels: Record<(typeof materials)[number], string> = {
  "high-tin": "High tin",
  spotted: "Spotted metal",
  common: "Common metal",
  zinc: "Zinc",
  copper: "Copper",
  pine: "Pine",
  oak: "Oak",
  mahogany: "Mahogany",
};

export const actionLabels: Record<(typeof actions)[number], string> = {
  mechanical: "Mechanical",
  "electro-pneumatic": "Electro-pneumatic",
  electric: "Electric",
  pneumatic: "Pneumatic",
};

export const chestTypeLabels: Record<(typeof chestTypes)[number], string> = {
  slider: "Slider chest",
  pitman: "Pitman chest",
  "direct-electric": "Direct electric",
  ventil: "Ventil chest",
};

export const workLabels: Record<"new" | "restored" | "retained" | "none", string> = {
  new: "New",
  restored: "Restored",
  retained: "Retained as is",
  none: "Not part of the work",
};

export function windText(w: { value: number; unit: "mm" | "in" }): string {
  return w.unit === "in" ? `${formatNumber(w.value, 2)} in w.g.` : `${formatNumber(w.value, 0)} mm w.g.`;
}

// One formatter per number of digits (here and in formatFixed): toLocaleString with options builds a
// new Intl.NumberFormat on every call (about 0.1 ms each in Chromium), which the figures panel did
// hundreds of times a drop.
const numberFormats = new Map<number, Intl.NumberFormat>();

/** Numbers with a thin space between thousands, as drawings give them: 3 420. */
export function formatNumber(n: number, digits = 0): string {
  if (!Number.isFinite(n)) return "–";
  let format = numberFormats.get(digits);
  if (!format) numberFormats.set(digits, (format = new Intl.NumberFormat("en-GB", { minimumFractionDigits: 0, maximumFractionDigits: digits })));
  return format.format(n).replace(/,/g, "\u202f");
}

const fixedFormats = new Map<number, Intl.NumberFormat>();

/** Exactly `digits` decimals with commas between thousands, as the pipe table gives its measurements: 1,234.50. */
export function formatFixed(n: number, digits: number): string {
  let format = fixedFormats.get(digits);
  if (!format) fixedFormats.set(digits, (format = new Intl.NumberFormat("en-GB", { minimumFractionDigits: digits, maximumFractionDigits: digits })));
  return format.format(n);
}

export function formatMm(n: number): string {
  return `${formatNumber(Math.round(n))} mm`;
}

export function formatDate(iso: string | null | undefined): string {
  if (!iso) return "–";
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return d.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });
}

export function formatDateTime(iso: string | null | undefined): string {
  if (!iso) return "–";
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return d.toLocaleString("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" });
}

/** "14:32" today, "3 Nov, 14:32" on another day: when unsaved work was kept. */
export function formatTimeOfDay(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  const time = d.toLocaleTimeString("en-GB", { hour: "2-digit", minute: "2-digit" });
  return d.toDateString() === new Date().toDateString() ? time : `${d.toLocaleDateString("en-GB", { day: "numeric", month: "short" })}, ${time}`;
}

export const originOrder: readonly Origin[] = origins;
export const findingOrder: readonly Finding[] = findings;
export const pipeWorkOrder: readonly PipeWork[] = pipeWorks;

/** "Swell to Great", "Swell Octave", "Swell to Pedal Sub Octave": the trade's names for couplers. */
export function couplerName(c: { from: string; to: string; octave: -1 | 0 | 1 }, divisions: readonly { id: string; name: string }[]): string {
  const name = (id: string) => divisions.find((d) => d.id === id)?.name ?? "?";
  const octave = c.octave === 1 ? " Octave" : c.octave === -1 ? " Sub Octave" : "";
  return c.from === c.to ? `${name(c.from)}${octave || " Unison"}` : `${name(c.from)} to ${name(c.to)}${octave}`;
}


/**
 * An amount with its currency sign: "€1 200.00", "CHF 1 200.00" — the product's one formatter
 * (formatAmount) behind the sign pages use (currencySymbol). `signed` writes + for a rise (differences).
 */
export function formatMoney(amount: string, currency: string, { signed = false }: { signed?: boolean } = {}): string {
  const text = formatAmount(amount.replace(/^\+/, ""));
  const rise = signed && !amount.startsWith("-") && /[1-9]/.test(amount);
  return text.startsWith("−") ? `−${currencySymbol(currency)}${text.slice(1)}` : `${rise ? "+" : ""}${currencySymbol(currency)}${text}`;
}
