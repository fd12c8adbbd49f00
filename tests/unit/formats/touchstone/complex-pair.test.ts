// Pair formats of the Touchstone specification ("Option Line": RI, MA, DB; angles in degrees).
import { describe, expect, it } from 'vitest';
import { complexFromPair, pairFromComplex } from '../../../../src/lib/formats/touchstone/complex-pair';

describe('complexFromPair', () => {
	const table: { format: 'RI' | 'MA' | 'DB'; pair: [number, number]; re: number; im: number; note: string }[] = [
		{ format: 'RI', pair: [0.3, -0.4], re: 0.3, im: -0.4, note: 'rectangular as written' },
		{ format: 'MA', pair: [0.5, 90], re: 0, im: 0.5, note: 'quarter turn' },
		{ format: 'MA', pair: [2, 180], re: -2, im: 0, note: 'half turn' },
		{ format: 'DB', pair: [-20, 0], re: 0.1, im: 0, note: '−20 dB is 0.1 in amplitude' },
		{ format: 'DB', pair: [0, -90], re: 0, im: -1, note: '0 dB is 1' }
	];
	for (const c of table) {
		it(`reads ${c.format} ${c.pair.join(' ')} (${c.note})`, () => {
			const v = complexFromPair(c.format, ...c.pair);
			expect(v.re).toBeCloseTo(c.re, 14);
			expect(v.im).toBeCloseTo(c.im, 14);
		});
	}
});

describe('pairFromComplex', () => {
	it('writes −1 at +180°, never −180°', () => {
		expect(pairFromComplex('MA', { re: -1, im: -0 })).toEqual([1, 180]);
	});
	it('writes 0.1 as −20 dB', () => {
		const [db, angle] = pairFromComplex('DB', { re: 0.1, im: 0 });
		expect(db).toBeCloseTo(-20, 12);
		expect(angle).toBe(0);
	});
});
