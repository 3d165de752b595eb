/**
 * The scheme model's words: the lists its fields choose from, in the order the product shows them.
 * Apart from the zod model (scheme.ts), so the editor's first scripts can read them without zod.
 */
export const families = ["principal", "flute", "string", "reed", "hybrid", "mutation", "mixture"] as const;
/**
 * How a pipe is built (docs/estimating-method.md, "Constructions"): open; conical (open, tapering);
 * stopped (closed by a stopper or a soldered lid) and capped (closed by a movable metal cap) both
 * speak as stopped pipes; half-stopped (a stopped pipe with a chimney); reed (a reed with a
 * resonator whose length and shape `resonator` gives).
 */
export const constructions = ["open", "conical", "stopped", "capped", "half-stopped", "reed"] as const;
/** Flue constructions only: what a reed's top or a stop's basses may be built as. */
export const flueConstructions = ["open", "conical", "stopped", "capped", "half-stopped"] as const;
/** Where a stop's pipes come from. `removed`: existing pipes that leave the organ. */
export const origins = ["new", "existing", "extension", "borrowed", "prepared", "removed"] as const;
/** What is done to existing pipes; none of them means kept as they are (cleaned). */
export const pipeWorks = ["restored", "revoiced", "relocated", "rescaled"] as const;
/**
 * What a survey found in an existing rank; each finding adds its own restoration norm. No finding
 * means the rank is sound. Reed findings apply to the reed pipes' blocks, shallots and tongues.
 */
export const findings = [
  "feet-collapsing", "split-seams", "mouths-damaged", "tops-torn", "wood-split", "woodworm", "tongues-worn", "resonators-damaged",
] as const;
/** A reed resonator's length as a fraction of full (half-wave) length: short-length reeds run down to a sixteenth. */
export const resonatorLengths = ["full", "half", "quarter", "eighth", "sixteenth"] as const;
export const RESONATOR_FRACTION: Readonly<Record<(typeof resonatorLengths)[number], number>> = {
  full: 1, half: 1 / 2, quarter: 1 / 4, eighth: 1 / 8, sixteenth: 1 / 16,
};
export const actions = ["mechanical", "electro-pneumatic", "electric", "pneumatic"] as const;
/** Pitman and direct-electric chests valve every pipe on its own, so their ranks may be extended or borrowed (unit chests). */
export const chestTypes = ["slider", "pitman", "direct-electric", "ventil"] as const;
export const UNIT_CHESTS: readonly (typeof chestTypes)[number][] = ["pitman", "direct-electric"];
/** Metals and woods the rate tables price; ids are the file format's words. */
export const materials = ["high-tin", "spotted", "common", "zinc", "copper", "pine", "oak", "mahogany"] as const;
