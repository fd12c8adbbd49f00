// The post-processor against an analytic series-RLC resonator driven by a Gaussian current pulse.
import { describe, expect, it } from 'vitest';
import { analyzePortSeries, impedanceResonance, parsePortSeries, type PortSeries } from '../../../src/lib/simulation';

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

/**
 * A probe-fed patch near its resonance: the probe's series inductance Lp in front of a parallel RLC,
 * Zin = j2πf·Lp + R/(1 + jQ(f/f0 − f0/f)) (the cavity model's single-mode circuit, Pozar, Microwave
 * Engineering 4th ed., §6.1 for the parallel RLC; probe as a series inductance, Balanis, Antenna Theory
 * 4th ed., §14.2; both from memory). Re Zin peaks at f0 whatever Lp is; Im Zin crosses zero at f0 only
 * without it, and above f0 (the parallel circuit turns capacitive there) where 2πf·Lp = R·Qν/(1 + Q²ν²), ν = f/f0 − f0/f.
 */
function probePatchSamples(opts: { resistanceOhm: number; resonanceHz: number; quality: number; probeNh: number; lowHz: number; highHz: number; count: number }) {
	const { resistanceOhm: r, resonanceHz: f0, quality: q, probeNh, lowHz, highHz, count } = opts;
	return Array.from({ length: count }, (_, i) => {
		const f = lowHz + ((highHz - lowHz) * i) / (count - 1);
		const nu = f / f0 - f0 / f;
		const den = 1 + (q * nu) ** 2;
		return { frequencyHz: f, resistanceOhm: r / den, reactanceOhm: 2 * Math.PI * f * probeNh * 1e-9 - (r * q * nu) / den };
	});
}

describe('impedanceResonance', () => {
	const band = { lowHz: 3.5e9, highHz: 6.5e9, count: 301 };
	it('finds the resistance peak at f0 within 0.01 % with and without a probe inductance, and its height R', () => {
		for (const probeNh of [0, 0.8]) {
			const z = impedanceResonance(probePatchSamples({ resistanceOhm: 120, resonanceHz: 5e9, quality: 25, probeNh, ...band }), 5e9);
			expect(Math.abs(z.maxResistanceHz! - 5e9) / 5e9).toBeLessThan(1e-4);
			expect(z.maxResistanceOhm).toBeCloseTo(120, 0);
		}
	});

	it('puts the reactance zero at f0 without a probe, and above it with one where 2πf·Lp = R·Qν/(1 + Q²ν²)', () => {
		const bare = impedanceResonance(probePatchSamples({ resistanceOhm: 120, resonanceHz: 5e9, quality: 25, probeNh: 0, ...band }), 5e9);
		expect(Math.abs(bare.zeroReactanceHz! - 5e9) / 5e9).toBeLessThan(1e-4);
		const fed = impedanceResonance(probePatchSamples({ resistanceOhm: 120, resonanceHz: 5e9, quality: 25, probeNh: 0.8, ...band }), 5e9);
		const f = fed.zeroReactanceHz!;
		expect(f).toBeGreaterThan(5e9 * 1.002);
		const nu = f / 5e9 - 5e9 / f;
		const residual = 2 * Math.PI * f * 0.8e-9 - (120 * 25 * nu) / (1 + (25 * nu) ** 2);
		expect(Math.abs(residual)).toBeLessThan(0.5); // Ω, linear interpolation between 10 MHz samples
	});

	it('reports no reactance zero behind a probe too inductive for one, and picks the peak nearest the one asked for', () => {
		const steep = impedanceResonance(probePatchSamples({ resistanceOhm: 40, resonanceHz: 5e9, quality: 15, probeNh: 1.5, ...band }), 5e9);
		expect(steep.zeroReactanceHz).toBeNull();
		expect(Math.abs(steep.maxResistanceHz! - 5e9) / 5e9).toBeLessThan(1e-4);
		// two modes: the peak nearest to 6 GHz is the second one
		const a = probePatchSamples({ resistanceOhm: 60, resonanceHz: 4.5e9, quality: 30, probeNh: 0, ...band });
		const b = probePatchSamples({ resistanceOhm: 90, resonanceHz: 6e9, quality: 30, probeNh: 0, ...band });
		const two = a.map((s, i) => ({ frequencyHz: s.frequencyHz, resistanceOhm: s.resistanceOhm + b[i].resistanceOhm, reactanceOhm: s.reactanceOhm + b[i].reactanceOhm }));
		expect(Math.abs(impedanceResonance(two, 6.1e9).maxResistanceHz! - 6e9) / 6e9).toBeLessThan(2e-3);
		expect(Math.abs(impedanceResonance(two, 4.4e9).maxResistanceHz! - 4.5e9) / 4.5e9).toBeLessThan(2e-3);
	});

	it('gives no peak when the resistance only rises, and rejects fewer than three samples', () => {
		const rising = [1, 2, 3, 4].map((k) => ({ frequencyHz: k * 1e9, resistanceOhm: 10 * k, reactanceOhm: 5 }));
		const z = impedanceResonance(rising, 2e9);
		expect(z.maxResistanceHz).toBeNull();
		expect(z.zeroReactanceHz).toBeNull();
		expect(() => impedanceResonance(rising.slice(0, 2), 2e9)).toThrow(RangeError);
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
