// Layered designs and arrays: closed simple rings, every element fed, the corporate feed connected from the port to every element (a graph of touching copper), the stack in order.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildArtwork, type Artwork, type ArtworkShape } from '../../../src/lib/artwork';
import { GeometryError, contourBounds, flattenContour, isSimpleRing, type Contour } from '../../../src/lib/geometry';
import type { DesignInputDocument } from '../../../src/lib/schemas';
import { layeredCases, layeredDocument, parasiticStack, threeCopperStack } from '../../fixtures/designs/layered-cases';
import { reachable, touchGraph } from './copper-graph';
import { tryBuildArtwork } from '../../fixtures/designs/random-designs';
import { sizeDocument } from '../../fixtures/designs/size-document';

function contoursOf(shape: ArtworkShape): Contour[] {
	const g = shape.geometry;
	return g.kind === 'region' ? [g.region.outer, ...g.region.holes] : g.kind === 'outline' ? [g.contour] : [];
}

/** The copper layer that carries the feed: bottom for aperture-coupled, inner for proximity and parasitic, top otherwise. */
function feedLayer(a: Artwork) {
	const id = a.metadata.feedKind === 'aperture-coupled' ? 'copper-bottom' : a.metadata.copperLayerCount === 3 ? 'copper-inner-1' : 'copper-top';
	return a.layers.find((l) => l.id === id)!;
}

/** Element prefixes ("e0-1-") of an array, or [""] for one element. */
function elementPrefixes(a: Artwork): string[] {
	const ids = a.layers.flatMap((l) => l.shapes.map((s) => s.id));
	const prefixes = [...new Set(ids.map((id) => /^e\d+-\d+-/.exec(id)?.[0]).filter((p): p is string => p !== undefined))];
	return prefixes.length ? prefixes : [''];
}

/** Checks the feed: the port shape reaches every element's feed copper, and no element touches the network more than once. */
function expectEveryElementFed(a: Artwork): void {
	const layer = feedLayer(a);
	const graph = touchGraph(layer.shapes);
	const port = layer.shapes.find((s) => s.role !== 'ground' && contoursOf(s).some((c) => Math.abs(contourBounds(c).minYMm) < 1e-9));
	expect(port, 'a shape on the feed layer reaches the board edge y = 0').toBeDefined();
	const fromPort = reachable(graph, port!.id);
	for (const prefix of elementPrefixes(a)) {
		const own = layer.shapes.filter((s) => (prefix ? s.id.startsWith(prefix) : !s.id.startsWith('net-')));
		expect(own.length).toBeGreaterThan(0);
		for (const s of own) expect(fromPort.has(s.id), `${s.id} is reached from the port`).toBe(true);
		if (prefix) {
			// the element meets the network in exactly one place: no short to a neighbour's feed
			const contacts = new Set(own.flatMap((s) => [...graph.get(s.id)!]).filter((id) => !id.startsWith(prefix)));
			expect([...contacts].every((id) => id.startsWith('net-'))).toBe(true);
			expect(contacts.size).toBeGreaterThanOrEqual(1);
			expect(contacts.size).toBeLessThanOrEqual(2);
		}
	}
	// every network piece is reached too: nothing floats
	for (const s of layer.shapes.filter((s) => s.id.startsWith('net-'))) expect(fromPort.has(s.id)).toBe(true);
}

/** Coupled feeds: each slot crosses its line under its patch; each proximity line ends under its patch; each parasitic sits over its driven patch. */
function expectCouplingInPlace(a: Artwork): void {
	const all = a.layers.flatMap((l) => l.shapes);
	for (const prefix of elementPrefixes(a)) {
		const get = (id: string) => all.find((s) => s.id === `${prefix}${id}`);
		const b = (s: ArtworkShape | undefined) => contourBounds(contoursOf(s!)[0]);
		if (a.metadata.feedKind === 'aperture-coupled') {
			const slot = b(get('coupling-slot')), line = b(get('feed-line')), stub = b(get('tuning-stub')), patch = b(get('patch'));
			expect(line.maxYMm).toBeGreaterThan(slot.minYMm);
			expect(stub.maxYMm).toBeGreaterThan(slot.maxYMm);
			expect(slot.minXMm).toBeLessThan(line.minXMm);
			expect(slot.maxXMm).toBeGreaterThan(line.maxXMm);
			expect(slot.minXMm).toBeGreaterThan(patch.minXMm);
			expect(slot.maxYMm).toBeLessThan(patch.maxYMm);
		}
		if (a.metadata.feedKind === 'proximity-coupled') {
			const line = b(get('feed-line')), patch = b(get('patch'));
			expect(line.maxYMm).toBeGreaterThan(patch.minYMm);
			expect(line.maxYMm).toBeLessThan(patch.maxYMm);
		}
		const parasitic = get('parasitic-patch');
		if (parasitic) {
			const p = b(parasitic), d = b(get('patch'));
			expect((p.minXMm + p.maxXMm) / 2).toBeCloseTo((d.minXMm + d.maxXMm) / 2, 9);
			expect((p.minYMm + p.maxYMm) / 2).toBeCloseTo((d.minYMm + d.maxYMm) / 2, 9);
		}
	}
}

function expectRingsClosedAndSimple(a: Artwork): void {
	for (const layer of a.layers)
		for (const shape of [...layer.shapes, ...layer.voids])
			for (const c of contoursOf(shape)) {
				expect(c.segments[c.segments.length - 1].to).toEqual(c.start);
				expect(isSimpleRing(flattenContour(c))).toBe(true);
			}
}

function expectStackInOrder(a: Artwork): void {
	// top to bottom: each slab's bottom face is the next one's top face; reversed, z increases from 0
	const up = [...a.stack].reverse();
	expect(up[0].zMm).toBe(0);
	for (let i = 1; i < up.length; i++) expect(up[i].zMm).toBeCloseTo(up[i - 1].zMm + up[i - 1].thicknessMm, 12);
	const coppers = a.stack.filter((s) => s.kind === 'copper');
	expect(coppers.length).toBe(a.metadata.copperLayerCount);
	expect(coppers.map((c) => (c.kind === 'copper' ? c.layerId : ''))).toEqual(a.layers.filter((l) => l.function.kind === 'copper').map((l) => l.id));
}

describe('layered designs and arrays (fixed cases)', () => {
	it.each(layeredCases)('$name: rings closed and simple, every element fed, coupling in place, stack in order', ({ doc }) => {
		const a = buildArtwork(sizeDocument(doc));
		expectRingsClosedAndSimple(a);
		expectEveryElementFed(a);
		expectCouplingInPlace(a);
		expectStackInOrder(a);
		const ids = a.layers.flatMap((l) => [...l.shapes, ...l.voids].map((s) => s.id));
		expect(new Set(ids).size).toBe(ids.length);
	});

	it('numbers three coppers 1–3 with the middle one inner', () => {
		const a = buildArtwork(sizeDocument(layeredCases[0].doc));
		expect(a.layers.filter((l) => l.function.kind === 'copper').map((l) => l.function)).toEqual([
			{ kind: 'copper', copperIndex: 1, side: 'top' },
			{ kind: 'copper', copperIndex: 2, side: 'inner' },
			{ kind: 'copper', copperIndex: 3, side: 'bottom' }
		]);
	});

	it('puts one element of every grid position into an 8×8 array, each fed', () => {
		const a = buildArtwork(sizeDocument(layeredDocument({ feed: 'inset', array: { columns: 8, rows: 8 } })));
		expect(elementPrefixes(a).length).toBe(64);
		expectEveryElementFed(a);
	});

	it('notices a broken feed: with one network piece taken out, some element is no longer reached', () => {
		const a = buildArtwork(sizeDocument(layeredDocument({ feed: 'inset', array: { columns: 4, rows: 2 } })));
		const cut: Artwork = { ...a, layers: a.layers.map((l) => (l.id === 'copper-top' ? { ...l, shapes: l.shapes.filter((s) => s.id !== 'net-1') } : l)) };
		expect(() => expectEveryElementFed(cut)).toThrow();
	});

	it('refuses a pitch smaller than the element with a GeometryError naming the spacing', () => {
		expect(() => buildArtwork(sizeDocument(layeredDocument({ feed: 'inset', array: { columns: 4, spacingXWavelengths: 0.3 } })))).toThrow(/spacingXWavelengths/);
	});
});

const POW2 = [1, 2, 4, 8] as const;
const randomDocuments: fc.Arbitrary<DesignInputDocument> = fc
	.record({
		kind: fc.constantFrom('inset', 'edge', 'quarter-wave', 'aperture-coupled', 'proximity-coupled', 'parasitic'),
		frequencyHz: fc.double({ min: 1.5e9, max: 6e9, noNaN: true }),
		relativePermittivity: fc.double({ min: 2.2, max: 6, noNaN: true }),
		heightMm: fc.double({ min: 0.25, max: 1.0, noNaN: true }),
		columns: fc.constantFrom(...POW2),
		rows: fc.constantFrom(...POW2),
		spacingX: fc.double({ min: 0.55, max: 0.95, noNaN: true }),
		spacingY: fc.double({ min: 0.55, max: 0.95, noNaN: true }),
		array: fc.boolean()
	})
	.map((r): DesignInputDocument => {
		const substrate = { relativePermittivity: r.relativePermittivity, heightMm: r.heightMm, lossTangent: 0.002 };
		const lower = { kind: 'dielectric' as const, relativePermittivity: r.relativePermittivity, heightMm: r.heightMm };
		const array = r.array ? { columns: r.columns, rows: r.rows, spacingXWavelengths: r.spacingX, spacingYWavelengths: r.spacingY } : undefined;
		const base = { name: `random ${r.kind}`, frequencyHz: r.frequencyHz, substrate, ...(array ? { array } : {}) };
		if (r.kind === 'parasitic') return { ...base, feed: 'inset', parasitic: {}, stack: [parasiticStack[0], parasiticStack[1], { kind: 'copper' }, lower, { kind: 'copper' }] };
		if (r.kind === 'aperture-coupled' || r.kind === 'proximity-coupled') return { ...base, feed: r.kind, stack: [threeCopperStack[0], threeCopperStack[1], { kind: 'copper' }, lower, { kind: 'copper' }] };
		return { ...base, feed: r.kind };
	});

const tryBuild = tryBuildArtwork;

describe('layered designs and arrays over random documents (fast-check)', () => {
	it('builds most, and every one built has closed simple rings, every element fed and the stack in order', () => {
		let built = 0;
		fc.assert(
			fc.property(randomDocuments, (doc) => {
				const a = tryBuild(doc);
				if (!a) return;
				built++;
				expectRingsClosedAndSimple(a);
				expectEveryElementFed(a);
				expectCouplingInPlace(a);
				expectStackInOrder(a);
			}),
			{ numRuns: 60, seed: 20261202 }
		);
		expect(built).toBeGreaterThan(30);
	});
});
