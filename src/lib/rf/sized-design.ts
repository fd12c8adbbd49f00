// What sizing returns: every derived quantity with its unit in its name, and the warnings.
// This is the contract between src/lib/rf (producer) and src/lib/artwork (consumer).
import type { DesignInput, FeedKind, Handedness, PatchShape } from '../schemas';
import type { SizedMaskCover } from './mask-cover';

export type WarningCode =
	| 'thick-substrate'
	| 'lossy-laminate'
	| 'inset-too-deep'
	| 'feed-wider-than-notch'
	| 'ground-margin-small'
	| 'narrow-bandwidth'
	| 'probe-near-edge'
	| 'cp-outside-validity'
	| 'first-pass-coupling'
	| 'parasitic-spacing'
	| 'grating-lobes'
	| 'low-efficiency'
	| 'dielectric-loss-dominates'
	| 'small-ground'
	| 'feed-mismatch'
	| 'probe-pin-fit'
	| 'assumed-loss-tangent'
	| 'outside-model-range'
	| 'band-not-covered';

export interface SizingWarning {
	code: WarningCode;
	/** One or two sentences a designer can act on. */
	message: string;
}

/** Patch geometry. Coordinates are the artwork's business; these are sizes only. */
export type SizedPatch =
	| {
			kind: 'rectangular';
			/** Non-radiating-edge length (x in the artwork). */
			widthMm: number;
			/** Resonant length (y in the artwork, the feed's direction). */
			lengthMm: number;
	  }
	| { kind: 'circular'; radiusMm: number; effectiveRadiusMm: number }
	| {
			kind: 'truncated-corner';
			/** Side of the square before truncation. */
			sideMm: number;
			/** Leg of each right-isosceles corner cut. */
			truncationLegMm: number;
			handedness: Handedness;
			/**
			 * Which opposite corners are cut, in the patch frame (x along the width, y the feed's axis,
			 * radiation towards +z): 'rising' cuts (+x,+y) and (−x,−y) and gives RHCP with the feed on
			 * the y axis; 'falling' cuts (−x,+y) and (+x,−y) and gives LHCP.
			 */
			truncatedDiagonal: 'rising' | 'falling';
	  }
	| {
			kind: 'nearly-square';
			/** Side along x. */
			widthMm: number;
			/** Side along y; differs from widthMm by a few per cent. */
			lengthMm: number;
			/**
			 * With the probe on the diagonal in the +x,+y quadrant and radiation towards +z, a longer y
			 * side gives RHCP and a longer x side LHCP.
			 */
			handedness: Handedness;
	  };

/** A microstrip line section on the substrate. */
export interface SizedLine {
	widthMm: number;
	lengthMm: number;
	impedanceOhm: number;
	effectivePermittivity: number;
}

export type SizedFeed =
	| { kind: 'edge'; line: SizedLine }
	| {
			kind: 'inset';
			/** Notch depth y0 from the radiating edge into the patch. */
			insetDepthMm: number;
			/** Copper-free gap on each side of the line inside the notch. */
			notchGapMm: number;
			line: SizedLine;
	  }
	| {
			kind: 'quarter-wave';
			/** λg/4 section between the patch edge and the feed line. */
			transformer: SizedLine;
			line: SizedLine;
	  }
	| SizedApertureFeed
	| SizedProximityFeed
	| {
			kind: 'probe';
			/**
			 * Probe position measured from the patch centre: along the resonant length (y) for
			 * linear polarisation, along the diagonal's components for the nearly-square patch.
			 */
			offsetXMm: number;
			offsetYMm: number;
			drillDiameterMm: number;
			padDiameterMm: number;
			clearanceDiameterMm: number;
	  };

/** The aperture-coupled feed: a microstrip line on the bottom copper crossing a slot in the middle ground. */
export interface SizedApertureFeed {
	kind: 'aperture-coupled';
	/** The line on the lower dielectric, from the board edge to the slot centre. */
	line: SizedLine;
	/** Slot length across the line (along x), width along the line (y). First-pass values. */
	slotLengthMm: number;
	slotWidthMm: number;
	/** Open stub past the slot centre (≈ λg/4 of the line). First-pass value. */
	stubLengthMm: number;
}

/** The proximity-coupled feed: a line on the inner copper ending under the patch. */
export interface SizedProximityFeed {
	kind: 'proximity-coupled';
	/** The line on the lower dielectric, from the board edge to its open end under the patch. */
	line: SizedLine;
	/** How far the line runs under the patch past the patch's lower edge. First-pass value. */
	overlapMm: number;
}

export type SizedLayeredFeed = SizedApertureFeed | SizedProximityFeed;

/** One slab of the resolved stack, top to bottom. */
export type SizedStackEntry =
	| { kind: 'copper'; thicknessMm: number; conductivitySPerM: number }
	| { kind: 'dielectric'; heightMm: number; relativePermittivity: number; lossTangent: number; bonding: boolean };

/** The parasitic patch on the top copper, centred over the driven patch. */
export interface SizedParasitic {
	patch: SizedPatch;
	sizeRatio: number;
	/** Dielectric height between the driven and the parasitic patch. */
	spacingMm: number;
	spacingWavelengths: number;
	/** How the driven patch was sized under the spacer (absent in revisions stored before). */
	cover?: {
		/** The covered-microstrip model used. */
		model: string;
		/** εeff of the driven patch as an uncovered wide microstrip (Hammerstad–Jensen) and under the spacer. */
		uncoveredEffectivePermittivity: number;
		coveredEffectivePermittivity: number;
		/** The substrate εr the single-layer sizing was given so that it sizes on the covered εeff. */
		equivalentSubstratePermittivity: number;
		/** The driven patch's resonant length as if uncovered, for comparison. */
		uncoveredResonantLengthMm: number;
	};
	/** Bandwidth estimates, fractions for VSWR ≤ 2 (absent in revisions stored before). */
	bandwidth?: {
		/** What the figures are. */
		model: string;
		/** The driven patch alone. */
		drivenBandwidthFraction: number;
		/** The stacked pair: an estimate. */
		pairBandwidthFraction: number;
		/** The Bode–Fano ceiling on the driven patch's Q. */
		limitBandwidthFraction: number;
	};
}

/** Array-factor figures for isotropic elements; `pattern` is ready to plot. */
export interface SizedArrayFactor {
	/** Directivity of the array factor alone (isotropic elements), dBi. */
	arrayFactorDirectivityDbi: number;
	/** Estimated array gain: element gain + 10·log10(element count) − feed-line loss − mismatch loss (the terms in `gainBreakdown`). Neglects mutual coupling. */
	gainDbi: number;
	/** The terms of `gainDbi`, each an estimate. */
	gainBreakdown: ArrayGainBreakdown;
	/** Half-power beamwidth in the scan plane (x–z) and across it; null when the beam has no −3 dB point in view. */
	halfPowerBeamwidthXzDeg: number | null;
	halfPowerBeamwidthYzDeg: number | null;
	/** Normalised array factor, dB (0 at the beam peak), on the angles −90°…90° in 1° steps. */
	pattern: { anglesDeg: number[]; xzDb: number[]; yzDb: number[] };
}

/** Array gain = elementGainDbi + arrayGainDb − feedLossDb − mismatchLossDb. */
export interface ArrayGainBreakdown {
	/** One element's gain estimate, dBi. */
	elementGainDbi: number;
	/** 10·log10(element count): N elements fed in phase with equal power, dB. */
	arrayGainDb: number;
	/** Conductor and dielectric loss along one port-to-element path of the routed network, dB (≥ 0). */
	feedLossDb: number;
	/** Mismatch loss at the port at f0, −10·log10(1 − |Γ|²), dB (≥ 0). */
	mismatchLossDb: number;
}

/** The corporate feed: T-junctions whose arms start with a λg/4 transformer to 2·Z0 at the junction. */
export interface SizedCorporateFeed {
	/** Impedance of every line and of the common port. */
	line: SizedLine;
	/** √(Z0 · 2Z0) λg/4 section in each arm next to the junction. */
	transformer: SizedLine;
	/** Impedance each arm presents at the junction (two in parallel make Z0). */
	branchImpedanceOhm: number;
	/** Centre-to-centre step between the levels of the tree. */
	levelPitchMm: number;
	/** Clearance kept between the network and other copper. */
	clearanceMm: number;
	/** Levels of T-junctions from the elements to the port. */
	junctionLevels: number;
	/** Routed length of one port-to-element path (Z0 line and λg/4 transformers, the element's own lead included). */
	pathLengthMm: number;
	/** Loss of the line and of a transformer per millimetre (conductor + dielectric), dB/mm. */
	lineLossDbPerMm: number;
	transformerLossDbPerMm: number;
	/** Resistance each element presents at its feed point, Ω (the design's target, the edge for an edge feed). */
	elementResistanceOhm: number;
}

export interface SizedArray {
	columns: number;
	rows: number;
	elementCount: number;
	spacingXMm: number;
	spacingYMm: number;
	spacingXWavelengths: number;
	spacingYWavelengths: number;
	scanAngleDeg: number;
	/** Largest spacing free of grating lobes over the scan range: λ0/(1 + |sin θ0|), in λ0. */
	gratingLobeLimitWavelengths: number;
	network: SizedCorporateFeed;
	factor: SizedArrayFactor;
}

export interface SizedEstimates {
	/** Fractional bandwidth for VSWR ≤ 2 (0.02 = 2 %). Estimate. */
	bandwidthFraction: number;
	/** Total quality factor. Estimate. */
	qualityFactor: number;
	/** Radiation (space-wave) quality factor Q_rad. Estimate. */
	radiationQualityFactor: number;
	/** Space-wave share of the radiated power, P_sp/(P_sp + P_sw), 0..1 (Jackson–Alexopoulos). Estimate. */
	surfaceWaveEfficiency: number;
	/** Broadside directivity, dBi. Estimate. */
	directivityDbi: number;
	/** Radiation efficiency with surface-wave, dielectric and conductor loss, 0..1. Estimate. */
	radiationEfficiency: number;
	/** Gain = directivity × efficiency, dBi. Estimate. */
	gainDbi: number;
}

/** The textbook model's answer to the same input, kept beside the first pass for comparison. */
export interface SizedTextbook {
	/** Resonant dimension by the textbook model: L (rectangular), the side (corner-cut, nearly square: the short side of the square base), the radius (circular). */
	resonantDimensionMm: number;
	/** Resonance the textbook model predicts for the first-pass patch, Hz. */
	resonanceOfFirstPassHz: number;
	/** Edge resistance with radiation only (no loss), Ω. */
	edgeResistanceOhm: number;
	/** Inset depth by cos² on that edge resistance (inset feed). */
	insetDepthMm?: number;
	/** Probe distance from the patch centre by cos² (J1² for a disc) on that edge resistance (probe feed). */
	probeOffsetMm?: number;
}

/** The expected error of the first-pass resonance and the range of the data behind it. */
export interface ResonanceAccuracy {
	/** Resonance typically within ± this many per cent of the target… */
	typicalErrorPercent: number;
	/** …for h/λ0 up to this… */
	maximumHeightRatio: number;
	/** …and εr within this range. */
	permittivityRange: readonly [number, number];
	/** The data the band comes from. */
	basis: string;
}

export interface SizedDesign {
	/** The validated input with every default filled: a complete design-input document. */
	input: DesignInput;
	shape: PatchShape;
	feedKind: FeedKind;
	frequencyHz: number;
	freeSpaceWavelengthMm: number;
	/** Effective permittivity of the patch (transmission-line model); εr itself in the circular cavity model. */
	effectivePermittivity: number;
	/** Hammerstad fringe extension ΔL per radiating edge (rectangular family only). */
	fringeExtensionMm?: number;
	/** L + 2ΔL (rectangular family only). */
	effectiveLengthMm?: number;
	/** Radiating-slot self conductance G1, S (rectangular family only). */
	slotConductanceS?: number;
	/** Mutual conductance between the two slots G12, S (rectangular family only). */
	mutualConductanceS?: number;
	/** Radiation conductance of the TM11 disc at its rim, S (circular only). */
	radiationConductanceS?: number;
	/** Resonant input resistance at the radiating edge (the rim for a disc) with every loss counted, Ω: the feed is placed on it. */
	edgeResistanceOhm: number;
	/** The same with radiation only (the textbook's edge resistance), Ω. */
	radiationEdgeResistanceOhm: number;
	/** The first-pass resonance's expected error band and its range. */
	resonanceAccuracy: ResonanceAccuracy;
	/** The textbook model's figures for the same input. */
	textbook: SizedTextbook;
	patch: SizedPatch;
	feed: SizedFeed;
	/** Ground plane and substrate outline, centred on the patch. */
	ground: { widthMm: number; lengthMm: number; marginMm: number };
	/** Copper thickness used in line models. */
	copperThicknessMm: number;
	estimates: SizedEstimates;
	warnings: SizingWarning[];
	/** The resolved stack, top to bottom: present when the document gives a stack (absent: copper / substrate / copper). */
	layerStack?: SizedStackEntry[];
	/** Present for a stacked parasitic patch. */
	parasitic?: SizedParasitic;
	/** Present when the solder mask covers the patch (maskCoverage "covered"): what the sizing was told about it. */
	maskCover?: SizedMaskCover;
	/** Present for an array; the element is everything above, and `ground` is one element's ground. */
	array?: SizedArray;
	/**
	 * Present when the document overrides dimensions (`overrides`): the closed-form value of each
	 * overridden dimension, for showing beside the value used. Everything else describes the overridden patch.
	 */
	formulaValues?: FormulaValues;
}

/** Closed-form values of overridden dimensions (only the overridden keys are present). */
export interface FormulaValues {
	lengthMm?: number;
	widthMm?: number;
	radiusMm?: number;
	insetDepthMm?: number;
	probeOffsetMm?: number;
	transformerImpedanceOhm?: number;
}
