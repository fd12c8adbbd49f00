// Resonance of a patch recomputed from its own dimensions: the check on sizing, the tolerance study's model, the retune's start.
import { SPEED_OF_LIGHT_M_PER_S, mFromMm } from '../units';
import { TM11_EIGENVALUE } from './bessel';
import { effectiveRadiusMm } from './circular-patch';
import { requireInRange, requireObject, requirePositive } from './guard';
import { nearlySquareCentreHz } from './nearly-square-patch';
import type { SizedPatch } from './sized-design';
import { lineModelOf } from './square-patch';
import type { LineModelKind } from './rectangular-patch';
import { InputError } from '../schemas';

export interface SubstrateValues {
	relativePermittivity: number;
	heightMm: number;
}

function lineResonanceHz(widthMm: number, lengthMm: number, heightMm: number, er: number, model: LineModelKind): number {
	const m = lineModelOf(widthMm, lengthMm, heightMm, er, model);
	return SPEED_OF_LIGHT_M_PER_S / (2 * mFromMm(m.effectiveLengthMm) * Math.sqrt(m.effectivePermittivity));
}

/**
 * Dominant-mode resonance in Hz: rectangular TM010 by the transmission-line model (f = c/(2·(L+2ΔL)·√εreff));
 * circular TM11 by the cavity model with the effective radius; a truncated-corner patch as its
 * square (the cut splits the mode symmetrically about it); a nearly-square patch as √(fx·fy).
 * The line model is the first pass unless 'textbook' is asked for (see LineModelKind).
 */
export function resonantFrequencyHz(patch: SizedPatch, substrate: SubstrateValues, model: LineModelKind = 'first-pass'): number {
	const p = requireObject('patch', patch);
	const s = requireObject('substrate', substrate);
	const er = requireInRange('relativePermittivity', s.relativePermittivity, 1, 1000, { exclusiveMin: true });
	const h = requirePositive('heightMm', s.heightMm);
	switch (p.kind) {
		case 'rectangular':
			return lineResonanceHz(requirePositive('widthMm', p.widthMm), requirePositive('lengthMm', p.lengthMm), h, er, model);
		case 'truncated-corner': {
			const side = requirePositive('sideMm', p.sideMm);
			return lineResonanceHz(side, side, h, er, model);
		}
		case 'nearly-square':
			return nearlySquareCentreHz(requirePositive('widthMm', p.widthMm), requirePositive('lengthMm', p.lengthMm), h, er, model);
		case 'circular': {
			const ae = effectiveRadiusMm(requirePositive('radiusMm', p.radiusMm), h, er);
			if (!(ae > 0)) throw new InputError([{ path: 'radiusMm', value: p.radiusMm, message: 'too small for the substrate height: the effective radius vanishes' }]);
			return (TM11_EIGENVALUE * SPEED_OF_LIGHT_M_PER_S) / (2 * Math.PI * mFromMm(ae) * Math.sqrt(er));
		}
		default:
			throw new InputError([{ path: 'kind', value: p.kind, message: 'one of rectangular, circular, truncated-corner, nearly-square' }]);
	}
}
