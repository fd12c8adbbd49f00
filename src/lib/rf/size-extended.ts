// Sizing beyond one substrate and one element: explicit stacks, aperture- and proximity-coupled feeds, a stacked parasitic patch, arrays.
import { InputError, sharedFieldsOf, type DesignInput } from '../schemas';
import { dbFromPowerRatio, mmFromUm } from '../units';
import { isLayeredFeedKind } from './feed-kinds';
import { apertureStart } from './aperture-coupling';
import { arrayFactorDirectivity, arrayPattern, gratingLobeLimitWavelengths, halfPowerBeamwidthDeg, type ArrayGeometry } from './array-factor';
import { staticEffectivePermittivity } from './analyze-microstrip';
import { BODE_FANO_BANDWIDTH_Q, COVERED_MICROSTRIP_MODEL, DOUBLE_TUNED_BANDWIDTH_Q, coveredEffectivePermittivity, equivalentSubstratePermittivity } from './covered-microstrip';
import { combineDielectrics, resolveLayerStack, type DielectricGroup } from './layer-stack';
import { corporateFeedPath, feedLineLossDb, feedMismatchLossDb, feedPathLengthMm } from './corporate-feed-budget';
import { lineLossDbPerMm } from './microstrip-loss';
import { microstripSection, quarterGuidedWavelengthMm } from './quarter-wave-transformer';
import type { SizedArray, SizedDesign, SizedFeed, SizedLine, SizedPatch, SizingWarning } from './sized-design';

/** Parasitic spacing range in λ0 that published stacked-patch guidelines start from (about 0.04–0.1 λ0 of low-εr spacer; from memory). */
export const PARASITIC_SPACING_WAVELENGTHS = { min: 0.04, max: 0.12 } as const;
/** Clearance from the corporate feed to other copper, in line widths (common practice, no source: 2–3 widths keeps coupling small). */
export const NETWORK_CLEARANCE_LINE_WIDTHS = 2;

/** True when the document uses anything the single-layer path does not know. */
export function needsExtendedSizing(d: DesignInput): boolean {
	return d.stack !== undefined || d.array !== undefined || d.parasitic !== undefined || isLayeredFeedKind(d.feed);
}

type SizeSingle = (d: DesignInput) => SizedDesign;

const onGroup = (d: DesignInput, g: DielectricGroup): DesignInput => ({
	...d,
	substrate: { ...d.substrate, relativePermittivity: g.relativePermittivity, heightMm: g.heightMm, lossTangent: g.lossTangent }
});

function scalePatch(p: SizedPatch, k: number): SizedPatch {
	switch (p.kind) {
		case 'rectangular':
			return { ...p, widthMm: p.widthMm * k, lengthMm: p.lengthMm * k };
		case 'nearly-square':
			return { ...p, widthMm: p.widthMm * k, lengthMm: p.lengthMm * k };
		case 'truncated-corner':
			return { ...p, sideMm: p.sideMm * k, truncationLegMm: p.truncationLegMm * k };
		case 'circular':
			return { ...p, radiusMm: p.radiusMm * k, effectiveRadiusMm: p.effectiveRadiusMm * k };
	}
}

/** What the stacked-pair bandwidth estimate is. */
const BANDWIDTH_MODEL =
	'estimate: the two coupled resonators of a stacked pair at their best double-tuned VSWR ≤ 2 response on the driven patch’s Q, 1.733/Q (Pues & Van de Capelle’s double-tuned match, IEEE Trans. Antennas Propag. 1989, from memory); the Bode–Fano limit π/(Q·ln 3) is the ceiling of any match. The parasitic’s own radiation and the real coupling are not modelled: tune by sweep.';

/** Width of the patch across the feed axis (the diameter of a disc). */
function patchWidthOf(p: SizedPatch): number {
	return p.kind === 'circular' ? 2 * p.radiusMm : p.kind === 'truncated-corner' ? p.sideMm : p.widthMm;
}

/** Resonant length of the patch along the feed axis. */
function patchLengthMm(p: SizedPatch): number {
	return p.kind === 'circular' ? 2 * p.radiusMm : p.kind === 'truncated-corner' ? p.sideMm : p.lengthMm;
}

/** The line the corporate feed and the element's feed are drawn on: its dielectric group. */
function lineGroup(d: DesignInput, groups: DielectricGroup[]): DielectricGroup {
	return groups.length === 1 ? groups[0] : groups[1];
}

export function sizeExtended(d: DesignInput, sizeSingle: SizeSingle): SizedDesign {
	const { entries, groups } = resolveLayerStack(d);
	const t = entries[0].kind === 'copper' ? entries[0].thicknessMm : mmFromUm(d.substrate.copperThicknessUm);
	const extraWarnings: SizingWarning[] = [];
	let sized: SizedDesign;
	const layered = d.feed;
	if (isLayeredFeedKind(layered)) {
		const [upper, lower] = groups;
		// the slot couples through the upper dielectric alone; the buried line sees both above it
		const patchGroup = layered === 'aperture-coupled' ? upper : combineDielectrics([upper, lower]);
		const base = sizeSingle(onGroup({ ...sharedFieldsOf(d), feed: 'edge' }, patchGroup));
		const margin = base.ground.marginMm;
		const probeLine = microstripSection(d.feedLineImpedanceOhm, d.frequencyHz, lower.heightMm, lower.relativePermittivity, t, 0);
		const lambdaG = 4 * quarterGuidedWavelengthMm(d.frequencyHz, probeLine.effectivePermittivity);
		const L = patchLengthMm(base.patch);
		let feed: SizedFeed;
		let tuneBy: string;
		switch (layered) {
			case 'aperture-coupled': {
				const start = apertureStart(L, lambdaG);
				const slotLengthMm = d.slot?.lengthMm ?? start.slotLengthMm;
				const slotWidthMm = d.slot?.widthMm ?? start.slotWidthMm;
				const stubLengthMm = d.slot?.stubLengthMm ?? start.stubLengthMm;
				feed = { kind: 'aperture-coupled', line: { ...probeLine, lengthMm: margin + L / 2 }, slotLengthMm, slotWidthMm, stubLengthMm };
				tuneBy = 'slot.lengthMm and slot.stubLengthMm';
				break;
			}
			case 'proximity-coupled': {
				const overlapMm = d.proximity?.overlapMm ?? L / 2;
				if (!(overlapMm < L)) throw new InputError([{ path: 'proximity.overlapMm', value: overlapMm, message: `must be less than the patch length ${L.toFixed(3)} mm; allowed range [0, ${L.toFixed(3)})` }]);
				feed = { kind: 'proximity-coupled', line: { ...probeLine, lengthMm: margin + overlapMm }, overlapMm };
				tuneBy = 'proximity.overlapMm';
				break;
			}
			default:
				return layered satisfies never;
		}
		extraWarnings.push({
			code: 'first-pass-coupling',
			message: `The ${layered} sizes are first-pass values from published design guidelines, not a solved match: tune ${tuneBy} by sweep against a field solver or a measurement.`
		});
		// the feed's own warnings (notch, line width) do not apply to a coupled feed; keep the substrate ones
		const kept = base.warnings.filter((w) => w.code !== 'feed-wider-than-notch' && w.code !== 'inset-too-deep' && w.code !== 'feed-mismatch');
		sized = { ...base, input: d, feedKind: layered, feed, warnings: kept };
	} else if (d.parasitic) {
		const [upper, lower] = groups;
		// the driven patch lies under the spacer: size it on the covered εeff (as an equivalent substrate εr at its own width)
		const uncovered = sizeSingle(onGroup(d, lower));
		const widthMm = patchWidthOf(uncovered.patch);
		const cover = { widthMm, heightMm: lower.heightMm, relativePermittivity: lower.relativePermittivity, coverHeightMm: upper.heightMm, coverRelativePermittivity: upper.relativePermittivity };
		const coveredEff = coveredEffectivePermittivity(cover);
		const uncoveredEff = staticEffectivePermittivity(widthMm / lower.heightMm, lower.relativePermittivity);
		const equivalentPermittivity = equivalentSubstratePermittivity(widthMm, lower.heightMm, coveredEff);
		const onCovered = onGroup(d, { ...lower, relativePermittivity: equivalentPermittivity });
		const driven = sizeSingle(d.shape === 'rectangular' && d.patchWidthMm === undefined ? { ...onCovered, patchWidthMm: widthMm } : onCovered);
		const lambda0 = driven.freeSpaceWavelengthMm;
		const spacingWavelengths = upper.heightMm / lambda0;
		if (spacingWavelengths < PARASITIC_SPACING_WAVELENGTHS.min || spacingWavelengths > PARASITIC_SPACING_WAVELENGTHS.max) {
			extraWarnings.push({
				code: 'parasitic-spacing',
				message: `The spacer between driven and parasitic patch is ${spacingWavelengths.toFixed(3)} λ0; stacked-patch guidelines start from ${PARASITIC_SPACING_WAVELENGTHS.min}–${PARASITIC_SPACING_WAVELENGTHS.max} λ0 (a low-εr spacer). Outside it the two resonances stop merging into one wide band.`
			});
		}
		extraWarnings.push({
			code: 'first-pass-coupling',
			message: `The parasitic patch (×${d.parasitic.sizeRatio} the driven one) and its spacing are first-pass values from published guidelines: tune parasitic.sizeRatio by sweep for the bandwidth you need.`
		});
		const q = driven.estimates.qualityFactor;
		sized = {
			...driven,
			input: d,
			parasitic: {
				patch: scalePatch(driven.patch, d.parasitic.sizeRatio),
				sizeRatio: d.parasitic.sizeRatio,
				spacingMm: upper.heightMm,
				spacingWavelengths,
				cover: { model: COVERED_MICROSTRIP_MODEL, uncoveredEffectivePermittivity: uncoveredEff, coveredEffectivePermittivity: coveredEff, equivalentSubstratePermittivity: equivalentPermittivity, uncoveredResonantLengthMm: patchLengthMm(uncovered.patch) },
				bandwidth: {
					model: BANDWIDTH_MODEL,
					drivenBandwidthFraction: driven.estimates.bandwidthFraction,
					pairBandwidthFraction: DOUBLE_TUNED_BANDWIDTH_Q / q,
					limitBandwidthFraction: BODE_FANO_BANDWIDTH_Q / q
				}
			}
		};
	} else {
		// one dielectric group between two coppers: the single-layer path on the equivalent layer
		sized = { ...sizeSingle(onGroup(d, groups[0])), input: d };
	}
	if (d.stack) sized = { ...sized, layerStack: entries, copperThicknessMm: t };
	if (d.array) {
		const array = sizeArray(d, sized, lineGroup(d, groups), t, extraWarnings);
		sized = { ...sized, array };
	}
	return { ...sized, warnings: [...sized.warnings, ...extraWarnings] };
}

/** How far the element's copper on the feed layer reaches left of its feed point (as artwork/build-element.ts draws it). */
function elementLeftReachMm(e: SizedDesign, line: SizedLine): number {
	const f = e.feed;
	if (f.kind === 'aperture-coupled') return Math.max(f.slotLengthMm, f.line.widthMm) / 2;
	if (f.kind === 'proximity-coupled') return f.line.widthMm / 2;
	const p = e.patch;
	const half = p.kind === 'circular' ? p.radiusMm : p.kind === 'truncated-corner' ? p.sideMm / 2 : p.widthMm / 2;
	return Math.max(half, line.widthMm / 2);
}

/** The element's feed line past the network's run: into the inset notch, or under the patch to the coupling point. */
function elementLeadBeyondRunMm(e: SizedDesign): number {
	const f = e.feed;
	if (f.kind === 'inset') return f.insetDepthMm;
	if (f.kind === 'aperture-coupled') return patchLengthMm(e.patch) / 2;
	if (f.kind === 'proximity-coupled') return f.overlapMm;
	return 0;
}

function sizeArray(d: DesignInput, element: SizedDesign, g: DielectricGroup, thicknessMm: number, warnings: SizingWarning[]): SizedArray {
	const a = d.array!;
	const lambda0 = element.freeSpaceWavelengthMm;
	const z0 = d.feedLineImpedanceOhm;
	const line: SizedLine = microstripSection(z0, d.frequencyHz, g.heightMm, g.relativePermittivity, thicknessMm, 0);
	// each arm turns Z0 into 2·Z0 at the junction, so two arms in parallel match the Z0 trunk (Pozar, Microwave Engineering, §2.5 and §7.2; from memory)
	const branchImpedanceOhm = 2 * z0;
	const section = microstripSection(Math.sqrt(z0 * branchImpedanceOhm), d.frequencyHz, g.heightMm, g.relativePermittivity, thicknessMm, 0);
	const transformer: SizedLine = { ...section, lengthMm: quarterGuidedWavelengthMm(d.frequencyHz, section.effectivePermittivity) };
	const clearanceMm = NETWORK_CLEARANCE_LINE_WIDTHS * line.widthMm;
	const levelPitchMm = Math.max(line.widthMm, transformer.widthMm) + clearanceMm;
	const limit = gratingLobeLimitWavelengths(a.scanAngleDeg);
	for (const [axis, s] of [['x', a.spacingXWavelengths], ['y', a.spacingYWavelengths]] as const) {
		const count = axis === 'x' ? a.columns : a.rows;
		if (count > 1 && s >= limit) {
			warnings.push({
				code: 'grating-lobes',
				message: `Element spacing along ${axis} is ${s} λ0, at or above the grating-lobe limit 1/(1+|sin θ0|) = ${limit.toFixed(3)} λ0 for a scan to ${a.scanAngleDeg}°: a second full-size beam enters visible space. Reduce array.spacing${axis.toUpperCase()}Wavelengths below ${limit.toFixed(3)}.`
			});
		}
	}
	const spacingXMm = a.spacingXWavelengths * lambda0;
	const spacingYMm = a.spacingYWavelengths * lambda0;
	const levels = corporateFeedPath({
		columns: a.columns,
		rows: a.rows,
		spacingXMm,
		spacingYMm,
		line,
		transformer,
		levelPitchMm,
		clearanceMm,
		marginMm: element.ground.marginMm,
		elementLeftReachMm: elementLeftReachMm(element, line),
		elementLeadMm: clearanceMm + elementLeadBeyondRunMm(element)
	});
	const medium = { frequencyHz: d.frequencyHz, relativePermittivity: g.relativePermittivity, lossTangent: g.lossTangent, conductivitySPerM: d.substrate.copperConductivitySPerM };
	const perMm = (l: SizedLine) => lineLossDbPerMm(l, d.frequencyHz, g.relativePermittivity, g.lossTangent, d.substrate.copperConductivitySPerM);
	// a quarter-wave element's own transformer is part of every path too
	const ownTransformer = element.feed.kind === 'quarter-wave' ? element.feed.transformer : null;
	const feedLossDb = feedLineLossDb(levels, line, transformer, medium) + (ownTransformer ? ownTransformer.lengthMm * perMm(ownTransformer) : 0);
	const elementResistanceOhm = element.feed.kind === 'edge' ? element.edgeResistanceOhm : element.feed.kind === 'inset' || element.feed.kind === 'quarter-wave' ? d.targetImpedanceOhm : z0;
	const mismatchLossDb = feedMismatchLossDb(levels, elementResistanceOhm, line, transformer, z0, d.frequencyHz);
	const length = feedPathLengthMm(levels, transformer.lengthMm);
	const geometry: ArrayGeometry = { columns: a.columns, rows: a.rows, spacingXWavelengths: a.spacingXWavelengths, spacingYWavelengths: a.spacingYWavelengths, scanAngleDeg: a.scanAngleDeg };
	const n = a.columns * a.rows;
	const directivity = arrayFactorDirectivity(geometry);
	return {
		columns: a.columns,
		rows: a.rows,
		elementCount: n,
		spacingXMm,
		spacingYMm,
		spacingXWavelengths: a.spacingXWavelengths,
		spacingYWavelengths: a.spacingYWavelengths,
		scanAngleDeg: a.scanAngleDeg,
		gratingLobeLimitWavelengths: limit,
		network: {
			line,
			transformer,
			branchImpedanceOhm,
			levelPitchMm,
			clearanceMm,
			junctionLevels: Math.log2(a.columns) + Math.log2(a.rows),
			pathLengthMm: length.lineMm + length.transformerMm + (ownTransformer?.lengthMm ?? 0),
			lineLossDbPerMm: perMm(line),
			transformerLossDbPerMm: perMm(transformer),
			elementResistanceOhm
		},
		factor: {
			arrayFactorDirectivityDbi: dbFromPowerRatio(directivity),
			// element gain + array gain of N (equal split, in phase) − the network's line and mismatch loss; mutual coupling ignored
			gainDbi: element.estimates.gainDbi + dbFromPowerRatio(n) - feedLossDb - mismatchLossDb,
			gainBreakdown: { elementGainDbi: element.estimates.gainDbi, arrayGainDb: dbFromPowerRatio(n), feedLossDb, mismatchLossDb },
			halfPowerBeamwidthXzDeg: halfPowerBeamwidthDeg(geometry, 'xz'),
			halfPowerBeamwidthYzDeg: halfPowerBeamwidthDeg(geometry, 'yz'),
			pattern: arrayPattern(geometry)
		}
	};
}
