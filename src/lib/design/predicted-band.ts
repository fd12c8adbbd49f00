// The band a sized design predicts around its resonance, drawn behind measured and simulated S11.
import type { SizedDesign } from '../rf/sized-design';

/** The predicted band: the estimated fractional bandwidth centred on the design frequency. */
export function predictedBand(sized: Pick<SizedDesign, 'frequencyHz'> & { estimates: Pick<SizedDesign['estimates'], 'bandwidthFraction'> }): { lowHz: number; highHz: number } {
	const halfHz = (sized.estimates.bandwidthFraction / 2) * sized.frequencyHz;
	return { lowHz: sized.frequencyHz - halfHz, highHz: sized.frequencyHz + halfHz };
}
