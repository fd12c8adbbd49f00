// The connector launch in the artwork: absent or "none" leaves the artwork as it was; an edge launch's pads and vias,
// its solved gap (the grounded-coplanar closed form, rf/grounded-coplanar.ts), and a back-side footprint under the probe.
import { describe, expect, it } from 'vitest';
import { buildArtwork } from '../../../src/lib/artwork';
import { GeometryError } from '../../../src/lib/geometry';
import { analyzeGroundedCoplanar } from '../../../src/lib/rf/grounded-coplanar';
import { parseDesignInput } from '../../../src/lib/schemas';
import { designDocument, sizedCase } from '../../fixtures/designs/design-cases';
import { layeredCases } from '../../fixtures/designs/layered-cases';
import { sizeDocument } from '../../fixtures/designs/size-document';

const UM = 1e-3;

describe('an artwork without a launch', () => {
	it.each(['inset', 'edge', 'quarter-wave', 'probe'] as const)('is the same with no launch and with launch.kind "none" (%s feed)', (feed) => {
		const plain = buildArtwork(sizedCase('rectangular', feed));
		expect(buildArtwork(sizedCase('rectangular', feed, { launch: { kind: 'none' } }))).toEqual(plain);
		expect(plain.metadata.launch).toBeUndefined();
		expect(plain.layers.flatMap((l) => l.shapes).some((s) => s.role.startsWith('launch'))).toBe(false);
	});

	it('keeps the parsed document free of a launch key when none was given (stored revisions parse as before)', () => {
		expect('launch' in parseDesignInput(designDocument('rectangular', 'inset'))).toBe(false);
	});
});

describe('an edge launch', () => {
	const sized = sizedCase('rectangular', 'inset', { launch: { kind: 'edge' } });
	const artwork = buildArtwork(sized);
	const launch = artwork.metadata.launch!;
	if (launch.kind !== 'edge') throw new Error('expected an edge launch');

	it('solves the gap so the grounded-coplanar section has the line impedance (Wadell 1991 §3.4.3 closed form)', () => {
		expect(launch.gapSolved).toBe(true);
		expect(launch.lineImpedanceOhm).toBeCloseTo(50, 6);
		expect(launch.signalWidthMm).toBeCloseTo(sized.feed.kind === 'inset' ? sized.feed.line.widthMm : NaN, 9);
		const z = analyzeGroundedCoplanar({ stripWidthMm: launch.signalWidthMm, gapMm: launch.gapMm, heightMm: 1.524, relativePermittivity: 3.55 }).impedanceOhm;
		expect(z).toBeCloseTo(50, 4);
		expect(launch.launchImpedanceOhm).toBeCloseTo(50, 4);
	});

	it('keeps a stated gap as given and reports the impedance it gives', () => {
		const a = buildArtwork(sizedCase('rectangular', 'inset', { launch: { kind: 'edge', gapMm: 0.4 } }));
		const l = a.metadata.launch!;
		expect(l.kind === 'edge' && l.gapMm).toBe(0.4);
		expect(l.kind === 'edge' && l.gapSolved).toBe(false);
		// a narrower gap than the solved one lowers Z0 below the line's
		expect(l.kind === 'edge' && l.launchImpedanceOhm).toBeLessThan(50);
	});

	it('draws the signal pad on the line and a ground pad each side, flush with the edge, with the defaults (3 mm long, 2 mm wide)', () => {
		const top = artwork.layers.find((l) => l.id === 'copper-top')!;
		const ids = top.shapes.filter((s) => s.role.startsWith('launch')).map((s) => `${s.id}:${s.role}`);
		expect(ids).toEqual(['launch-signal:launch-signal', 'launch-ground-left:launch-ground', 'launch-ground-right:launch-ground']);
		const bottomLayer = artwork.layers.find((l) => l.id === 'copper-bottom')!;
		expect(bottomLayer.shapes.some((s) => s.role.startsWith('launch'))).toBe(false);
		expect(launch.lengthMm).toBe(3);
		expect(launch.groundWidthMm).toBe(2);
	});

	it('places one row of 0.3 mm plated vias per pad, 1 mm apart, half a pitch in from the pads’ inner end, 0.5 mm from the gap edge', () => {
		const vias = artwork.drills.filter((d) => d.role === 'launch-via');
		expect(vias.length).toBe(6);
		expect(vias.every((v) => v.plated && v.diameterMm === 0.3 && v.fromCopper === 1 && v.toCopper === 2)).toBe(true);
		const xc = artwork.board.widthMm / 2;
		const rightX = xc + launch.signalWidthMm / 2 + launch.gapMm + 0.5;
		const right = vias.filter((v) => v.center[0] > xc).map((v) => v.center);
		expect(right.every((p) => Math.abs(p[0] - rightX) < UM)).toBe(true);
		expect(right.map((p) => p[1]).sort((a, b) => a - b)).toEqual([0.5, 1.5, 2.5]);
	});

	it('builds on an array’s network input at the board edge', () => {
		const doc = { ...layeredCases.find((c) => c.name === '2×2 quarter-wave array')!.doc, launch: { kind: 'edge' as const, groundWidthMm: 0.5 } };
		const a = buildArtwork(sizeDocument(doc));
		expect(a.metadata.launch?.kind).toBe('edge');
		expect(a.drills.filter((d) => d.role === 'launch-via').length).toBeGreaterThan(0);
	});

	it('refuses a line whose impedance no gap reaches, naming launch.gapMm', () => {
		// a 200 Ω line is 36 µm wide on this substrate: even the widest gap the solver tries stays under 200 Ω
		const doc = designDocument('rectangular', 'edge', { feedLineImpedanceOhm: 200, targetImpedanceOhm: 200, launch: { kind: 'edge' } });
		expect(() => buildArtwork(sizeDocument(doc))).toThrow(GeometryError);
		expect(() => buildArtwork(sizeDocument(doc))).toThrow(/launch\.gapMm/);
		// a stated gap builds
		expect(buildArtwork(sizeDocument({ ...doc, launch: { kind: 'edge', gapMm: 1 } })).metadata.launch?.kind).toBe('edge');
	});

	it('solves low line impedances too: a 10 Ω line gets a section of 10 Ω', () => {
		const a = buildArtwork(sizeDocument(designDocument('rectangular', 'edge', { feedLineImpedanceOhm: 10, targetImpedanceOhm: 10, launch: { kind: 'edge' } })));
		const l = a.metadata.launch!;
		expect(l.kind === 'edge' && l.launchImpedanceOhm).toBeCloseTo(10, 4);
	});
});

describe('a back-side launch', () => {
	it('adds a square ground pad under the anti-pad on the bottom copper (mount "pad", default 6 mm)', () => {
		const a = buildArtwork(sizedCase('rectangular', 'probe', { launch: { kind: 'back' } }));
		const bottom = a.layers.find((l) => l.id === 'copper-bottom')!;
		expect(bottom.shapes.map((s) => s.role)).toEqual(['ground', 'launch-back-pad', 'clearance']);
		const l = a.metadata.launch!;
		expect(l).toMatchObject({ kind: 'back', mount: 'pad', padSideMm: 6, antiPadDiameterMm: 4.1, flangeDrillMm: null });
		expect(a.drills.length).toBe(1);
	});

	it('adds four plated flange holes on a square centred on the pin (mount "flange", defaults 2.7 mm on 8.6 mm)', () => {
		const a = buildArtwork(sizedCase('rectangular', 'probe', { launch: { kind: 'back', mount: 'flange' } }));
		const pin = a.drills.find((d) => d.role === 'probe')!;
		const holes = a.drills.filter((d) => d.role === 'launch-flange');
		expect(holes.length).toBe(4);
		for (const h of holes) {
			expect(h.plated).toBe(true);
			expect(h.diameterMm).toBe(2.7);
			expect(Math.abs(Math.abs(h.center[0] - pin.center[0]) - 4.3)).toBeLessThan(1e-9);
			expect(Math.abs(Math.abs(h.center[1] - pin.center[1]) - 4.3)).toBeLessThan(1e-9);
		}
	});
});

describe('any launch the schema accepts', () => {
	it('builds an artwork the Artwork schema accepts, or refuses with a GeometryError (property)', async () => {
		const fc = (await import('fast-check')).default;
		const { artworkSchema } = await import('../../../src/lib/schemas/artwork');
		fc.assert(
			fc.property(
				fc.constantFrom('inset', 'edge', 'quarter-wave', 'probe'),
				fc.record({ lengthMm: fc.double({ min: 0.2, max: 50, noNaN: true }), groundWidthMm: fc.double({ min: 0.2, max: 50, noNaN: true }), viaPitchMm: fc.double({ min: 0.1, max: 20, noNaN: true }), viaRows: fc.integer({ min: 1, max: 4 }) }),
				fc.record({ mount: fc.constantFrom('pad', 'flange'), padSideMm: fc.double({ min: 0.5, max: 50, noNaN: true }), flangeSpacingMm: fc.double({ min: 0.5, max: 50, noNaN: true }) }),
				(feed, edge, back) => {
					const launch = feed === 'probe' ? { kind: 'back' as const, ...back } : { kind: 'edge' as const, ...edge };
					try {
						const a = buildArtwork(sizeDocument(designDocument('rectangular', feed, { launch })));
						expect(artworkSchema.safeParse(a).success).toBe(true);
						expect(a.metadata.launch?.kind).toBe(launch.kind);
					} catch (e) {
						expect(e).toBeInstanceOf(GeometryError);
					}
				}
			),
			{ numRuns: 40 }
		);
	});
});
