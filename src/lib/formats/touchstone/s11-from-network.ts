// The reflection at port 1 of a read network, as the samples rf/measured-response analyses.
import type { ReflectionSample } from '../../schemas/reflection-sample';
import type { TouchstoneNetwork } from './touchstone-network';

export function s11FromNetwork(network: TouchstoneNetwork): ReflectionSample[] {
	return network.points.map((p) => ({ frequencyHz: p.frequencyHz, s11: p.s[0] }));
}
