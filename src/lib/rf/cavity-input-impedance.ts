// The model's predicted S11 near resonance: the cavity model's parallel-RLC input impedance at the feed point,
// built from the sized resonance, the total quality factor and the feed resistance at resonance. It is the closed-form
// curve the pages draw beside the full-wave and the measured S11.
import { feedKindTraits } from './feed-kinds';
import type { SizedDesign } from './sized-design';
import { requirePositive } from './guard';

export interface ParallelRlc {
	/** Resonant frequency f0 (Hz): where the reactance is zero. */
	resonantFrequencyHz: number;
	/** Total (loaded by radiation, conductor and dielectric loss) quality factor Q = ω0·R·C. */
	qualityFactor: number;
	/** Input resistance at resonance, Ω. */
	resistanceOhm: number;
}

export interface ImpedanceSample {
	frequencyHz: number;
	resistanceOhm: number;
	reactanceOhm: number;
	/** Γ = (Z − Z0)/(Z + Z0) against referenceImpedanceOhm. */
	s11Re: number;
	s11Im: number;
}

/**
 * Zin(f) = R / (1 + j·Q·(f/f0 − f0/f)): the admittance 1/R + j(ωC − 1/(ωL)) of a parallel RLC with
 * ω0² = 1/(LC) and Q = ω0·R·C (Pozar, Microwave Engineering 4th ed., §6.1, parallel resonant circuit; from memory).
 * A patch near its resonance behaves so at its feed point (Balanis, Antenna Theory 4th ed., §14.2, cavity model; from memory).
 */
export function parallelRlcImpedance(rlc: ParallelRlc, frequencyHz: number): { resistanceOhm: number; reactanceOhm: number } {
	const f0 = requirePositive('resonantFrequencyHz', rlc.resonantFrequencyHz);
	const q = requirePositive('qualityFactor', rlc.qualityFactor);
	const r = requirePositive('resistanceOhm', rlc.resistanceOhm);
	const f = requirePositive('frequencyHz', frequencyHz);
	const x = q * (f / f0 - f0 / f);
	const denominator = 1 + x * x;
	return { resistanceOhm: r / denominator, reactanceOhm: (-r * x) / denominator };
}

/** Γ of an impedance against a real reference impedance. */
export function reflectionFromImpedance(resistanceOhm: number, reactanceOhm: number, referenceImpedanceOhm: number): { re: number; im: number } {
	const nRe = resistanceOhm - referenceImpedanceOhm;
	const dRe = resistanceOhm + referenceImpedanceOhm;
	const d2 = dRe * dRe + reactanceOhm * reactanceOhm;
	return { re: (nRe * dRe + reactanceOhm * reactanceOhm) / d2, im: (reactanceOhm * dRe - nRe * reactanceOhm) / d2 };
}

/**
 * The parallel RLC of a sized design: f0 is the design frequency the patch was sized to resonate at, Q the total
 * quality factor of its estimates, R the resistance its feed was sized to present at resonance (the target impedance,
 * or the radiating-edge resistance for an edge feed, which transforms nothing).
 */
export function cavityModelRlc(sized: Pick<SizedDesign, 'frequencyHz' | 'estimates' | 'feedKind' | 'edgeResistanceOhm' | 'input'>): ParallelRlc {
	return {
		resonantFrequencyHz: sized.frequencyHz,
		qualityFactor: sized.estimates.qualityFactor,
		resistanceOhm: feedKindTraits[sized.feedKind].presents === 'edge-resistance' ? sized.edgeResistanceOhm : sized.input.targetImpedanceOhm
	};
}

/** The cavity-model prediction at each frequency. */
export function cavityModelResponse(rlc: ParallelRlc, frequenciesHz: readonly number[], referenceImpedanceOhm = 50): ImpedanceSample[] {
	return frequenciesHz.map((frequencyHz) => {
		const z = parallelRlcImpedance(rlc, frequencyHz);
		const g = reflectionFromImpedance(z.resistanceOhm, z.reactanceOhm, referenceImpedanceOhm);
		return { frequencyHz, resistanceOhm: z.resistanceOhm, reactanceOhm: z.reactanceOhm, s11Re: g.re, s11Im: g.im };
	});
}
