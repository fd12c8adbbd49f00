// Copper of one layer grouped into features: dark shapes that touch or overlap are one piece of metal.
import { LENGTH_EPSILON_MM } from '../geometry';
import type { ArtworkLayer, ArtworkShape } from '../artwork';
import { boundaryPieces, type BoundaryPiece } from './boundary-piece';
import { isPointInShape } from './point-in-shape';
import { boundaryDistance } from './shape-distance';

export interface CopperShape {
	readonly shape: ArtworkShape;
	readonly pieces: readonly BoundaryPiece[];
	/** Index of the connected feature this shape belongs to. */
	readonly feature: number;
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
 */
export function copperFeatures(layer: ArtworkLayer): CopperShape[] {
	const shapes = layer.shapes.filter((s) => s.polarity === 'dark' && s.geometry.kind !== 'outline');
	const pieces = shapes.map(boundaryPieces);
	const parent = shapes.map((_, i) => i);
	const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i])));
	for (let i = 0; i < shapes.length; i++) {
		for (let j = i + 1; j < shapes.length; j++) {
			if (find(i) !== find(j) && touches(pieces[i], pieces[j])) parent[find(i)] = find(j);
		}
	}
	return shapes.map((shape, i) => ({ shape, pieces: pieces[i], feature: find(i) }));
}

export function isCopperLayer(layer: ArtworkLayer): boolean {
	return layer.function.kind === 'copper';
}
