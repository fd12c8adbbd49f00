// Writer checks: write → read gives the same network back (fast-check), and the file layouts the
// Touchstone specification (IBIS Open Forum v2.0/v2.1; keyword order from memory) asks for.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../../src/lib/schemas/input-error';
import {
	buildTouchstoneCommands,
	readTouchstone,
	writeTouchstone,
	type Complex,
	type DataFormat,
	type FrequencyUnit,
	type TouchstoneNetwork,
	type WrittenTouchstoneVersion
} from '../../../../src/lib/formats/touchstone/index';

const complexArb = (format: DataFormat): fc.Arbitrary<Complex> =>
	format === 'RI'
		? fc.record({ re: fc.double({ min: -10, max: 10, noNaN: true }), im: fc.double({ min: -10, max: 10, noNaN: true }) })
		: // MA and DB: a magnitude that has a logarithm, at any angle.
			fc.tuple(fc.double({ min: 1e-6, max: 10, noNaN: true }), fc.double({ min: -Math.PI, max: Math.PI, noNaN: true })).map(([m, a]) => ({ re: m * Math.cos(a), im: m * Math.sin(a) }));

/** Strictly increasing frequencies in hertz built from positive steps. */
const frequenciesArb = (count: { minLength: number; maxLength: number }) =>
	fc
		.tuple(fc.double({ min: 0, max: 1e10, noNaN: true }), fc.array(fc.double({ min: 1, max: 1e9, noNaN: true }), { minLength: count.minLength - 1, maxLength: count.maxLength - 1 }))
		.map(([start, steps]) => steps.reduce<number[]>((acc, step) => [...acc, acc[acc.length - 1] + step], [start]));

const networkArb: fc.Arbitrary<{ network: TouchstoneNetwork; version: WrittenTouchstoneVersion }> = fc
	.record({
		portCount: fc.constantFrom(1 as const, 2 as const),
		format: fc.constantFrom<DataFormat>('RI', 'MA', 'DB'),
		frequencyUnit: fc.constantFrom<FrequencyUnit>('Hz', 'kHz', 'MHz', 'GHz'),
		version: fc.constantFrom<WrittenTouchstoneVersion>('1.1', '2.0'),
		frequencies: frequenciesArb({ minLength: 1, maxLength: 8 }),
		references: fc.array(fc.double({ min: 1, max: 500, noNaN: true }), { minLength: 2, maxLength: 2 }),
		sameReference: fc.boolean(),
		noiseCount: fc.nat({ max: 3 })
	})
	.chain((r) =>
		fc
			.record({
				values: fc.array(fc.array(complexArb(r.format), { minLength: r.portCount === 1 ? 1 : 4, maxLength: r.portCount === 1 ? 1 : 4 }), {
					minLength: r.frequencies.length,
					maxLength: r.frequencies.length
				}),
				noise: fc.array(
					fc.record({
						minimumNoiseFigureDb: fc.double({ min: 0, max: 20, noNaN: true }),
						optimumSourceReflection: complexArb('MA'),
						noiseResistance: fc.double({ min: 0, max: 100, noNaN: true })
					}),
					{ minLength: r.portCount === 2 ? r.noiseCount : 0, maxLength: r.portCount === 2 ? r.noiseCount : 0 }
				)
			})
			.map(({ values, noise }) => {
				const refs = r.portCount === 1 || r.sameReference ? Array.from({ length: r.portCount }, () => r.references[0]) : r.references;
				// Noise frequencies start at the first network frequency, which version 1 needs to find them.
				const first = r.frequencies[0];
				const network: TouchstoneNetwork = {
					version: r.version === '1.1' ? '1' : '2.0',
					portCount: r.portCount,
					frequencyUnit: r.frequencyUnit,
					format: r.format,
					referenceImpedanceOhm: refs,
					points: r.frequencies.map((frequencyHz, i) => ({ frequencyHz, s: values[i] })),
					noise: noise.map((n, i) => ({ ...n, frequencyHz: first + i * 1e6 }))
				};
				return { network, version: r.version };
			})
	);

function close(a: number, b: number, relative: number): boolean {
	return Math.abs(a - b) <= relative * Math.max(Math.abs(a), Math.abs(b)) + 1e-300;
}

function closeComplex(a: Complex, b: Complex, scale: number): boolean {
	return Math.abs(a.re - b.re) <= 1e-12 * scale && Math.abs(a.im - b.im) <= 1e-12 * scale;
}

describe('writeTouchstone → readTouchstone round trip', () => {
	it('gives back the same network for every version, unit and format', () => {
		fc.assert(
			fc.property(networkArb, ({ network, version }) => {
				const back = readTouchstone(writeTouchstone(network, { version }), { portCount: network.portCount });
				expect(back.version).toBe(network.version);
				expect(back.portCount).toBe(network.portCount);
				expect(back.format).toBe(network.format);
				expect(back.frequencyUnit).toBe(network.frequencyUnit);
				expect(back.referenceImpedanceOhm).toEqual(network.referenceImpedanceOhm);
				expect(back.points).toHaveLength(network.points.length);
				back.points.forEach((p, i) => {
					const q = network.points[i];
					expect(close(p.frequencyHz, q.frequencyHz, 1e-15), `frequency ${p.frequencyHz} vs ${q.frequencyHz}`).toBe(true);
					p.s.forEach((v, j) => {
						const scale = Math.max(1, Math.hypot(q.s[j].re, q.s[j].im));
						expect(closeComplex(v, q.s[j], scale), `point ${i} s${j}`).toBe(true);
					});
				});
				expect(back.noise).toHaveLength(network.noise.length);
				back.noise.forEach((n, i) => {
					const m = network.noise[i];
					expect(close(n.frequencyHz, m.frequencyHz, 1e-15)).toBe(true);
					expect(n.minimumNoiseFigureDb).toBe(m.minimumNoiseFigureDb);
					expect(n.noiseResistance).toBe(m.noiseResistance);
					expect(closeComplex(n.optimumSourceReflection, m.optimumSourceReflection, 10)).toBe(true);
				});
			}),
			{ numRuns: 400, seed: 7 }
		);
	});

	it('is exact in RI and Hz: read back bit for bit, and written again byte for byte', () => {
		fc.assert(
			fc.property(networkArb, ({ network, version }) => {
				// Noise Γopt is always written as magnitude and angle, so it is left out of the exact check.
				const exact: TouchstoneNetwork = { ...network, format: 'RI', frequencyUnit: 'Hz', noise: [] };
				const text = writeTouchstone(exact, { version });
				const back = readTouchstone(text);
				expect(back.points).toEqual(exact.points);
				expect(writeTouchstone(back, { version })).toBe(text);
			}),
			{ numRuns: 200, seed: 11 }
		);
	});
});

describe('writeTouchstone layouts', () => {
	const onePort: TouchstoneNetwork = {
		version: '1',
		portCount: 1,
		frequencyUnit: 'GHz',
		format: 'RI',
		referenceImpedanceOhm: [50],
		points: [
			{ frequencyHz: 2.4e9, s: [{ re: 0.5, im: -0.25 }] },
			{ frequencyHz: 2.5e9, s: [{ re: 0.1, im: 0 }] }
		],
		noise: []
	};

	it('writes version 1.1 as an option line and one line per frequency', () => {
		expect(writeTouchstone(onePort, { comments: ['demo'] })).toBe('! demo\n# GHz S RI R 50\n2.4 0.5 -0.25\n2.5 0.1 0\n');
	});

	it('writes version 2.0 with its keywords in order and [End] last (TSIRD 4.1: [End] required)', () => {
		expect(writeTouchstone(onePort, { version: '2.0' })).toBe(
			'[Version] 2.0\n# GHz S RI R 50\n[Number of Ports] 1\n[Number of Frequencies] 2\n[Network Data]\n2.4 0.5 -0.25\n2.5 0.1 0\n[End]\n'
		);
	});

	it('writes per-port resistances on the 1.1 option line and as [Reference] in 2.0', () => {
		const twoPort: TouchstoneNetwork = {
			...onePort,
			portCount: 2,
			referenceImpedanceOhm: [50, 75],
			points: [{ frequencyHz: 1e9, s: [{ re: 0.1, im: 0 }, { re: 0.2, im: 0 }, { re: 0.3, im: 0 }, { re: 0.4, im: 0 }] }]
		};
		expect(writeTouchstone(twoPort, { version: '1.1' })).toContain('# GHz S RI R 50 75\n');
		const v2 = writeTouchstone(twoPort, { version: '2.0' });
		expect(v2).toContain('[Two-Port Data Order] 21_12\n');
		expect(v2).toContain('[Reference] 50 75\n');
		expect(v2).toContain('# GHz S RI R 50\n');
	});

	it('converts to the format and unit asked for (0.1 ∠ 0° is −20 dB)', () => {
		expect(writeTouchstone(onePort, { format: 'DB', frequencyUnit: 'MHz' })).toContain('\n2500 -20 0\n');
	});

	it('splits multi-line comments into one "!" line each', () => {
		const cmds = buildTouchstoneCommands(onePort, { comments: ['a\nb'] });
		expect(cmds.slice(0, 2)).toEqual([
			{ type: 'comment', text: 'a' },
			{ type: 'comment', text: 'b' }
		]);
	});

	const bad: { name: string; network: TouchstoneNetwork; format?: DataFormat; version?: WrittenTouchstoneVersion; path: string }[] = [
		{ name: 'a zero value in DB', network: { ...onePort, points: [{ frequencyHz: 1, s: [{ re: 0, im: 0 }] }] }, format: 'DB', path: 'points.0.s.0' },
		{ name: 'a NaN value', network: { ...onePort, points: [{ frequencyHz: 1, s: [{ re: NaN, im: 0 }] }] }, path: 'points.0.s.0' },
		{ name: 'frequencies out of order', network: { ...onePort, points: [...onePort.points].reverse() }, path: 'points.1.frequencyHz' },
		{ name: 'no points', network: { ...onePort, points: [] }, path: 'points' },
		{ name: 'a reference of 0 Ω', network: { ...onePort, referenceImpedanceOhm: [0] }, path: 'referenceImpedanceOhm.0' },
		{
			name: 'version 1.1 noise data that starts above the last network frequency',
			network: {
				...onePort,
				portCount: 2,
				referenceImpedanceOhm: [50, 50],
				points: [{ frequencyHz: 1e9, s: [{ re: 0, im: 0 }, { re: 1, im: 0 }, { re: 1, im: 0 }, { re: 0, im: 0 }] }],
				noise: [{ frequencyHz: 2e9, minimumNoiseFigureDb: 1, optimumSourceReflection: { re: 0.1, im: 0 }, noiseResistance: 0.2 }]
			},
			version: '1.1',
			path: 'noise.0.frequencyHz'
		}
	];
	for (const b of bad) {
		it(`refuses ${b.name} with an InputError`, () => {
			let caught: unknown;
			try {
				writeTouchstone(b.network, { format: b.format, version: b.version });
			} catch (err) {
				caught = err;
			}
			expect(caught).toBeInstanceOf(InputError);
			expect((caught as InputError).first.path).toBe(b.path);
		});
	}
});
