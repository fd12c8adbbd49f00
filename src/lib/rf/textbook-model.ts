// The textbook first pass for the same input, kept beside the corrected one: what the transmission-line model and the cos² relation would give.
import type { DesignInput } from '../schemas';
import { circularRadiationConductanceS } from './circular-patch';
import { circularProbeRadiusMm } from './circular-probe-radius';
import { insetDepthMm } from './inset-depth';
import { probeOffsetMm } from './probe-offset';
import { rectangularPatch } from './rectangular-patch';
import { resonantFrequencyHz } from './resonant-frequency';
import type { SizedPatch, SizedTextbook } from './sized-design';
import { slotConductance } from './slot-conductance';
import { squarePatch } from './square-patch';

/**
 * The textbook figures (Balanis, Antenna Theory, §14.2.1 and §14.3): the resonant dimension by the
 * (1 + 12h/W)^−½ transmission-line model (the radius for a disc, whose cavity model is unchanged),
 * the radiation-only edge resistance, the feed position by cos² (J1² for a disc) on it, and the
 * resonance the textbook model predicts for the first-pass patch. The feed position is left out
 * where the textbook cannot place it (a target above its edge resistance).
 */
export function textbookModel(d: DesignInput, firstPass: SizedPatch): SizedTextbook {
	const { frequencyHz, substrate: s } = d;
	const resonanceOfFirstPassHz = resonantFrequencyHz(firstPass, s, 'textbook');
	if (firstPass.kind === 'circular') {
		const edge = 1 / circularRadiationConductanceS(firstPass.effectiveRadiusMm, frequencyHz);
		const out: SizedTextbook = { resonantDimensionMm: firstPass.radiusMm, resonanceOfFirstPassHz, edgeResistanceOhm: edge };
		if (d.targetImpedanceOhm > edge) return out;
		switch (d.feed) {
			case 'probe': {
				const target = { edgeResistanceOhm: edge, targetResistanceOhm: d.targetImpedanceOhm, radiusMm: firstPass.radiusMm, effectiveRadiusMm: firstPass.effectiveRadiusMm };
				try {
					return { ...out, probeOffsetMm: circularProbeRadiusMm(target) };
				} catch {
					return out; // the rim presents less than the target: no textbook probe position
				}
			}
			case 'inset':
			case 'edge':
			case 'quarter-wave':
			case 'aperture-coupled':
			case 'proximity-coupled':
				return out; // the textbook places only a probe on a disc
			default:
				return d satisfies never;
		}
	}
	const base = { frequencyHz, relativePermittivity: s.relativePermittivity, heightMm: s.heightMm, model: 'textbook' as const };
	const model = firstPass.kind === 'rectangular' ? rectangularPatch({ ...base, widthMm: d.patchWidthMm }) : squarePatch(base);
	const edge = slotConductance({ widthMm: model.widthMm, lengthMm: model.lengthMm, frequencyHz }).edgeResistanceOhm;
	const out: SizedTextbook = { resonantDimensionMm: model.lengthMm, resonanceOfFirstPassHz, edgeResistanceOhm: edge };
	if (firstPass.kind !== 'rectangular' || d.targetImpedanceOhm > edge) return out;
	const target = { edgeResistanceOhm: edge, targetResistanceOhm: d.targetImpedanceOhm, lengthMm: model.lengthMm };
	switch (d.feed) {
		case 'inset':
			return { ...out, insetDepthMm: insetDepthMm(target) };
		case 'probe':
			return { ...out, probeOffsetMm: probeOffsetMm(target) };
		case 'edge':
		case 'quarter-wave':
		case 'aperture-coupled':
		case 'proximity-coupled':
			return out; // no feed position to place by cos²
		default:
			return d satisfies never;
	}
}
