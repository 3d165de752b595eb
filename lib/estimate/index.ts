/**
 * Stopwright's estimator: one pure library for the server, the browser (live figures while editing)
 * and the command line. Start with parseScheme / parseSchemeFile, then estimateScheme.
 */
export * from "./scheme";
export { describeIssue, parseScheme, parseSchemeFile, type ParseResult, type ParseFileResult } from "./validate";
export {
  estimateScheme, SchemeError, type Estimate, type DivisionEstimate, type StopEstimate, type DivisionChest, type PackageEstimate,
} from "./estimate";
export { parseRates, upgradeRates, ratesSchema, normsSchema, itemsSchema, withoutPrices, type Rates, type RatesInput, type Norms, type Items, type RatesResult } from "./rates";
export { pipesOfStop, formGeometry, geometryRules, type GeometryRules, type PipeDetail, type PipeState, type FormGeometry } from "./geometry";
export { compareSchemes, compareEstimates, type Comparison } from "./compare";
export { planScheme, countPipes, type PipeCounts, type PlanIssue, type SchemePlan, type StopKind } from "./pipes";
export { noteToMidi, midiToNote, compassNoteCount } from "./notes";
export { parseFootage, formatFootage, harmonicOf8ft, semitonesAbove8ft, frequencyHz, type Fraction } from "./pitch";
export { speedOfSoundMPerS } from "./acoustics";
export { departments, departmentLabels, sizeClasses, sizeClassLabels, type Department, type SizeClass } from "./departments";
export { packages, packageLabels, type PackageId } from "./cost-centres";
export { phases, type Programme } from "./programme";
export type { Money, ItemLine, MaterialMoneyLine, LabourLine } from "./money";
export { chestFit, chestSize, clearanceMm, pipeRowWidthMm, placeRow, rowOf, rowDepthMm, chestSideOf, type ChestSize, type ChestFit, type ChestRow, type RowPipe } from "./chest";
export type { Wiring } from "./wiring";
export type { WindNeed } from "./wind";
export type { CaseFigures } from "./case";
export type { SwellBox } from "./swell-box";
export type { Weights, Transport, SiteTime } from "./site";
export type { Caution } from "./cautions";
