import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { insetDepthMm } from '../../../src/lib/rf/inset-depth';
import { probeOffsetMm } from '../../../src/lib/rf/probe-offset';
import { InputError } from '../../../src/lib/schemas';

describe('insetDepthMm', () => {
	// Balanis, Antenna Theory (3rd ed.), ch. 14, inset-feed example; from memory:
	// Rin(0) 228.3 Ω, L 0.906 cm, 50 Ω → y0 ≈ 0.3126 cm.
	it("reproduces Balanis' inset depth of 3.126 mm", () => {
		expect(insetDepthMm({ edgeResistanceOhm: 228.3, targetResistanceOhm: 50, lengthMm: 9.06 })).toBeCloseTo(3.126, 2);
	});

	it('lies in [0, L/2] and gives back the target through cos²', () => {
		fc.assert(
			fc.property(fc.double({ min: 10, max: 2000, noNaN: true }), fc.double({ min: 0.001, max: 1, noNaN: true }), fc.double({ min: 0.1, max: 1000, noNaN: true }), (edge, share, l) => {
				const target = edge * share;
				const y0 = insetDepthMm({ edgeResistanceOhm: edge, targetResistanceOhm: target, lengthMm: l });
				expect(y0).toBeGreaterThanOrEqual(0);
				expect(y0).toBeLessThanOrEqual(l / 2);
				expect(edge * Math.cos((Math.PI * y0) / l) ** 2).toBeCloseTo(target, 6);
			}),
			{ numRuns: 300 }
		);
	});

	it('is an InputError naming the target and the reachable range when the edge resistance is lower', () => {
		try {
			insetDepthMm({ edgeResistanceOhm: 40, targetResistanceOhm: 50, lengthMm: 10 });
			expect.unreachable();
		} catch (e) {
			expect(e).toBeInstanceOf(InputError);
			expect((e as InputError).first.path).toBe('targetResistanceOhm');
			expect((e as InputError).first.message).toMatch(/allowed range \(0, 40\.00\]/);
		}
	});
});

describe('probeOffsetMm', () => {
	it('measures from the centre: L/2 − y0, zero for a target of 0+ and L/2 at the edge resistance', () => {
		expect(probeOffsetMm({ edgeResistanceOhm: 228.3, targetResistanceOhm: 50, lengthMm: 9.06 })).toBeCloseTo(9.06 / 2 - 3.126, 2);
		expect(probeOffsetMm({ edgeResistanceOhm: 200, targetResistanceOhm: 200, lengthMm: 10 })).toBeCloseTo(5, 12);
		expect(probeOffsetMm({ edgeResistanceOhm: 200, targetResistanceOhm: 1e-12, lengthMm: 10 })).toBeLessThan(1e-4);
	});
});
