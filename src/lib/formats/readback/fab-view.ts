// What a board house sees in our files, rebuilt from the parse: layer images, holes, board extents, and what did not match.
import type { Bounds } from '../../geometry';

/** A file as written: its name and its text, or its UTF-8 bytes (the export pipeline's `{ name, bytes }`). */
export type FabFile = { readonly name: string; readonly text: string | Uint8Array } | { readonly name: string; readonly bytes: Uint8Array };

/** Names of the files a board house reads: Gerber layers and Excellon drills (not DXF, SVG, JSON or notes). */
export function isFabFileName(name: string): boolean {
	return /\.(gbr|ger|gtl|gbl|gko|gm1|gts|gbs|drl|xln|exc)$/i.test(name);
}

/** A ring of [x, y] points in mm, not closed (the first point is not repeated). */
export type FabRing = [xMm: number, yMm: number][];

/** A filled polygon: one outer ring and its holes. Plain data, ready to draw. */
export interface FabPolygon {
	readonly outer: FabRing;
	readonly holes: FabRing[];
}

/**
 * Which physical layer a Gerber file images, from its %TF.FileFunction: "copper-L1", "copper-L2",
 * "profile", "mask-top", "mask-bottom". The artwork's layers map to the same keys.
 */
export type FabLayerKey = string;

/** A line drawn with a round pen (a legend stroke): its centre line and the pen's width. */
export interface FabStroke {
	readonly points: FabRing;
	readonly widthMm: number;
	readonly polarity: 'dark' | 'clear';
}

export interface FabLayerImage {
	readonly fileName: string;
	readonly key: FabLayerKey;
	/** The image after dark and clear shapes are applied in file order (flattened arcs, ≤ 0.1 µm sag). */
	readonly polygons: FabPolygon[];
	readonly areaMm2: number;
	/** Extents of the image; for the profile, of the outline's centre line. Null when empty. */
	readonly bounds: Bounds | null;
	/**
	 * A legend layer's strokes, as drawn. Its polygons are then each pen position's disc and chord rectangle, not
	 * joined (hundreds of overlapping pieces of ink join slowly and gain nothing), and its area is the pen-swept
	 * area Σ (length × width + π width²/4) per stroke; it is compared stroke by stroke.
	 */
	readonly strokes?: readonly FabStroke[];
}

export interface FabHole {
	readonly xMm: number;
	readonly yMm: number;
	readonly diameterMm: number;
}

export interface FabDrillFile {
	readonly fileName: string;
	readonly plated: boolean;
	readonly holes: FabHole[];
}

export type ReadBackCheck =
	| 'file-unreadable'
	| 'file-unsupported'
	| 'file-unidentified'
	| 'layer-missing'
	| 'layer-unexpected'
	| 'layer-area'
	| 'layer-shape'
	| 'layer-extents'
	| 'board-extents'
	| 'drill-count'
	| 'drill-diameter'
	| 'drill-position';

/** One way the files differ from the artwork. Any mismatch means a writer bug: the bundle must not ship. */
export interface ReadBackMismatch {
	readonly check: ReadBackCheck;
	readonly fileName: string | null;
	readonly layerKey: FabLayerKey | null;
	readonly message: string;
}

export interface FabView {
	readonly layers: FabLayerImage[];
	readonly drills: FabDrillFile[];
	/** Board extents from the profile layer's outline; null without a profile file. */
	readonly board: Bounds | null;
	/** Problems found while reading (unreadable or unsupported files), before any comparison. */
	readonly problems: ReadBackMismatch[];
}

/** Tolerances of the comparison: what a writer may lose to rounding and flattening, and no more. */
export const READ_BACK_TOLERANCE = Object.freeze({
	/**
	 * Copper (or mask) area per layer: 0.5 %. The area covered by one image and not the other must
	 * stay below that too, and below the layer's perimeter × extentsMm (every edge off by 1 µm).
	 */
	areaFraction: 0.005,
	/** Board and image extents: 1 µm (Gerber 4.6 writes 1 nm; flattening sags 0.1 µm at most). */
	extentsMm: 1e-3,
	/** Hole diameters: exact to the Excellon file's 3 decimals, so half a µm of rounding. */
	drillDiameterMm: 0.5e-3 + 1e-9,
	/** Hole positions: 3 decimals, so within 1 µm. */
	drillPositionMm: 1e-3
});
