// Typed Gerber commands: what the file means, apart from how it is spelled.
import type { Point } from '../../geometry';

/**
 * Gerber coordinate format (the FS command): digits before and after the decimal point of an
 * integer coordinate. With 4.6 in mm, 12.5 mm is written X12500000 (12.5 × 10⁶), leading zeros
 * omitted; 1 nm resolution, ±9999 mm range.
 */
export interface CoordinateFormat {
	readonly integerPlaces: number;
	readonly decimalPlaces: number;
}

export const GERBER_COORDINATE_FORMAT: CoordinateFormat = { integerPlaces: 4, decimalPlaces: 6 };

export type GerberCommand =
	/** G04 comment. */
	| { readonly type: 'comment'; readonly text: string }
	/** X2 file attribute (%TF…*%), aperture attribute (%TA…*%) or attribute delete (%TD…*%). */
	| { readonly type: 'attribute'; readonly scope: 'file' | 'aperture' | 'delete'; readonly name: string; readonly values: readonly string[] }
	| { readonly type: 'format'; readonly format: CoordinateFormat }
	| { readonly type: 'units'; readonly units: 'mm' }
	/** %ADD<code>C,<diameter>*%: a round aperture. */
	| { readonly type: 'define-circle-aperture'; readonly code: number; readonly diameterMm: number }
	| { readonly type: 'select-aperture'; readonly code: number }
	/** %LPD*% / %LPC*%. */
	| { readonly type: 'polarity'; readonly polarity: 'dark' | 'clear' }
	/** G75: multi-quadrant arcs, required before the first G02/G03. */
	| { readonly type: 'multi-quadrant' }
	| { readonly type: 'interpolation'; readonly mode: 'linear' | 'clockwise' | 'counter-clockwise' }
	| { readonly type: 'region-start' }
	| { readonly type: 'region-end' }
	/** D02: move without drawing. */
	| { readonly type: 'move'; readonly to: Point }
	/** D01 in linear mode. */
	| { readonly type: 'line'; readonly to: Point }
	/** D01 in circular mode: I, J are the centre's offsets from the start point. */
	| { readonly type: 'arc'; readonly to: Point; readonly centerOffset: Point }
	/** D03: flash the current aperture. */
	| { readonly type: 'flash'; readonly at: Point }
	/** M02: end of file. */
	| { readonly type: 'end' };
