/**
 * Reading a spectrum result: the one place that turns the engine's exact and decimal strings
 * into values, picks the lightest state of a sector, keys sectors, derives the summary stored
 * for lists and formats numbers for display. Pure TypeScript on top of `lib/boundary`; no
 * React, database or zod, so the designer, the results pages, the lists, the diff, the plots
 * and the data-access layer all share it.
 */
export { compareResultNumbers, parseExactRational, parseResultNumber } from "./result-number";
export { compareStateCounts, isSurviving, log10OfStateCount } from "./state-count";
export { pairKey } from "./pair-key";
export { lightestBySector, lightestLevel, type SectorLightest } from "./lightest";
export { isTachyonicState, tachyonicSectors, type TachyonicSector, type TachyonSource } from "./tachyons";
export { summarizeResult, summaryFacts, type ResultSummary, type SummaryFacts, type SummaryWorldvolume } from "./summary";
export { massInGeV } from "./gev";
export { highestUnstretchedMassSquared, unstretchedMassSquared, unstretchedMassSquaredText } from "./mass-cap";
export { formatWorldvolume, listWorldvolume, stringCreationSectors, worldvolumeKey, type ListedWorldvolume } from "./worldvolumes";
export {
  displaySignificantDigits,
  formatEngineProse,
  formatMassSquared,
  formatNumber,
  type FormatNumberOptions,
} from "./format";
export {
  pageSectorOverviews,
  resultOverview,
  sectorOverview,
  type ResultOverview,
  type SectorDetailField,
  type SectorOverview,
  type SectorOverviewPage,
  type SectorPageQuery,
} from "./overview";
export { compareNatural, sectorNames, type SectorName, type SectorNames, type StackNameSource } from "./sector-names";
export { lightestHeadline, type HeadlineSector, type HeadlineState, type LightestHeadline } from "./headline";
export { expansionEndPositions, simplifyExpansionLatex } from "./expansion-display";
export {
  quantumNumberText,
  quantumNumbers,
  resultHasTower,
  towerPoints,
  type QuantumNumber,
  type TowerPoint,
} from "./tower";
