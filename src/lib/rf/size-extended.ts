// Sizing beyond one substrate and one element: explicit stacks, aperture- and proximity-coupled feeds, a stacked parasitic patch, arrays.
import { InputError, type DesignInput } from '../schemas';
import { dbFromPowerRatio, mmFromUm } from '../units';
import { isLayeredFeedKind } from './feed-kinds';
import { apertureStart } from './aperture-coupling';
import { arrayFactorDirectivity, arrayPattern, gratingLobeLimitWavelengths, halfPowerBeamwidthDeg, type ArrayGeometry } from './array-factor';
import { combineDielectrics, resolveLayerStack, type DielectricGroup } from './layer-stack';
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

const onGroup = (d: DesignInput, g: DielectricGroup, feed: DesignInput['feed'] = d.feed): DesignInput => ({
	...d,
	feed,
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
		const base = sizeSingle(onGroup(d, patchGroup, 'edge'));
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
		const driven = sizeSingle(onGroup(d, lower));
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
		sized = {
			...driven,
			input: d,
			parasitic: { patch: scalePatch(driven.patch, d.parasitic.sizeRatio), sizeRatio: d.parasitic.sizeRatio, spacingMm: upper.heightMm, spacingWavelengths }
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
	const geometry: ArrayGeometry = { columns: a.columns, rows: a.rows, spacingXWavelengths: a.spacingXWavelengths, spacingYWavelengths: a.spacingYWavelengths, scanAngleDeg: a.scanAngleDeg };
	const n = a.columns * a.rows;
	const directivity = arrayFactorDirectivity(geometry);
	return {
		columns: a.columns,
		rows: a.rows,
		elementCount: n,
		spacingXMm: a.spacingXWavelengths * lambda0,
		spacingYMm: a.spacingYWavelengths * lambda0,
		spacingXWavelengths: a.spacingXWavelengths,
		spacingYWavelengths: a.spacingYWavelengths,
		scanAngleDeg: a.scanAngleDeg,
		gratingLobeLimitWavelengths: limit,
		network: { line, transformer, branchImpedanceOhm, levelPitchMm, clearanceMm, junctionLevels: Math.log2(a.columns) + Math.log2(a.rows) },
		factor: {
			arrayFactorDirectivityDbi: dbFromPowerRatio(directivity),
			// element gain + array gain of N (common practice, no source): ignores mutual coupling and network loss
			gainDbi: element.estimates.gainDbi + dbFromPowerRatio(n),
			halfPowerBeamwidthXzDeg: halfPowerBeamwidthDeg(geometry, 'xz'),
			halfPowerBeamwidthYzDeg: halfPowerBeamwidthDeg(geometry, 'yz'),
			pattern: arrayPattern(geometry)
		}
	};
}
