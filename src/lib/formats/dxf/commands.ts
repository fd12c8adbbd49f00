// Typed DXF entities: what the drawing holds, apart from dxf-writer's group codes.
import type { Point } from '../../geometry';

export interface DxfVertex {
	readonly at: Point;
	/** tan(θ/4) of the arc that starts here (θ > 0 counter-clockwise); 0 for a straight edge. */
	readonly bulge: number;
}

export type DxfCommand =
	/** A layer with an AutoCAD colour index (1 red … 7 white). */
	| { readonly type: 'layer'; readonly name: string; readonly colorIndex: number }
	| { readonly type: 'polyline'; readonly layer: string; readonly vertices: readonly DxfVertex[]; readonly closed: boolean }
	| { readonly type: 'circle'; readonly layer: string; readonly center: Point; readonly radiusMm: number }
	/** A straight line (dimension and title-block linework). */
	| { readonly type: 'line'; readonly layer: string; readonly from: Point; readonly to: Point }
	/**
	 * A single-line TEXT read left to right from `at`, the left end of its baseline. `heightMm` is DXF's text height
	 * (group 40, about the capital height); `widthMm` the room the sheet's layout left for it.
	 */
	| { readonly type: 'text'; readonly layer: string; readonly at: Point; readonly heightMm: number; readonly widthMm: number; readonly value: string };
