// Attenuation of a microstrip line: conductor loss (Pozar's wide-strip form) and dielectric loss (the filling-factor form), in dB per millimetre.
import { VACUUM_PERMEABILITY_H_PER_M, mFromMm, mmFromM, SPEED_OF_LIGHT_M_PER_S } from '../units';

/** Nepers to decibels, 20·log10(e). */
const DB_PER_NEPER = 20 / Math.LN10;

export interface LossyLine {
	widthMm: number;
	impedanceOhm: number;
	/** εeff of the line at the frequency. */
	effectivePermittivity: number;
}

/** Surface resistance Rs = √(ωμ0 / 2σ) of a good conductor (Pozar, Microwave Engineering 4th ed., §1.7; from memory). */
export function surfaceResistanceOhm(frequencyHz: number, conductivitySPerM: number): number {
	return Math.sqrt((Math.PI * frequencyHz * VACUUM_PERMEABILITY_H_PER_M) / conductivitySPerM);
}

/**
 * Conductor loss α_c = Rs / (Z0·W) Np/m (Pozar, Microwave Engineering 4th ed., eq. 3.199, from
 * memory): the strip and the ground, current spread evenly over the width; smooth copper. Example:
 * a 50 Ω line 3.06 mm wide in copper (58 MS/m) at 2.45 GHz loses ≈ 0.00073 dB/mm.
 */
export function conductorLossDbPerMm(line: LossyLine, frequencyHz: number, conductivitySPerM: number): number {
	const alpha = surfaceResistanceOhm(frequencyHz, conductivitySPerM) / (line.impedanceOhm * mFromMm(line.widthMm));
	return (alpha * DB_PER_NEPER) / mmFromM(1);
}

/**
 * Dielectric loss α_d = k0·εr(εeff − 1)·tanδ / (2√εeff(εr − 1)) Np/m (Pozar, Microwave
 * Engineering 4th ed., eq. 3.198, from memory): tanδ weighted by the share of the field in the
 * dielectric. Example: εr 4.4, εeff 3.33, tanδ 0.02 at 2.45 GHz ≈ 0.0074 dB/mm.
 */
export function dielectricLossDbPerMm(line: LossyLine, frequencyHz: number, relativePermittivity: number, lossTangent: number): number {
	const k0PerM = (2 * Math.PI * frequencyHz) / SPEED_OF_LIGHT_M_PER_S;
	const er = relativePermittivity;
	const eps = line.effectivePermittivity;
	// (εeff − 1)/(εr − 1) is the filling factor; it is 1 when the substrate is air-like
	const filling = er - 1 > 1e-9 ? (er * (eps - 1)) / (er - 1) : eps;
	const alpha = (k0PerM * filling * lossTangent) / (2 * Math.sqrt(eps));
	return (alpha * DB_PER_NEPER) / mmFromM(1);
}

/** Both losses of a line, dB per millimetre. */
export function lineLossDbPerMm(line: LossyLine, frequencyHz: number, relativePermittivity: number, lossTangent: number, conductivitySPerM: number): number {
	return conductorLossDbPerMm(line, frequencyHz, conductivitySPerM) + dielectricLossDbPerMm(line, frequencyHz, relativePermittivity, lossTangent);
}
