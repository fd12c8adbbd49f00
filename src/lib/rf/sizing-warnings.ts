// The warnings a sized design carries: each a code and a sentence a designer can act on.
import type { SizingWarning } from './sized-design';

/** h/λ0 above which surface waves grow and the models lose accuracy (issue 3; about 0.05). */
export const THICK_SUBSTRATE_RATIO = 0.05;
/** tanδ and frequency at and above which laminate loss matters (common practice, no source). */
export const LOSSY_TANGENT = 0.01;
export const LOSSY_FREQUENCY_HZ = 6e9;
/** Inset depth as a share of L beyond which the notch detunes the patch (common practice, no source). */
export const DEEP_INSET_SHARE = 0.4;
/** Notch (line + two gaps) as a share of the radiating edge beyond which the cos² relation fails (common practice, no source). */
export const WIDE_NOTCH_SHARE = 0.5;
/** Fractional bandwidth under which tolerances easily push the band off target (common practice, no source). */
export const NARROW_BANDWIDTH_FRACTION = 0.01;
/** Total Q below which the CP perturbation relations are outside their small-perturbation validity. */
export const CP_MINIMUM_Q = 10;

export interface WarningFacts {
	heightMm: number;
	freeSpaceWavelengthMm: number;
	frequencyHz: number;
	lossTangent: number;
	marginMm: number;
	bandwidthFraction: number;
	qualityFactor: number;
	circularlyPolarised: boolean;
	/** Inset depth and the resonant length it sits in. */
	inset?: { depthMm: number; lengthMm: number };
	/** Width of copper-free notch or of the line that meets the patch, against the edge it meets. */
	feedWidth?: { widthMm: number; edgeMm: number; notch: boolean };
	/** Distance from the probe centre to the nearest patch edge, and the probe pad radius. */
	probe?: { edgeDistanceMm: number; padRadiusMm: number };
}

const pct = (x: number) => `${(x * 100).toFixed(1)} %`;

/** Every warning that applies, in a fixed order. */
export function sizingWarnings(f: WarningFacts): SizingWarning[] {
	const out: SizingWarning[] = [];
	const ratio = f.heightMm / f.freeSpaceWavelengthMm;
	if (ratio > THICK_SUBSTRATE_RATIO) {
		out.push({
			code: 'thick-substrate',
			message: `The substrate is electrically thick (h/λ0 = ${ratio.toFixed(3)} > ${THICK_SUBSTRATE_RATIO}): surface waves carry away power and the transmission-line and cavity models lose accuracy; expect to tune on the bench.`
		});
	}
	if (f.lossTangent >= LOSSY_TANGENT && f.frequencyHz >= LOSSY_FREQUENCY_HZ) {
		out.push({
			code: 'lossy-laminate',
			message: `A laminate with tanδ = ${f.lossTangent} at ${(f.frequencyHz / 1e9).toFixed(2)} GHz loses much of the power in the dielectric; a low-loss laminate (tanδ < 0.01) is usual above 6 GHz.`
		});
	}
	if (f.inset && f.inset.depthMm > DEEP_INSET_SHARE * f.inset.lengthMm) {
		out.push({
			code: 'inset-too-deep',
			message: `The inset reaches ${pct(f.inset.depthMm / f.inset.lengthMm)} of the patch length; the resistance falls to 0 Ω at L/2, so no inset can go deeper than the centre, and a notch this deep detunes the patch. Prefer a probe or quarter-wave feed.`
		});
	}
	if (f.feedWidth && f.feedWidth.widthMm > (f.feedWidth.notch ? WIDE_NOTCH_SHARE : 1) * f.feedWidth.edgeMm) {
		out.push({
			code: 'feed-wider-than-notch',
			message: f.feedWidth.notch
				? `The inset notch (line plus both gaps, ${f.feedWidth.widthMm.toFixed(2)} mm) takes more than half of the ${f.feedWidth.edgeMm.toFixed(2)} mm radiating edge; the cos² relation assumes a narrow notch. Use a thinner substrate, a higher line impedance or a probe feed.`
				: `The line meeting the patch (${f.feedWidth.widthMm.toFixed(2)} mm) is wider than the ${f.feedWidth.edgeMm.toFixed(2)} mm edge it feeds; it cannot be attached as drawn.`
		});
	}
	if (f.marginMm < f.heightMm) {
		out.push({
			code: 'ground-margin-small',
			message: `The ground extends only ${f.marginMm.toFixed(2)} mm beyond the patch, less than the substrate height ${f.heightMm} mm; the fringing fields reach past the ground edge and shift the resonance.`
		});
	}
	if (f.bandwidthFraction < NARROW_BANDWIDTH_FRACTION) {
		out.push({
			code: 'narrow-bandwidth',
			message: `The estimated VSWR ≤ 2 bandwidth is only ${pct(f.bandwidthFraction)}; permittivity and etch tolerances can push the band off the target. Run the tolerance study or use a thicker substrate.`
		});
	}
	if (f.probe && f.probe.edgeDistanceMm < f.probe.padRadiusMm) {
		out.push({
			code: 'probe-near-edge',
			message: `The probe sits ${f.probe.edgeDistanceMm.toFixed(2)} mm from the patch edge, closer than its pad radius ${f.probe.padRadiusMm.toFixed(2)} mm; the pad would overhang the patch. Lower the target resistance or use a smaller probe.`
		});
	}
	if (f.circularlyPolarised && f.qualityFactor < CP_MINIMUM_Q) {
		out.push({
			code: 'cp-outside-validity',
			message: `The patch Q (${f.qualityFactor.toFixed(1)}) is below ${CP_MINIMUM_Q}: the perturbation relation for circular polarisation assumes a small perturbation on a high-Q patch, so the cut or aspect ratio is only a starting point for tuning.`
		});
	}
	return out;
}
