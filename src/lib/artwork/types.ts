// The Artwork value: everything a writer or a design-rule check needs, as plain typed data in millimetres.
import type { Contour, Point, Region } from '../geometry';
import type { FeedKind, PatchShape } from '../schemas';

/** What a shape is for. Stable across versions: design-rule checks select shapes by role. */
export type ShapeRole =
	| 'patch'
	| 'feed-line'
	| 'transformer'
	| 'notch'
	| 'probe-pad'
	| 'ground'
	| 'clearance'
	| 'profile'
	| 'mask-opening'
	/** The parasitic patch of a stacked pair, on the top copper. */
	| 'parasitic-patch'
	/** Aperture-coupled slot cut in the ground between the substrates (clear). */
	| 'coupling-slot'
	/** Open stub of an aperture-coupled feed line past the slot. */
	| 'tuning-stub'
	/** A Z0 line of an array's corporate feed. */
	| 'feed-network'
	/** A λg/4 transformer in an arm of a corporate-feed T-junction. */
	| 'network-transformer';

/**
 * Dark adds material to the layer's image (copper, or a mask opening on a mask layer);
 * clear removes what earlier dark shapes put there (a ground clearance). Gerber's LPD/LPC.
 */
export type Polarity = 'dark' | 'clear';

export type ShapeGeometry =
	/** A filled area bounded by line and arc segments. */
	| { readonly kind: 'region'; readonly region: Region }
	/** An exact filled circle (a flash of a round aperture in Gerber). */
	| { readonly kind: 'circle'; readonly center: Point; readonly diameterMm: number }
	/** A closed line drawn with a round pen, not filled (the board profile). */
	| { readonly kind: 'outline'; readonly contour: Contour; readonly strokeWidthMm: number };

export interface ArtworkShape {
	/** Unique within the artwork, stable for the same design: "patch", "feed-line", "clearance"... */
	readonly id: string;
	readonly role: ShapeRole;
	readonly polarity: Polarity;
	readonly geometry: ShapeGeometry;
}

/** Which physical layer a layer images. Copper layers are numbered 1 (top) to n (bottom). */
export type LayerFunction =
	| { readonly kind: 'copper'; readonly copperIndex: number; readonly side: 'top' | 'inner' | 'bottom' }
	| { readonly kind: 'profile' }
	| { readonly kind: 'solder-mask'; readonly side: 'top' | 'bottom' };

export interface ArtworkLayer {
	/** File-name and group id: "copper-top", "copper-inner-1" (three-copper stacks), "copper-bottom", "profile", "mask-top", "mask-bottom". */
	readonly id: string;
	/** Human name for titles and DXF. */
	readonly title: string;
	readonly function: LayerFunction;
	/** Drawn in order: a clear shape removes only what dark shapes before it drew. */
	readonly shapes: readonly ArtworkShape[];
	/** Copper-free areas by design (inset notch gaps): not drawn, kept for checks and drawings. */
	readonly voids: readonly ArtworkShape[];
}

export interface ArtworkDrill {
	readonly id: string;
	readonly role: 'probe';
	/** Plated through hole (copper barrel) or non-plated. */
	readonly plated: boolean;
	readonly center: Point;
	/** Finished hole diameter. */
	readonly diameterMm: number;
	/** Copper layers the hole spans, 1 = top. */
	readonly fromCopper: number;
	readonly toCopper: number;
}

/** One slab of the stack, bottom face at zMm (z = 0 at the bottom face of the lowest copper). */
export type StackLayer =
	| {
			readonly kind: 'copper';
			readonly id: string;
			/** The ArtworkLayer this copper is patterned by. */
			readonly layerId: string;
			readonly zMm: number;
			readonly thicknessMm: number;
			readonly conductivitySPerM: number;
	  }
	| {
			readonly kind: 'dielectric';
			readonly id: string;
			readonly zMm: number;
			readonly thicknessMm: number;
			readonly relativePermittivity: number;
			readonly lossTangent: number;
			/** Present (true) for a bonding film between cores in an explicit stack. */
			readonly bonding?: boolean;
	  };

/** A main size to dimension on drawings: a measured span between two points. */
export interface ArtworkDimension {
	readonly id: 'patch-width' | 'patch-length' | 'patch-diameter' | 'inset-depth' | 'feed-width' | 'ground-width' | 'ground-length';
	/** Short label: W, L, D, y0, Wf, Wg, Lg. */
	readonly label: string;
	readonly from: Point;
	readonly to: Point;
	readonly valueMm: number;
	/** Side of the measured span on which to draw the line. */
	readonly side: 'above' | 'below' | 'left' | 'right';
}

export interface Artwork {
	/** Board outline: a rectangle from (0, 0) to (widthMm, lengthMm). */
	readonly board: { readonly widthMm: number; readonly lengthMm: number };
	/** Top to bottom: copper top first, then the rest. */
	readonly layers: readonly ArtworkLayer[];
	readonly drills: readonly ArtworkDrill[];
	/**
	 * Top to bottom: the first entry is the top copper and zMm (each slab's bottom face) decreases
	 * along the list; read it backwards for z increasing from 0 at the bottom copper's lower face.
	 */
	readonly stack: readonly StackLayer[];
	readonly dimensions: readonly ArtworkDimension[];
	readonly metadata: {
		readonly designName: string;
		readonly shape: PatchShape;
		readonly feedKind: FeedKind;
		readonly frequencyHz: number;
		readonly copperLayerCount: number;
		/** The probe model the design states (absent: not stated; the files say nothing about it). */
		readonly probe?: ArtworkProbe;
	};
}

/**
 * What conducts in the probe hole. A solid pin fills the finished hole; a plated barrel is a copper
 * tube whose inside diameter is the finished hole and whose wall is the plating (the fab drills
 * about drillDiameterMm + 2 × plating and plates it back to the finished size).
 */
export interface ArtworkProbe {
	readonly model: 'solid-pin' | 'plated-barrel';
	/** Finished hole diameter. */
	readonly drillDiameterMm: number;
	/** Barrel wall copper; null for a solid pin. */
	readonly platingThicknessUm: number | null;
}
