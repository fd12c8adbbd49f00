// Test helper: which copper shapes of one layer touch (share an edge or overlap), as a graph, from their flattened outlines.
import type { ArtworkShape } from '../../../src/lib/artwork';
import { boundsOfPoints, flattenContour, isPointInRing, segmentsIntersect, type Bounds, type Point } from '../../../src/lib/geometry';

interface Node {
	shape: ArtworkShape;
	ring: Point[];
	bounds: Bounds;
}

function ringOf(shape: ArtworkShape): Point[] {
	const g = shape.geometry;
	if (g.kind === 'region') return flattenContour(g.region.outer);
	if (g.kind === 'circle') {
		const r = g.diameterMm / 2;
		return Array.from({ length: 64 }, (_, k): Point => [g.center[0] + r * Math.cos((2 * Math.PI * k) / 64), g.center[1] + r * Math.sin((2 * Math.PI * k) / 64)]);
	}
	if (g.kind === 'stroke') return [...g.points];
	return flattenContour(g.contour);
}

/** Two outlines touch when an edge of one meets an edge of the other, or one lies inside the other. */
function touch(a: Node, b: Node): boolean {
	const e = 1e-9;
	if (a.bounds.minXMm > b.bounds.maxXMm + e || b.bounds.minXMm > a.bounds.maxXMm + e || a.bounds.minYMm > b.bounds.maxYMm + e || b.bounds.minYMm > a.bounds.maxYMm + e) return false;
	for (let i = 0; i < a.ring.length; i++) {
		const p = a.ring[i], q = a.ring[(i + 1) % a.ring.length];
		for (let j = 0; j < b.ring.length; j++) if (segmentsIntersect(p, q, b.ring[j], b.ring[(j + 1) % b.ring.length])) return true;
	}
	return isPointInRing(a.ring[0], b.ring) || isPointInRing(b.ring[0], a.ring);
}

/** Adjacency lists by shape id, over the dark shapes given (bounding boxes bucketed on a grid). */
export function touchGraph(shapes: readonly ArtworkShape[]): Map<string, Set<string>> {
	const nodes: Node[] = shapes.filter((s) => s.polarity === 'dark').map((shape) => {
		const ring = ringOf(shape);
		return { shape, ring, bounds: boundsOfPoints(ring) };
	});
	const graph = new Map<string, Set<string>>(nodes.map((n) => [n.shape.id, new Set<string>()]));
	const cell = 20;
	const grid = new Map<string, Node[]>();
	for (const n of nodes) {
		for (let gx = Math.floor(n.bounds.minXMm / cell); gx <= Math.floor(n.bounds.maxXMm / cell); gx++)
			for (let gy = Math.floor(n.bounds.minYMm / cell); gy <= Math.floor(n.bounds.maxYMm / cell); gy++) {
				const k = `${gx},${gy}`;
				if (!grid.has(k)) grid.set(k, []);
				grid.get(k)!.push(n);
			}
	}
	for (const bucket of grid.values()) {
		for (let i = 0; i < bucket.length; i++)
			for (let j = i + 1; j < bucket.length; j++) {
				const a = bucket[i], b = bucket[j];
				if (graph.get(a.shape.id)!.has(b.shape.id)) continue;
				if (touch(a, b)) {
					graph.get(a.shape.id)!.add(b.shape.id);
					graph.get(b.shape.id)!.add(a.shape.id);
				}
			}
	}
	return graph;
}

/** Ids reachable from `start`. */
export function reachable(graph: Map<string, Set<string>>, start: string): Set<string> {
	const seen = new Set([start]);
	const queue = [start];
	while (queue.length) for (const next of graph.get(queue.shift()!) ?? []) if (!seen.has(next)) (seen.add(next), queue.push(next));
	return seen;
}
