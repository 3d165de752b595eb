/**
 * Stopwright's estimator: one pure library for the server, the browser (live figures while editing)
 * and the command line. Start with parseScheme / parseSchemeFile, then estimateScheme.
 */
export * from "./scheme";
export { describeIssue, parseScheme, parseSchemeFile, type ParseResult, type ParseFileResult } from "./validate";
export { estimateScheme, SchemeError, type Estimate, type DivisionEstimate, type StopEstimate, type DivisionChest } from "./estimate";
export { parseRates, ratesSchema, normsSchema, withoutPrices, type Rates, type RatesInput, type Norms, type RatesResult } from "./rates";
export { pipesOfStop, rankGeometry, type PipeDetail, type PipeState, type RankGeometry } from "./geometry";
export { compareSchemes, compareEstimates, type Comparison } from "./compare";
export { planScheme, countPipes, type PipeCounts, type PlanIssue, type SchemePlan, type StopKind } from "./pipes";
export { noteToMidi, midiToNote, compassNoteCount } from "./notes";
export { parseFootage, formatFootage, harmonicOf8ft, semitonesAbove8ft, frequencyHz, type Fraction } from "./pitch";
export { speedOfSoundMPerS } from "./acoustics";
export { departments, departmentLabels, sizeClasses, sizeClassLabels, type Department, type SizeClass } from "./labour";
export { phases, type Programme } from "./programme";
export type { Money } from "./money";
export { clearanceMm, type ChestSize, type ChestFit } from "./chest";
export type { Wiring } from "./wiring";
export type { Caution } from "./cautions";
