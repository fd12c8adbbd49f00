// Property tests (fast-check) over random valid designs of every shape and feed: the artwork's invariants.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type ArtworkShape } from '../../../src/lib/artwork';
import {
	AREA_EPSILON_MM2,
	arcSweepRad,
	contourBounds,
	flattenContour,
	isSimpleRing,
	regionArea,
	type Contour,
	type Point
} from '../../../src/lib/geometry';
import { randomSingleDesigns, tryBuildArtwork } from '../../fixtures/designs/random-designs';

/** Random design-input documents of every shape with each feed the shape allows. */
const documents = randomSingleDesigns();
const tryBuild = tryBuildArtwork;

function contoursOf(shape: ArtworkShape): Contour[] {
	const g = shape.geometry;
	return g.kind === 'region' ? [g.region.outer, ...g.region.holes] : g.kind === 'outline' ? [g.contour] : [];
}

/** Distance from a point to a contour's exact boundary (segments and arcs). */
function distanceToContour(p: Point, c: Contour): number {
	let best = Infinity;
	let from = c.start;
	for (const s of c.segments) {
		if (s.kind === 'line') {
			const [ax, ay] = from, [bx, by] = s.to;
			const len2 = (bx - ax) ** 2 + (by - ay) ** 2;
			const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - ax) * (bx - ax) + (p[1] - ay) * (by - ay)) / len2));
			best = Math.min(best, Math.hypot(p[0] - (ax + t * (bx - ax)), p[1] - (ay + t * (by - ay))));
		} else {
			const r = Math.hypot(from[0] - s.center[0], from[1] - s.center[1]);
			const sweep = arcSweepRad(from, s.to, s.center, s.clockwise);
			const partial = arcSweepRad(from, p, s.center, s.clockwise);
			const onArc = Math.abs(partial) <= Math.abs(sweep) + 1e-12;
			best = Math.min(best, onArc ? Math.abs(Math.hypot(p[0] - s.center[0], p[1] - s.center[1]) - r) : Math.min(Math.hypot(p[0] - from[0], p[1] - from[1]), Math.hypot(p[0] - s.to[0], p[1] - s.to[1])));
		}
		from = s.to;
	}
	return best;
}

const RUNS = { numRuns: 120, seed: 20261120 };

describe('buildArtwork over random designs (fast-check)', () => {
	it('throws nothing but GeometryError and builds most random designs', () => {
		let built = 0;
		fc.assert(
			fc.property(documents, (o) => {
				if (tryBuild(o)) built++;
			}),
			RUNS
		);
		expect(built).toBeGreaterThan(RUNS.numRuns * 0.6);
	});

	it('closes every ring and keeps it simple (no self-intersection)', () => {
		fc.assert(
			fc.property(documents, (o) => {
				const a = tryBuild(o);
				if (!a) return;
				for (const layer of a.layers) {
					for (const shape of [...layer.shapes, ...layer.voids]) {
						for (const c of contoursOf(shape)) {
							const last = c.segments[c.segments.length - 1].to;
							expect(last).toEqual(c.start);
							expect(isSimpleRing(flattenContour(c))).toBe(true);
						}
					}
				}
			}),
			RUNS
		);
	});

	it('keeps the patch inside the ground and the ground equal to the board', () => {
		fc.assert(
			fc.property(documents, (o) => {
				const a = tryBuild(o);
				if (!a) return;
				const patch = a.layers[0].shapes.find((s) => s.role === 'patch')!;
				const ground = a.layers.find((l) => l.id === 'copper-bottom')!.shapes.find((s) => s.role === 'ground')!;
				const pb = contourBounds(contoursOf(patch)[0]);
				const gb = contourBounds(contoursOf(ground)[0]);
				expect(gb).toEqual({ minXMm: 0, minYMm: 0, maxXMm: a.board.widthMm, maxYMm: a.board.lengthMm });
				expect(pb.minXMm).toBeGreaterThanOrEqual(gb.minXMm);
				expect(pb.minYMm).toBeGreaterThanOrEqual(gb.minYMm);
				expect(pb.maxXMm).toBeLessThanOrEqual(gb.maxXMm);
				expect(pb.maxYMm).toBeLessThanOrEqual(gb.maxYMm);
			}),
			RUNS
		);
	});

	it('runs the feed from the board edge (y = 0) to a point on the patch boundary', () => {
		fc.assert(
			fc.property(documents, (o) => {
				const a = tryBuild(o);
				if (!a || a.metadata.feedKind === 'probe') return;
				const top = a.layers[0].shapes;
				const patch = contoursOf(top.find((s) => s.role === 'patch')!)[0];
				const line = contoursOf(top.find((s) => s.role === 'feed-line')!)[0];
				const lineBounds = contourBounds(line);
				expect(lineBounds.minYMm).toBe(0);
				const joiner = top.find((s) => s.role === 'transformer');
				const toucher = joiner ? contoursOf(joiner)[0] : line;
				if (joiner) expect(contourBounds(joiner.geometry.kind === 'region' ? joiner.geometry.region.outer : line).minYMm).toBeCloseTo(lineBounds.maxYMm, 9);
				const tb = contourBounds(toucher);
				const topCorners = [toucher.start, ...toucher.segments.map((s) => s.to)].filter((p) => p[1] >= tb.maxYMm - (tb.maxYMm - tb.minYMm) / 2);
				// both upper corners of the feed lie on the patch's boundary
				expect(topCorners.length).toBeGreaterThanOrEqual(2);
				for (const p of topCorners) expect(distanceToContour(p, patch)).toBeLessThan(1e-6);
			}),
			RUNS
		);
	});

	it('keeps the probe clearance ring whole: inside the ground, larger than drill, drill inside pad', () => {
		fc.assert(
			fc.property(
				documents.map((o) => ({ ...o, feed: 'probe' as const })),
				(o) => {
					const a = tryBuild(o);
					if (!a) return;
					const ground = a.layers.find((l) => l.id === 'copper-bottom')!;
					const clearance = ground.shapes.find((s) => s.role === 'clearance')!;
					const pad = a.layers[0].shapes.find((s) => s.role === 'probe-pad')!;
					if (clearance.geometry.kind !== 'circle' || pad.geometry.kind !== 'circle') throw new Error('circles expected');
					const { center, diameterMm } = clearance.geometry;
					const r = diameterMm / 2;
					expect(clearance.polarity).toBe('clear');
					expect(center[0] - r).toBeGreaterThan(0);
					expect(center[1] - r).toBeGreaterThan(0);
					expect(center[0] + r).toBeLessThan(a.board.widthMm);
					expect(center[1] + r).toBeLessThan(a.board.lengthMm);
					const drill = a.drills.find((d) => d.role === 'probe')!;
					expect(drill.plated).toBe(true);
					expect(drill.center).toEqual(center);
					expect(drill.diameterMm).toBeLessThan(diameterMm);
					expect(drill.diameterMm).toBeLessThan(pad.geometry.diameterMm);
				}
			),
			RUNS
		);
	});

	it('makes no zero-area shape', () => {
		fc.assert(
			fc.property(documents, (o) => {
				const a = tryBuild(o);
				if (!a) return;
				for (const layer of a.layers) {
					for (const s of [...layer.shapes, ...layer.voids]) {
						const g = s.geometry;
						if (g.kind === 'region') expect(regionArea(g.region)).toBeGreaterThan(AREA_EPSILON_MM2);
						else if (g.kind === 'circle') expect(g.diameterMm).toBeGreaterThan(0);
						else expect(g.strokeWidthMm).toBeGreaterThan(0);
					}
				}
			}),
			RUNS
		);
	});

	it('gives every shape a unique id', () => {
		fc.assert(
			fc.property(documents, (o) => {
				const a = tryBuild(o);
				if (!a) return;
				const ids = a.layers.flatMap((l) => [...l.shapes, ...l.voids].map((s) => s.id));
				expect(new Set(ids).size).toBe(ids.length);
			}),
			RUNS
		);
	});
});
