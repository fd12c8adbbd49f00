// The feed loss is reckoned on the routed length: the sizing's port-to-element path equals the centre-line length of the corporate feed the artwork draws.
import { describe, expect, it } from 'vitest';
import { layoutCorporateFeed, type NetworkPiece } from '../../../src/lib/artwork';
import { buildElement } from '../../../src/lib/artwork/build-element';
import type { Point } from '../../../src/lib/geometry';
import { corporateFeedPath, feedPathLengthMm, size } from '../../../src/lib/rf';
import { parseDesignInput, type DesignInputDocument } from '../../../src/lib/schemas';
import { layeredDocument, threeCopperStack } from '../../fixtures/designs/layered-cases';

const key = (p: Point) => `${p[0].toFixed(6)},${p[1].toFixed(6)}`;

/** Centre-line length from the port to a point, walking the pieces as a graph of their end points (they are a tree). */
function routedLengthMm(pieces: readonly NetworkPiece[], port: Point, to: Point): number {
	const adj = new Map<string, { next: string; lengthMm: number }[]>();
	for (const p of pieces) {
		const a = key(p.from), b = key(p.to), len = Math.hypot(p.to[0] - p.from[0], p.to[1] - p.from[1]);
		adj.set(a, [...(adj.get(a) ?? []), { next: b, lengthMm: len }]);
		adj.set(b, [...(adj.get(b) ?? []), { next: a, lengthMm: len }]);
	}
	const dist = new Map([[key(port), 0]]);
	const queue = [key(port)];
	while (queue.length) {
		const at = queue.shift()!;
		for (const e of adj.get(at) ?? []) if (!dist.has(e.next)) (dist.set(e.next, dist.get(at)! + e.lengthMm), queue.push(e.next));
	}
	const d = dist.get(key(to));
	if (d === undefined) throw new Error(`no path from the port to ${key(to)}`);
	return d;
}

const cases: { name: string; doc: DesignInputDocument }[] = [
	{ name: '4 × 1 inset, εr 2.2, 5.8 GHz, 0.75 λ0', doc: { name: 'Path demo', frequencyHz: 5.8e9, feed: 'inset', substrate: { relativePermittivity: 2.2, heightMm: 0.787, lossTangent: 0.0009 }, array: { columns: 4, spacingXWavelengths: 0.75 } } as DesignInputDocument },
	{ name: '4 × 4 inset, εr 4.4, 2.45 GHz', doc: { name: 'Path demo', frequencyHz: 2.45e9, feed: 'inset', substrate: { relativePermittivity: 4.4, heightMm: 1.6, lossTangent: 0.02 }, array: { columns: 4, rows: 4 } } as DesignInputDocument },
	{ name: '1 × 4 edge column', doc: layeredDocument({ feed: 'edge', array: { columns: 1, rows: 4 } }) },
	{ name: '2 × 2 quarter-wave', doc: layeredDocument({ feed: 'quarter-wave', array: { columns: 2, rows: 2 } }) },
	{ name: '2 × 4 aperture-coupled', doc: layeredDocument({ feed: 'aperture-coupled', stack: [...threeCopperStack], array: { columns: 2, rows: 4 } }) },
	{ name: '8 × 2 inset', doc: layeredDocument({ feed: 'inset', array: { columns: 8, rows: 2, spacingXWavelengths: 0.8, spacingYWavelengths: 0.8 } }) }
];

describe('the routed path the feed loss is reckoned on', () => {
	it.each(cases)('$name: the sizing path equals the drawn network from the port to every element', ({ doc }) => {
		const sized = size(parseDesignInput(doc));
		const a = sized.array!;
		const element = buildElement(sized, a.network.clearanceMm);
		const points = Array.from({ length: a.rows }, (_, r) => Array.from({ length: a.columns }, (_, c): Point => [c * a.spacingXMm, r * a.spacingYMm]));
		const { pieces, port } = layoutCorporateFeed(points, a, element.feedFootprint.minXMm, element.feedFootprint.minYMm, sized.ground.marginMm);
		const levels = corporateFeedPath({
			columns: a.columns,
			rows: a.rows,
			spacingXMm: a.spacingXMm,
			spacingYMm: a.spacingYMm,
			line: a.network.line,
			transformer: a.network.transformer,
			levelPitchMm: a.network.levelPitchMm,
			clearanceMm: a.network.clearanceMm,
			marginMm: sized.ground.marginMm,
			elementLeftReachMm: -element.feedFootprint.minXMm,
			elementLeadMm: 0
		});
		const modelled = feedPathLengthMm(levels, a.network.transformer.lengthMm);
		for (const row of points) for (const p of row) expect(routedLengthMm(pieces, port, p)).toBeCloseTo(modelled.lineMm + modelled.transformerMm, 6);
		// and the sized design's own path adds the element's lead (its run and the line into the element) to it
		expect(a.network.pathLengthMm).toBeGreaterThan(modelled.lineMm + modelled.transformerMm);
	});
});
