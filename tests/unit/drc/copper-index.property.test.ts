// The spatial index changes how many pairs are measured, never the result: the indexed copper grouping,
// copper-spacing and trace-width rules against the all-pairs versions (kept here only) on random layouts.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Artwork, ArtworkLayer, ArtworkShape } from '../../../src/lib/artwork';
import { buildArtwork } from '../../../src/lib/artwork';
import { checkArtwork, checkCopperSpacing, checkTraceWidth, type Violation } from '../../../src/lib/drc';
import { boundaryPieces, pieceMidpoint, type BoundaryPiece } from '../../../src/lib/drc/boundary-piece';
import { copperFeatures, isCopperLayer } from '../../../src/lib/drc/copper-features';
import { closestOnPiece } from '../../../src/lib/drc/piece-distance';
import { isPointInShape } from '../../../src/lib/drc/point-in-shape';
import { boundaryDistance } from '../../../src/lib/drc/shape-distance';
import { narrowestWidth } from '../../../src/lib/drc/shape-width';
import { locationOf, midpointOf, roundMm } from '../../../src/lib/drc/violation';
import { LENGTH_EPSILON_MM, distanceMm } from '../../../src/lib/geometry';
import { arrayBenchDocument } from '../../../src/lib/design';
import { STANDARD_QUICK_TURN_PROFILE as P } from '../../../src/lib/schemas/fab-profile';
import { craftArtwork, disc, rect, roundRegion } from './crafted-artwork';
import { sizeDocument } from '../../fixtures/designs/size-document';

// ---- the all-pairs versions, as they were before the index: the reference the indexed ones must equal ----

interface BruteShape {
	shape: ArtworkShape;
	pieces: BoundaryPiece[];
	feature: number;
}

function bruteTouches(a: readonly BoundaryPiece[], b: readonly BoundaryPiece[]): boolean {
	const d = boundaryDistance(a, b);
	if (d && d.distanceMm <= LENGTH_EPSILON_MM) return true;
	return (b.length > 0 && isPointInShape(b[0].from, a)) || (a.length > 0 && isPointInShape(a[0].from, b));
}

function bruteFeatures(layer: ArtworkLayer): BruteShape[] {
	const shapes = layer.shapes.filter((s) => s.polarity === 'dark' && s.geometry.kind !== 'outline');
	const pieces = shapes.map(boundaryPieces);
	const parent = shapes.map((_, i) => i);
	const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i])));
	for (let i = 0; i < shapes.length; i++) {
		for (let j = i + 1; j < shapes.length; j++) {
			if (find(i) !== find(j) && bruteTouches(pieces[i], pieces[j])) parent[find(i)] = find(j);
		}
	}
	return shapes.map((shape, i) => ({ shape, pieces: pieces[i], feature: find(i) }));
}

function bruteSpacing(artwork: Artwork): Violation[] {
	const out: Violation[] = [];
	for (const layer of artwork.layers.filter(isCopperLayer)) {
		const copper = bruteFeatures(layer);
		for (let i = 0; i < copper.length; i++) {
			for (let j = i + 1; j < copper.length; j++) {
				const [a, b] = [copper[i], copper[j]];
				if (a.feature === b.feature) continue;
				const gap = boundaryDistance(a.pieces, b.pieces);
				if (!gap || !(gap.distanceMm < P.minSpacingMm - LENGTH_EPSILON_MM)) continue;
				out.push({
					ruleId: 'copper-spacing',
					layerId: layer.id,
					shapeIds: [a.shape.id, b.shape.id],
					location: locationOf(midpointOf(gap.onA, gap.onB)),
					measuredMm: roundMm(gap.distanceMm),
					requiredMm: P.minSpacingMm,
					message: `${a.shape.id} and ${b.shape.id} are ${roundMm(gap.distanceMm)} mm apart; ${P.name} needs at least ${P.minSpacingMm} mm between copper features`
				});
			}
		}
	}
	return out;
}

function bruteTrace(artwork: Artwork): Violation[] {
	const out: Violation[] = [];
	const isJoint = (piece: BoundaryPiece, others: readonly BruteShape[]) => {
		const m = pieceMidpoint(piece);
		return others.some((o) => isPointInShape(m, o.pieces) || o.pieces.some((p) => distanceMm(m, closestOnPiece(m, p)) <= LENGTH_EPSILON_MM));
	};
	for (const layer of artwork.layers.filter(isCopperLayer)) {
		const copper = bruteFeatures(layer);
		for (const c of copper) {
			if (!['feed-line', 'transformer'].includes(c.shape.role)) continue;
			const g = c.shape.geometry;
			const others = copper.filter((o) => o !== c);
			const width = g.kind === 'circle' ? { widthMm: g.diameterMm, from: g.center, to: g.center } : (narrowestWidth(c.pieces, (p) => !isJoint(p, others)) ?? narrowestWidth(c.pieces));
			if (!width || !(width.widthMm < P.minTraceWidthMm - LENGTH_EPSILON_MM)) continue;
			out.push({
				ruleId: 'trace-width',
				layerId: layer.id,
				shapeIds: [c.shape.id],
				location: locationOf(midpointOf(width.from, width.to)),
				measuredMm: roundMm(width.widthMm),
				requiredMm: P.minTraceWidthMm,
				message: `${c.shape.id} is ${roundMm(width.widthMm)} mm wide; ${P.name} needs traces of at least ${P.minTraceWidthMm} mm`
			});
		}
	}
	return out;
}

/** Feature numbers as a partition: each shape labelled by the first shape of its feature. */
const partition = (features: readonly { feature: number }[]) => features.map((f) => features.findIndex((g) => g.feature === f.feature));

// ---- random layouts: coordinates on a 0.05 mm grid, so touching, overlapping and near-minimum gaps all occur ----

const grid = (lo: number, hi: number) => fc.integer({ min: Math.round(lo / 0.05), max: Math.round(hi / 0.05) }).map((n) => n * 0.05);
const randomShape = fc.oneof(
	fc.record({ kind: fc.constant('rect' as const), x: grid(1, 30), y: grid(1, 30), w: grid(0.05, 8), h: grid(0.05, 8), trace: fc.boolean() }),
	fc.record({ kind: fc.constant('disc' as const), x: grid(2, 30), y: grid(2, 30), d: grid(0.1, 6), trace: fc.boolean() }),
	fc.record({ kind: fc.constant('round' as const), x: grid(3, 30), y: grid(3, 30), r: grid(0.1, 3), trace: fc.constant(false) })
);

type ShapeSpec = { kind: string; x: number; y: number; w?: number; h?: number; d?: number; r?: number; trace: boolean };

function layout(specs: readonly ShapeSpec[]): Artwork {
	const top = specs.map((s, i) => {
		const role = s.trace ? 'feed-line' : 'patch';
		if (s.kind === 'rect') return rect(`s${i}`, role, s.x, s.y, s.x + s.w!, s.y + s.h!);
		if (s.kind === 'disc') return disc(`s${i}`, role, [s.x, s.y], s.d!);
		return roundRegion(`s${i}`, 'patch', [s.x, s.y], s.r!);
	});
	return craftArtwork({ top });
}

describe('indexed copper checks equal the all-pairs checks', () => {
	it('groups copper into the same features, and reports the same spacing and trace-width violations in the same order', () => {
		fc.assert(
			fc.property(fc.array(randomShape, { minLength: 2, maxLength: 24 }), (specs) => {
				const artwork = layout(specs);
				expect(partition(copperFeatures(artwork.layers[0]))).toEqual(partition(bruteFeatures(artwork.layers[0])));
				expect(checkCopperSpacing(artwork, P)).toEqual(bruteSpacing(artwork));
				expect(checkTraceWidth(artwork, P)).toEqual(bruteTrace(artwork));
			}),
			{ numRuns: 150, seed: 20261202 }
		);
	});

	it('finds violations on the random layouts too (the comparison is not between two empty lists)', () => {
		const found = fc.sample(fc.array(randomShape, { minLength: 8, maxLength: 24 }), { numRuns: 40, seed: 7 }).map((specs) => checkCopperSpacing(layout(specs), P).length);
		expect(found.some((n) => n > 0)).toBe(true);
	});
});

describe('a large array is checked in near-linear time', () => {
	it('checks a 32×32 array (7 196 copper shapes) in seconds; comparing every pair took minutes', () => {
		// 16×16 took ≈ 91 s with all pairs (issue 13); 32×32 has 4× the shapes, so ≈ 16× that
		const artwork = buildArtwork(sizeDocument(arrayBenchDocument(32)));
		const started = performance.now();
		const violations = checkArtwork(artwork, P);
		const elapsedMs = performance.now() - started;
		expect(violations).toEqual([]);
		expect(elapsedMs).toBeLessThan(15_000);
	});
});
