// Converts between a complex value and the number pair a Touchstone data format writes for it.
import type { Complex, DataFormat } from './touchstone-network';

const RAD_PER_DEG = Math.PI / 180;
const DEG_PER_RAD = 180 / Math.PI;

/** The complex value a pair of numbers in `format` stands for. Angles are in degrees. */
export function complexFromPair(format: DataFormat, first: number, second: number): Complex {
	if (format === 'RI') return { re: first, im: second };
	const magnitude = format === 'MA' ? first : 10 ** (first / 20);
	const angleRad = second * RAD_PER_DEG;
	return { re: magnitude * Math.cos(angleRad), im: magnitude * Math.sin(angleRad) };
}

/** The pair of numbers `format` writes for a complex value; the angle lies in (−180°, 180°]. */
export function pairFromComplex(format: DataFormat, value: Complex): [number, number] {
	if (format === 'RI') return [value.re, value.im];
	const magnitude = Math.hypot(value.re, value.im);
	const angleDeg = Math.atan2(value.im, value.re) * DEG_PER_RAD;
	const angle = angleDeg === -180 ? 180 : angleDeg;
	return [format === 'MA' ? magnitude : 20 * Math.log10(magnitude), angle];
}
