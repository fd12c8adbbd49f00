// Homing's step rules: de-embedding the feed line, the secant, the cavity model's first feed step, the quarter-wave section.
import { describe, expect, it } from 'vitest';
import type { FieldCheckResult } from '../../../../src/lib/schemas/field-check';
import { cosineModelStep, feedPointResistance, loadThroughLine, nextTransformerImpedance, secant, transformerStep } from '../../../../src/worker/fullwave/homing-steps';
import { sizeDocument } from '../../../fixtures/designs/size-document';

const inset = sizeDocument({ frequencyHz: 2.45e9, feed: 'inset', substrate: { relativePermittivity: 4.3, heightMm: 1.6 } });
const probe = sizeDocument({ frequencyHz: 2.45e9, feed: 'probe', substrate: { relativePermittivity: 4.3, heightMm: 1.6 } });

/** A result whose port sees `z` at the target (two samples around it are enough). */
function resultSeeing(z: { re: number; im: number }): FieldCheckResult {
	const sample = (frequencyHz: number) => ({ frequencyHz, s11Re: 0, s11Im: 0, resistanceOhm: z.re, reactanceOhm: z.im });
	return { targetFrequencyHz: 2.45e9, referenceImpedanceOhm: 50, samples: [sample(2.4e9), sample(2.5e9)] } as unknown as FieldCheckResult;
}

/** Zin = Z0·(ZL + jZ0·tanβl)/(Z0 + jZL·tanβl) (Pozar, Microwave Engineering 4th ed., eq. 2.44; from memory). */
function alongLine(zl: { re: number; im: number }, z0: number, t: number) {
	const nr = zl.re;
	const ni = zl.im + z0 * t;
	const dr = z0 - zl.im * t;
	const di = zl.re * t;
	const d = dr * dr + di * di;
	return { re: (z0 * (nr * dr + ni * di)) / d, im: (z0 * (ni * dr - nr * di)) / d };
}

describe('Homing steps', () => {
	it('moves the port’s Zin back along the inset feed line to the feed point', () => {
		if (inset.feed.kind !== 'inset') throw new Error('inset case');
		const line = inset.feed.line;
		const beta = (2 * Math.PI * 2.45e9 * Math.sqrt(line.effectivePermittivity)) / 299_792_458_000;
		const t = Math.tan(beta * line.lengthMm);
		for (const zl of [{ re: 20, im: -5 }, { re: 50, im: 0 }, { re: 180, im: 40 }]) {
			expect(feedPointResistance(inset, resultSeeing(alongLine(zl, 50, t)))).toBeCloseTo(zl.re, 6);
		}
	});

	it('takes a probe’s Zin as the feed point’s', () => {
		expect(feedPointResistance(probe, resultSeeing({ re: 37, im: 12 }))).toBeCloseTo(37, 9);
	});

	it('finds the root of a straight line in one secant step, and falls back on a flat one', () => {
		expect(secant(1, 3, 2, 1, 99)).toBeCloseTo(2.5, 12); // y = 5 − 2x
		expect(secant(1, 3, 2, 3, 99)).toBe(99);
	});

	it('lands on the reference in one step when the patch follows the cos² (inset) and sin² (probe) model', () => {
		// R(y) = R_edge·cos²(πy/L) and R(p) = R_edge·sin²(πp/L) (Balanis, Antenna Theory 4th ed., eq. 14-20a; from memory)
		const l = (inset.patch as { lengthMm: number }).lengthMm;
		const rEdge = 300;
		const r = (y: number) => rEdge * Math.cos((Math.PI * y) / l) ** 2;
		const y = cosineModelStep(inset, 'insetDepthMm', 4, r(4), 50);
		expect(r(y)).toBeCloseTo(50, 6);
		const rp = (p: number) => rEdge * Math.sin((Math.PI * p) / l) ** 2;
		const p = cosineModelStep(probe, 'probeOffsetMm', 2, rp(2), 50);
		expect(rp(p)).toBeCloseTo(50, 6);
	});

	it('moves a Zin back along a line to the load it came from (the inverse of eq. 2.44)', () => {
		for (const zl of [{ re: 20, im: -5 }, { re: 230, im: 60 }]) {
			for (const bl of [0.3, Math.PI / 2 - 1e-3, 2.2]) {
				const back = loadThroughLine(alongLine(zl, 70, Math.tan(bl)), 70, bl);
				expect(back.re).toBeCloseTo(zl.re, 6);
				expect(back.im).toBeCloseTo(zl.im, 6);
			}
		}
	});
});

describe('Homing on the quarter-wave feed', () => {
	const doc = { frequencyHz: 2.45e9, feed: 'quarter-wave', substrate: { relativePermittivity: 3.55, heightMm: 1.524, lossTangent: 0.0027 } } as const;
	const qw = sizeDocument(doc);
	const f = 2.45e9;
	const bl = (line: { lengthMm: number; effectivePermittivity: number }) => (2 * Math.PI * f * Math.sqrt(line.effectivePermittivity) * line.lengthMm) / 299_792_458_000;
	/** The port's Zin of a design whose patch edge presents zl at the target: through the λg/4 section, then the feed line. */
	const portSees = (sized: typeof qw, zl: { re: number; im: number }) => {
		if (sized.feed.kind !== 'quarter-wave') throw new Error('quarter-wave case');
		const { transformer, line } = sized.feed;
		const atJoin = alongLine(zl, transformer.impedanceOhm, Math.tan(bl(transformer)));
		return alongLine(atJoin, 50, Math.tan(bl(line)));
	};
	const s11Db = (z: { re: number; im: number }) => 20 * Math.log10(Math.hypot(z.re - 50, z.im) / Math.hypot(z.re + 50, z.im));
	const withSection = (zt: number) => sizeDocument({ ...doc, overrides: { transformerImpedanceOhm: zt } });

	it('sizes the section the override names, keeps it λg/4 long, and shows the formula’s √(R_edge·Z0) beside it', () => {
		if (qw.feed.kind !== 'quarter-wave') throw new Error('quarter-wave case');
		const tuned = withSection(95);
		if (tuned.feed.kind !== 'quarter-wave') throw new Error('quarter-wave case');
		expect(tuned.feed.transformer.impedanceOhm).toBeCloseTo(95, 3);
		expect(bl(tuned.feed.transformer)).toBeCloseTo(Math.PI / 2, 6); // λg/4 at the target
		expect(tuned.formulaValues?.transformerImpedanceOhm).toBeCloseTo(qw.feed.transformer.impedanceOhm, 6);
		expect(qw.feed.transformer.impedanceOhm).toBeCloseTo(Math.sqrt(50 * qw.edgeResistanceOhm), 3);
	});

	it('refuses the override on a feed without a quarter-wave section, and out of its 10–300 Ω range', () => {
		expect(() => sizeDocument({ ...doc, feed: 'inset', overrides: { transformerImpedanceOhm: 90 } })).toThrow(/quarter-wave/);
		expect(() => withSection(5)).toThrow();
		expect(() => transformerStep(inset, resultSeeing({ re: 50, im: 0 }))).toThrow(RangeError);
	});

	it('lands on S11 ≤ −20 dB at the target in one step when the simulated patch edge is not the formula’s', () => {
		// a patch edge of 110 Ω where the formula expected R_edge: the first section mismatches
		const edge = { re: 110, im: 0 };
		const before = s11Db(portSees(qw, edge));
		expect(before).toBeGreaterThan(-20);
		const zt = transformerStep(qw, resultSeeing(portSees(qw, edge)));
		expect(zt).toBeCloseTo(Math.sqrt(50 * 110), 6); // the λ/4 rule Zin = Zt²/Z_L (Pozar, §5.4; from memory)
		expect(s11Db(portSees(withSection(zt), edge))).toBeLessThan(-40);
	});

	it('picks the real section of least |Γ| for a reactive edge, and reaches −20 dB within two steps when the edge moves with the patch', () => {
		const edge = { re: 180, im: 35 };
		const zt = transformerStep(qw, resultSeeing(portSees(qw, edge)));
		const gamma = (z: number) => s11Db(portSees(withSection(z), edge));
		expect(gamma(zt)).toBeLessThan(gamma(zt * 1.03));
		expect(gamma(zt)).toBeLessThan(gamma(zt * 0.97));
		expect(gamma(zt)).toBeLessThan(-20);
		// the resonant correction that runs beside the step moves the edge a little: a second step follows it
		const moved = { re: 195, im: 20 };
		const second = transformerStep(withSection(zt), resultSeeing(portSees(withSection(zt), moved)));
		expect(s11Db(portSees(withSection(second), moved))).toBeLessThan(-20);
	});

	it('reaches −20 dB where the patch edge moves with the section: the secant settles what the bare step swings about', () => {
		// A synthetic response shaped on the quick Homing run of the README's quarter-wave example: there the
		// de-embedded edge fell from 142 Ω to 113 Ω as the section went from 77 Ω to 84 Ω (the section's width
		// changes its junction with the radiating edge), |Z_L| ∝ Zt^−2.6, so the bare step Zt → √(Z0·|Z_L|)
		// swings with a slope of −1.3 about its fixed point.
		const edgeFor = (zt: number) => ({ re: 142 * (77.4 / zt) ** 2.6, im: 10 });
		const study = (useSecant: boolean) => {
			let zt = 88.6;
			let previous: { impedanceOhm: number; proposedOhm: number } | null = null;
			const s11: number[] = [];
			for (let step = 0; step < 5; step++) {
				const sized = withSection(zt);
				const seen = portSees(sized, edgeFor(zt));
				s11.push(s11Db(seen));
				const current = { impedanceOhm: zt, proposedOhm: transformerStep(sized, resultSeeing(seen)) };
				zt = useSecant ? nextTransformerImpedance(current, previous) : current.proposedOhm;
				previous = current;
			}
			return s11;
		};
		const bare = study(false);
		const settled = study(true);
		expect(settled[0]).toBeGreaterThan(-20);
		expect(Math.min(...settled.slice(1, 4))).toBeLessThan(-20);
		expect(settled[4]).toBeLessThan(-25); // the edge's +10 Ω reactance bounds what one real Zt can do
		// the bare step never gets there: each step overshoots the last
		expect(Math.min(...bare)).toBeGreaterThan(-20);
	});

	it('takes the first proposal as it is, the secant inside a bracket, and half a step without one', () => {
		expect(nextTransformerImpedance({ impedanceOhm: 80, proposedOhm: 92 }, null)).toBe(92);
		// residual +12 at 80 Ω and −6 at 92 Ω bracket the root: the secant root of a straight residual, 88 Ω
		expect(nextTransformerImpedance({ impedanceOhm: 92, proposedOhm: 86 }, { impedanceOhm: 80, proposedOhm: 92 })).toBeCloseTo(88, 9);
		// the quick real run's first two feed trials, residuals −16.1 and −11.4 Ω: no bracket, half way to 77.2 Ω
		expect(nextTransformerImpedance({ impedanceOhm: 88.6, proposedOhm: 77.2 }, { impedanceOhm: 104.7, proposedOhm: 88.6 })).toBeCloseTo(82.9, 9);
		// equal residuals give no secant either
		expect(nextTransformerImpedance({ impedanceOhm: 92, proposedOhm: 95 }, { impedanceOhm: 80, proposedOhm: 83 })).toBeCloseTo(93.5, 9);
	});
});
