// How numbers read on screen: significant figures that match what is known, powers of ten written as such, one
// number of decimals per kind of value, lengths and foil in the person's units. Pure: the same text in browser and server.
import { copperInUnit, copperSymbol, lengthInUnit, lengthSymbol, type CopperUnit, type LengthUnit } from './display-units';

const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };
/** U+2212 MINUS SIGN, as typeset text writes negative numbers. */
const MINUS = '−';

/**
 * `value` with `digits` significant figures in fixed notation, trailing zeros kept (29.442, 0.1500): the digits say how
 * well it is known. At most six decimals; non-finite values are a dash.
 */
export function formatSignificant(value: number, digits: number): string {
	if (!Number.isFinite(value)) return '—';
	if (value === 0) return '0';
	const decimals = Math.max(0, Math.min(6, digits - 1 - Math.floor(Math.log10(Math.abs(value)))));
	return value.toFixed(decimals);
}

/** As `formatSignificant`, trailing zeros dropped (2.2, not 2.200): for values as a datasheet states them. */
export function formatTrimmed(value: number, digits: number): string {
	const text = formatSignificant(value, digits);
	return text.includes('.') ? text.replace(/0+$/, '').replace(/\.$/, '') : text;
}

/** `value` as m × 10ⁿ with up to `digits` significant figures in m (58000000 → "5.8 × 10⁷"); |n| < 3 stays plain. */
export function formatPowerOfTen(value: number, digits = 3): string {
	if (!Number.isFinite(value)) return '—';
	if (value === 0) return '0';
	const exponent = Math.floor(Math.log10(Math.abs(value)));
	if (Math.abs(exponent) < 3) return formatTrimmed(value, digits);
	let mantissa = Number((value / 10 ** exponent).toPrecision(digits));
	let n = exponent;
	// 9.996e7 at 3 figures rounds to 10.0 × 10⁷: carry into the exponent
	if (Math.abs(mantissa) >= 10) {
		mantissa /= 10;
		n += 1;
	}
	const m = formatTrimmed(mantissa, digits).replace('-', MINUS);
	return `${m} × 10${[...String(n)].map((c) => SUPERSCRIPT[c]).join('')}`;
}

/** Relative permittivity εr: three significant figures (laminate datasheets state two or three: 4.4, 3.66, 10.2). */
export const formatPermittivity = (relativePermittivity: number): string => formatTrimmed(relativePermittivity, 3);

/** Loss tangent tanδ: two significant figures (0.0009, 0.02). */
export const formatLossTangent = (lossTangent: number): string => formatTrimmed(lossTangent, 2);

/** Conductivity in S/m as a power of ten, three figures (5.8 × 10⁷). */
export const formatConductivity = (sPerM: number): string => formatPowerOfTen(sPerM, 3);

/** Decimals every frequency in GHz is shown with: 1 MHz, finer than a first-pass estimate is good for. */
export const FREQUENCY_GHZ_DECIMALS = 3;

/** A frequency in Hz as GHz with the one number of decimals every frequency on a page shares (2.450, 2.377). */
export function formatGhz(frequencyHz: number): string {
	if (!Number.isFinite(frequencyHz)) return '—';
	return (frequencyHz / 1e9).toFixed(FREQUENCY_GHZ_DECIMALS);
}

/** A length in mm as a number in `unit`, with `digits` significant figures (29.442 mm, 1159.1 mil). */
export const formatLengthNumber = (mm: number, unit: LengthUnit, digits = 5): string => formatSignificant(lengthInUnit(mm, unit), digits);

/**
 * A small length (a fab rule, a tolerance) as a number in `unit`, trailing zeros dropped: mm to four significant figures
 * (0.15, 0.075, 0.2032), mil to three (5.91, 8, 2.95: a tenth of a mil is finer than a board house works to).
 */
export const formatLengthCompact = (mm: number, unit: LengthUnit): string => formatTrimmed(lengthInUnit(mm, unit), unit === 'mil' ? 3 : 4);

/** A length in mm as text with its symbol in `unit`: "0.150 mm", "5.91 mil". */
export const formatLength = (mm: number, unit: LengthUnit, digits = 5): string => `${formatLengthNumber(mm, unit, digits)} ${lengthSymbol(unit)}`;

/** A foil thickness in µm as a number in `unit`: µm to 0.1, oz to two decimals, trailing zeros dropped (35, 0.5, 1). */
export function formatCopperNumber(um: number, unit: CopperUnit): string {
	if (!Number.isFinite(um)) return '—';
	const v = copperInUnit(um, unit);
	return String(Number(v.toFixed(unit === 'oz' ? 2 : 1)));
}

/** A foil thickness in µm as text with its symbol in `unit`: "35 µm", "1 oz". */
export const formatCopper = (um: number, unit: CopperUnit): string => `${formatCopperNumber(um, unit)} ${copperSymbol(unit)}`;
