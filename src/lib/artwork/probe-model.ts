// The probe model a design states (solid pin or plated barrel) as the artwork carries it to the drill file, fab notes and sweep.
import type { SizedDesign } from '../rf/sized-design';
import type { ArtworkProbe } from './types';

/**
 * Barrel plating when a plated-barrel probe names none: 25 µm, the usual average hole-wall copper
 * asked of a plated through hole (from memory: IPC-6012 class 3 asks 25 µm average, class 2 20 µm).
 */
export const DEFAULT_PLATING_THICKNESS_UM = 25;

/** The stated probe model of a probe-fed design; undefined when none is stated or the feed is not a probe. */
export function probeModelOf(sized: SizedDesign): ArtworkProbe | undefined {
	const input = sized.input;
	if (sized.feed.kind !== 'probe' || input.feed !== 'probe') return undefined;
	const probe = input.probe;
	if (!probe.model) return undefined;
	return {
		model: probe.model,
		drillDiameterMm: sized.feed.drillDiameterMm,
		platingThicknessUm: probe.model === 'plated-barrel' ? (probe.platingThicknessUm ?? DEFAULT_PLATING_THICKNESS_UM) : null
	};
}
