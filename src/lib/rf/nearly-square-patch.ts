// Nearly-square patch fed on its diagonal for circular polarisation: the side ratio from the Q relation and the handedness rule.
import type { Handedness } from '../schemas';
import { freeSpaceWavelengthMm } from '../units';
import { requireInRange, requireObject, requirePositive } from './guard';
import { maximumHeightMm, tooThickError, type LineModelKind } from './rectangular-patch';
import { lineModelOf } from './square-patch';

export interface NearlySquareInput {
	frequencyHz: number;
	relativePermittivity: number;
	heightMm: number;
	qualityFactor: number;
	handedness: Handedness;
	/** Line model; default 'first-pass'. */
	model?: LineModelKind;
}

export interface NearlySquareSize {
	/** Side along x. */
	widthMm: number;
	/** Side along y. */
	lengthMm: number;
	/** Long side / short side = 1 + 1/Q0. */
	aspectRatio: number;
}

/** Centre frequency √(fx·fy) of the two orthogonal modes of a W × L patch (transmission-line model each). */
export function nearlySquareCentreHz(widthMm: number, lengthMm: number, heightMm: number, er: number, model: LineModelKind = 'first-pass'): number {
	const modeX = lineModelOf(lengthMm, widthMm, heightMm, er, model);
	const modeY = lineModelOf(widthMm, lengthMm, heightMm, er, model);
	const c = freeSpaceWavelengthMm(1) / 2;
	const fx = c / (modeX.effectiveLengthMm * Math.sqrt(modeX.effectivePermittivity));
	const fy = c / (modeY.effectiveLengthMm * Math.sqrt(modeY.effectivePermittivity));
	return Math.sqrt(fx * fy);
}

/**
 * Sides a < b with b/a = 1 + 1/Q0 (Garg et al., Microstrip Antenna Design Handbook, ch. 9; from
 * memory), fed on the diagonal; the short side is solved by bisection so that √(fx·fy) = f0.
 * Handedness, for a probe on the diagonal in the +x,+y quadrant and radiation towards +z: the mode
 * along the longer side resonates lower and lags, so the field turns from the short side's axis to
 * the long side's. A longer y side (lengthMm > widthMm) turns the field x → y, counter-clockwise
 * seen from +z: RHCP (IEEE Std 145); a longer x side gives LHCP. Same validity as the corner cut:
 * Q0 ≳ 10.
 */
export function nearlySquarePatch(input: NearlySquareInput): NearlySquareSize {
	const d = requireObject('input', input);
	const frequencyHz = requirePositive('frequencyHz', d.frequencyHz);
	const er = requireInRange('relativePermittivity', d.relativePermittivity, 1, 1000, { exclusiveMin: true });
	const heightMm = requirePositive('heightMm', d.heightMm);
	const q = requireInRange('qualityFactor', d.qualityFactor, 0.5, Number.MAX_VALUE);
	const ratio = 1 + 1 / q;
	const model: LineModelKind = input.model === 'textbook' ? 'textbook' : 'first-pass';
	const centre = (short: number) => nearlySquareCentreHz(short, short * ratio, heightMm, er, model);
	// The centre frequency falls as the patch grows; the smallest side still has the fringe extensions.
	const smallestMm = 1e-9 * freeSpaceWavelengthMm(frequencyHz);
	const tinyCentre = (h: number) => nearlySquareCentreHz(smallestMm, smallestMm * ratio, h, er, model) - frequencyHz;
	if (!(tinyCentre(heightMm) > 0)) throw tooThickError(heightMm, maximumHeightMm(tinyCentre, heightMm));
	let lo = smallestMm;
	let hi = freeSpaceWavelengthMm(frequencyHz);
	for (let i = 0; i < 200 && hi - lo > 1e-14 * hi; i++) {
		const mid = (lo + hi) / 2;
		if (centre(mid) > frequencyHz) lo = mid;
		else hi = mid;
	}
	const short = (lo + hi) / 2;
	const long = short * ratio;
	return d.handedness === 'lhcp' ? { widthMm: long, lengthMm: short, aspectRatio: ratio } : { widthMm: short, lengthMm: long, aspectRatio: ratio };
}
