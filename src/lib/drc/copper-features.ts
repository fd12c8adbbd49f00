// Copper of one layer grouped into features: dark shapes that touch or overlap are one piece of metal.
import { LENGTH_EPSILON_MM } from '../geometry';
import type { ArtworkLayer, ArtworkShape } from '../artwork';
import { boundaryPieces, type BoundaryPiece } from './boundary-piece';
import { createShapeIndex, type ShapeIndex } from './copper-index';
import { isPointInShape } from './point-in-shape';
import { boundaryDistance } from './shape-distance';

export interface CopperShape {
	readonly shape: ArtworkShape;
	readonly pieces: readonly BoundaryPiece[];
	/** Index of the connected feature this shape belongs to. */
	readonly feature: number;
}

/** A layer's copper shapes with the spatial index over them (shape i of the index is `shapes[i]`). */
export interface LayerCopper {
	readonly shapes: CopperShape[];
	readonly index: ShapeIndex;
}

function touches(a: readonly BoundaryPiece[], b: readonly BoundaryPiece[]): boolean {
	const d = boundaryDistance(a, b);
	if (d && d.distanceMm <= LENGTH_EPSILON_MM) return true;
	// disjoint boundaries: connected only when one lies inside the other
	return (b.length > 0 && isPointInShape(b[0].from, a)) || (a.length > 0 && isPointInShape(a[0].from, b));
}

/**
 * The dark filled shapes of a layer with their feature numbers (union–find over touching pairs).
 * Clear shapes are left out: on our boards they only open holes (ground clearances) and never
 * split copper in two; drill-to-plane clearance is the annular-ring rule's business.
 * Only shapes whose boxes touch are compared (touching or containing copper has touching boxes),
 * so a layer of n shapes costs about n log n, not n².
 */
export function layerCopper(layer: ArtworkLayer): LayerCopper {
	// an artwork is immutable once built: the rules that need a layer's copper share one grouping
	const known = grouped.get(layer);
	if (known) return known;
	const copper = groupCopper(layer);
	grouped.set(layer, copper);
	return copper;
}

const grouped = new WeakMap<ArtworkLayer, LayerCopper>();

function groupCopper(layer: ArtworkLayer): LayerCopper {
	const shapes = layer.shapes.filter((s) => s.polarity === 'dark' && s.geometry.kind !== 'outline');
	const pieces = shapes.map(boundaryPieces);
	const index = createShapeIndex(pieces);
	const parent = shapes.map((_, i) => i);
	const find = (i: number): number => {
		let root = i;
		while (parent[root] !== root) root = parent[root];
		while (parent[i] !== root) [i, parent[i]] = [parent[i], root];
		return root;
	};
	for (let i = 0; i < shapes.length; i++) {
		for (const j of index.neighboursOf(i, LENGTH_EPSILON_MM)) {
			if (j > i && find(i) !== find(j) && touches(pieces[i], pieces[j])) parent[find(i)] = find(j);
		}
	}
	return { shapes: shapes.map((shape, i) => ({ shape, pieces: pieces[i], feature: find(i) })), index };
}

/** The layer's copper shapes with their feature numbers (see layerCopper). */
export function copperFeatures(layer: ArtworkLayer): CopperShape[] {
	return layerCopper(layer).shapes;
}

export function isCopperLayer(layer: ArtworkLayer): boolean {
	return layer.function.kind === 'copper';
}
