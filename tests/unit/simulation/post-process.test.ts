// The post-processor against an analytic series-RLC resonator driven by a Gaussian current pulse.
import { describe, expect, it } from 'vitest';
import { analyzePortSeries, parsePortSeries, type PortSeries } from '../../../src/lib/simulation';

/**
 * A series RLC: Z(f) = R + j(2πfL − 1/(2πfC)), resonant at f0 = 1/(2π√(LC)) with Q = 2πf0L/R
 * (Pozar, Microwave Engineering 4th ed., §6.1; from memory). Driven by the current
 * i(t) = exp(−((t − t0)/σ)²/2)·cos(2πfc(t − t0)), its voltage is v = R·i + L·di/dt + (1/C)∫i dt.
 * As in the engine, i is sampled half a timestep after v.
 */
function seriesRlcSeries(opts: { resistanceOhm: number; resonanceHz: number; quality: number; centreHz: number; dtS: number }) {
	const { resistanceOhm: r, resonanceHz: f0, quality: q, centreHz: fc, dtS: dt } = opts;
	const l = (q * r) / (2 * Math.PI * f0);
	const c = 1 / ((2 * Math.PI * f0) ** 2 * l);
	const sigma = Math.sqrt(2 * Math.log(10)) / (2 * Math.PI * 0.3 * fc); // −20 dB at fc ± 30 %
	const t0 = 6 * sigma;
	const n = Math.ceil((12 * sigma) / dt);
	const current = (t: number) => Math.exp(-(((t - t0) / sigma) ** 2) / 2) * Math.cos(2 * Math.PI * fc * (t - t0));
	const dCurrent = (t: number) => {
		const u = t - t0;
		const g = Math.exp(-((u / sigma) ** 2) / 2);
		return g * ((-u / sigma ** 2) * Math.cos(2 * Math.PI * fc * u) - 2 * Math.PI * fc * Math.sin(2 * Math.PI * fc * u));
	};
	const voltage: PortSeries = { timeS: [], values: [] };
	const currentSeries: PortSeries = { timeS: [], values: [] };
	let charge = 0;
	const sub = 8; // trapezoid sub-steps per timestep for ∫i dt
	for (let k = 0; k < n; k++) {
		const t = k * dt;
		(voltage.timeS as number[]).push(t);
		(voltage.values as number[]).push(r * current(t) + l * dCurrent(t) + charge / c);
		(currentSeries.timeS as number[]).push(t + dt / 2);
		(currentSeries.values as number[]).push(current(t + dt / 2));
		for (let s = 0; s < sub; s++) {
			const a = t + (s * dt) / sub;
			charge += ((current(a) + current(a + dt / sub)) / 2) * (dt / sub);
		}
	}
	return { voltage, current: currentSeries };
}

describe('analyzePortSeries', () => {
	const f0 = 2.4e9;
	const series = seriesRlcSeries({ resistanceOhm: 40, resonanceHz: f0, quality: 30, centreHz: 2.45e9, dtS: 1e-12 });
	const result = analyzePortSeries({ ...series, referenceImpedanceOhm: 50, targetFrequencyHz: 2.45e9, band: { lowHz: 1.715e9, highHz: 3.185e9 } });

	it('recovers the resonance of a series RLC within 0.05 %', () => {
		expect(result.resonance).not.toBeNull();
		expect(Math.abs(result.resonance!.frequencyHz - f0) / f0).toBeLessThan(5e-4);
		expect(result.deviationFraction!).toBeCloseTo((f0 - 2.45e9) / 2.45e9, 3);
	});

	it('recovers R across the band within 0.5 Ω (the half-timestep offset of the current is honoured)', () => {
		for (const s of result.samples) expect(Math.abs(s.resistanceOhm - 40)).toBeLessThan(0.5);
	});

	it('gives |S11| = |R − Z0|/(R + Z0) at resonance, and the VSWR that goes with it', () => {
		// Γ = (40 − 50)/(40 + 50) = −1/9 → −19.08 dB, VSWR 1.25
		expect(result.resonance!.s11Db).toBeCloseTo(20 * Math.log10(1 / 9), 1);
		expect(result.minimumVswr).toBeCloseTo(1.25, 2);
	});

	it('finds the −10 dB band where |Γ| = 1/√10 on both sides of the resonance', () => {
		// |Γ|² = ((R−Z0)² + X²)/((R+Z0)² + X²) = 0.1 → X² = (0.1(R+Z0)² − (R−Z0)²)/0.9
		const x = Math.sqrt((0.1 * 90 ** 2 - 10 ** 2) / 0.9);
		const l = (30 * 40) / (2 * Math.PI * f0);
		const c = 1 / ((2 * Math.PI * f0) ** 2 * l);
		// 2πfL − 1/(2πfC) = ±x solved for f
		const edge = (sign: number) => {
			const a = 2 * Math.PI * l;
			const b = -sign * x;
			const cc = -1 / (2 * Math.PI * c);
			return (-b + Math.sqrt(b * b - 4 * a * cc)) / (2 * a);
		};
		expect(result.band).not.toBeNull();
		expect(Math.abs(result.band!.lowHz - edge(-1)) / f0).toBeLessThan(1e-3);
		expect(Math.abs(result.band!.highHz - edge(1)) / f0).toBeLessThan(1e-3);
	});

	it('reports no resonance when the minimum sits at the band’s end', () => {
		const off = seriesRlcSeries({ resistanceOhm: 40, resonanceHz: 4e9, quality: 30, centreHz: 2.45e9, dtS: 1e-12 });
		const r = analyzePortSeries({ ...off, referenceImpedanceOhm: 50, targetFrequencyHz: 2.45e9, band: { lowHz: 1.715e9, highHz: 3.185e9 } });
		expect(r.resonance).toBeNull();
		expect(r.deviationFraction).toBeNull();
	});
});

describe('parsePortSeries', () => {
	it('reads the engine’s text files, skipping % comment lines', () => {
		const s = parsePortSeries('% time-domain voltage integration by openEMS\n% t/s\tvoltage\n0\t-0\n1e-12\t0.5\n2e-12\t-0.25\n');
		expect(s.timeS).toEqual([0, 1e-12, 2e-12]);
		expect(s.values).toEqual([-0, 0.5, -0.25]);
	});

	it('rejects a row it cannot read', () => {
		expect(() => parsePortSeries('0 1\n1e-12 abc\n')).toThrow(/cannot read/);
	});
});
