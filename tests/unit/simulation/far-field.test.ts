// The far-field post-processor against patterns whose directivity is known in closed form.
import { describe, expect, it } from 'vitest';
import { fieldCheckPatternSchema } from '../../../src/lib/schemas/field-check';
import { FAR_FIELD_PHI_DEG, FAR_FIELD_THETA_DEG, FarFieldError, acceptedPower, analyzeFarField, radiationIntensity, type FarFieldSphere, type PortSeries } from '../../../src/lib/simulation';

const DEG = Math.PI / 180;
const ETA0 = 376.730313668; // free-space wave impedance μ0·c, Ω (CODATA 2018)

/** A sphere on the runner's own grid from E_θ(θ, φ) and E_φ(θ, φ), real phasors (V/m at 1 m). */
function sphere(eTheta: (t: number, p: number) => number, ePhi: (t: number, p: number) => number = () => 0, grid = { thetaDeg: FAR_FIELD_THETA_DEG, phiDeg: FAR_FIELD_PHI_DEG }): FarFieldSphere {
	const n = grid.thetaDeg.length * grid.phiDeg.length;
	const s = { frequencyHz: 2.45e9, radiusM: 1, ...grid, eThetaRe: new Float64Array(n), eThetaIm: new Float64Array(n), ePhiRe: new Float64Array(n), ePhiIm: new Float64Array(n) };
	grid.phiDeg.forEach((p, j) =>
		grid.thetaDeg.forEach((t, i) => {
			s.eThetaRe[j * grid.thetaDeg.length + i] = eTheta(t * DEG, p * DEG);
			s.ePhiIm[j * grid.thetaDeg.length + i] = ePhi(t * DEG, p * DEG);
		})
	);
	return s;
}

const levelAt = (cut: { levels: { thetaDeg: number; levelDb: number }[] }, thetaDeg: number) => cut.levels.find((l) => l.thetaDeg === thetaDeg)!.levelDb;

describe('analyzeFarField', () => {
	it('gives an isotropic radiator 0 dBi everywhere and P = 4π·r²·|E|²/(2η0)', () => {
		const s = sphere(() => 1);
		// isotropic: D = 1 (IEEE Std 145-2013, the definition of directivity)
		expect(radiationIntensity(s).radiatedPowerW / ((4 * Math.PI) / (2 * ETA0))).toBeCloseTo(1, 3);
		const p = analyzeFarField(s, null);
		expect(p.directivityDbi).toBeCloseTo(0, 2);
		expect(p.peakDirectivityDbi).toBeCloseTo(0, 2);
		expect(p.gainDbi).toBeNull();
		expect(p.radiationEfficiency).toBeNull();
		for (const cut of [p.ePlane, p.hPlane]) for (const l of cut.levels) expect(l.levelDb).toBeCloseTo(0, 2);
	});

	it('gives a short dipole along x 1.76 dBi at broadside, its E-plane (φ = 0°) falling as cos²θ and its H-plane flat', () => {
		// short dipole D0 = 1.5 = 1.76 dBi, E ∝ sin of the angle from its axis (Balanis, Antenna Theory 4th ed., §4.2; standard result)
		// for a dipole along x: E_θ = cos θ·cos φ, E_φ = −sin φ
		const p = analyzeFarField(
			sphere(
				(t, ph) => Math.cos(t) * Math.cos(ph),
				(_, ph) => -Math.sin(ph)
			),
			null
		);
		expect(p.directivityDbi).toBeCloseTo(10 * Math.log10(1.5), 2);
		expect(p.peakDirectivityDbi).toBeCloseTo(10 * Math.log10(1.5), 2);
		expect(p.ePlane.phiDeg).toBe(0);
		expect(p.hPlane.phiDeg).toBe(90);
		expect(levelAt(p.ePlane, 60)).toBeCloseTo(10 * Math.log10(0.25), 6); // cos² 60° = ¼: −6.02 dB
		expect(levelAt(p.ePlane, -60)).toBeCloseTo(10 * Math.log10(0.25), 6);
		expect(levelAt(p.ePlane, 90)).toBe(-40); // the null, drawn at the floor
		for (const l of p.hPlane.levels) expect(l.levelDb).toBeCloseTo(0, 6);
		expect(p.ePlane.levels.map((l) => l.thetaDeg)).toEqual([...FAR_FIELD_THETA_DEG.slice(1).map((t) => -t).reverse(), ...FAR_FIELD_THETA_DEG]);
	});

	it('finds the E-plane at φ = 90° when the broadside field points along y', () => {
		// a dipole along y: E_θ = cos θ·sin φ, E_φ = cos φ
		const p = analyzeFarField(
			sphere(
				(t, ph) => Math.cos(t) * Math.sin(ph),
				(_, ph) => Math.cos(ph)
			),
			null
		);
		expect(p.ePlane.phiDeg).toBe(90);
		expect(levelAt(p.ePlane, 60)).toBeCloseTo(10 * Math.log10(0.25), 6);
		expect(p.hPlane.phiDeg).toBe(0);
		expect(levelAt(p.hPlane, 60)).toBeCloseTo(0, 6);
	});

	it('gives U = cos²θ on the upper hemisphere a directivity of 6 (7.78 dBi)', () => {
		// U = cosⁿθ over the upper half-space: D0 = 2(n + 1) (Balanis, Antenna Theory 4th ed., §2.6 examples; from memory)
		const p = analyzeFarField(
			sphere((t) => (t <= Math.PI / 2 ? Math.cos(t) : 0)),
			null
		);
		expect(p.directivityDbi).toBeCloseTo(10 * Math.log10(6), 1);
		expect(levelAt(p.ePlane, 180)).toBe(-40);
	});

	it('turns the accepted power into gain: half the power radiated is 3.01 dB below the directivity', () => {
		const s = sphere((t, ph) => Math.cos(t) * Math.cos(ph), (_, ph) => -Math.sin(ph));
		const radiated = radiationIntensity(s).radiatedPowerW;
		const p = analyzeFarField(s, 2 * radiated);
		expect(p.radiationEfficiency).toBeCloseTo(0.5, 12);
		expect(p.gainDbi! - p.directivityDbi).toBeCloseTo(10 * Math.log10(0.5), 9);
		expect(p.acceptedPowerW).toBe(2 * radiated);
		expect(fieldCheckPatternSchema.parse(p)).toEqual(p);
	});

	it('rejects a sphere without radiated power or with a wrong grid', () => {
		expect(() => analyzeFarField(sphere(() => 0), 1)).toThrow(FarFieldError);
		expect(() => analyzeFarField({ ...sphere(() => 1), eThetaRe: new Float64Array(3) }, 1)).toThrow(/expected 6552 samples/);
		expect(() => analyzeFarField(sphere(() => 1, () => 0, { thetaDeg: [0, 45, 90], phiDeg: FAR_FIELD_PHI_DEG }), 1)).toThrow(/0° to 180°/);
		expect(() => analyzeFarField(sphere(() => 1, () => 0, { thetaDeg: FAR_FIELD_THETA_DEG, phiDeg: [0, 60, 120, 180, 240, 300] }), 1)).toThrow(/0°, 90°, 180° and 270°/);
	});
});

describe('acceptedPower', () => {
	it('gives ½·R·|I(f)|² for a resistor driven by a Gaussian current, with the engine’s single-sided phasors', () => {
		// i(t) = exp(−((t − t0)/τ)²): |I(f)| = τ·√π·exp(−(π·f·τ)²) (Fourier pair of a Gaussian, standard result);
		// single-sided phasor 2·|I(f)| as the engine's DFT writes it (openEMS ProcessFieldsFD: "*2 for single-sided spectrum")
		const r = 50;
		const tau = 2e-10;
		const t0 = 8 * tau;
		const dt = 1e-12;
		const current: PortSeries = { timeS: [], values: [] };
		const voltage: PortSeries = { timeS: [], values: [] };
		for (let k = 0; k * dt < 2 * t0; k++) {
			const t = k * dt;
			(current.timeS as number[]).push(t);
			(current.values as number[]).push(Math.exp(-(((t - t0) / tau) ** 2)));
			(voltage.timeS as number[]).push(t);
			(voltage.values as number[]).push(r * Math.exp(-(((t - t0) / tau) ** 2)));
		}
		const f = 1e9;
		const phasor = 2 * tau * Math.sqrt(Math.PI) * Math.exp(-((Math.PI * f * tau) ** 2));
		expect(acceptedPower(voltage, current, f) / (0.5 * r * phasor ** 2)).toBeCloseTo(1, 6);
	});
});
