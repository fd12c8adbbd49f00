// A Gerber/Excellon coordinate string → mm, following the file's format, zero suppression and units.
import { mmFromInch } from '../../units';

export interface NumberFormat {
	/** [integer places, decimal places]; null when the file did not say. */
	readonly format: readonly [number, number] | null;
	readonly zeroSuppression: 'leading' | 'trailing' | null;
	readonly units: 'mm' | 'in';
}

/**
 * "12500000" in 4.6 leading-suppressed is 12.5; "125" in 4.6 trailing-suppressed is 12.5 too (it
 * pads to 10 digits: 1250000000). A string with a decimal point is read as written.
 */
export function parseCoordinateMm(text: string, nf: NumberFormat): number {
	let value: number;
	if (text.includes('.')) value = Number(text);
	else {
		const [intPlaces, decPlaces] = nf.format ?? [2, 4];
		const sign = text.startsWith('-') ? -1 : 1;
		let digits = text.replace(/^[+-]/, '');
		if (nf.zeroSuppression === 'trailing') digits = digits.padEnd(intPlaces + decPlaces, '0');
		value = (sign * Number(digits)) / 10 ** decPlaces;
	}
	return nf.units === 'in' ? mmFromInch(value) : value;
}

export function lengthInMm(value: number, units: 'mm' | 'in'): number {
	return units === 'in' ? mmFromInch(value) : value;
}
