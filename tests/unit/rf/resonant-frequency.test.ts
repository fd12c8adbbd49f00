import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as rf from '../../../src/lib/rf';
import { resonantFrequencyHz } from '../../../src/lib/rf/resonant-frequency';
import { InputError, parseDesignInput } from '../../../src/lib/schemas';

describe('resonantFrequencyHz', () => {
	it("recovers 10 GHz from Balanis' example dimensions (W 11.86 mm, L 9.06 mm; from memory) within 0.5 %", () => {
		const f = resonantFrequencyHz({ kind: 'rectangular', widthMm: 11.86, lengthMm: 9.06 }, { relativePermittivity: 2.2, heightMm: 1.588 });
		expect(Math.abs(f / 10e9 - 1)).toBeLessThan(0.005);
	});

	it('falls when the patch grows or εr rises', () => {
		const sub = { relativePermittivity: 4.4, heightMm: 1.6 };
		const f = resonantFrequencyHz({ kind: 'circular', radiusMm: 16, effectiveRadiusMm: 16.5 }, sub);
		expect(resonantFrequencyHz({ kind: 'circular', radiusMm: 16.5, effectiveRadiusMm: 17 }, sub)).toBeLessThan(f);
		expect(resonantFrequencyHz({ kind: 'circular', radiusMm: 16, effectiveRadiusMm: 16.5 }, { ...sub, relativePermittivity: 4.6 })).toBeLessThan(f);
	});
});

describe('every public rf function', () => {
	// Each public function called with arbitrary arguments returns or throws InputError, nothing else.
	const fns: [string, (a: unknown, b: unknown) => unknown][] = [
		['size', (a) => rf.size(parseDesignInput(a))], // a document is parsed at the edge, then sized
		['resonantFrequencyHz', (a, b) => rf.resonantFrequencyHz(a as never, b as never)],
		['toleranceStudy', (a, b) => rf.toleranceStudy(parseDesignInput(a), b as never)],
		['analyzeMicrostrip', (a) => rf.analyzeMicrostrip(a as never)],
		['dispersivePermittivity', (a) => rf.dispersivePermittivity(a as never)],
		['synthesizeMicrostrip', (a) => rf.synthesizeMicrostrip(a as never)],
		['rectangularPatch', (a) => rf.rectangularPatch(a as never)],
		['squarePatch', (a) => rf.squarePatch(a as never)],
		['slotConductance', (a) => rf.slotConductance(a as never)],
		['insetDepthMm', (a) => rf.insetDepthMm(a as never)],
		['probeOffsetMm', (a) => rf.probeOffsetMm(a as never)],
		['quarterWaveTransformer', (a) => rf.quarterWaveTransformer(a as never)],
		['circularPatch', (a) => rf.circularPatch(a as never)],
		['circularProbeRadiusMm', (a) => rf.circularProbeRadiusMm(a as never)],
		['truncationLegMm', (a, b) => rf.truncationLegMm(a as never, b as never)],
		['nearlySquarePatch', (a) => rf.nearlySquarePatch(a as never)],
		['performanceEstimates', (a) => rf.performanceEstimates(a as never)],
		['groundSize', (a) => rf.groundSize(a as never)]
	];
	const value = fc.oneof(fc.double(), fc.constantFrom(NaN, Infinity, -Infinity, 0, -1), fc.string(), fc.constant(undefined), fc.constant(null), fc.constantFrom('rectangular', 'circular', 'truncated-corner', 'nearly-square', 'rhcp'));
	const shaped = fc.dictionary(
		fc.constantFrom('kind', 'widthMm', 'lengthMm', 'heightMm', 'relativePermittivity', 'frequencyHz', 'impedanceOhm', 'thicknessMm', 'radiusMm', 'effectiveRadiusMm', 'sideMm', 'edgeResistanceOhm', 'targetResistanceOhm', 'qualityFactor', 'handedness', 'seed', 'samples'),
		value
	);
	it.each(fns)('%s throws only InputError', (_name, fn) => {
		fc.assert(
			fc.property(fc.oneof(fc.anything(), shaped), fc.oneof(fc.anything(), shaped, value), (a, b) => {
				try {
					fn(a, b);
				} catch (e) {
					expect(e).toBeInstanceOf(InputError);
				}
			}),
			{ numRuns: 200 }
		);
	});
});
