// Microstrip synthesis: the strip width for a target impedance, by numeric inversion of the Hammerstad–Jensen model.
import { InputError } from '../schemas';
import { microstripModel, type MicrostripModel } from './analyze-microstrip';
import { requireInRange, requireNonNegative, requireObject, requirePositive } from './guard';

export interface MicrostripTarget {
	impedanceOhm: number;
	heightMm: number;
	relativePermittivity: number;
	thicknessMm?: number;
}

export interface SynthesizedMicrostrip extends MicrostripModel {
	widthMm: number;
}

/** Search limits for u = W/h; together they span far beyond 10–200 Ω on any laminate. */
const MIN_WIDTH_RATIO = 1e-5;
const MAX_WIDTH_RATIO = 1e5;

/** Closed-form starting point (Wheeler's synthesis as given in Pozar, Microwave Engineering §3.8). */
function startingRatio(z: number, er: number): number {
	const a = (z / 60) * Math.sqrt((er + 1) / 2) + ((er - 1) / (er + 1)) * (0.23 + 0.11 / er);
	const narrow = (8 * Math.exp(a)) / (Math.exp(2 * a) - 2);
	if (narrow > 0 && narrow < 2) return narrow;
	const b = (377 * Math.PI) / (2 * z * Math.sqrt(er));
	const wide = (2 / Math.PI) * (b - 1 - Math.log(2 * b - 1) + ((er - 1) / (2 * er)) * (Math.log(b - 1) + 0.39 - 0.61 / er));
	return Number.isFinite(wide) && wide > 0 ? wide : 1;
}

/**
 * The width W whose Hammerstad–Jensen Z0 (with the thickness correction) equals the target, to
 * about 1e-12 relative. Newton's method on ln Z over ln(W/h), kept inside a bracket. Example:
 * 50 Ω on εr 4.4, h 1.6 mm, t 35 µm → W ≈ 3.0 mm.
 */
export function synthesizeMicrostrip(target: MicrostripTarget): SynthesizedMicrostrip {
	const t = requireObject('target', target);
	const z = requirePositive('impedanceOhm', t.impedanceOhm);
	const heightMm = requirePositive('heightMm', t.heightMm);
	const er = requireInRange('relativePermittivity', t.relativePermittivity, 1, 1000);
	const tr = (t.thicknessMm === undefined ? 0 : requireNonNegative('thicknessMm', t.thicknessMm)) / heightMm;
	const logTarget = Math.log(z);
	const g = (x: number) => Math.log(microstripModel(Math.exp(x), er, tr).impedanceOhm) - logTarget;

	let lo = Math.log(MIN_WIDTH_RATIO);
	let hi = Math.log(MAX_WIDTH_RATIO);
	const gLo = g(lo);
	const gHi = g(hi);
	if (!(gLo >= 0 && gHi <= 0)) {
		const zMax = Math.exp(gLo + logTarget);
		const zMin = Math.exp(gHi + logTarget);
		throw new InputError([
			{ path: 'impedanceOhm', value: z, message: `not realisable as microstrip on this substrate; allowed range [${zMin.toPrecision(4)}, ${zMax.toPrecision(4)}]` }
		]);
	}
	let x = Math.min(hi, Math.max(lo, Math.log(startingRatio(z, er))));
	for (let iter = 0; iter < 100; iter++) {
		const gx = g(x);
		if (Math.abs(gx) < 1e-14) break;
		if (gx > 0) lo = x;
		else hi = x;
		const step = 1e-7;
		const slope = (g(x + step) - gx) / step;
		let next = x - gx / slope;
		if (!(next > lo && next < hi)) next = (lo + hi) / 2;
		if (Math.abs(next - x) < 1e-15) break;
		x = next;
	}
	const u = Math.exp(x);
	return { widthMm: u * heightMm, ...microstripModel(u, er, tr) };
}
