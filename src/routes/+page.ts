// The landing page's worked example is sized by the same pure core the editor and the exports use.
import { size } from '$lib/rf';
import { parseDesignInput } from '$lib/schemas';
import type { PageLoad } from './$types';

/**
 * Demo scenario: a 2.45 GHz sensor-node patch on 1.6 mm glass-epoxy, inset-fed for 50 Ω, with the
 * glass-epoxy class's typical tanδ: the figures `npm run cli -- size --frequency-ghz 2.45 --er 4.3
 * --height-mm 1.6` and the API give for the same laminate.
 */
export const _landingExample = {
	name: 'Sensor node, 2.45 GHz',
	frequencyHz: 2.45e9,
	shape: 'rectangular',
	feed: 'inset',
	substrate: { relativePermittivity: 4.3, lossTangent: 0.02, heightMm: 1.6 }
} as const;
const example = _landingExample;

export const load: PageLoad = () => {
	const sized = size(parseDesignInput(example));
	const patch = sized.patch.kind === 'rectangular' ? sized.patch : undefined;
	const inset = sized.feed.kind === 'inset' ? sized.feed : undefined;
	return {
		example: {
			frequencyGhz: sized.frequencyHz / 1e9,
			relativePermittivity: sized.input.substrate.relativePermittivity,
			heightMm: sized.input.substrate.heightMm,
			widthMm: patch?.widthMm ?? 0,
			lengthMm: patch?.lengthMm ?? 0,
			insetDepthMm: inset?.insetDepthMm ?? 0,
			lineWidthMm: inset?.line.widthMm ?? 0,
			bandwidthPercent: sized.estimates.bandwidthFraction * 100,
			warnings: sized.warnings.map((w) => w.message)
		}
	};
};
