// Square patch: the side whose transmission-line resonance (W = L) is f0, the base of both circularly polarised shapes.
import { freeSpaceWavelengthMm } from '../units';
import { requireInRange, requireObject, requirePositive } from './guard';
import { fringeExtensionMm, lineEffectivePermittivity, maximumHeightMm, tooThickError, type LineModelKind, type RectangularPatchSize } from './rectangular-patch';

export interface SquarePatchInput {
	frequencyHz: number;
	relativePermittivity: number;
	heightMm: number;
	/** Line model; default 'first-pass'. */
	model?: LineModelKind;
}

/** Transmission-line model of a W × L patch (Balanis, Antenna Theory, §14.2.1): εreff, ΔL and L + 2ΔL; εreff by the chosen line model. */
export function lineModelOf(widthMm: number, lengthMm: number, heightMm: number, er: number, model: LineModelKind = 'first-pass'): RectangularPatchSize {
	const effectivePermittivity = lineEffectivePermittivity(widthMm, heightMm, er, model);
	const fringe = fringeExtensionMm(widthMm, heightMm, effectivePermittivity);
	return { widthMm, lengthMm, effectivePermittivity, fringeExtensionMm: fringe, effectiveLengthMm: lengthMm + 2 * fringe };
}

function squareSide(frequencyHz: number, er: number, heightMm: number, model: LineModelKind): number {
	const halfWaveMm = freeSpaceWavelengthMm(frequencyHz) / 2;
	let side = halfWaveMm / Math.sqrt(er);
	for (let i = 0; i < 100; i++) {
		const eps = lineEffectivePermittivity(side, heightMm, er, model);
		const next = halfWaveMm / Math.sqrt(eps) - 2 * fringeExtensionMm(side, heightMm, eps);
		if (!(next > 0)) return next;
		if (Math.abs(next - side) <= 1e-13 * side) return next;
		side = next;
	}
	return side;
}

/**
 * The side s of a square patch resonating at f0 in the transmission-line model with W = L = s,
 * found by fixed-point iteration of s = λ0/(2√εreff(s)) − 2ΔL(s) (the dependence on s is weak).
 */
export function squarePatch(input: SquarePatchInput): RectangularPatchSize {
	const d = requireObject('input', input);
	const frequencyHz = requirePositive('frequencyHz', d.frequencyHz);
	const er = requireInRange('relativePermittivity', d.relativePermittivity, 1, 1000, { exclusiveMin: true });
	const heightMm = requirePositive('heightMm', d.heightMm);
	const model: LineModelKind = input.model === 'textbook' ? 'textbook' : 'first-pass';
	const side = squareSide(frequencyHz, er, heightMm, model);
	if (!(side > 0)) throw tooThickError(heightMm, maximumHeightMm((h) => squareSide(frequencyHz, er, h, model), heightMm));
	return lineModelOf(side, side, heightMm, er, model);
}
