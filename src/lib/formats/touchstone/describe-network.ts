// What a Touchstone file held, in one line of facts: version, ports, units, format, reference, sweep span.
import type { TouchstoneNetwork } from './touchstone-network';

export interface NetworkDescription {
	version: TouchstoneNetwork['version'];
	portCount: TouchstoneNetwork['portCount'];
	frequencyUnit: TouchstoneNetwork['frequencyUnit'];
	format: TouchstoneNetwork['format'];
	referenceImpedanceOhm: number[];
	pointCount: number;
	startHz: number;
	stopHz: number;
}

/** The reader guarantees at least one point, so start and stop always exist. */
export function describeNetwork(network: TouchstoneNetwork): NetworkDescription {
	return {
		version: network.version,
		portCount: network.portCount,
		frequencyUnit: network.frequencyUnit,
		format: network.format,
		referenceImpedanceOhm: network.referenceImpedanceOhm,
		pointCount: network.points.length,
		startHz: network.points[0].frequencyHz,
		stopHz: network.points[network.points.length - 1].frequencyHz
	};
}
