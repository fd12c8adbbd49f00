import { describe, expect, it } from 'vitest';
import { nearlySquareCentreHz, nearlySquarePatch } from '../../../src/lib/rf/nearly-square-patch';
import { squarePatch } from '../../../src/lib/rf/square-patch';
import { truncatedDiagonalFor, truncationLegMm } from '../../../src/lib/rf/truncated-corner-patch';
import { InputError } from '../../../src/lib/schemas';

describe('corner-truncated patch', () => {
	// Garg et al., Microstrip Antenna Design Handbook, ch. 9 (from memory): ΔS/S = 1/(2Q0), ΔS = c² for two cuts.
	it('cuts ΔS/S = 1/(2Q)', () => {
		const c = truncationLegMm(30, 25);
		expect((c * c) / (30 * 30)).toBeCloseTo(1 / 50, 12);
	});

	it('cuts the rising diagonal for RHCP and the falling one for LHCP (feed on y, radiation +z)', () => {
		expect(truncatedDiagonalFor('rhcp')).toBe('rising');
		expect(truncatedDiagonalFor('lhcp')).toBe('falling');
	});

	it('rejects a Q below 0.5', () => {
		expect(() => truncationLegMm(30, 0.1)).toThrow(InputError);
	});
});

describe('nearly-square patch', () => {
	const base = { frequencyHz: 2.45e9, relativePermittivity: 4.4, heightMm: 1.6, qualityFactor: 25 };

	// Garg et al., ch. 9 (from memory): long/short = 1 + 1/Q0.
	it('has sides in the ratio 1 + 1/Q around the square, centred on f0', () => {
		const p = nearlySquarePatch({ ...base, handedness: 'rhcp' });
		expect(p.lengthMm / p.widthMm).toBeCloseTo(1 + 1 / 25, 12);
		expect(Math.abs(nearlySquareCentreHz(p.widthMm, p.lengthMm, 1.6, 4.4) / 2.45e9 - 1)).toBeLessThan(1e-9);
		const square = squarePatch(base).widthMm;
		expect(p.widthMm).toBeLessThan(square);
		expect(p.lengthMm).toBeGreaterThan(square);
	});

	it('makes the y side longer for RHCP and the x side longer for LHCP (probe in the +x,+y quadrant)', () => {
		const r = nearlySquarePatch({ ...base, handedness: 'rhcp' });
		const l = nearlySquarePatch({ ...base, handedness: 'lhcp' });
		expect(r.lengthMm).toBeGreaterThan(r.widthMm);
		expect(l.widthMm).toBeGreaterThan(l.lengthMm);
		expect(l.widthMm).toBeCloseTo(r.lengthMm, 12);
	});
});
