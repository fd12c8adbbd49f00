// Rectangular patch, transmission-line model: width, effective permittivity, fringe extension and length.
import { InputError } from '../schemas';
import { freeSpaceWavelengthMm } from '../units';
import { staticEffectivePermittivity } from './analyze-microstrip';
import { requireInRange, requireObject, requirePositive } from './guard';

/**
 * Which line model sizes the rectangular family. 'first-pass' (the default): εeff of a strip as
 * wide as the patch by Hammerstad–Jensen (IEEE MTT-S 1980, stated 0.2 % for 0.01 ≤ W/h ≤ 100) and
 * Hammerstad's ΔL. 'textbook': the (1 + 12h/W)^−½ εreff of Balanis, Antenna Theory, §14.2.1, with
 * the same ΔL, kept for comparison and for the regression rows. On 16 measured patches (Kara 1996 /
 * Chang et al. 1986, see tests/fixtures/rf/published-resonances.ts) the first pass predicts
 * resonance with a mean error of +0.31 % (max |1.63 %|), the textbook +0.51 % (max |1.74 %|).
 */
export type LineModelKind = 'first-pass' | 'textbook';

export interface RectangularPatchInput {
	frequencyHz: number;
	relativePermittivity: number;
	heightMm: number;
	/** Fix the width; only the length is solved. */
	widthMm?: number;
	/** Line model; default 'first-pass'. */
	model?: LineModelKind;
}

export interface RectangularPatchSize {
	widthMm: number;
	lengthMm: number;
	effectivePermittivity: number;
	/** ΔL at each radiating edge. */
	fringeExtensionMm: number;
	/** L + 2ΔL: the electrical length, half a guided wavelength at resonance. */
	effectiveLengthMm: number;
}

/** Width for efficient radiation, W = c/(2f0)·√(2/(εr+1)) (Balanis, Antenna Theory, §14.2.1). */
export function radiatingWidthMm(frequencyHz: number, relativePermittivity: number): number {
	return (freeSpaceWavelengthMm(frequencyHz) / 2) * Math.sqrt(2 / (relativePermittivity + 1));
}

/** εreff = (εr+1)/2 + (εr−1)/2·(1 + 12h/W)^−½ (Balanis, Antenna Theory, §14.2.1; valid for W/h > 1, used throughout). */
export function patchEffectivePermittivity(widthMm: number, heightMm: number, relativePermittivity: number): number {
	return (relativePermittivity + 1) / 2 + ((relativePermittivity - 1) / 2) / Math.sqrt(1 + (12 * heightMm) / widthMm);
}

/** εeff of the patch as a wide microstrip line, by the chosen line model. */
export function lineEffectivePermittivity(widthMm: number, heightMm: number, relativePermittivity: number, model: LineModelKind = 'first-pass'): number {
	return model === 'textbook' ? patchEffectivePermittivity(widthMm, heightMm, relativePermittivity) : staticEffectivePermittivity(widthMm / heightMm, relativePermittivity);
}

/** Hammerstad's ΔL = 0.412h·(εreff+0.3)(W/h+0.264)/((εreff−0.258)(W/h+0.8)) (Balanis, Antenna Theory, §14.2.1). */
export function fringeExtensionMm(widthMm: number, heightMm: number, effectivePermittivity: number): number {
	const u = widthMm / heightMm;
	return (0.412 * heightMm * (effectivePermittivity + 0.3) * (u + 0.264)) / ((effectivePermittivity - 0.258) * (u + 0.8));
}

/** Physical length L = λ0/(2√εreff) − 2ΔL for a width (may be ≤ 0 on a far too thick substrate). */
function lengthFor(frequencyHz: number, er: number, heightMm: number, widthMm: number, model: LineModelKind) {
	const effectivePermittivity = lineEffectivePermittivity(widthMm, heightMm, er, model);
	const fringe = fringeExtensionMm(widthMm, heightMm, effectivePermittivity);
	const effectiveLengthMm = freeSpaceWavelengthMm(frequencyHz) / (2 * Math.sqrt(effectivePermittivity));
	return { widthMm, lengthMm: effectiveLengthMm - 2 * fringe, effectivePermittivity, fringeExtensionMm: fringe, effectiveLengthMm };
}

/** The largest height for which the patch keeps a positive length (bisection; error path only). */
export function maximumHeightMm(lengthAt: (heightMm: number) => number, heightMm: number): number {
	let lo = 0;
	let hi = heightMm;
	for (let i = 0; i < 200 && hi - lo > 1e-12 * hi; i++) {
		const mid = (lo + hi) / 2;
		if (lengthAt(mid) > 0) lo = mid;
		else hi = mid;
	}
	return lo;
}

/** The InputError for a substrate so thick that the fringing fields use up the whole resonant length. */
export function tooThickError(heightMm: number, maxMm: number): InputError {
	return new InputError([
		{
			path: 'heightMm',
			value: heightMm,
			message: `too thick for this frequency and permittivity: the fringe extensions exceed the resonant length; allowed range (0, ${maxMm.toPrecision(4)})`
		}
	]);
}

/**
 * Sizes a rectangular patch with the transmission-line model (Balanis, Antenna Theory, §14.2.1),
 * εeff by the chosen line model (see LineModelKind). Balanis' design example with the textbook
 * model: εr 2.2, h 1.588 mm, 10 GHz → W 11.86 mm, εreff 1.972, ΔL 0.81 mm, L 9.06 mm.
 */
export function rectangularPatch(input: RectangularPatchInput): RectangularPatchSize {
	const d = requireObject('input', input);
	const frequencyHz = requirePositive('frequencyHz', d.frequencyHz);
	const er = requireInRange('relativePermittivity', d.relativePermittivity, 1, 1000, { exclusiveMin: true });
	const heightMm = requirePositive('heightMm', d.heightMm);
	const widthMm = d.widthMm === undefined ? radiatingWidthMm(frequencyHz, er) : requirePositive('widthMm', d.widthMm);
	const model: LineModelKind = input.model === 'textbook' ? 'textbook' : 'first-pass';
	const size = lengthFor(frequencyHz, er, heightMm, widthMm, model);
	if (!(size.lengthMm > 0)) {
		throw tooThickError(heightMm, maximumHeightMm((h) => lengthFor(frequencyHz, er, h, widthMm, model).lengthMm, heightMm));
	}
	return size;
}
