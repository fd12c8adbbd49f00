import { describe, expect, it } from 'vitest';
import { integrateGaussLegendre } from '../../../src/lib/rf/gauss-legendre';

describe('integrateGaussLegendre', () => {
	it('integrates a degree-47 polynomial exactly on one panel', () => {
		expect(integrateGaussLegendre((x) => x ** 46, -1, 1)).toBeCloseTo(2 / 47, 14);
	});

	it('integrates sin over [0, π] to 2', () => {
		expect(integrateGaussLegendre(Math.sin, 0, Math.PI)).toBeCloseTo(2, 14);
	});

	it('needs more panels for a fast oscillation, and gets it right with them', () => {
		const f = (x: number) => Math.cos(200 * x);
		const exact = Math.sin(200) / 200;
		expect(Math.abs(integrateGaussLegendre(f, 0, 1, 70) - exact)).toBeLessThan(1e-12);
		expect(Math.abs(integrateGaussLegendre(f, 0, 1, 1) - exact)).toBeGreaterThan(1e-6);
	});
});
