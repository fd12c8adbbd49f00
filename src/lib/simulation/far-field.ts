// Far-field samples on a (θ, φ) sphere → radiated power, directivity, gain and the E/H-plane cuts.
import type { FieldCheckPattern } from '../schemas/field-check';
import { FREE_SPACE_IMPEDANCE_OHM } from '../units';
import { dft } from './post-process';
import type { PortSeries } from './types';

/**
 * The far field of one frequency sampled on a full sphere, as the engine's far-field tool writes
 * it: complex E_θ and E_φ (V/m, the engine's single-sided phasors) at radius `radiusM`, indexed
 * `[iPhi * thetaDeg.length + iTheta]`. θ runs from 0 (broadside, +z, away from the ground) to
 * 180°; φ covers [0°, 360°) in equal steps and includes 0°, 90°, 180° and 270° (the cut planes).
 */
export interface FarFieldSphere {
	frequencyHz: number;
	radiusM: number;
	thetaDeg: readonly number[];
	phiDeg: readonly number[];
	eThetaRe: ArrayLike<number>;
	eThetaIm: ArrayLike<number>;
	ePhiRe: ArrayLike<number>;
	ePhiIm: ArrayLike<number>;
}

/** The far-field sampling the runner asks for: θ 0–180° in 2° steps, φ 0–355° in 5° steps. */
export const FAR_FIELD_THETA_DEG: readonly number[] = Array.from({ length: 91 }, (_, i) => 2 * i);
export const FAR_FIELD_PHI_DEG: readonly number[] = Array.from({ length: 72 }, (_, i) => 5 * i);
/** Floor of the normalised cuts, dB below the peak (deep nulls are drawn at the floor). */
export const CUT_FLOOR_DB = -40;

const DEG = Math.PI / 180;
const dbFromRatio = (ratio: number) => 10 * Math.log10(ratio);

/** A far-field sphere the post-processor cannot use: a bad grid or no radiated power. */
export class FarFieldError extends Error {
	readonly code = 'far-field' as const;
}

function checkSphere(s: FarFieldSphere): void {
	const n = s.thetaDeg.length * s.phiDeg.length;
	if (s.thetaDeg.length < 3 || s.phiDeg.length < 4) throw new FarFieldError('far field: the sphere needs at least 3 θ and 4 φ samples');
	for (const a of [s.eThetaRe, s.eThetaIm, s.ePhiRe, s.ePhiIm]) if (a.length !== n) throw new FarFieldError(`far field: expected ${n} samples per component, got ${a.length}`);
	if (Math.abs(s.thetaDeg[0]) > 1e-9 || Math.abs(s.thetaDeg[s.thetaDeg.length - 1] - 180) > 1e-9) throw new FarFieldError('far field: θ must run from 0° to 180°');
	if (!s.thetaDeg.every((t, i) => i === 0 || t > s.thetaDeg[i - 1])) throw new FarFieldError('far field: θ must increase');
	const step = 360 / s.phiDeg.length;
	if (!s.phiDeg.every((p, i) => Math.abs(p - i * step) < 1e-6)) throw new FarFieldError('far field: φ must cover [0°, 360°) in equal steps from 0°');
	if (s.phiDeg.length % 4 !== 0) throw new FarFieldError('far field: φ must include 0°, 90°, 180° and 270°');
}

/**
 * Radiation intensity U = r²·(|E_θ|² + |E_φ|²)/(2η0) (W/sr) at every sample, and the radiated
 * power P = ∮ U dΩ by the trapezoidal rule in θ (weight sin θ) and the periodic rectangle rule in φ.
 */
export function radiationIntensity(s: FarFieldSphere): { intensityWPerSr: Float64Array; radiatedPowerW: number } {
	checkSphere(s);
	const nT = s.thetaDeg.length;
	const nP = s.phiDeg.length;
	const u = new Float64Array(nT * nP);
	const scale = (s.radiusM * s.radiusM) / (2 * FREE_SPACE_IMPEDANCE_OHM);
	for (let k = 0; k < u.length; k++) u[k] = scale * (s.eThetaRe[k] ** 2 + s.eThetaIm[k] ** 2 + s.ePhiRe[k] ** 2 + s.ePhiIm[k] ** 2);
	const dPhi = (2 * Math.PI) / nP;
	let power = 0;
	for (let i = 0; i < nT; i++) {
		const before = i > 0 ? (s.thetaDeg[i] - s.thetaDeg[i - 1]) * DEG : 0;
		const after = i < nT - 1 ? (s.thetaDeg[i + 1] - s.thetaDeg[i]) * DEG : 0;
		const weight = ((before + after) / 2) * Math.sin(s.thetaDeg[i] * DEG) * dPhi;
		for (let j = 0; j < nP; j++) power += weight * u[j * nT + i];
	}
	return { intensityWPerSr: u, radiatedPowerW: power };
}

/**
 * Directivity and gain of a far-field sphere, and its two principal cuts.
 * - Directivity D(θ, φ) = 4π·U(θ, φ)/P_rad; broadside is θ = 0 (the mean over φ there).
 * - Gain G = D·P_rad/P_accepted (radiation efficiency P_rad/P_accepted, which counts dielectric,
 *   copper and surface-wave loss but not the mismatch); null without an accepted power.
 * - The cuts run θ from −180° to 180° in the planes φ = 0° and φ = 90° (a negative θ is the
 *   opposite half-plane, φ + 180°), normalised to the sphere's peak: 0 dB at the peak, floored at
 *   CUT_FLOOR_DB. The E-plane is the plane of the broadside field's polarisation (its larger
 *   component at θ = 0: along x → φ = 0°, along y → φ = 90°), the H-plane the other one.
 */
export function analyzeFarField(s: FarFieldSphere, acceptedPowerW: number | null): FieldCheckPattern {
	const { intensityWPerSr: u, radiatedPowerW } = radiationIntensity(s);
	if (!(radiatedPowerW > 0)) throw new FarFieldError('far field: no radiated power (the near-field box recorded no field)');
	const nT = s.thetaDeg.length;
	const nP = s.phiDeg.length;
	const directivity = (k: number) => (4 * Math.PI * u[k]) / radiatedPowerW;
	let broadside = 0;
	for (let j = 0; j < nP; j++) broadside += directivity(j * nT) / nP;
	let peak = 0;
	for (let k = 0; k < u.length; k++) peak = Math.max(peak, directivity(k));

	// polarisation at broadside: E_θ at θ = 0 points along x for φ = 0°, along y for φ = 90°
	const quarter = nP / 4;
	const power = (re: ArrayLike<number>, im: ArrayLike<number>, k: number) => re[k] ** 2 + im[k] ** 2;
	const alongX = power(s.eThetaRe, s.eThetaIm, 0);
	const alongY = power(s.eThetaRe, s.eThetaIm, quarter * nT);
	const ePlanePhiDeg = alongY > alongX ? 90 : 0;

	const cut = (phiIndex: number) => {
		const opposite = (phiIndex + nP / 2) % nP;
		const level = (j: number, i: number) => Math.max(CUT_FLOOR_DB, dbFromRatio(Math.max(directivity(j * nT + i), 1e-30) / peak));
		const points: { thetaDeg: number; levelDb: number }[] = [];
		for (let i = nT - 1; i > 0; i--) points.push({ thetaDeg: -s.thetaDeg[i], levelDb: level(opposite, i) });
		for (let i = 0; i < nT; i++) points.push({ thetaDeg: s.thetaDeg[i], levelDb: level(phiIndex, i) });
		return points;
	};
	const efficiency = acceptedPowerW && acceptedPowerW > 0 ? radiatedPowerW / acceptedPowerW : null;
	return {
		frequencyHz: s.frequencyHz,
		directivityDbi: dbFromRatio(broadside),
		peakDirectivityDbi: dbFromRatio(peak),
		gainDbi: efficiency === null ? null : dbFromRatio(broadside * efficiency),
		radiationEfficiency: efficiency,
		radiatedPowerW,
		acceptedPowerW: acceptedPowerW && acceptedPowerW > 0 ? acceptedPowerW : null,
		ePlane: { phiDeg: ePlanePhiDeg, levels: cut(ePlanePhiDeg === 0 ? 0 : quarter) },
		hPlane: { phiDeg: ePlanePhiDeg === 0 ? 90 : 0, levels: cut(ePlanePhiDeg === 0 ? quarter : 0) }
	};
}

/**
 * The power the port accepts at one frequency, P = ½·Re(V·I*), with V and I the port's phasors in
 * the engine's single-sided convention X = 2·Δt·Σ x(t)·e^(−jωt) — the convention of its field
 * dumps, so that P_rad/P_accepted is the radiation efficiency.
 */
export function acceptedPower(voltage: PortSeries, current: PortSeries, frequencyHz: number): number {
	const v = dft(voltage, frequencyHz);
	const i = dft(current, frequencyHz);
	// single-sided phasors are twice dft()'s sums: ½·Re(2V·(2I)*) = 2·Re(V·I*)
	return 2 * (v.re * i.re + v.im * i.im);
}
