// How far the first-pass resonance is expected to be off, and where that figure holds: read from published measurements.
import type { PatchShape } from '../schemas';
import type { ResonanceAccuracy } from './sized-design';

/**
 * Rectangular family: the largest |error| of the first-pass resonance over 16 measured patches
 * (Kara 1996 and Chang, Long & Richards 1986, as tabulated in tests/fixtures/rf/published-resonances.ts,
 * from memory): h/λ0 0.0044–0.081, εr 2.22–10.2. Rounded up to the next 0.5 %.
 */
export const RECTANGULAR_ACCURACY: ResonanceAccuracy = {
	typicalErrorPercent: 2,
	maximumHeightRatio: 0.081,
	permittivityRange: [2.2, 10.2],
	basis: '16 published measured rectangular patches (Kara 1996; Chang, Long & Richards 1986)'
};

/**
 * Circular: the largest |error| of the cavity model with Balanis' effective radius over 10 measured
 * discs (Dahele & Lee 1987 and others, as tabulated in the same fixture, from memory): h/λ0
 * 0.0020–0.016, εr 2.32–4.55. Rounded up to the next 0.5 %.
 */
export const CIRCULAR_ACCURACY: ResonanceAccuracy = {
	typicalErrorPercent: 2,
	maximumHeightRatio: 0.016,
	permittivityRange: [2.32, 4.55],
	basis: '10 published measured circular patches (Dahele & Lee 1987 and others)'
};

export function resonanceAccuracy(shape: PatchShape): ResonanceAccuracy {
	return shape === 'circular' ? CIRCULAR_ACCURACY : RECTANGULAR_ACCURACY;
}
