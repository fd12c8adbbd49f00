// The flat report of a sized design: every quantity with its unit in its key, as the CLI and API print it.
import type { DesignInput } from '../schemas';
import { polarisationBandsOf } from './polarisation-bands';
import type { SizedDesign, SizingWarning } from './sized-design';

export interface SizingReport {
	input: DesignInput;
	[quantity: string]: unknown;
	estimates: Record<string, unknown>;
	warnings: SizingWarning[];
}

/** Flattens a SizedDesign: `input` first, then the quantities, `estimates`, `warnings`. Absent quantities are left out. */
export function sizingReport(sized: SizedDesign): SizingReport {
	const out: Record<string, unknown> = {
		input: sized.input,
		shape: sized.shape,
		feed: sized.feedKind,
		frequencyHz: sized.frequencyHz,
		freeSpaceWavelengthMm: sized.freeSpaceWavelengthMm
	};
	const p = sized.patch;
	switch (p.kind) {
		case 'rectangular':
			Object.assign(out, { patchWidthMm: p.widthMm, patchLengthMm: p.lengthMm });
			break;
		case 'nearly-square':
			Object.assign(out, { patchWidthMm: p.widthMm, patchLengthMm: p.lengthMm, handedness: p.handedness });
			break;
		case 'truncated-corner':
			Object.assign(out, { patchWidthMm: p.sideMm, patchLengthMm: p.sideMm, truncationLegMm: p.truncationLegMm, truncatedDiagonal: p.truncatedDiagonal, handedness: p.handedness });
			break;
		case 'circular':
			Object.assign(out, { patchRadiusMm: p.radiusMm, effectiveRadiusMm: p.effectiveRadiusMm });
			break;
	}
	// only the quantities the shape's model defines: slots and ΔL for the line model, G_rad for the disc
	const model: Record<string, number | undefined> = {
		effectivePermittivity: sized.effectivePermittivity,
		fringeExtensionMm: sized.fringeExtensionMm,
		effectiveLengthMm: sized.effectiveLengthMm,
		slotConductanceS: sized.slotConductanceS,
		mutualConductanceS: sized.mutualConductanceS,
		radiationConductanceS: sized.radiationConductanceS,
		edgeResistanceOhm: sized.edgeResistanceOhm,
		radiationEdgeResistanceOhm: sized.radiationEdgeResistanceOhm
	};
	for (const [key, value] of Object.entries(model)) if (value !== undefined) out[key] = value;
	Object.assign(out, { resonanceAccuracy: sized.resonanceAccuracy, textbook: sized.textbook });
	const f = sized.feed;
	const line = (prefix: string, l: { widthMm: number; lengthMm: number; impedanceOhm: number; effectivePermittivity: number }) => ({
		[`${prefix}ImpedanceOhm`]: l.impedanceOhm,
		[`${prefix}WidthMm`]: l.widthMm,
		[`${prefix}LengthMm`]: l.lengthMm,
		[`${prefix}EffectivePermittivity`]: l.effectivePermittivity
	});
	switch (f.kind) {
		case 'inset':
			Object.assign(out, { insetDepthMm: f.insetDepthMm, notchGapMm: f.notchGapMm }, line('feedLine', f.line));
			break;
		case 'edge':
			Object.assign(out, line('feedLine', f.line));
			break;
		case 'quarter-wave':
			Object.assign(out, line('transformer', f.transformer), line('feedLine', f.line));
			break;
		case 'aperture-coupled':
			Object.assign(out, line('feedLine', f.line), { slotLengthMm: f.slotLengthMm, slotWidthMm: f.slotWidthMm, stubLengthMm: f.stubLengthMm });
			break;
		case 'proximity-coupled':
			Object.assign(out, line('feedLine', f.line), { overlapMm: f.overlapMm });
			break;
		case 'probe':
			Object.assign(out, {
				probeOffsetMm: Math.hypot(f.offsetXMm, f.offsetYMm),
				probeOffsetXMm: f.offsetXMm,
				probeOffsetYMm: f.offsetYMm,
				probeDrillDiameterMm: f.drillDiameterMm,
				probePadDiameterMm: f.padDiameterMm,
				probeClearanceDiameterMm: f.clearanceDiameterMm
			});
			break;
		default:
			throw new Error(`sizingReport: no report row for feed ${f satisfies never}`);
	}
	Object.assign(out, {
		groundWidthMm: sized.ground.widthMm,
		groundLengthMm: sized.ground.lengthMm,
		groundMarginMm: sized.ground.marginMm,
		copperThicknessMm: sized.copperThicknessMm,
		estimates: {
			note: 'Estimates from the cavity and transmission-line models with the surface-wave share (Jackson–Alexopoulos), not measurements.',
			bandwidthFraction: sized.estimates.bandwidthFraction,
			qualityFactor: sized.estimates.qualityFactor,
			directivityDbi: sized.estimates.directivityDbi,
			radiationEfficiency: sized.estimates.radiationEfficiency,
			radiationQualityFactor: sized.estimates.radiationQualityFactor,
			surfaceWaveEfficiency: sized.estimates.surfaceWaveEfficiency,
			gainDbi: sized.estimates.gainDbi
		},
		warnings: sized.warnings
	});
	// a CP patch: its AR ≤ 3 dB, two-mode VSWR ≤ 2 and usable bands (derived from Q here, so stored revisions show them too)
	const cp = polarisationBandsOf(sized);
	if (cp) {
		out.circularPolarisation = {
			note: 'Estimates from the two-mode cavity model (Langston & Jackson, 2004): AR ≤ 3 dB and VSWR ≤ 2 bands centred on the target; the usable band is where both hold.',
			axialRatioBandwidthFraction: cp.axialRatioBandwidthFraction,
			axialRatioBandLowerHz: cp.axialRatioBand.lowerHz,
			axialRatioBandUpperHz: cp.axialRatioBand.upperHz,
			impedanceBandwidthFraction: cp.impedanceBandwidthFraction,
			impedanceBandLowerHz: cp.impedanceBand.lowerHz,
			impedanceBandUpperHz: cp.impedanceBand.upperHz,
			usableBandLowerHz: cp.usableBand?.lowerHz ?? null,
			usableBandUpperHz: cp.usableBand?.upperHz ?? null
		};
	}
	// present only for layered designs and arrays, so single-layer reports keep their keys
	if (sized.layerStack) out.layerStack = sized.layerStack;
	if (sized.parasitic) out.parasitic = sized.parasitic;
	if (sized.array) out.array = sized.array;
	// present only when the mask covers the patch, so other reports keep their keys
	if (sized.maskCover) out.maskCover = sized.maskCover;
	return out as SizingReport;
}
