// Mounting holes: non-plated drills the user places, copper pulled back on the planes, mask opened, kept from the patch.
import { describe, expect, it } from 'vitest';
import { buildArtwork, MOUNTING_HOLE_COPPER_PULLBACK_MM, MOUNTING_HOLE_KEEP_OUT_HEIGHTS } from '../../../src/lib/artwork';
import { checkArtwork } from '../../../src/lib/drc';
import { GeometryError } from '../../../src/lib/geometry';
import { STANDARD_QUICK_TURN_PROFILE } from '../../../src/lib/schemas/fab-profile';
import { sizedCase } from '../../fixtures/designs/design-cases';

const H_MM = 1.524;

describe('mounting holes', () => {
	const a = buildArtwork(sizedCase('rectangular', 'probe', { solderMask: true, groundMarginMm: 12, mountingHoles: [{ xMm: 4, yMm: 4, diameterMm: 3.2 }, { xMm: 4, yMm: 52, diameterMm: 2.2 }] }));

	it('are non-plated drills through every copper, after the plated probe', () => {
		expect(a.drills.map((d) => [d.id, d.role, d.plated, d.fromCopper, d.toCopper])).toEqual([
			['probe-drill', 'probe', true, 1, 2],
			['mounting-hole-1', 'mounting', false, 1, 2],
			['mounting-hole-2', 'mounting', false, 1, 2]
		]);
		expect(a.metadata.mountingHoleKeepOutMm).toBeCloseTo(MOUNTING_HOLE_KEEP_OUT_HEIGHTS * H_MM, 12);
	});

	it('pull the ground back around each hole and open both masks over them', () => {
		const ground = a.layers.find((l) => l.id === 'copper-bottom')!;
		const cut = ground.shapes.find((s) => s.id === 'copper-bottom-clearance-mounting-hole-1')!;
		expect(cut).toMatchObject({ role: 'clearance', polarity: 'clear', geometry: { kind: 'circle', center: [4, 4], diameterMm: 3.2 + 2 * MOUNTING_HOLE_COPPER_PULLBACK_MM } });
		for (const id of ['mask-top', 'mask-bottom']) expect(a.layers.find((l) => l.id === id)!.shapes.map((s) => s.id)).toContain(`${id}-mounting-hole-2`);
	});

	it('pass the checks when kept 5 h from the patch (common practice, no source), and fail just inside', () => {
		expect(checkArtwork(a, STANDARD_QUICK_TURN_PROFILE)).toEqual([]);
		const keepOut = MOUNTING_HOLE_KEEP_OUT_HEIGHTS * H_MM;
		const sized = sizedCase('rectangular', 'probe', { groundMarginMm: 12 });
		const patchLeft = (sized.ground.widthMm - (sized.patch.kind === 'rectangular' ? sized.patch.widthMm : 0)) / 2;
		const at = (gapMm: number) => buildArtwork(sizedCase('rectangular', 'probe', { groundMarginMm: 12, mountingHoles: [{ xMm: patchLeft - gapMm - 1, yMm: sized.ground.lengthMm / 2, diameterMm: 2 }] }));
		expect(checkArtwork(at(keepOut + 1e-3), STANDARD_QUICK_TURN_PROFILE)).toEqual([]);
		const [v] = checkArtwork(at(keepOut - 1e-3), STANDARD_QUICK_TURN_PROFILE);
		expect(v).toMatchObject({ ruleId: 'hole-keep-out', shapeIds: ['mounting-hole-1', 'patch'] });
		expect(v.measuredMm).toBeCloseTo(keepOut - 1e-3, 4);
	});

	it('refuses a hole that leaves the board, naming it', () => {
		expect(() => buildArtwork(sizedCase('rectangular', 'inset', { mountingHoles: [{ xMm: 1, yMm: 10, diameterMm: 3.2 }] }))).toThrow(GeometryError);
		expect(() => buildArtwork(sizedCase('rectangular', 'inset', { mountingHoles: [{ xMm: 10, yMm: 10, diameterMm: 2 }, { xMm: 500, yMm: 10, diameterMm: 2 }] }))).toThrow(/mountingHoles\.1/);
	});

	it('leave a design without holes as it was', () => {
		const plain = buildArtwork(sizedCase('rectangular', 'inset'));
		expect(plain.drills).toEqual([]);
		expect(plain.metadata.mountingHoleKeepOutMm).toBeUndefined();
	});
});
