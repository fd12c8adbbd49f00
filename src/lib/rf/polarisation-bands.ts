// The bands of a single-feed circularly polarised patch: axial ratio ≤ 3 dB, VSWR ≤ 2, their overlap (the usable band), and whether a stated band is covered.

/** A frequency interval, lower < upper. */
export interface FrequencyBand {
	lowerHz: number;
	upperHz: number;
}

/** Axial ratio the CP band is read at, dB (the usual 3 dB limit; common practice, no source). */
export const AXIAL_RATIO_LIMIT_DB = 3;
/** VSWR the impedance band is read at (the product's bandwidth figures use 2 throughout). */
export const IMPEDANCE_VSWR_LIMIT = 2;

/**
 * Fractional axial-ratio bandwidth of a single-feed CP patch (nearly-square or corner-truncated) whose
 * two orthogonal modes, each of quality factor Q, are split for exact CP at the centre:
 * ARBW = (AR − 1)/(Q·√AR) with AR the field ratio (AR ≤ 3 dB: AR = 10^(3/20) ≈ 1.413, ARBW ≈ 0.347/Q).
 * Langston & Jackson, "Impedance, axial-ratio, and receive-power bandwidths of microstrip antennas",
 * IEEE Trans. Antennas Propag. 52(10), 2004 (from memory). It has the same form as the VSWR ≤ S band
 * (S − 1)/(Q·√S) of one mode.
 */
export function axialRatioBandwidthFraction(qualityFactor: number, axialRatioDb = AXIAL_RATIO_LIMIT_DB): number {
	const ar = 10 ** (axialRatioDb / 20);
	return (ar - 1) / (qualityFactor * Math.sqrt(ar));
}

/**
 * Fractional VSWR ≤ S band of the same two-mode patch, matched at the centre. With δ = 2Q(f − f0)/f0
 * and the modes at δ = ±1, the cavity model's input impedance (the two modes' parallel-RLC
 * impedances in series, each half the centre resistance) gives |Γ| = δ²/(4 + δ²), so the band edge is
 * δ = 2·√(g/(1 − g)) with g = (S − 1)/(S + 1): √2/Q for S = 2, twice one mode's 1/(Q·√2).
 * Derived here from the two-mode cavity model (the model Langston & Jackson use).
 */
export function twoModeImpedanceBandwidthFraction(qualityFactor: number, vswr = IMPEDANCE_VSWR_LIMIT): number {
	const g = (vswr - 1) / (vswr + 1);
	return (2 * Math.sqrt(g / (1 - g))) / qualityFactor;
}

/** The band of fractional width `fraction` centred on f0. */
export function bandAround(centreHz: number, fraction: number): FrequencyBand {
	return { lowerHz: centreHz * (1 - fraction / 2), upperHz: centreHz * (1 + fraction / 2) };
}

/** Where two bands overlap; null when they do not. */
export function bandOverlap(a: FrequencyBand, b: FrequencyBand): FrequencyBand | null {
	const lowerHz = Math.max(a.lowerHz, b.lowerHz);
	const upperHz = Math.min(a.upperHz, b.upperHz);
	return lowerHz < upperHz ? { lowerHz, upperHz } : null;
}

/** True when `outer` holds all of `inner`. */
export function bandCovers(outer: FrequencyBand | null, inner: FrequencyBand): boolean {
	return outer !== null && outer.lowerHz <= inner.lowerHz && outer.upperHz >= inner.upperHz;
}

export const bandWidthHz = (b: FrequencyBand | null): number => (b === null ? 0 : b.upperHz - b.lowerHz);

/** The bands of a CP design, all estimates from its total Q. */
export interface PolarisationBands {
	/** AR ≤ 3 dB band. */
	axialRatioBand: FrequencyBand;
	axialRatioBandwidthFraction: number;
	/** VSWR ≤ 2 (|S11| ≤ −9.5 dB, the usual "−10 dB") band of the two modes together. */
	impedanceBand: FrequencyBand;
	impedanceBandwidthFraction: number;
	/** Where both hold: the band the patch is usable as a CP antenna; null if they do not overlap. */
	usableBand: FrequencyBand | null;
}

/**
 * The AR, impedance and usable bands of a CP patch centred on f0 with total quality factor Q. In this
 * model both bands are centred on f0 and the AR band is about a quarter of the impedance band, so the
 * usable band is the AR band; a design tuned off centre moves them apart, and the overlap says so.
 */
export function polarisationBands(centreHz: number, qualityFactor: number): PolarisationBands {
	const axialRatioBandwidthFractionValue = axialRatioBandwidthFraction(qualityFactor);
	const impedanceBandwidthFraction = twoModeImpedanceBandwidthFraction(qualityFactor);
	const axialRatioBand = bandAround(centreHz, axialRatioBandwidthFractionValue);
	const impedanceBand = bandAround(centreHz, impedanceBandwidthFraction);
	return {
		axialRatioBand,
		axialRatioBandwidthFraction: axialRatioBandwidthFractionValue,
		impedanceBand,
		impedanceBandwidthFraction,
		usableBand: bandOverlap(axialRatioBand, impedanceBand)
	};
}

/** Whether the shape is one of the single-feed circularly polarised patches. */
export const isCircularlyPolarisedShape = (shape: string): boolean => shape === 'truncated-corner' || shape === 'nearly-square';

/** The CP bands of a sized design, from its stored figures (old revisions included); null for a linearly polarised shape. */
export function polarisationBandsOf(sized: { shape: string; frequencyHz: number; estimates: { qualityFactor: number } }): PolarisationBands | null {
	return isCircularlyPolarisedShape(sized.shape) ? polarisationBands(sized.frequencyHz, sized.estimates.qualityFactor) : null;
}
