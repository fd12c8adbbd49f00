// What sizing returns: every derived quantity with its unit in its name, and the warnings.
// This is the contract between src/lib/rf (producer) and src/lib/artwork (consumer).
import type { DesignInput, FeedKind, Handedness, PatchShape } from '../schemas';

export type WarningCode =
	| 'thick-substrate'
	| 'lossy-laminate'
	| 'inset-too-deep'
	| 'feed-wider-than-notch'
	| 'ground-margin-small'
	| 'narrow-bandwidth'
	| 'probe-near-edge'
	| 'cp-outside-validity';

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

export interface SizedEstimates {
	/** Fractional bandwidth for VSWR ≤ 2 (0.02 = 2 %). Estimate. */
	bandwidthFraction: number;
	/** Total quality factor. Estimate. */
	qualityFactor: number;
	/** Broadside directivity, dBi. Estimate. */
	directivityDbi: number;
	/** Radiation efficiency with dielectric and conductor loss, 0..1. Estimate. */
	radiationEfficiency: number;
	/** Gain = directivity × efficiency, dBi. Estimate. */
	gainDbi: number;
}

export interface SizedDesign {
	/** The validated input with every default filled: a complete design-input document. */
	input: DesignInput;
	shape: PatchShape;
	feedKind: FeedKind;
	frequencyHz: number;
	freeSpaceWavelengthMm: number;
	/** Effective permittivity of the patch (transmission-line model); cavity model for circular. */
	effectivePermittivity: number;
	/** Hammerstad fringe extension ΔL per radiating edge (rectangular family; 0 otherwise). */
	fringeExtensionMm: number;
	/** L + 2ΔL (rectangular family); 2·a_e for circular. */
	effectiveLengthMm: number;
	/** Radiating-slot self conductance G1, S. */
	slotConductanceS: number;
	/** Mutual conductance between the two slots G12, S. */
	mutualConductanceS: number;
	/** Input resistance at the radiating edge, Ω. */
	edgeResistanceOhm: number;
	patch: SizedPatch;
	feed: SizedFeed;
	/** Ground plane and substrate outline, centred on the patch. */
	ground: { widthMm: number; lengthMm: number; marginMm: number };
	/** Copper thickness used in line models. */
	copperThicknessMm: number;
	estimates: SizedEstimates;
	warnings: SizingWarning[];
}
