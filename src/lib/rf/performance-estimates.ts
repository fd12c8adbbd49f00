// Estimates from the cavity model: quality factor, VSWR ≤ 2 bandwidth, directivity, radiation efficiency, gain.
import { dbFromPowerRatio, FREE_SPACE_IMPEDANCE_OHM, freeSpaceWavelengthMm, mFromMm, VACUUM_PERMEABILITY_H_PER_M, VACUUM_PERMITTIVITY_F_PER_M } from '../units';
import { TM11_EIGENVALUE } from './bessel';
import { requireInRange, requireObject, requirePositive } from './guard';
import type { SizedEstimates } from './sized-design';
import { surfaceWaveEfficiency } from './surface-wave';

export interface EstimateInput {
	frequencyHz: number;
	heightMm: number;
	/** Substrate εr: sets the surface-wave share. */
	relativePermittivity: number;
	lossTangent: number;
	copperConductivitySPerM: number;
	/** Radiation quality factor Q_rad of the patch (from the shape's function below). */
	radiationQualityFactor: number;
	/** Broadside directivity as a power ratio. */
	directivity: number;
}

/**
 * Q_rad of a rectangular TM010 cavity: stored energy ε·E0²·h·W·L/4 over radiated power
 * E0²h²·(G1 + G12) (the edge resistance 1/(2(G1+G12)) at edge voltage E0·h), so
 * Q_rad = ω·ε0·εr·W·L/(4h·(G1 + G12)); L is the effective length. Derived here from the cavity model.
 */
export function rectangularRadiationQuality(widthMm: number, effectiveLengthMm: number, heightMm: number, relativePermittivity: number, frequencyHz: number, conductanceS: number): number {
	const omega = 2 * Math.PI * frequencyHz;
	return (omega * VACUUM_PERMITTIVITY_F_PER_M * relativePermittivity * mFromMm(widthMm) * mFromMm(effectiveLengthMm)) / (4 * mFromMm(heightMm) * conductanceS);
}

/** Two-slot directivity D = (2πW/λ0)²/I1 · 2/(1 + G12/G1) (Balanis, Antenna Theory, §14.2.4; from memory). */
export function rectangularDirectivity(widthMm: number, frequencyHz: number, slotIntegral: number, slotConductanceS: number, mutualConductanceS: number): number {
	const single = ((2 * Math.PI * widthMm) / freeSpaceWavelengthMm(frequencyHz)) ** 2 / slotIntegral;
	return single * (2 / (1 + mutualConductanceS / slotConductanceS));
}

/**
 * Q_rad of a circular TM11 cavity: stored energy (ε·h·E0²·π/2)·(a_e²/2)(1 − 1/χ′11²)·J1²(χ′11) over
 * radiated power ½·G_rad·(E0·h·J1(χ′11))², so Q_rad = ω·ε0·εr·π·a_e²·(1 − 1/χ′11²)/(2h·G_rad).
 * Derived here from the cavity model.
 */
export function circularRadiationQuality(effectiveRadiusMm: number, heightMm: number, relativePermittivity: number, frequencyHz: number, conductanceS: number): number {
	const omega = 2 * Math.PI * frequencyHz;
	const a = mFromMm(effectiveRadiusMm);
	return (omega * VACUUM_PERMITTIVITY_F_PER_M * relativePermittivity * Math.PI * a * a * (1 - 1 / TM11_EIGENVALUE ** 2)) / (2 * mFromMm(heightMm) * conductanceS);
}

/** D0 = (k0·a_e)²/(120·G_rad), 120 written as η0/π (Balanis, Antenna Theory, §14.3; from memory). */
export function circularDirectivity(effectiveRadiusMm: number, frequencyHz: number, conductanceS: number): number {
	const ka = (2 * Math.PI * effectiveRadiusMm) / freeSpaceWavelengthMm(frequencyHz);
	return (Math.PI * ka * ka) / (FREE_SPACE_IMPEDANCE_OHM * conductanceS);
}

/**
 * Combines the loss mechanisms (Balanis, Antenna Theory 4th ed., §14.2.5–14.2.6, from memory):
 * Q_c = h·√(π·f·µ0·σ), Q_d = 1/tanδ, and the surface wave as Q_sw = Q_rad·e_hed/(1 − e_hed) with
 * e_hed the Jackson–Alexopoulos space-wave share (surface-wave.ts); 1/Q = 1/Q_rad + 1/Q_sw + 1/Q_c + 1/Q_d.
 * Fractional bandwidth for VSWR ≤ S is (S − 1)/(Q·√S), i.e. 1/(Q·√2) for S = 2; radiation efficiency
 * (space wave only) Q/Q_rad. The efficiency therefore never exceeds e_hed, which falls as h/λ0 grows.
 */
export function performanceEstimates(input: EstimateInput): SizedEstimates {
	const d = requireObject('input', input);
	const frequencyHz = requirePositive('frequencyHz', d.frequencyHz);
	const heightMm = requirePositive('heightMm', d.heightMm);
	const er = requireInRange('relativePermittivity', d.relativePermittivity, 1, 1000);
	const tanDelta = requireInRange('lossTangent', d.lossTangent, 0, 1, { exclusiveMax: true });
	const sigma = requirePositive('copperConductivitySPerM', d.copperConductivitySPerM);
	const qRad = requirePositive('radiationQualityFactor', d.radiationQualityFactor);
	const directivity = requirePositive('directivity', d.directivity);
	const qConductor = mFromMm(heightMm) * Math.sqrt(Math.PI * frequencyHz * VACUUM_PERMEABILITY_H_PER_M * sigma);
	const spaceWaveShare = surfaceWaveEfficiency(heightMm, frequencyHz, er);
	const inverseQSurface = (1 / qRad) * (1 / spaceWaveShare - 1);
	const inverseQ = 1 / qRad + inverseQSurface + 1 / qConductor + tanDelta;
	const qualityFactor = 1 / inverseQ;
	const vswr = 2;
	const radiationEfficiency = 1 / qRad / inverseQ;
	return {
		bandwidthFraction: (vswr - 1) / (qualityFactor * Math.sqrt(vswr)),
		qualityFactor,
		radiationQualityFactor: qRad,
		surfaceWaveEfficiency: spaceWaveShare,
		directivityDbi: dbFromPowerRatio(directivity),
		radiationEfficiency,
		gainDbi: dbFromPowerRatio(directivity * radiationEfficiency)
	};
}
