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

/** Bracketed bisection over [lo, hi] (fallback), with the reachability check. */
function bisect(g: (x: number) => number, lo: number, hi: number, z: number, logTarget: number): number {
	const gLo = g(lo);
	const gHi = g(hi);
	if (!(gLo >= 0 && gHi <= 0)) {
		const zMax = Math.exp(gLo + logTarget);
		const zMin = Math.exp(gHi + logTarget);
		throw new InputError([
			{ path: 'impedanceOhm', value: z, message: `not realisable as microstrip on this substrate; allowed range [${zMin.toPrecision(4)}, ${zMax.toPrecision(4)}]` }
		]);
	}
	for (let i = 0; i < 200 && hi - lo > 1e-15; i++) {
		const mid = (lo + hi) / 2;
		if (g(mid) > 0) lo = mid;
		else hi = mid;
	}
	return (lo + hi) / 2;
}

/**
 * The width W whose Hammerstad–Jensen Z0 (with the thickness correction) equals the target, to
 * about 1e-12 relative. Secant steps on ln Z over ln(W/h), with a bisection fallback. Example:
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

	const lnMin = Math.log(MIN_WIDTH_RATIO);
	const lnMax = Math.log(MAX_WIDTH_RATIO);
	// Secant steps from the closed-form guess; ln Z is nearly linear in ln u, so a few steps suffice.
	let x0 = Math.min(lnMax, Math.max(lnMin, Math.log(startingRatio(z, er))));
	let g0 = g(x0);
	let x = x0 + (g0 > 0 ? 0.01 : -0.01);
	let gx = g(x);
	let converged = Math.abs(g0) < 1e-14;
	if (converged) x = x0;
	for (let iter = 0; iter < 60 && !converged; iter++) {
		if (Math.abs(gx) < 1e-14) {
			converged = true;
			break;
		}
		const next = x - (gx * (x - x0)) / (gx - g0);
		if (!Number.isFinite(next) || next < lnMin || next > lnMax) break;
		x0 = x;
		g0 = gx;
		x = next;
		gx = g(x);
	}
	if (!converged) x = bisect(g, lnMin, lnMax, z, logTarget);
	const u = Math.exp(x);
	return { widthMm: u * heightMm, ...microstripModel(u, er, tr) };
}
