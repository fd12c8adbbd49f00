// The launch rules on built designs and the one rule the crafted table leaves out (launch-outside-board, judged alone).
import { describe, expect, it } from 'vitest';
import { buildArtwork, type Artwork } from '../../../src/lib/artwork';
import { checkArtwork, checkLaunch, checkLaunchInsideBoard } from '../../../src/lib/drc';
import { STANDARD_QUICK_TURN_PROFILE as P } from '../../../src/lib/schemas/fab-profile';
import { sizedCase } from '../../fixtures/designs/design-cases';
import { edgeLaunchedArtwork } from './crafted-artwork';

const UM = 1e-3;

/** The crafted edge launch with its right ground pad moved so its outer edge lies `insideMm` inside the right board edge (40 mm). */
function rightPadAt(insideMm: number): Artwork {
	const a = edgeLaunchedArtwork();
	const top = a.layers[0];
	const shapes = top.shapes.map((s) =>
		s.id === 'launch-ground-right'
			? { ...s, geometry: { kind: 'region' as const, region: { outer: { start: [38 - insideMm, 0] as const, segments: [{ kind: 'line' as const, to: [40 - insideMm, 0] as const }, { kind: 'line' as const, to: [40 - insideMm, 3] as const }, { kind: 'line' as const, to: [38 - insideMm, 3] as const }, { kind: 'line' as const, to: [38 - insideMm, 0] as const }] }, holes: [] } } }
			: s
	);
	return { ...a, layers: [{ ...top, shapes }, ...a.layers.slice(1)] };
}

describe('launch-outside-board', () => {
	it('fires when a launch pad runs 1 µm off the board, measuring how far inside (negative)', () => {
		const v = checkLaunchInsideBoard(rightPadAt(-UM));
		expect(v.length).toBe(1);
		expect(v[0]).toMatchObject({ ruleId: 'launch-outside-board', shapeIds: ['launch-ground-right'], requiredMm: 0 });
		expect(v[0].measuredMm).toBeCloseTo(-UM, 6);
	});

	it('passes when the pad ends 1 µm inside the board edge', () => {
		expect(checkLaunchInsideBoard(rightPadAt(UM))).toEqual([]);
	});

	it('fires for a launch hole whose centre is off the board', () => {
		const v = checkLaunchInsideBoard(edgeLaunchedArtwork({ vias: [{ center: [17.5, -0.2] }] }));
		expect(v.map((x) => x.shapeIds[0])).toEqual(['launch-via-0']);
	});
});

describe('launch rules on built designs (quick-turn profile)', () => {
	it('find nothing wrong with the default edge launch of an inset patch', () => {
		expect(checkArtwork(buildArtwork(sizedCase('rectangular', 'inset', { launch: { kind: 'edge' } })), P)).toEqual([]);
	});

	it('find nothing wrong with the default back-side pad under a probe', () => {
		expect(checkArtwork(buildArtwork(sizedCase('rectangular', 'probe', { launch: { kind: 'back' } })), P)).toEqual([]);
	});

	it('flag a launch long enough to reach the patch: the ground pads touch the patch copper', () => {
		// the margin below this patch is 3h = 4.572 mm: 6 mm pads run into the patch (launch-gap measures 0)
		const a = buildArtwork(sizedCase('rectangular', 'edge', { launch: { kind: 'edge', lengthMm: 6 } }));
		const gaps = checkLaunch(a, P).filter((v) => v.ruleId === 'launch-gap');
		expect(gaps.length).toBe(2);
		expect(gaps.every((v) => v.measuredMm === 0 && v.shapeIds[1] === 'patch')).toBe(true);
	});

	it('flag plated flange holes that pass through the patch', () => {
		const a = buildArtwork(sizedCase('rectangular', 'probe', { launch: { kind: 'back', mount: 'flange' } }));
		const v = checkLaunch(a, P);
		expect(v.length).toBe(4);
		expect(v.every((x) => x.ruleId === 'launch-gap' && x.measuredMm === 0 && x.message.includes('passes through patch'))).toBe(true);
	});

	it('flag a via row that leaves no ring in a narrow pad (annular ring)', () => {
		const a = buildArtwork(sizedCase('rectangular', 'inset', { launch: { kind: 'edge', groundWidthMm: 0.6, viaInsetMm: 0.3, viaDrillMm: 0.4 } }));
		const rings = checkLaunch(a, P).filter((v) => v.ruleId === 'launch-annular-ring');
		// 0.3 mm from the gap edge, 0.2 mm radius: 0.1 mm of copper to the gap side (the pad's outer edge is 0.3 mm away)
		expect(rings.length).toBe(6);
		expect(rings.every((v) => Math.abs(v.measuredMm - 0.1) < 1e-4)).toBe(true);
	});
});
