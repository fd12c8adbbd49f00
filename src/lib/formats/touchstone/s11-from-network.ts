// The reflection at port 1 of a read network, as the samples rf/measured-response analyses.
import type { Complex, TouchstoneNetwork } from './touchstone-network';

export interface S11Sample {
	frequencyHz: number;
	s11: Complex;
}

export function s11FromNetwork(network: TouchstoneNetwork): S11Sample[] {
	return network.points.map((p) => ({ frequencyHz: p.frequencyHz, s11: p.s[0] }));
}
