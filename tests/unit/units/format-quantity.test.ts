import { describe, expect, it } from 'vitest';
import { formatConductivity, formatLengthCompact, formatCopper, formatGhz, formatLength, formatLossTangent, formatPermittivity, formatPowerOfTen, formatSignificant, formatTrimmed } from '../../../src/lib/units';

describe('formatSignificant and formatTrimmed', () => {
	// Each case: value, significant figures, text (rounding half away from zero as Number.prototype.toFixed does, ECMA-262 §21.1.3.3).
	const cases: [number, number, string, string][] = [
		[29.44172, 5, '29.442', '29.442'],
		[0.15, 4, '0.1500', '0.15'],
		[2.2, 3, '2.20', '2.2'],
		[1234.5, 3, '1235', '1235'], // never fewer digits than the integer part
		[0, 3, '0', '0'],
		[-3.14159, 3, '-3.14', '-3.14']
	];
	it.each(cases)('%f to %i figures is %s (trimmed %s)', (value, digits, fixed, trimmed) => {
		expect(formatSignificant(value, digits)).toBe(fixed);
		expect(formatTrimmed(value, digits)).toBe(trimmed);
	});

	it('shows a dash for values that are not numbers', () => {
		expect(formatSignificant(Number.NaN, 3)).toBe('—');
		expect(formatSignificant(Infinity, 3)).toBe('—');
		expect(formatPowerOfTen(Number.NaN)).toBe('—');
		expect(formatGhz(Number.NaN)).toBe('—');
	});
});

describe('physical values with sensible figures', () => {
	// Annealed copper, 5.8 × 10⁷ S/m (IEC 60028: 58 MS/m for the 100 % IACS standard).
	it('writes copper conductivity as 5.8 × 10⁷', () => {
		expect(formatConductivity(58_000_000)).toBe('5.8 × 10⁷');
		expect(formatConductivity(59_600_000)).toBe('5.96 × 10⁷');
		// a mantissa that rounds up to ten carries into the exponent
		expect(formatPowerOfTen(99_960_000, 3)).toBe('1 × 10⁸');
		expect(formatPowerOfTen(0.000012, 2)).toBe('1.2 × 10⁻⁵');
		expect(formatPowerOfTen(-4.1e9, 2)).toBe('−4.1 × 10⁹');
		expect(formatPowerOfTen(12.5)).toBe('12.5');
	});

	it('gives εr three figures and tanδ two', () => {
		expect(formatPermittivity(4.68666)).toBe('4.69');
		expect(formatPermittivity(10.2)).toBe('10.2');
		expect(formatPermittivity(2.2)).toBe('2.2');
		expect(formatLossTangent(0.0009)).toBe('0.0009');
		expect(formatLossTangent(0.01852)).toBe('0.019');
	});

	it('gives every frequency the same three decimals in GHz', () => {
		expect(formatGhz(2.45e9)).toBe('2.450');
		expect(formatGhz(2.3765e9)).toBe('2.377'); // not 2.3765 beside 2.450: one number of decimals
		expect(formatGhz(10e9)).toBe('10.000');
	});

	// 0.15 mm / 0.0254 = 5.905… mil (NIST SP 811 B.9).
	it('writes lengths in mm or mil and foil in µm or oz', () => {
		expect(formatLength(0.15, 'mm', 3)).toBe('0.150 mm');
		expect(formatLength(0.15, 'mil', 3)).toBe('5.91 mil');
		expect(formatLength(0.2032, 'mil', 3)).toBe('8.00 mil');
		expect(formatCopper(35, 'um')).toBe('35 µm');
		expect(formatCopper(35, 'oz')).toBe('1 oz');
		expect(formatCopper(17.5, 'oz')).toBe('0.5 oz');
		expect(formatCopper(18, 'oz')).toBe('0.51 oz');
	});

	it('writes fab rules compactly: mm as stored, mil to three figures', () => {
		expect(formatLengthCompact(0.15, 'mm')).toBe('0.15');
		expect(formatLengthCompact(0.2032, 'mm')).toBe('0.2032');
		expect(formatLengthCompact(0.2032, 'mil')).toBe('8');
		expect(formatLengthCompact(0.15, 'mil')).toBe('5.91');
		expect(formatLengthCompact(0.075, 'mil')).toBe('2.95');
	});
});
