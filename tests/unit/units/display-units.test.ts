import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { copperFormText, lengthFormText, milFromMm, mmFromLengthUnit, mmFromMil, ozFromUm, parseCopperUm, parseLengthMm, umFromOz, MM_PER_MIL, UM_PER_OZ } from '../../../src/lib/units';

describe('mil and oz conversions', () => {
	// NIST SP 811 (2008), Appendix B.9: 1 mil = 2.54 × 10⁻⁵ m exactly.
	it('takes one mil as 0.0254 mm exactly', () => {
		expect(MM_PER_MIL).toBe(0.0254);
		expect(mmFromMil(1)).toBe(0.0254);
		expect(milFromMm(25.4)).toBeCloseTo(1000, 9);
	});

	// 8 mil = 8 × 0.0254 = 0.2032 mm (NIST SP 811 B.9); the float product 0.20320000000000002 is cleaned away.
	it('gives 8 mil as 0.2032 mm with no float noise', () => {
		expect(mmFromMil(8)).toBe(0.2032);
		expect(mmFromMil(6)).toBe(0.1524);
	});

	// 35 µm per oz/ft²: common practice, no source. Mass over area: 1 oz = 28.349523125 g and 1 ft² = 0.09290304 m²
	// (NIST SP 811 B.9, exact), copper 8.96 g/cm³ (from memory) → 34.06 µm; the nominal sits within 3 % of it.
	it('takes 1 oz/ft² of foil as 35 µm, within 3 % of what its mass and area give', () => {
		expect(UM_PER_OZ).toBe(35);
		const fromMassUm = (28.349523125 / 8.96 / (0.09290304 * 1e4)) * 1e4;
		expect(fromMassUm).toBeCloseTo(34.06, 2);
		expect(Math.abs(UM_PER_OZ - fromMassUm) / fromMassUm).toBeLessThan(0.03);
		expect(umFromOz(1)).toBe(35);
		expect(umFromOz(0.5)).toBe(17.5);
		expect(ozFromUm(70)).toBe(2);
	});

	it('brings any length on a 10 nm grid back unchanged through its mil form text', () => {
		fc.assert(
			fc.property(fc.integer({ min: 0, max: 10_000_000 }), (steps) => {
				const mm = Number((steps * 1e-5).toPrecision(12));
				const back = parseLengthMm(lengthFormText(mm, 'mil'), 'mil');
				expect(back).toEqual({ ok: true, value: mm });
			}),
			{ numRuns: 300 }
		);
	});

	it('brings any foil thickness on a 0.01 µm grid back unchanged through its oz form text', () => {
		fc.assert(
			fc.property(fc.integer({ min: 0, max: 50_000 }), (steps) => {
				const um = Number((steps * 0.01).toPrecision(12));
				expect(parseCopperUm(copperFormText(um, 'oz'), 'oz')).toEqual({ ok: true, value: um });
			}),
			{ numRuns: 300 }
		);
	});

	it('agrees mil → mm → mil within the 10 nm grid', () => {
		fc.assert(
			fc.property(fc.double({ min: 0, max: 1e5, noNaN: true }), (mil) => {
				expect(Math.abs(milFromMm(mmFromMil(mil)) - mil)).toBeLessThanOrEqual(0.5e-5 / MM_PER_MIL + 1e-9 * mil);
			}),
			{ numRuns: 200 }
		);
	});

	it('leaves mm as mm', () => {
		expect(mmFromLengthUnit(1.6, 'mm')).toBe(1.6);
		expect(lengthFormText(1.6, 'mm')).toBe('1.6');
		expect(lengthFormText(1.6, 'mil')).toBe('62.9921');
		expect(copperFormText(35, 'um')).toBe('35');
		expect(copperFormText(18, 'oz')).toBe('0.5143');
	});
});

describe('parseLengthMm', () => {
	// Each case: typed text, the person's unit, the mm we store (factors from NIST SP 811 B.9: inch 25.4 mm, mil 0.0254 mm).
	const good: [string, 'mm' | 'mil', number][] = [
		['8 mil', 'mm', 0.2032], // explicit mil beats the person's mm
		['0.2 mm', 'mil', 0.2], // explicit mm beats the person's mil
		['8', 'mil', 0.2032], // bare number in the person's unit
		['0.2', 'mm', 0.2],
		['8mil', 'mm', 0.2032], // no space
		['  6 MIL ', 'mm', 0.1524], // case and spaces
		['8 thou', 'mm', 0.2032], // thou is the mil
		['5 mils', 'mm', 0.127],
		['0.008 in', 'mm', 0.2032],
		['0.008"', 'mm', 0.2032],
		['150 µm', 'mil', 0.15],
		['150 um', 'mm', 0.15],
		['.5', 'mm', 0.5],
		['1e-1 mm', 'mil', 0.1],
		['-0.1', 'mm', -0.1] // a sign parses; the schema's range refuses it
	];
	it.each(good)('reads %j (person in %s) as %f mm', (text, unit, mm) => {
		expect(parseLengthMm(text, unit)).toEqual({ ok: true, value: mm });
	});

	const bad: [string, RegExp][] = [
		['', /required/],
		['   ', /required/],
		['eight', /must be a number/],
		['8 furlongs', /unknown unit "furlongs"/],
		['0,2', /use a point/],
		['1 000', /must be a number/],
		['8 mil 2', /must be a number/],
		['1e999', /finite/],
		['NaN', /must be a number/],
		['Infinity mm', /must be a number/],
		['0x10', /must be a number|unknown unit/]
	];
	it.each(bad)('refuses %j with a message for the field', (text, message) => {
		const out = parseLengthMm(text, 'mm');
		expect(out.ok).toBe(false);
		if (!out.ok) expect(out.message).toMatch(message);
	});
});

describe('parseCopperUm', () => {
	it('reads bare numbers in the person’s unit and explicit µm or oz', () => {
		expect(parseCopperUm('1', 'oz')).toEqual({ ok: true, value: 35 });
		expect(parseCopperUm('35', 'um')).toEqual({ ok: true, value: 35 });
		expect(parseCopperUm('0.5 oz', 'um')).toEqual({ ok: true, value: 17.5 });
		expect(parseCopperUm('18 µm', 'oz')).toEqual({ ok: true, value: 18 });
		expect(parseCopperUm('18um', 'oz')).toEqual({ ok: true, value: 18 });
	});

	it('refuses a length unit and junk', () => {
		expect(parseCopperUm('1 mil', 'um')).toEqual({ ok: false, message: 'unknown unit "mil"; use µm or oz' });
		expect(parseCopperUm('heavy', 'oz').ok).toBe(false);
		expect(parseCopperUm('', 'oz')).toEqual({ ok: false, message: 'required' });
	});
});
