import { describe, expect, it } from 'vitest';
import { slotConductance } from '../../../src/lib/rf/slot-conductance';
import { freeSpaceWavelengthMm } from '../../../src/lib/units';

describe('slotConductance', () => {
	// Balanis, Antenna Theory (3rd ed.), ch. 14, inset-feed example; from memory: W 1.186 cm,
	// L 0.906 cm, 10 GHz → G1 ≈ 1.57e-3 S, Rin(0) = 1/(2(G1+G12)) ≈ 228.3 Ω.
	it("reproduces Balanis' G1 and edge resistance at 10 GHz", () => {
		const s = slotConductance({ widthMm: 11.86, lengthMm: 9.06, frequencyHz: 10e9 });
		expect(Math.abs(s.slotConductanceS / 1.57e-3 - 1)).toBeLessThan(0.01);
		expect(Math.abs(s.edgeResistanceOhm / 228.3 - 1)).toBeLessThan(0.01);
	});

	// Balanis ch. 14: for W ≪ λ0, G1 → W²/(90λ0²) (from memory). Checks the integral's normalisation.
	it('approaches the narrow-slot limit W²/(90·λ0²)', () => {
		const lambda = freeSpaceWavelengthMm(1e9);
		const w = lambda / 200;
		const s = slotConductance({ widthMm: w, lengthMm: lambda / 4, frequencyHz: 1e9 });
		expect(Math.abs(s.slotConductanceS / ((w * w) / (90 * lambda * lambda)) - 1)).toBeLessThan(0.01);
	});

	it('agrees with a brute-force midpoint rule for G12', () => {
		const w = 40;
		const l = 30;
		const f = 2.4e9;
		const s = slotConductance({ widthMm: w, lengthMm: l, frequencyHz: f });
		const k0 = (2 * Math.PI) / freeSpaceWavelengthMm(f);
		const n = 200_000;
		let sum = 0;
		for (let i = 0; i < n; i++) {
			const t = ((i + 0.5) * Math.PI) / n;
			const c = Math.cos(t);
			const ratio = Math.sin(((k0 * w) / 2) * c) / c;
			// J0 by its integral representation (1/π)∫0^π cos(x·sinτ) dτ, independent of besselJ.
			const x = k0 * l * Math.sin(t);
			let j0 = 0;
			for (let k = 0; k < 64; k++) j0 += Math.cos(x * Math.sin(((k + 0.5) * Math.PI) / 64));
			sum += ratio * ratio * (j0 / 64) * Math.sin(t) ** 3;
		}
		const g12 = (sum * (Math.PI / n)) / (120 * Math.PI * Math.PI) * ((120 * Math.PI) / 376.730313);
		expect(Math.abs(s.mutualConductanceS / g12 - 1)).toBeLessThan(1e-5);
	});
});
