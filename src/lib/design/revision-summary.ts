// One line about a revision for lists: frequency, shape and feed, and the main patch size.
import type { SizedDesign } from '../rf';
import type { DesignInput } from '../schemas';
import { ghzFromHz } from '../units';

export function revisionSummary(input: DesignInput, sized: SizedDesign): string {
	const p = sized.patch;
	const size =
		p.kind === 'circular' ? `a ${p.radiusMm.toFixed(2)} mm` : p.kind === 'truncated-corner' ? `${p.sideMm.toFixed(2)} mm square` : `${p.widthMm.toFixed(2)} × ${p.lengthMm.toFixed(2)} mm`;
	return `${ghzFromHz(input.frequencyHz).toFixed(4)} GHz ${input.shape}, ${input.feed} feed, ${size}, εr ${input.substrate.relativePermittivity}`;
}
