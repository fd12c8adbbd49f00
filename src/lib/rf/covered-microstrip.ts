// A microstrip (or a patch as a wide one) under a dielectric cover: its εeff by the partial-capacitance method, and the equivalent substrate permittivity that gives it.
import { staticEffectivePermittivity } from './analyze-microstrip';

/** The model's name, shown beside its figures. */
export const COVERED_MICROSTRIP_MODEL =
	'partial-capacitance model of a covered microstrip (Svačina, IEEE Microwave and Guided Wave Letters 1992, form from memory): substrate filling factor from Hammerstad–Jensen, cover share (1 − q1)·(2/π)·arctan(π·hc/(2h)) (a simplification of that paper’s conformal-mapping term keeping its limits)';

export interface CoveredMicrostrip {
	/** Strip (or patch) width W. */
	widthMm: number;
	/** Substrate under the strip. */
	heightMm: number;
	relativePermittivity: number;
	/** Dielectric cover on top of the strip, air above it. */
	coverHeightMm: number;
	coverRelativePermittivity: number;
}

/** Share of the strip's field in the substrate, q1 = (εeff − 1)/(εr − 1), from the uncovered Hammerstad–Jensen εeff (1 for an air-like substrate). */
export function substrateFillingFactor(widthMm: number, heightMm: number, relativePermittivity: number): number {
	const er = relativePermittivity;
	if (er - 1 < 1e-9) return 1;
	return (staticEffectivePermittivity(widthMm / heightMm, er) - 1) / (er - 1);
}

/**
 * εeff of a covered microstrip, εr1·q1 + εr2·(1 − q1)² / (εr2·(1 − q1 − q2) + q2): the field above
 * the strip (share 1 − q1) crosses the cover (share q2) and the air beyond it in series (the
 * partial-capacitance form of Svačina 1992, from memory). q1 is the Hammerstad–Jensen substrate
 * filling factor, so without a cover this is the uncovered Hammerstad–Jensen εeff exactly;
 * q2 = (1 − q1)·(2/π)·arctan(π·hc/(2h)) grows from 0 (no cover) to 1 − q1 (a cover filling the
 * upper half-space, εeff → εr1·q1 + εr2·(1 − q1)). The result always lies between the uncovered
 * εeff and the larger of εr1 and εr2: the upper region's permittivity, a series combination of air
 * and cover, lies between 1 and εr2. Example: a 20.4 mm patch on 0.787 mm εr 2.2 under 1.5 mm of
 * εr 2.2 gives ≈ 2.17 where the uncovered value is ≈ 2.10.
 */
export function coveredEffectivePermittivity(c: CoveredMicrostrip): number {
	const q1 = substrateFillingFactor(c.widthMm, c.heightMm, c.relativePermittivity);
	const upper = 1 - q1;
	const q2 = upper * (2 / Math.PI) * Math.atan((Math.PI * c.coverHeightMm) / (2 * c.heightMm));
	const er2 = c.coverRelativePermittivity;
	const airShare = upper - q2;
	const upperTerm = upper <= 0 ? 0 : (er2 * upper * upper) / (er2 * airShare + q2);
	return c.relativePermittivity * q1 + upperTerm;
}

/**
 * The substrate permittivity whose uncovered Hammerstad–Jensen εeff at W/h equals `effectivePermittivity`
 * (bisection; εeff grows with εr): what the single-layer sizing is given so that it sizes the patch on
 * the covered εeff.
 */
export function equivalentSubstratePermittivity(widthMm: number, heightMm: number, effectivePermittivity: number): number {
	const u = widthMm / heightMm;
	let lo = 1;
	let hi = 2;
	while (staticEffectivePermittivity(u, hi) < effectivePermittivity && hi < 1e4) hi *= 2;
	for (let i = 0; i < 200 && hi - lo > 1e-12 * hi; i++) {
		const mid = (lo + hi) / 2;
		if (staticEffectivePermittivity(u, mid) < effectivePermittivity) lo = mid;
		else hi = mid;
	}
	return (lo + hi) / 2;
}

/**
 * VSWR ≤ 2 bandwidth × Q of a resonator matched with one added resonator at its best (the
 * double-tuned match): 1.733, against 1/√2 ≈ 0.707 for the resonator alone and π/ln 3 ≈ 2.86 for
 * any lossless match (the Bode–Fano limit; Fano 1950, Pozar, Microwave Engineering 4th ed., §5.10,
 * from memory). Found by searching the load's resistance and the added resonator's slope;
 * tests/unit/rf/covered-microstrip.test.ts repeats the search. The double-tuned match of a patch is
 * Pues & Van de Capelle's (IEEE Trans. Antennas Propag. 1989, from memory); a stacked parasitic pair
 * is two coupled resonators of the same kind.
 */
export const DOUBLE_TUNED_BANDWIDTH_Q = 1.733;
/** Bode–Fano limit π/ln(1/|Γ|) for |Γ| = 1/3 (VSWR 2), × Q. */
export const BODE_FANO_BANDWIDTH_Q = Math.PI / Math.log(3);
