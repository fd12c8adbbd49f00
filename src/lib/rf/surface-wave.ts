// Surface waves of a patch on a grounded slab: the space-wave share of a horizontal dipole's power, and the εr-dependent thickness limit.
import { freeSpaceWavelengthMm } from '../units';
import { requireInRange, requirePositive } from './guard';

/**
 * e_hed = P_sp/(P_sp + P_sw) of a horizontal electric dipole on a thin grounded slab, the
 * surface-wave factor of a resonant patch (Jackson & Alexopoulos, IEEE Trans. AP 39(3), 1991, as
 * given in Balanis, Antenna Theory 4th ed., §14.2.6; from memory):
 * e_hed = 1 / (1 + 3π·k0h·(1 − 1/n1²)³ / (4·c1)), n1 = √εr, c1 = 1 − 1/n1² + 0.4/n1⁴.
 * Valid for thin substrates (h/λ0 ≲ 0.1, below the TE1 cutoff). Example: εr 2.2, h/λ0 0.02 → 0.929;
 * εr 10.2, h/λ0 0.02 → 0.806.
 */
export function surfaceWaveEfficiency(heightMm: number, frequencyHz: number, relativePermittivity: number): number {
	const h = requirePositive('heightMm', heightMm);
	const f = requirePositive('frequencyHz', frequencyHz);
	const er = requireInRange('relativePermittivity', relativePermittivity, 1, 1000);
	const k0h = (2 * Math.PI * h) / freeSpaceWavelengthMm(f);
	const q = 1 - 1 / er;
	const c1 = 1 - 1 / er + 0.4 / (er * er);
	return 1 / (1 + (3 * Math.PI * k0h * q ** 3) / (4 * c1));
}

/** The share of λ0 in the thickness criterion h ≤ 0.3·λ0/(2π·√εr). */
export const SURFACE_WAVE_LIMIT_SHARE = 0.3;

/**
 * Largest h/λ0 before the TM0 surface wave carries a large share of the power:
 * h/λ0 ≤ 0.3/(2π·√εr) (James & Hall, Handbook of Microstrip Antennas, 1989, ch. 1, from memory;
 * also quoted by Garg et al., Microstrip Antenna Design Handbook, §1.4). It falls with εr:
 * 0.032 at εr 2.2, 0.023 at εr 4.4, 0.015 at εr 10.2.
 */
export function surfaceWaveLimitRatio(relativePermittivity: number): number {
	const er = requireInRange('relativePermittivity', relativePermittivity, 1, 1000);
	return SURFACE_WAVE_LIMIT_SHARE / (2 * Math.PI * Math.sqrt(er));
}
