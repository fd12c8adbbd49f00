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
	| { readonly type: 'circle'; readonly layer: string; readonly center: Point; readonly radiusMm: number };
