// Turns a network into the Touchstone command list of a version 1.1 or version 2.0 file.
import { InputError, type InputIssue } from '../../schemas/input-error';
import type { TouchstoneCommand } from './commands';
import { pairFromComplex } from './complex-pair';
import { HZ_PER_FREQUENCY_UNIT, type DataFormat, type FrequencyUnit, type TouchstoneNetwork } from './touchstone-network';

export type WrittenTouchstoneVersion = '1.1' | '2.0';

export interface TouchstoneWriteOptions {
	/** "1.1": option line and data only (per-port R on the option line when ports differ); "2.0": keyword file. */
	version?: WrittenTouchstoneVersion;
	/** Pair format to write; defaults to the network's. */
	format?: DataFormat;
	/** Frequency unit to write; defaults to the network's. */
	frequencyUnit?: FrequencyUnit;
	/** Comment lines placed at the top of the file (one `!` line per entry; newlines split entries). */
	comments?: string[];
}

function fail(path: string, value: unknown, message: string): never {
	const issue: InputIssue = { path, value, message };
	throw new InputError([issue]);
}

/** Checks what a file cannot express, so that whatever is written reads back. */
function checkNetwork(network: TouchstoneNetwork, format: DataFormat, version: WrittenTouchstoneVersion): void {
	const sCount = network.portCount === 1 ? 1 : 4;
	if (network.points.length === 0) fail('points', network.points, 'at least one frequency is needed');
	if (network.referenceImpedanceOhm.length !== network.portCount) {
		fail('referenceImpedanceOhm', network.referenceImpedanceOhm, `needs one value per port (${network.portCount})`);
	}
	network.referenceImpedanceOhm.forEach((r, i) => {
		if (!Number.isFinite(r) || r <= 0) fail(`referenceImpedanceOhm.${i}`, r, 'must be a finite resistance; allowed range (0, ∞) Ω');
	});
	let previousHz = -Infinity;
	network.points.forEach((point, i) => {
		if (!Number.isFinite(point.frequencyHz) || point.frequencyHz < 0 || point.frequencyHz <= previousHz) {
			fail(`points.${i}.frequencyHz`, point.frequencyHz, `must be finite, ≥ 0 and greater than the previous frequency (${previousHz} Hz)`);
		}
		previousHz = point.frequencyHz;
		if (point.s.length !== sCount) fail(`points.${i}.s`, point.s, `a ${network.portCount}-port point holds ${sCount} values`);
		point.s.forEach((v, j) => {
			if (!Number.isFinite(v.re) || !Number.isFinite(v.im)) fail(`points.${i}.s.${j}`, v, 'must have a finite real and imaginary part');
			if (format === 'DB' && v.re === 0 && v.im === 0) fail(`points.${i}.s.${j}`, v, 'a zero value has no dB magnitude; write RI or MA instead');
		});
	});
	if (network.noise.length > 0 && network.portCount !== 2) fail('noise', network.noise, 'noise data belongs to 2-port networks only');
	let previousNoiseHz = -Infinity;
	network.noise.forEach((n, i) => {
		if (!Number.isFinite(n.frequencyHz) || n.frequencyHz < 0 || n.frequencyHz <= previousNoiseHz) {
			fail(`noise.${i}.frequencyHz`, n.frequencyHz, 'must be finite, ≥ 0 and greater than the previous noise frequency');
		}
		previousNoiseHz = n.frequencyHz;
		const g = n.optimumSourceReflection;
		if (![n.minimumNoiseFigureDb, n.noiseResistance, g.re, g.im].every(Number.isFinite)) fail(`noise.${i}`, n, 'every noise value must be finite');
	});
	// A version 1 reader finds noise data by its first frequency being ≤ the last network frequency.
	if (version === '1.1' && network.noise.length > 0 && network.noise[0].frequencyHz > previousHz) {
		fail('noise.0.frequencyHz', network.noise[0].frequencyHz, `a version 1.1 file needs the first noise frequency ≤ the last network frequency (${previousHz} Hz); write 2.0 instead`);
	}
}

export function buildTouchstoneCommands(network: TouchstoneNetwork, options: TouchstoneWriteOptions = {}): TouchstoneCommand[] {
	const version: WrittenTouchstoneVersion = options.version ?? (network.version === '1' ? '1.1' : '2.0');
	const format = options.format ?? network.format;
	const frequencyUnit = options.frequencyUnit ?? network.frequencyUnit;
	checkNetwork(network, format, version);
	const hzPerUnit = HZ_PER_FREQUENCY_UNIT[frequencyUnit];
	const refs = network.referenceImpedanceOhm;
	const allSame = refs.every((r) => r === refs[0]);

	const commands: TouchstoneCommand[] = [];
	for (const entry of options.comments ?? []) {
		for (const text of entry.split(/\r\n|\r|\n/)) commands.push({ type: 'comment', text });
	}
	if (version === '2.0') commands.push({ type: 'keyword', name: 'Version', args: ['2.0'] });
	commands.push({ type: 'option', frequencyUnit, format, referenceImpedanceOhm: version === '1.1' && !allSame ? [...refs] : [refs[0]] });
	if (version === '2.0') {
		commands.push({ type: 'keyword', name: 'Number of Ports', args: [String(network.portCount)] });
		// Our points hold [S11, S21, S12, S22]: the 21_12 order.
		if (network.portCount === 2) commands.push({ type: 'keyword', name: 'Two-Port Data Order', args: ['21_12'] });
		commands.push({ type: 'keyword', name: 'Number of Frequencies', args: [String(network.points.length)] });
		if (network.noise.length > 0) commands.push({ type: 'keyword', name: 'Number of Noise Frequencies', args: [String(network.noise.length)] });
		if (!allSame) commands.push({ type: 'keyword', name: 'Reference', args: refs.map(String) });
		commands.push({ type: 'keyword', name: 'Network Data', args: [] });
	}
	for (const point of network.points) {
		commands.push({ type: 'data', values: [point.frequencyHz / hzPerUnit, ...point.s.flatMap((v) => pairFromComplex(format, v))] });
	}
	if (network.noise.length > 0) {
		if (version === '2.0') commands.push({ type: 'keyword', name: 'Noise Data', args: [] });
		for (const n of network.noise) {
			const [magnitude, angleDeg] = pairFromComplex('MA', n.optimumSourceReflection);
			commands.push({ type: 'data', values: [n.frequencyHz / hzPerUnit, n.minimumNoiseFigureDb, magnitude, angleDeg, n.noiseResistance] });
		}
	}
	if (version === '2.0') commands.push({ type: 'keyword', name: 'End', args: [] });
	return commands;
}
