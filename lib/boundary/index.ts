/**
 * Public surface of the spectrum engine: everything the interface, the route handlers and the
 * exports need. The engine is pure TypeScript (no I/O, time or randomness) and runs both in the
 * browser (live preview) and on the server (authoritative results).
 *
 * Conventions: alpha' = 1, lengths in units of sqrt(alpha'); see `CONVENTIONS_TEXT`.
 */

export type * from "./types";

export {
  computeSpectrum,
  tryComputeSpectrum,
  computeSector,
  createSectorContext,
  type SectorContext,
  type SpectrumAttempt,
} from "./spectrum";
export {
  checkConfiguration,
  configurationWarnings,
  configurationLimits,
  configurationCost,
  dimensionOf,
  describeStack,
  ConfigurationError,
  type ConfigurationProblem,
} from "./check";
export {
  classifyPair,
  dirichletPosition,
  type AxisClassification,
  type PairClassification,
  type SeparationComponent,
} from "./classify";
export { expandAxis, expandPair, bosonModing, fermionModing, bosonExpansionLatex, fermionExpansionLatex, lightConeAxis } from "./expansion";
export { formatDecimal, listInWords } from "./format";
export { resultInputKey } from "./result-key";
export {
  canonicalPosition,
  turnsOnCircle,
  checkCompactAxes,
  compactLimits,
  compactRadius,
  computeTower,
  describeCompactPair,
  hasCompactAxes,
  towerRowLimit,
  wilsonLine,
  withCompactConventions,
  type CompactPair,
  type TowerInput,
  type TowerLevel,
} from "./compact";
export { dualTheory, tDualize } from "./t-duality";
export {
  ENGINE_VERSION,
  CONVENTIONS_TEXT,
  bosonicCriticalDimension,
  superstringCriticalDimension,
} from "./constants";
export { zeroPointEnergy, zeroPointContributions } from "./zero-point";
export { oscillatorDegeneracies, projectedDegeneracies } from "./degeneracy";
export {
  countSupercharges,
  pairPreservesSupersymmetry,
  worldvolumeSupersymmetry,
  nameSupersymmetry,
  type WorldvolumeSupersymmetry,
} from "./supersymmetry";
export { describeWorldvolumes, type DescribeWorldvolumesInput, type PairSummary } from "./worldvolume";
export { parseRational, formatRational, rationalToNumber, compareRational, type Rational } from "./rational";
export {
  annulusCurve,
  createAnnulusCache,
  braneAntibraneSupergravity,
  type AnnulusCurve,
  type AnnulusShape,
} from "./annulus";
export { stacksUnderPlane, omegaTwistedCounts, groupName, planeGeometry, type StackUnderPlane } from "./orientifold";
export { maxOrientifolds } from "./orientifold-check";
export { planeCharge, tadpoleBalance } from "./tadpole";
export {
  createInteractionCache,
  interactionCurve,
  interactionCurves,
  interactionPairs,
  interactionSampleCount,
  INTERACTION_CONVENTIONS,
  type InteractionCache,
  type InteractionCurve,
  type InteractionPair,
} from "./interaction";
