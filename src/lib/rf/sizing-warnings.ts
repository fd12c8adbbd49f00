// The warnings a sized design carries: each a code and a sentence a designer can act on, judged from the design's own physics.
import type { ResonanceAccuracy, SizingWarning } from './sized-design';
import { bandCovers, bandWidthHz, type FrequencyBand } from './polarisation-bands';
import { surfaceWaveLimitRatio } from './surface-wave';

/** Radiation efficiency below which a design is flagged (the "say 60 %"; common practice, no source). */
export const LOW_EFFICIENCY = 0.6;
/** Inset depth as a share of L beyond which the notch detunes the patch (common practice, no source). */
export const DEEP_INSET_SHARE = 0.4;
/** Notch (line + two gaps) as a share of the radiating edge beyond which the cos⁴ relation fails (common practice, no source). */
export const WIDE_NOTCH_SHARE = 0.5;
/** Fractional bandwidth under which tolerances easily push the band off target (common practice, no source). */
export const NARROW_BANDWIDTH_FRACTION = 0.01;
/** Total Q below which the CP perturbation relations are outside their small-perturbation validity. */
export const CP_MINIMUM_Q = 10;
/** Smallest ground side, in λ0, before the finite ground shifts the resonance and the match (≈ λ0/2; common practice, no source). */
export const SMALL_GROUND_WAVELENGTHS = 0.5;
/**
 * Largest reflection |Γ| between the feed point and the line before a warning: 0.1 (−20 dB), which
 * leaves room for the model's own error within a −15 dB target (common practice, no source).
 */
export const MISMATCH_REFLECTION = 0.1;
/** ± tolerance of a plated hole's finished diameter, mm (±0.08 mm ≈ ±3 mil; common practice, no source). */
export const PLATED_HOLE_TOLERANCE_MM = 0.08;
/** Centre pin of a common panel-mount coaxial connector, mm (≈ 0.050 in; from memory). */
export const CONNECTOR_PIN_DIAMETER_MM = 1.27;
/** εr range over which the cos⁴ inset depth stays within 15 % of Ramesh & Yip's empirical 50 Ω formula (tests/unit/rf/published-data.test.ts); above it the cos⁴ depth comes out shallower. */
export const INSET_RELATION_PERMITTIVITY = [2, 4.5] as const;

export interface WarningFacts {
	heightMm: number;
	freeSpaceWavelengthMm: number;
	frequencyHz: number;
	relativePermittivity: number;
	lossTangent: number;
	/** Set when the document gave no tanδ and this value was assumed. */
	assumedLossTangent?: { value: number; materialClass: string };
	radiationEfficiency: number;
	radiationQualityFactor: number;
	marginMm: number;
	groundWidthMm: number;
	groundLengthMm: number;
	bandwidthFraction: number;
	qualityFactor: number;
	circularlyPolarised: boolean;
	accuracy: ResonanceAccuracy;
	/** Inset depth and the resonant length it sits in. */
	inset?: { depthMm: number; lengthMm: number };
	/** Width of copper-free notch or of the line that meets the patch, against the edge it meets. */
	feedWidth?: { widthMm: number; edgeMm: number; notch: boolean };
	/** Distance from the probe centre to the nearest patch edge, the probe pad radius and the drilled hole. */
	probe?: { edgeDistanceMm: number; padRadiusMm: number; drillDiameterMm: number };
	/** The resistance the feed presents where it meets the line, and the line's impedance. */
	feedPoint?: { resistanceOhm: number; lineImpedanceOhm: number };
	/** The document's band to cover and the design's usable band (CP: AR ≤ 3 dB and VSWR ≤ 2 overlap; else VSWR ≤ 2). */
	bandCover?: { wanted: FrequencyBand; usable: FrequencyBand | null };
}

const mhz = (hz: number) => `${(hz / 1e6).toFixed(1)} MHz`;
const bandText = (b: FrequencyBand) => `${mhz(b.lowerHz)}–${mhz(b.upperHz)}`;

const pct = (x: number) => `${(x * 100).toFixed(1)} %`;

/** Every warning that applies, in a fixed order. */
export function sizingWarnings(f: WarningFacts): SizingWarning[] {
	const out: SizingWarning[] = [];
	const ratio = f.heightMm / f.freeSpaceWavelengthMm;
	const limit = surfaceWaveLimitRatio(f.relativePermittivity);
	if (f.assumedLossTangent) {
		const a = f.assumedLossTangent;
		out.push({
			code: 'assumed-loss-tangent',
			message: `No loss tangent was given: tanδ = ${a.value} was assumed, typical of ${a.materialClass} at εr ${f.relativePermittivity}. Efficiency, gain and bandwidth depend on it; enter the value from your laminate's datasheet.`
		});
	}
	if (ratio > limit) {
		out.push({
			code: 'thick-substrate',
			message: `The substrate is electrically thick for εr ${f.relativePermittivity} (h/λ0 = ${ratio.toFixed(3)} > ${limit.toFixed(3)} = 0.3/(2π√εr), James & Hall): surface waves carry away power and the models lose accuracy; expect to tune on the bench.`
		});
	}
	if (ratio > f.accuracy.maximumHeightRatio || f.relativePermittivity < f.accuracy.permittivityRange[0] || f.relativePermittivity > f.accuracy.permittivityRange[1]) {
		out.push({
			code: 'outside-model-range',
			message: `h/λ0 = ${ratio.toFixed(3)} and εr ${f.relativePermittivity} lie outside the data the resonance band was read from (h/λ0 ≤ ${f.accuracy.maximumHeightRatio}, εr ${f.accuracy.permittivityRange[0]}–${f.accuracy.permittivityRange[1]}): the ±${f.accuracy.typicalErrorPercent} % band does not apply.`
		});
	} else if (f.inset && (f.relativePermittivity < INSET_RELATION_PERMITTIVITY[0] || f.relativePermittivity > INSET_RELATION_PERMITTIVITY[1])) {
		out.push({
			code: 'outside-model-range',
			message: `The cos⁴ inset relation was checked for εr ${INSET_RELATION_PERMITTIVITY[0]}–${INSET_RELATION_PERMITTIVITY[1]}; at εr ${f.relativePermittivity} treat the inset depth as a starting point for tuning.`
		});
	}
	if (f.lossTangent > 1 / f.radiationQualityFactor) {
		out.push({
			code: 'lossy-laminate',
			message: `The dielectric loses more power than the patch radiates (tanδ = ${f.lossTangent} > 1/Q_rad = ${(1 / f.radiationQualityFactor).toPrecision(2)}): a lower-loss laminate or a thicker substrate raises the efficiency.`
		});
	}
	if (f.radiationEfficiency < LOW_EFFICIENCY) {
		out.push({
			code: 'low-efficiency',
			message: `The estimated radiation efficiency is ${pct(f.radiationEfficiency)}, below ${pct(LOW_EFFICIENCY)}: most of the power heats the laminate and the copper or leaves as surface waves; gain is ${(10 * Math.log10(f.radiationEfficiency)).toFixed(1)} dB below directivity.`
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
				? `The inset notch (line plus both gaps, ${f.feedWidth.widthMm.toFixed(2)} mm) takes more than half of the ${f.feedWidth.edgeMm.toFixed(2)} mm radiating edge; the inset relation assumes a narrow notch. Use a thinner substrate, a higher line impedance or a probe feed.`
				: `The line meeting the patch (${f.feedWidth.widthMm.toFixed(2)} mm) is wider than the ${f.feedWidth.edgeMm.toFixed(2)} mm edge it feeds; it cannot be attached as drawn.`
		});
	}
	if (f.feedPoint) {
		const { resistanceOhm: r, lineImpedanceOhm: z } = f.feedPoint;
		const gamma = Math.abs(r - z) / (r + z);
		if (gamma > MISMATCH_REFLECTION) {
			out.push({
				code: 'feed-mismatch',
				message: `The feed point presents ${r.toFixed(1)} Ω to a ${z.toFixed(1)} Ω line: |Γ| = ${gamma.toFixed(2)} (S11 ${(20 * Math.log10(gamma)).toFixed(1)} dB) before any model error. Set the target resistance to the line impedance or add a matching section.`
			});
		}
	}
	if (f.marginMm < f.heightMm) {
		out.push({
			code: 'ground-margin-small',
			message: `The ground extends only ${f.marginMm.toFixed(2)} mm beyond the patch, less than the substrate height ${f.heightMm} mm; the fringing fields reach past the ground edge and shift the resonance.`
		});
	}
	const groundSide = Math.min(f.groundWidthMm, f.groundLengthMm);
	if (groundSide < SMALL_GROUND_WAVELENGTHS * f.freeSpaceWavelengthMm) {
		out.push({
			code: 'small-ground',
			message: `The ground is ${(groundSide / f.freeSpaceWavelengthMm).toFixed(2)} λ0 across its short side, under λ0/2 (${(SMALL_GROUND_WAVELENGTHS * f.freeSpaceWavelengthMm).toFixed(1)} mm): expect more back radiation, less gain and a shifted resonance and match. Widen the ground margin or plan to tune.`
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
	if (f.probe && f.probe.drillDiameterMm - PLATED_HOLE_TOLERANCE_MM < CONNECTOR_PIN_DIAMETER_MM) {
		out.push({
			code: 'probe-pin-fit',
			message: `At its lower tolerance (−${PLATED_HOLE_TOLERANCE_MM} mm) the ${f.probe.drillDiameterMm} mm plated probe hole finishes at ${(f.probe.drillDiameterMm - PLATED_HOLE_TOLERANCE_MM).toFixed(2)} mm, smaller than a common connector's ${CONNECTOR_PIN_DIAMETER_MM} mm centre pin. Check your connector's pin and drill at least ${(CONNECTOR_PIN_DIAMETER_MM + PLATED_HOLE_TOLERANCE_MM).toFixed(2)} mm.`
		});
	}
	if (f.bandCover && !bandCovers(f.bandCover.usable, f.bandCover.wanted)) {
		const { wanted, usable } = f.bandCover;
		const what = f.circularlyPolarised ? 'usable CP band (axial ratio ≤ 3 dB and VSWR ≤ 2)' : 'VSWR ≤ 2 band';
		const short = bandWidthHz(usable) < bandWidthHz(wanted);
		out.push({
			code: 'band-not-covered',
			message:
				usable === null
					? `The estimated ${what} is empty, so it cannot cover ${bandText(wanted)}.`
					: `The estimated ${what} is ${bandText(usable)} (${mhz(bandWidthHz(usable))}), ${short ? 'narrower than' : 'off'} the band to cover ${bandText(wanted)} (${mhz(bandWidthHz(wanted))}). ${short ? 'A thicker or lower-εr substrate lowers Q and widens it' : 'Move the target frequency to the middle of the band to cover'}${f.circularlyPolarised && short ? ', or use a dual-feed CP patch' : ''}.`
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
