// Sizing one design: validated input in, every derived quantity and the warnings out.
import { MASK_COVER_MODEL, maskCoverPermittivities, maskCoverValues, type SizedMaskCover } from './mask-cover';
import { InputError, laminateClassFor, type DesignInput } from '../schemas';
import { freeSpaceWavelengthMm, mmFromUm } from '../units';
import { feedKindTraits } from './feed-kinds';
import { circularPatch } from './circular-patch';
import { circularProbeRadiusMm } from './circular-probe-radius';
import { insetDepthMm } from './inset-depth';
import { nearlySquarePatch } from './nearly-square-patch';
import { circularDirectivity, circularRadiationQuality, performanceEstimates, rectangularDirectivity, rectangularRadiationQuality } from './performance-estimates';
import { probeOffsetMm } from './probe-offset';
import { microstripSection, quarterWaveTransformer } from './quarter-wave-transformer';
import { rectangularPatch, type RectangularPatchSize } from './rectangular-patch';
import { groundSize } from './ground-size';
import { needsExtendedSizing, sizeExtended } from './size-extended';
import type { FormulaValues, SizedDesign, SizedEstimates, SizedFeed, SizedLine, SizedPatch } from './sized-design';
import { circularRadiationConductanceS, effectiveRadiusMm } from './circular-patch';
import { sizingWarnings, type WarningFacts } from './sizing-warnings';
import { slotConductance, type SlotConductances } from './slot-conductance';
import { squarePatch, lineModelOf } from './square-patch';
import { truncatedDiagonalFor, truncationLegMm } from './truncated-corner-patch';
import { resonanceAccuracy as resonanceAccuracyFor } from './first-pass-accuracy';
import { textbookModel } from './textbook-model';
import { bandAround, isCircularlyPolarisedShape, polarisationBands, type FrequencyBand } from './polarisation-bands';

/** Notch gap default: equal to the feed-line width on each side (common practice, no source). */
export const NOTCH_GAP_LINE_WIDTHS = 1;
/** Probe pad default: the drill plus a 0.25 mm annular ring on each side (common practice, no source). */
export const PROBE_ANNULAR_RING_MM = 0.25;

/** Where the low-level functions' argument names live in the design-input document. */
const DOCUMENT_PATHS: Record<string, string> = {
	heightMm: 'substrate.heightMm',
	relativePermittivity: 'substrate.relativePermittivity',
	targetResistanceOhm: 'targetImpedanceOhm',
	impedanceOhm: 'feedLineImpedanceOhm'
};

/** The geometry-and-conductance core every shape reduces to before the feed is attached. */
interface Core {
	patch: SizedPatch;
	model: RectangularPatchSize;
	slots: SlotConductances;
	/** Resonant input resistance at the edge with every loss: the radiation-only value × the radiation efficiency (cavity model, 1/G_total). */
	edgeResistanceOhm: number;
	/** 1/G with radiation only: the textbook's edge resistance. */
	radiationEdgeResistanceOhm: number;
	estimates: SizedEstimates;
	/** Patch extent along x and y. */
	extentXMm: number;
	extentYMm: number;
	/** Length along the feed axis that the cos² relation uses. */
	resonantLengthMm: number;
	/** The edge a line or notch meets. */
	feedEdgeMm: number;
}

/** The loaded edge resistance R_rad·η (1/G_total of the cavity) beside the radiation-only R_rad. */
function edgeResistances(radiationEdgeResistanceOhm: number, estimates: SizedEstimates) {
	return { edgeResistanceOhm: radiationEdgeResistanceOhm * estimates.radiationEfficiency, radiationEdgeResistanceOhm };
}

function lineEstimates(d: DesignInput, model: RectangularPatchSize, slots: SlotConductances): SizedEstimates {
	const { frequencyHz, substrate: s } = d;
	const g = slots.slotConductanceS + slots.mutualConductanceS;
	return performanceEstimates({
		frequencyHz,
		heightMm: s.heightMm,
		relativePermittivity: s.relativePermittivity,
		lossTangent: lossTangentOf(d),
		copperConductivitySPerM: s.copperConductivitySPerM,
		radiationQualityFactor: rectangularRadiationQuality(model.widthMm, model.effectiveLengthMm, s.heightMm, s.relativePermittivity, frequencyHz, g),
		directivity: rectangularDirectivity(model.widthMm, frequencyHz, slots.slotIntegral, slots.slotConductanceS, slots.mutualConductanceS)
	});
}

/** An overridden length keeps the width's εreff and ΔL (they depend on W and h only). */
function withLengthOverride(model: RectangularPatchSize, lengthMm: number | undefined): RectangularPatchSize {
	if (lengthMm === undefined) return model;
	return { ...model, lengthMm, effectiveLengthMm: lengthMm + 2 * model.fringeExtensionMm };
}

/** The closed-form values of the dimensions the document overrides (undefined without overrides). */
function formulaValuesOf(d: DesignInput, fed: SizedFeed, core: Core): FormulaValues | undefined {
	const o = d.overrides;
	if (!o || Object.values(o).every((v) => v === undefined)) return undefined;
	const plain = sizeValid({ ...d, overrides: undefined });
	const out: FormulaValues = {};
	if (o.lengthMm !== undefined && plain.patch.kind === 'rectangular') out.lengthMm = plain.patch.lengthMm;
	if (o.widthMm !== undefined && plain.patch.kind === 'rectangular') out.widthMm = plain.patch.widthMm;
	if (o.radiusMm !== undefined && plain.patch.kind === 'circular') out.radiusMm = plain.patch.radiusMm;
	// the feed formulas applied to the patch as overridden, so a tuned feed is compared like for like
	switch (fed.kind) {
		case 'inset':
			if (o.insetDepthMm !== undefined) out.insetDepthMm = insetDepthMm({ edgeResistanceOhm: core.edgeResistanceOhm, targetResistanceOhm: d.targetImpedanceOhm, lengthMm: core.resonantLengthMm, law: 'cos4' });
			return out;
		case 'probe':
			if (o.probeOffsetMm !== undefined) out.probeOffsetMm = probeFormulaOffset(d, core);
			return out;
		case 'quarter-wave':
			// the λg/4 section's own rule: Zt = √(R_edge·Z0)
			if (o.transformerImpedanceOhm !== undefined) out.transformerImpedanceOhm = Math.sqrt(core.edgeResistanceOhm * d.targetImpedanceOhm);
			return out;
		case 'edge':
		case 'aperture-coupled':
		case 'proximity-coupled':
			return out; // no feed dimension of these can be overridden
		default:
			return fed satisfies never;
	}
}

function probeFormulaOffset(d: DesignInput, core: Core): number {
	const target = { edgeResistanceOhm: core.edgeResistanceOhm, targetResistanceOhm: d.targetImpedanceOhm };
	if (core.patch.kind === 'circular') return circularProbeRadiusMm({ ...target, radiusMm: core.patch.radiusMm, effectiveRadiusMm: core.patch.effectiveRadiusMm });
	return probeOffsetMm({ ...target, lengthMm: core.resonantLengthMm });
}

function rectangularFamily(d: DesignInput): Core {
	const { frequencyHz, substrate: s } = d;
	const base = { frequencyHz, relativePermittivity: s.relativePermittivity, heightMm: s.heightMm };
	if (d.shape === 'rectangular') {
		const model = withLengthOverride(rectangularPatch({ ...base, widthMm: d.patchWidthMm ?? d.overrides?.widthMm }), d.overrides?.lengthMm);
		const slots = slotConductance({ widthMm: model.widthMm, lengthMm: model.lengthMm, frequencyHz });
		const patch: SizedPatch = { kind: 'rectangular', widthMm: model.widthMm, lengthMm: model.lengthMm };
		const estimates = lineEstimates(d, model, slots);
		return { patch, model, slots, ...edgeResistances(slots.edgeResistanceOhm, estimates), estimates, extentXMm: model.widthMm, extentYMm: model.lengthMm, resonantLengthMm: model.lengthMm, feedEdgeMm: model.widthMm };
	}
	const square = squarePatch(base);
	const squareSlots = slotConductance({ widthMm: square.widthMm, lengthMm: square.lengthMm, frequencyHz });
	const estimates = lineEstimates(d, square, squareSlots);
	if (d.shape === 'truncated-corner') {
		const patch: SizedPatch = {
			kind: 'truncated-corner',
			sideMm: square.widthMm,
			truncationLegMm: truncationLegMm(square.widthMm, estimates.qualityFactor),
			handedness: d.handedness,
			truncatedDiagonal: truncatedDiagonalFor(d.handedness)
		};
		return { patch, model: square, slots: squareSlots, ...edgeResistances(squareSlots.edgeResistanceOhm, estimates), estimates, extentXMm: square.widthMm, extentYMm: square.widthMm, resonantLengthMm: square.widthMm, feedEdgeMm: square.widthMm };
	}
	// Nearly square: two orthogonal modes; the diagonal probe sees their mean edge resistance.
	const ns = nearlySquarePatch({ ...base, qualityFactor: estimates.qualityFactor, handedness: d.handedness });
	const modeX = slotConductance({ widthMm: ns.lengthMm, lengthMm: ns.widthMm, frequencyHz });
	const modeY = slotConductance({ widthMm: ns.widthMm, lengthMm: ns.lengthMm, frequencyHz });
	const slots: SlotConductances = {
		slotConductanceS: (modeX.slotConductanceS + modeY.slotConductanceS) / 2,
		mutualConductanceS: (modeX.mutualConductanceS + modeY.mutualConductanceS) / 2,
		edgeResistanceOhm: (modeX.edgeResistanceOhm + modeY.edgeResistanceOhm) / 2,
		slotIntegral: (modeX.slotIntegral + modeY.slotIntegral) / 2
	};
	const model = lineModelOf(ns.widthMm, ns.lengthMm, s.heightMm, s.relativePermittivity);
	const patch: SizedPatch = { kind: 'nearly-square', widthMm: ns.widthMm, lengthMm: ns.lengthMm, handedness: d.handedness };
	return { patch, model, slots, ...edgeResistances(slots.edgeResistanceOhm, estimates), estimates, extentXMm: ns.widthMm, extentYMm: ns.lengthMm, resonantLengthMm: ns.lengthMm, feedEdgeMm: ns.widthMm };
}

/** An overridden radius brings its own effective radius and radiation conductance. */
function withRadiusOverride(c: ReturnType<typeof circularPatch>, d: DesignInput): ReturnType<typeof circularPatch> {
	const radiusMm = d.overrides?.radiusMm;
	if (radiusMm === undefined) return c;
	const ae = effectiveRadiusMm(radiusMm, d.substrate.heightMm, d.substrate.relativePermittivity);
	const g = circularRadiationConductanceS(ae, d.frequencyHz);
	return { radiusMm, effectiveRadiusMm: ae, radiationConductanceS: g, edgeResistanceOhm: 1 / g };
}

function circularCore(d: DesignInput): Core {
	const { frequencyHz, substrate: s } = d;
	const c = withRadiusOverride(circularPatch({ frequencyHz, relativePermittivity: s.relativePermittivity, heightMm: s.heightMm }), d);
	const g = c.radiationConductanceS;
	const estimates = performanceEstimates({
		frequencyHz,
		heightMm: s.heightMm,
		relativePermittivity: s.relativePermittivity,
		lossTangent: lossTangentOf(d),
		copperConductivitySPerM: s.copperConductivitySPerM,
		radiationQualityFactor: circularRadiationQuality(c.effectiveRadiusMm, s.heightMm, s.relativePermittivity, frequencyHz, g),
		directivity: circularDirectivity(c.effectiveRadiusMm, frequencyHz, g)
	});
	const diameter = 2 * c.radiusMm;
	return {
		patch: { kind: 'circular', radiusMm: c.radiusMm, effectiveRadiusMm: c.effectiveRadiusMm },
		model: { widthMm: diameter, lengthMm: diameter, effectivePermittivity: s.relativePermittivity, fringeExtensionMm: 0, effectiveLengthMm: 2 * c.effectiveRadiusMm },
		slots: { slotConductanceS: g, mutualConductanceS: 0, edgeResistanceOhm: c.edgeResistanceOhm, slotIntegral: 0 },
		...edgeResistances(c.edgeResistanceOhm, estimates),
		estimates,
		extentXMm: diameter,
		extentYMm: diameter,
		resonantLengthMm: diameter,
		feedEdgeMm: c.radiusMm
	};
}

interface FeedResult {
	feed: SizedFeed;
	feedRoomMm: number;
	facts: Pick<WarningFacts, 'inset' | 'feedWidth' | 'probe'>;
}

function attachFeed(d: DesignInput, core: Core, marginMm: number): FeedResult {
	const { frequencyHz, substrate: s } = d;
	const t = mmFromUm(s.copperThicknessUm);
	const line = (impedanceOhm: number, lengthMm: number): SizedLine => microstripSection(impedanceOhm, frequencyHz, s.heightMm, s.relativePermittivity, t, lengthMm);
	switch (d.feed) {
		case 'edge': {
			const l = line(d.feedLineImpedanceOhm, marginMm);
			return { feed: { kind: 'edge', line: l }, feedRoomMm: 0, facts: { feedWidth: { widthMm: l.widthMm, edgeMm: core.feedEdgeMm, notch: false } } };
		}
		case 'inset': {
			const depth = d.overrides?.insetDepthMm ?? insetDepthMm({ edgeResistanceOhm: core.edgeResistanceOhm, targetResistanceOhm: d.targetImpedanceOhm, lengthMm: core.resonantLengthMm, law: 'cos4' });
			const l = line(d.feedLineImpedanceOhm, marginMm + depth);
			const gap = d.inset.notchGapMm ?? NOTCH_GAP_LINE_WIDTHS * l.widthMm;
			return {
				feed: { kind: 'inset', insetDepthMm: depth, notchGapMm: gap, line: l },
				feedRoomMm: 0,
				facts: { inset: { depthMm: depth, lengthMm: core.resonantLengthMm }, feedWidth: { widthMm: l.widthMm + 2 * gap, edgeMm: core.feedEdgeMm, notch: true } }
			};
		}
		case 'quarter-wave': {
			// an overridden section impedance Zt is the √(load·source) of the load Zt²/Z0
			const zt = d.overrides?.transformerImpedanceOhm;
			const transformer = quarterWaveTransformer({
				loadResistanceOhm: zt === undefined ? core.edgeResistanceOhm : (zt * zt) / d.targetImpedanceOhm,
				sourceResistanceOhm: d.targetImpedanceOhm,
				frequencyHz,
				heightMm: s.heightMm,
				relativePermittivity: s.relativePermittivity,
				thicknessMm: t
			});
			const probeLine = line(d.feedLineImpedanceOhm, 0);
			// The feed side must hold the λ/4 section plus at least one line width of 50 Ω line.
			const feedRoomMm = transformer.lengthMm + probeLine.widthMm;
			const sideMm = Math.max(marginMm, feedRoomMm);
			const l = { ...probeLine, lengthMm: sideMm - transformer.lengthMm };
			return { feed: { kind: 'quarter-wave', transformer, line: l }, feedRoomMm, facts: { feedWidth: { widthMm: Math.max(transformer.widthMm, l.widthMm), edgeMm: core.feedEdgeMm, notch: false } } };
		}
		case 'aperture-coupled':
		case 'proximity-coupled':
			// sized by sizeExtended, which hands this function an edge-fed stand-in
			throw new Error(`attachFeed: ${d.feed} is sized by sizeExtended`);
		case 'probe': {
			const pad = d.probe.padDiameterMm ?? d.probe.drillDiameterMm + 2 * PROBE_ANNULAR_RING_MM;
			const common = { drillDiameterMm: d.probe.drillDiameterMm, padDiameterMm: pad, clearanceDiameterMm: d.probe.clearanceDiameterMm };
			const target = { edgeResistanceOhm: core.edgeResistanceOhm, targetResistanceOhm: d.targetImpedanceOhm };
			if (core.patch.kind === 'circular') {
				const rho = d.overrides?.probeOffsetMm ?? circularProbeRadiusMm({ ...target, radiusMm: core.patch.radiusMm, effectiveRadiusMm: core.patch.effectiveRadiusMm });
				return { feed: { kind: 'probe', offsetXMm: 0, offsetYMm: rho, ...common }, feedRoomMm: 0, facts: { probe: { edgeDistanceMm: core.patch.radiusMm - rho, padRadiusMm: pad / 2, drillDiameterMm: common.drillDiameterMm } } };
			}
			if (core.patch.kind === 'nearly-square') {
				// Both modes see R·sin²(π·t/2) at the fraction t of the way from the centre to the corner:
				// the cos² relation over a unit half-length, counted from the corner instead of the edge.
				const share = 1 - insetDepthMm({ ...target, lengthMm: 2 });
				const x = (share * core.patch.widthMm) / 2;
				const y = (share * core.patch.lengthMm) / 2;
				const edge = Math.min(core.patch.widthMm / 2 - x, core.patch.lengthMm / 2 - y);
				return { feed: { kind: 'probe', offsetXMm: x, offsetYMm: y, ...common }, feedRoomMm: 0, facts: { probe: { edgeDistanceMm: edge, padRadiusMm: pad / 2, drillDiameterMm: common.drillDiameterMm } } };
			}
			const offset = d.overrides?.probeOffsetMm ?? probeOffsetMm({ ...target, lengthMm: core.resonantLengthMm });
			const edge = Math.min(core.resonantLengthMm / 2 - offset, core.extentXMm / 2);
			return { feed: { kind: 'probe', offsetXMm: 0, offsetYMm: offset, ...common }, feedRoomMm: 0, facts: { probe: { edgeDistanceMm: edge, padRadiusMm: pad / 2, drillDiameterMm: common.drillDiameterMm } } };
		}
		default:
			return d satisfies never;
	}
}

/** Sizes one single-layer element from a validated document (the original path, untouched by stacks and arrays). */
function sizeValid(d: DesignInput, assumed?: WarningFacts['assumedLossTangent']): SizedDesign {
	const s = d.substrate;
	const lambda0 = freeSpaceWavelengthMm(d.frequencyHz);
	const core = d.shape === 'circular' ? circularCore(d) : rectangularFamily(d);
	const marginMm = d.groundMarginMm ?? 3 * s.heightMm;
	const fed = attachFeed(d, core, marginMm);
	const formulaValues = formulaValuesOf(d, fed.feed, core);
	const ground = groundSize({ patchWidthMm: core.extentXMm, patchLengthMm: core.extentYMm, heightMm: s.heightMm, marginMm, feedRoomMm: fed.feedRoomMm });
	const resonanceAccuracy = resonanceAccuracyFor(d.shape);
	const warnings = sizingWarnings({
		heightMm: s.heightMm,
		freeSpaceWavelengthMm: lambda0,
		frequencyHz: d.frequencyHz,
		relativePermittivity: s.relativePermittivity,
		lossTangent: lossTangentOf(d),
		assumedLossTangent: assumed,
		radiationEfficiency: core.estimates.radiationEfficiency,
		radiationQualityFactor: core.estimates.radiationQualityFactor,
		marginMm,
		groundWidthMm: ground.widthMm,
		groundLengthMm: ground.lengthMm,
		bandwidthFraction: core.estimates.bandwidthFraction,
		qualityFactor: core.estimates.qualityFactor,
		circularlyPolarised: isCircularlyPolarisedShape(d.shape),
		accuracy: resonanceAccuracy,
		...(d.bandToCover ? { bandCover: { wanted: d.bandToCover, usable: usableBandOf(d, core.estimates) } } : {}),
		feedPoint: { resistanceOhm: feedKindTraits[d.feed].presents === 'edge-resistance' ? core.edgeResistanceOhm : d.targetImpedanceOhm, lineImpedanceOhm: d.feedLineImpedanceOhm },
		...fed.facts
	});
	const shapeModel =
		core.patch.kind === 'circular'
			? { radiationConductanceS: core.slots.slotConductanceS }
			: { fringeExtensionMm: core.model.fringeExtensionMm, effectiveLengthMm: core.model.effectiveLengthMm, slotConductanceS: core.slots.slotConductanceS, mutualConductanceS: core.slots.mutualConductanceS };
	return {
		input: d,
		shape: d.shape,
		feedKind: d.feed,
		frequencyHz: d.frequencyHz,
		freeSpaceWavelengthMm: lambda0,
		effectivePermittivity: core.model.effectivePermittivity,
		...shapeModel,
		edgeResistanceOhm: core.edgeResistanceOhm,
		radiationEdgeResistanceOhm: core.radiationEdgeResistanceOhm,
		resonanceAccuracy,
		textbook: textbookModel(d, core.patch),
		patch: core.patch,
		feed: fed.feed,
		ground,
		copperThicknessMm: mmFromUm(s.copperThicknessUm),
		estimates: core.estimates,
		warnings,
		...(formulaValues ? { formulaValues } : {})
	};
}

/** The patch's extent across and along the feed axis: W and L, a side, or the diameter 2a. */
function patchExtentsMm(p: SizedDesign['patch']): { widthMm: number; lengthMm: number } {
	if (p.kind === 'circular') return { widthMm: 2 * p.radiusMm, lengthMm: 2 * p.radiusMm };
	if (p.kind === 'truncated-corner') return { widthMm: p.sideMm, lengthMm: p.sideMm };
	return { widthMm: p.widthMm, lengthMm: p.lengthMm };
}

/**
 * A patch under the solder mask: sized bare first for its width, then re-sized on the substrate εr whose bare
 * εeff equals the covered one (see rf/mask-cover.ts), the width kept; the stored input stays the document.
 */
function sizeUnderMask(d: DesignInput, assumed?: WarningFacts['assumedLossTangent']): SizedDesign {
	const bare = sizeValid(d, assumed);
	const { widthMm, lengthMm } = patchExtentsMm(bare.patch);
	const cover = maskCoverValues(d);
	const p = maskCoverPermittivities(widthMm, d.substrate.heightMm, d.substrate.relativePermittivity, cover);
	const onCovered: DesignInput = { ...d, substrate: { ...d.substrate, relativePermittivity: p.equivalentSubstratePermittivity } };
	const covered = sizeValid(d.shape === 'rectangular' && d.patchWidthMm === undefined && d.overrides?.widthMm === undefined ? { ...onCovered, patchWidthMm: widthMm } : onCovered, assumed);
	const maskCover: SizedMaskCover = { model: MASK_COVER_MODEL, relativePermittivity: cover.relativePermittivity, thicknessMm: cover.thicknessMm, assumed: cover.assumed, ...p, uncoveredResonantSizeMm: lengthMm };
	return { ...covered, input: d, textbook: bare.textbook, maskCover };
}

/** The band a design is usable over: a CP patch's AR ≤ 3 dB and VSWR ≤ 2 overlap, else its VSWR ≤ 2 band. */
function usableBandOf(d: DesignInput, estimates: SizedEstimates): FrequencyBand | null {
	if (isCircularlyPolarisedShape(d.shape)) return polarisationBands(d.frequencyHz, estimates.qualityFactor).usableBand;
	return bandAround(d.frequencyHz, estimates.bandwidthFraction);
}

/** tanδ of a document whose missing value has already been filled by withLossTangent. */
function lossTangentOf(d: DesignInput): number {
	return d.substrate.lossTangent ?? laminateClassFor(d.substrate.relativePermittivity).typicalLossTangent;
}

/** Fills a missing tanδ with its εr class's typical value, and says so. */
function withLossTangent(d: DesignInput): { doc: DesignInput; assumed?: WarningFacts['assumedLossTangent'] } {
	if (d.substrate.lossTangent !== undefined) return { doc: d };
	const c = laminateClassFor(d.substrate.relativePermittivity);
	return { doc: { ...d, substrate: { ...d.substrate, lossTangent: c.typicalLossTangent } }, assumed: { value: c.typicalLossTangent, materialClass: c.name } };
}

function toDocumentPaths(error: InputError): InputError {
	return new InputError(error.issues.map((i) => ({ ...i, path: DOCUMENT_PATHS[i.path] ?? i.path })));
}

/**
 * Sizes one validated design (parse it once at the edge with parseDesignInput): computes the patch, the feed, the
 * ground, the estimates and the warnings. Throws only InputError, with document field paths (e.g.
 * "substrate.heightMm" for a substrate too thick for the patch, "targetImpedanceOhm" when no inset depth reaches the
 * target).
 */
export function size(input: DesignInput): SizedDesign {
	const { doc: d, assumed } = withLossTangent(input);
	try {
		if (needsExtendedSizing(d)) return sizeExtended(d, (g) => sizeValid(g, assumed));
		return d.solderMask && d.maskCoverage === 'covered' ? sizeUnderMask(d, assumed) : sizeValid(d, assumed);
	} catch (error) {
		if (error instanceof InputError) throw toDocumentPaths(error);
		throw error;
	}
}
