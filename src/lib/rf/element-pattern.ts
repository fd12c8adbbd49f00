// Far-field pattern of one patch: the E- and H-plane cuts from the two-slot model (rectangular family) and the TM11 cavity model (disc).
import { halfPowerWidthDeg } from './half-power-width';
import { dbFromPowerRatio, freeSpaceWavelengthMm, radFromDeg } from '../units';
import { besselJ } from './bessel';
import type { SizedDesign } from './sized-design';

/**
 * What the pattern of one patch is computed from. Angles are in the patch frame of the artwork: x along
 * the patch width, y along the resonant length (the feed's axis), z the broadside direction away from
 * the ground. The E-plane is the y–z plane (it holds the feed's axis), the H-plane the x–z plane.
 */
export type ElementPatternGeometry =
	| {
			/**
			 * Two radiating slots W long and h high, Leff apart, in phase, over an infinite ground, in air
			 * (Balanis, Antenna Theory 4th ed., §14.2.4; from memory).
			 */
			model: 'two-slot';
			frequencyHz: number;
			/** Slot length = the patch width W (x). */
			widthMm: number;
			/** Slot separation Leff = L + 2ΔL (y). */
			effectiveLengthMm: number;
			/** Slot height = the dielectric height h under the patch. */
			heightMm: number;
	  }
	| {
			/** TM11 mode of a disc of effective radius a_e over an infinite ground (Balanis, Antenna Theory 4th ed., §14.3; from memory). */
			model: 'cavity-tm11';
			frequencyHz: number;
			effectiveRadiusMm: number;
	  };

export type PatternPlane = 'e' | 'h';

/** sin(x)/x with its limit 1 at 0. */
const sinc = (x: number) => (Math.abs(x) < 1e-12 ? 1 : Math.sin(x) / x);

/**
 * |E| of the far field, normalised to 1 at broadside, at θ from broadside (radians) and azimuth φ
 * from the x axis (radians), on the upper half-space (θ ≤ π/2).
 *
 * Two-slot model: each slot is an x-directed magnetic current W × h doubled by the ground; the two are
 * in phase (TM010) and Leff apart along y. E_θ ∝ sinφ·F and E_φ ∝ cosθ·cosφ·F with
 * F = sinc(k0h/2·cosθ)·sinc(k0W/2·sinθ·cosφ)·cos(k0Leff/2·sinθ·sinφ). In the E-plane (φ = 90°) this is
 * Balanis's sinc(k0h/2·cosθ)·cos(k0Leff/2·sinθ), in the H-plane (φ = 0) cosθ·sinc(k0h/2·cosθ)·sinc(k0W/2·sinθ).
 *
 * Cavity TM11 model: E_θ ∝ cosφ·(J0(x) − J2(x)) and E_φ ∝ −cosθ·sinφ·(J0(x) + J2(x)) with x = k0·a_e·sinθ,
 * the E-plane along φ = 90° here because the probe sits on the y axis.
 */
export function elementFieldMagnitude(g: ElementPatternGeometry, thetaRad: number, phiRad: number): number {
	const k0 = (2 * Math.PI) / freeSpaceWavelengthMm(g.frequencyHz);
	const st = Math.sin(thetaRad);
	const ct = Math.cos(thetaRad);
	if (g.model === 'two-slot') {
		const f = (theta: number) =>
			sinc(((k0 * g.heightMm) / 2) * Math.cos(theta)) * sinc(((k0 * g.widthMm) / 2) * Math.sin(theta) * Math.cos(phiRad)) * Math.cos(((k0 * g.effectiveLengthMm) / 2) * Math.sin(theta) * Math.sin(phiRad));
		const here = f(thetaRad);
		return Math.hypot(Math.sin(phiRad) * here, ct * Math.cos(phiRad) * here) / f(0);
	}
	const x = k0 * g.effectiveRadiusMm * st;
	const j0 = besselJ(0, x);
	const j2 = besselJ(2, x);
	// at broadside J0 − J2 = J0 + J2 = 1, and |E| = √(sin²φ + cos²φ) = 1
	const eTheta = Math.sin(phiRad) * (j0 - j2);
	const ePhi = ct * Math.cos(phiRad) * (j0 + j2);
	return Math.hypot(eTheta, ePhi);
}

/** |E| on a principal-plane cut, normalised to broadside, at a signed angle from broadside (−90°…90°). */
export function elementCutMagnitude(g: ElementPatternGeometry, plane: PatternPlane, angleDeg: number): number {
	const a = radFromDeg(angleDeg);
	// a negative angle is the same cut on the other side: φ + 180°
	const phi = (plane === 'e' ? Math.PI / 2 : 0) + (a < 0 ? Math.PI : 0);
	return elementFieldMagnitude(g, Math.abs(a), phi);
}

/** Power pattern on a cut, dB relative to broadside, floored at −80 dB (a null of the model). */
export function elementCutDb(g: ElementPatternGeometry, plane: PatternPlane, angleDeg: number): number {
	const m = elementCutMagnitude(g, plane, angleDeg);
	return Math.max(dbFromPowerRatio(m * m), -80);
}

/** Full width between the −3 dB points either side of broadside (walk out, then bisect); null when a side stays above −3 dB to ±90°. */
export function elementHalfPowerBeamwidthDeg(g: ElementPatternGeometry, plane: PatternPlane): number | null {
	return halfPowerWidthDeg((a) => elementCutDb(g, plane, a), 0, 0.25);
}

/** The plot-ready cuts of one patch: angles −90°…90° in 1° steps, the E- and H-plane power in dB (0 at broadside) and the beamwidths. */
export interface ElementPattern {
	geometry: ElementPatternGeometry;
	anglesDeg: number[];
	eDb: number[];
	hDb: number[];
	/** −3 dB width of each cut; null when the cut stays above −3 dB out to ±90° (the model's E-plane on high-εr substrates). */
	halfPowerBeamwidthEDeg: number | null;
	halfPowerBeamwidthHDeg: number | null;
	/** Each cut's level at ±90° (grazing), dB; the model's H-plane is a null there (−80, the floor). */
	grazingEDb: number;
	grazingHDb: number;
}

export function elementPattern(g: ElementPatternGeometry): ElementPattern {
	const anglesDeg = Array.from({ length: 181 }, (_, i) => i - 90);
	const round = (v: number) => Math.round(v * 1000) / 1000;
	return {
		geometry: g,
		anglesDeg,
		eDb: anglesDeg.map((a) => round(elementCutDb(g, 'e', a))),
		hDb: anglesDeg.map((a) => round(elementCutDb(g, 'h', a))),
		halfPowerBeamwidthEDeg: elementHalfPowerBeamwidthDeg(g, 'e'),
		halfPowerBeamwidthHDeg: elementHalfPowerBeamwidthDeg(g, 'h'),
		grazingEDb: round(elementCutDb(g, 'e', 90)),
		grazingHDb: round(elementCutDb(g, 'h', 90))
	};
}

/** Height of the dielectric under the patch: the substrate's, or with a stack the dielectrics above the second copper. */
function patchHeightMm(sized: SizedDesign): number {
	if (!sized.layerStack) return sized.input.substrate.heightMm;
	let h = 0;
	for (const entry of sized.layerStack.slice(1)) {
		if (entry.kind === 'copper') break;
		h += entry.heightMm;
	}
	return h;
}

/**
 * The pattern geometry of a single-element design, from its stored sizing (old revisions included);
 * null for arrays (their page shows the array factor) and for stacked parasitic pairs (no model here).
 */
export function elementPatternGeometry(sized: SizedDesign): ElementPatternGeometry | null {
	if (sized.array || sized.parasitic) return null;
	const p = sized.patch;
	const frequencyHz = sized.frequencyHz;
	if (p.kind === 'circular') return { model: 'cavity-tm11', frequencyHz, effectiveRadiusMm: p.effectiveRadiusMm };
	const fringe = sized.fringeExtensionMm ?? 0;
	const widthMm = p.kind === 'truncated-corner' ? p.sideMm : p.widthMm;
	const lengthMm = p.kind === 'truncated-corner' ? p.sideMm : p.lengthMm;
	return { model: 'two-slot', frequencyHz, widthMm, effectiveLengthMm: lengthMm + 2 * fringe, heightMm: patchHeightMm(sized) };
}
