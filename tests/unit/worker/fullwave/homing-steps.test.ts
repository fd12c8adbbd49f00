// Homing's step rules: de-embedding the feed line, the secant, the cavity model's first feed step.
import { describe, expect, it } from 'vitest';
import { size } from '../../../../src/lib/rf';
import type { FieldCheckResult } from '../../../../src/lib/schemas/field-check';
import { cosineModelStep, feedPointResistance, secant } from '../../../../src/worker/fullwave/homing-steps';

const inset = size({ frequencyHz: 2.45e9, feed: 'inset', substrate: { relativePermittivity: 4.3, heightMm: 1.6 } });
const probe = size({ frequencyHz: 2.45e9, feed: 'probe', substrate: { relativePermittivity: 4.3, heightMm: 1.6 } });

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
});
