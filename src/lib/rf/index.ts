// Public face of the rf room: sizing of patches, feeds and microstrip lines; estimates; the tolerance study.
export * from './sized-design';
export { feedKindTraits, feedLineOf, isLayeredFeed, isLayeredFeedKind, type FeedKindTraits } from './feed-kinds';
export { size, NOTCH_GAP_LINE_WIDTHS, PROBE_ANNULAR_RING_MM } from './size';
export { DEFAULT_MASK_RELATIVE_PERMITTIVITY, DEFAULT_MASK_THICKNESS_UM, MASK_COVER_MODEL, maskCoverPermittivities, maskCoverValues, type SizedMaskCover } from './mask-cover';
export { sizingReport, type SizingReport } from './sizing-report';
export { resonantFrequencyHz, type SubstrateValues } from './resonant-frequency';
export { toleranceStudy, type ToleranceOptions, type ToleranceStudy } from './tolerance-study';
export { analyzeMicrostrip, type MicrostripGeometry, type MicrostripModel } from './analyze-microstrip';
export { dispersivePermittivity, type DispersionInput } from './dispersive-permittivity';
export { synthesizeMicrostrip, type MicrostripTarget, type SynthesizedMicrostrip } from './synthesize-microstrip';
export { rectangularPatch, radiatingWidthMm, patchEffectivePermittivity, fringeExtensionMm, type RectangularPatchInput, type RectangularPatchSize } from './rectangular-patch';
export { squarePatch } from './square-patch';
export { slotConductance, type SlotConductances, type SlotPair } from './slot-conductance';
export { insetDepthMm, type InsetTarget } from './inset-depth';
export { probeOffsetMm } from './probe-offset';
export { quarterWaveTransformer, quarterGuidedWavelengthMm, type TransformerInput } from './quarter-wave-transformer';
export { circularPatch, effectiveRadiusMm, circularRadiationConductanceS, type CircularPatchInput, type CircularPatchSize } from './circular-patch';
export { circularProbeRadiusMm, type CircularProbeTarget } from './circular-probe-radius';
export { truncationLegMm, truncatedDiagonalFor, type TruncatedDiagonal } from './truncated-corner-patch';
export { nearlySquarePatch, type NearlySquareInput, type NearlySquareSize } from './nearly-square-patch';
export { performanceEstimates, type EstimateInput } from './performance-estimates';
export { groundSize, DEFAULT_MARGIN_HEIGHTS, type GroundInput } from './ground-size';
export { besselJ, TM11_EIGENVALUE } from './bessel';
export { integrateGaussLegendre } from './gauss-legendre';
export {
	analyzeMeasuredResponse,
	reflectionDb,
	vswrFromReflection,
	DEFAULT_MATCH_THRESHOLD_DB,
	MIN_REFLECTION_DB,
	type ReflectionSample,
	type ReflectionValue,
	type ResponsePoint,
	type MeasuredResonance,
	type MatchedBand,
	type MeasuredResponse,
	type MeasuredResponseOptions
} from './measured-response';
export { parallelRlcImpedance, reflectionFromImpedance, cavityModelRlc, cavityModelResponse, type ParallelRlc, type ImpedanceSample } from './cavity-input-impedance';
export { proposeRetune, type RetuneProposal, type RetuneOptions, type DimensionChange } from './retune';
export { resolveLayerStack, combineDielectrics, type DielectricGroup, type ResolvedStack } from './layer-stack';
export { apertureStart, SLOT_LENGTH_PATCH_SHARE, SLOT_WIDTH_LENGTH_SHARE, STUB_GUIDED_WAVELENGTH_SHARE, type ApertureStart } from './aperture-coupling';
export {
	arrayFactorDirectivity,
	arrayFactorMagnitude,
	arrayFactorCutDb,
	arrayPattern,
	gratingLobeLimitWavelengths,
	gratingLobeCondition,
	halfPowerBeamwidthDeg,
	broadsideLineDirectivityApprox,
	type ArrayGeometry
} from './array-factor';
export { PARASITIC_SPACING_WAVELENGTHS, NETWORK_CLEARANCE_LINE_WIDTHS } from './size-extended';
export {
	elementPattern,
	elementPatternGeometry,
	elementFieldMagnitude,
	elementCutMagnitude,
	elementCutDb,
	elementHalfPowerBeamwidthDeg,
	type ElementPattern,
	type ElementPatternGeometry,
	type PatternPlane
} from './element-pattern';
export {
	polarisationBands,
	polarisationBandsOf,
	axialRatioBandwidthFraction,
	twoModeImpedanceBandwidthFraction,
	bandAround,
	bandOverlap,
	bandCovers,
	bandWidthHz,
	isCircularlyPolarisedShape,
	AXIAL_RATIO_LIMIT_DB,
	IMPEDANCE_VSWR_LIMIT,
	type FrequencyBand,
	type PolarisationBands
} from './polarisation-bands';
export { conductorLossDbPerMm, dielectricLossDbPerMm, lineLossDbPerMm, surfaceResistanceOhm, type LossyLine } from './microstrip-loss';
export { corporateFeedPath, feedPathLengthMm, feedLineLossDb, feedMismatchLossDb, type FeedPathInput, type FeedPathLevel, type FeedLineMedium } from './corporate-feed-budget';
