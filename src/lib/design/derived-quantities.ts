// The derived values of a sized design as labelled rows with display units, shared by the panel and the diff.
import { elementPattern, elementPatternGeometry, polarisationBandsOf, type FrequencyBand, type SizedDesign } from '../rf';
import { ghzFromHz } from '../units';

export interface Quantity {
	key: string;
	group: 'Patch' | 'Feed' | 'Parasitic' | 'Array' | 'Board' | 'Model' | 'Textbook model' | 'Estimates';
	label: string;
	/** In the display unit. */
	value: number | string;
	unit: string;
	/** Significant digits to show. */
	digits: number;
}

export function derivedQuantities(s: SizedDesign): Quantity[] {
	const q: Quantity[] = [];
	const add = (group: Quantity['group'], key: string, label: string, value: number | string, unit: string, digits = 5) => q.push({ key, group, label, value, unit, digits });

	const p = s.patch;
	switch (p.kind) {
		case 'rectangular':
		case 'nearly-square':
			add('Patch', 'patchWidthMm', 'Width W', p.widthMm, 'mm');
			add('Patch', 'patchLengthMm', 'Length L', p.lengthMm, 'mm');
			if (p.kind === 'nearly-square') add('Patch', 'handedness', 'Polarisation', p.handedness.toUpperCase(), '');
			break;
		case 'truncated-corner':
			add('Patch', 'patchSideMm', 'Side a', p.sideMm, 'mm');
			add('Patch', 'truncationLegMm', 'Corner cut leg', p.truncationLegMm, 'mm');
			add('Patch', 'handedness', 'Polarisation', p.handedness.toUpperCase(), '');
			break;
		case 'circular':
			add('Patch', 'patchRadiusMm', 'Radius a', p.radiusMm, 'mm');
			add('Patch', 'effectiveRadiusMm', 'Effective radius aₑ', p.effectiveRadiusMm, 'mm');
			break;
	}

	const f = s.feed;
	const line = (prefix: string, name: string, l: { widthMm: number; lengthMm: number; impedanceOhm: number }) => {
		add('Feed', `${prefix}WidthMm`, `${name} width`, l.widthMm, 'mm');
		add('Feed', `${prefix}LengthMm`, `${name} length`, l.lengthMm, 'mm');
		add('Feed', `${prefix}ImpedanceOhm`, `${name} impedance`, l.impedanceOhm, 'Ω', 4);
	};
	switch (f.kind) {
		case 'inset':
			add('Feed', 'insetDepthMm', 'Inset depth y₀', f.insetDepthMm, 'mm');
			add('Feed', 'notchGapMm', 'Notch gap', f.notchGapMm, 'mm');
			line('feedLine', 'Feed line', f.line);
			break;
		case 'edge':
			line('feedLine', 'Feed line', f.line);
			break;
		case 'quarter-wave':
			line('transformer', 'λ/4 transformer', f.transformer);
			line('feedLine', 'Feed line', f.line);
			break;
		case 'aperture-coupled':
			add('Feed', 'slotLengthMm', 'Coupling slot length', f.slotLengthMm, 'mm');
			add('Feed', 'slotWidthMm', 'Coupling slot width', f.slotWidthMm, 'mm');
			add('Feed', 'stubLengthMm', 'Open stub past the slot', f.stubLengthMm, 'mm');
			line('feedLine', 'Feed line', f.line);
			break;
		case 'proximity-coupled':
			add('Feed', 'overlapMm', 'Line run under the patch', f.overlapMm, 'mm');
			line('feedLine', 'Feed line', f.line);
			break;
		case 'probe':
			add('Feed', 'probeOffsetXMm', 'Probe offset x', f.offsetXMm, 'mm');
			add('Feed', 'probeOffsetYMm', 'Probe offset y', f.offsetYMm, 'mm');
			add('Feed', 'probeDrillDiameterMm', 'Drill ⌀', f.drillDiameterMm, 'mm', 3);
			add('Feed', 'probePadDiameterMm', 'Pad ⌀', f.padDiameterMm, 'mm', 3);
			add('Feed', 'probeClearanceDiameterMm', 'Clearance ⌀', f.clearanceDiameterMm, 'mm', 3);
			break;
		default:
			throw new Error(`derivedQuantities: no rows for feed ${f satisfies never}`);
	}

	if (s.parasitic) {
		const pp = s.parasitic.patch;
		if (pp.kind === 'rectangular' || pp.kind === 'nearly-square') {
			add('Parasitic', 'parasiticWidthMm', 'Width', pp.widthMm, 'mm');
			add('Parasitic', 'parasiticLengthMm', 'Length', pp.lengthMm, 'mm');
		}
		add('Parasitic', 'parasiticSizeRatio', 'Size over the driven patch', s.parasitic.sizeRatio, '×', 3);
		add('Parasitic', 'parasiticSpacingMm', 'Height above the driven patch', s.parasitic.spacingMm, 'mm', 4);
		add('Parasitic', 'parasiticSpacingWavelengths', 'Height above the driven patch', s.parasitic.spacingWavelengths, 'λ₀', 3);
		const cover = s.parasitic.cover;
		if (cover) {
			add('Parasitic', 'drivenUncoveredEffectivePermittivity', 'Driven patch εeff, uncovered', cover.uncoveredEffectivePermittivity, '', 4);
			add('Parasitic', 'drivenCoveredEffectivePermittivity', 'Driven patch εeff under the spacer (sized on this)', cover.coveredEffectivePermittivity, '', 4);
			add('Parasitic', 'drivenUncoveredLengthMm', 'Driven patch length if uncovered', cover.uncoveredResonantLengthMm, 'mm');
		}
		const bw = s.parasitic.bandwidth;
		if (bw) {
			add('Parasitic', 'drivenBandwidthPercent', 'Bandwidth, driven patch alone (VSWR ≤ 2)', bw.drivenBandwidthFraction * 100, '%', 3);
			add('Parasitic', 'pairBandwidthPercent', 'Bandwidth, stacked pair (estimate, VSWR ≤ 2)', bw.pairBandwidthFraction * 100, '%', 3);
		}
	}

	if (s.array) {
		const a = s.array;
		add('Array', 'arrayElements', 'Elements (columns × rows)', `${a.columns} × ${a.rows} = ${a.elementCount}`, '');
		add('Array', 'arraySpacingXMm', 'Pitch along x', a.spacingXMm, 'mm');
		if (a.rows > 1) add('Array', 'arraySpacingYMm', 'Pitch along y', a.spacingYMm, 'mm');
		add('Array', 'gratingLobeLimitWavelengths', 'Grating-lobe-free pitch below', a.gratingLobeLimitWavelengths, 'λ₀', 3);
		add('Array', 'networkTransformerWidthMm', 'T-junction λ/4 arm width', a.network.transformer.widthMm, 'mm');
		add('Array', 'networkTransformerImpedanceOhm', 'T-junction λ/4 arm impedance', a.network.transformer.impedanceOhm, 'Ω', 4);
		add('Array', 'networkJunctionLevels', 'T-junction levels', String(a.network.junctionLevels), '');
		// revisions stored before the gain budget carry no path length or breakdown
		if (a.network.pathLengthMm !== undefined) add('Array', 'networkPathLengthMm', 'Feed line per element (routed)', a.network.pathLengthMm, 'mm');
	}

	const per = s.array ? 'Element ground' : 'Ground';
	add('Board', 'groundWidthMm', `${per} width`, s.ground.widthMm, 'mm');
	add('Board', 'groundLengthMm', `${per} length`, s.ground.lengthMm, 'mm');
	add('Board', 'groundMarginMm', 'Ground margin', s.ground.marginMm, 'mm', 4);
	if (s.maskCover) {
		// the mask over the patch, as the sizing was told about it (rf/mask-cover.ts)
		const c = s.maskCover;
		add('Board', 'maskCoverRelativePermittivity', `Mask εr over the patch${c.assumed.relativePermittivity ? ' (assumed)' : ''}`, c.relativePermittivity, '', 3);
		add('Board', 'maskCoverThicknessUm', `Mask thickness over the patch${c.assumed.thickness ? ' (assumed)' : ''}`, c.thicknessMm * 1000, 'µm', 3);
		add('Board', 'maskUncoveredEffectivePermittivity', 'Patch εeff, bare', c.uncoveredEffectivePermittivity, '', 5);
		add('Board', 'maskCoveredEffectivePermittivity', 'Patch εeff under the mask (sized on this)', c.coveredEffectivePermittivity, '', 5);
		add('Board', 'maskEquivalentPermittivity', 'Equivalent substrate εr used', c.equivalentSubstratePermittivity, '', 5);
		add('Board', 'maskUncoveredSizeMm', 'Patch length if bare', c.uncoveredResonantSizeMm, 'mm');
	}

	add('Model', 'frequencyGHz', 'Frequency f₀', ghzFromHz(s.frequencyHz), 'GHz', 6);
	add('Model', 'freeSpaceWavelengthMm', 'Free-space wavelength λ₀', s.freeSpaceWavelengthMm, 'mm');
	if (p.kind === 'circular') {
		// the TM11 cavity model: εr itself, the effective radius (above) and the rim's radiation conductance
		add('Model', 'effectivePermittivity', 'Cavity permittivity (εr)', s.effectivePermittivity, '', 4);
		if (s.radiationConductanceS !== undefined) add('Model', 'radiationConductanceMs', 'Radiation conductance G_rad', s.radiationConductanceS * 1000, 'mS', 4);
	} else {
		add('Model', 'effectivePermittivity', 'Effective permittivity εeff', s.effectivePermittivity, '', 4);
		if (s.fringeExtensionMm !== undefined) add('Model', 'fringeExtensionMm', 'Fringe extension ΔL', s.fringeExtensionMm, 'mm', 4);
		if (s.effectiveLengthMm !== undefined) add('Model', 'effectiveLengthMm', 'Effective length L + 2ΔL', s.effectiveLengthMm, 'mm');
		if (s.slotConductanceS !== undefined) add('Model', 'slotConductanceMs', 'Slot conductance G₁', s.slotConductanceS * 1000, 'mS', 4);
		if (s.mutualConductanceS !== undefined) add('Model', 'mutualConductanceMs', 'Mutual conductance G₁₂', s.mutualConductanceS * 1000, 'mS', 4);
	}
	add('Model', 'edgeResistanceOhm', p.kind === 'circular' ? 'Rim resistance (with losses)' : 'Edge resistance (with losses)', s.edgeResistanceOhm, 'Ω', 4);
	// revisions stored before the corrected first pass carry no radiation-only value, band or textbook row
	if (s.radiationEdgeResistanceOhm !== undefined) add('Model', 'radiationEdgeResistanceOhm', p.kind === 'circular' ? 'Rim resistance (radiation only)' : 'Edge resistance (radiation only)', s.radiationEdgeResistanceOhm, 'Ω', 4);
	const a = s.resonanceAccuracy as SizedDesign['resonanceAccuracy'] | undefined;
	if (a) add('Model', 'resonanceAccuracy', 'Expected resonance error', `typically within ±${a.typicalErrorPercent} % for h/λ₀ ≤ ${a.maximumHeightRatio}, εr ${a.permittivityRange[0]}–${a.permittivityRange[1]}`, '');

	const t = s.textbook as SizedDesign['textbook'] | undefined;
	if (t) {
		add('Textbook model', 'textbookResonantDimensionMm', p.kind === 'circular' ? 'Radius a' : p.kind === 'rectangular' ? 'Length L' : 'Side of the square', t.resonantDimensionMm, 'mm');
		add('Textbook model', 'textbookResonanceGHz', 'Its resonance of the first-pass patch', ghzFromHz(t.resonanceOfFirstPassHz), 'GHz', 5);
		if (t.insetDepthMm !== undefined) add('Textbook model', 'textbookInsetDepthMm', 'Inset depth y₀ (cos²)', t.insetDepthMm, 'mm');
		if (t.probeOffsetMm !== undefined) add('Textbook model', 'textbookProbeOffsetMm', 'Probe from the centre', t.probeOffsetMm, 'mm');
	}

	const e = s.estimates;
	add('Estimates', 'bandwidthPercent', 'Bandwidth (VSWR ≤ 2)', e.bandwidthFraction * 100, '%', 3);
	add('Estimates', 'qualityFactor', 'Quality factor Q', e.qualityFactor, '', 3);
	add('Estimates', 'directivityDbi', 'Directivity', e.directivityDbi, 'dBi', 3);
	add('Estimates', 'radiationEfficiencyPercent', 'Radiation efficiency', e.radiationEfficiency * 100, '%', 3);
	if (e.surfaceWaveEfficiency !== undefined) add('Estimates', 'surfaceWaveEfficiencyPercent', 'Space-wave share (surface waves)', e.surfaceWaveEfficiency * 100, '%', 3);
	add('Estimates', 'gainDbi', s.array ? 'Element gain' : 'Gain', e.gainDbi, 'dBi', 3);
	if (s.array) {
		const af = s.array.factor;
		add('Estimates', 'arrayFactorDirectivityDbi', 'Array-factor directivity', af.arrayFactorDirectivityDbi, 'dBi', 3);
		const b = af.gainBreakdown as typeof af.gainBreakdown | undefined;
		if (b) {
			add('Estimates', 'arrayFeedLossDb', 'Feed-line loss (conductor + dielectric)', b.feedLossDb, 'dB', 3);
			add('Estimates', 'arrayMismatchLossDb', 'Mismatch loss at the port', b.mismatchLossDb, 'dB', 3);
		}
		add('Estimates', 'arrayGainDbi', b ? 'Array gain (element + 10·log N − feed loss − mismatch)' : 'Array gain', af.gainDbi, 'dBi', 3);
		// a single row has no −3 dB point across it (isotropic elements): said in words, without a unit
		const width = (deg: number | null) => (deg === null ? { v: 'none in view', u: '' } : { v: deg, u: '°' });
		const xz = width(af.halfPowerBeamwidthXzDeg);
		const yz = width(af.halfPowerBeamwidthYzDeg);
		add('Estimates', 'beamwidthXzDeg', 'Beamwidth x–z (−3 dB)', xz.v, xz.u, 3);
		add('Estimates', 'beamwidthYzDeg', 'Beamwidth y–z (−3 dB)', yz.v, yz.u, 3);
	}
	// a single patch's pattern and a CP patch's bands, derived from the stored sizing (old revisions too)
	const geometry = elementPatternGeometry(s);
	if (geometry) {
		const pattern = elementPattern(geometry);
		const width = (deg: number | null) => (deg === null ? { v: 'wider than 180°', u: '' } : { v: deg, u: '°' });
		const e = width(pattern.halfPowerBeamwidthEDeg);
		const h = width(pattern.halfPowerBeamwidthHDeg);
		add('Estimates', 'beamwidthEDeg', 'Beamwidth E-plane (−3 dB)', e.v, e.u, 3);
		add('Estimates', 'beamwidthHDeg', 'Beamwidth H-plane (−3 dB)', h.v, h.u, 3);
	}
	const cp = polarisationBandsOf(s);
	if (cp) {
		const mhz = (b: FrequencyBand | null) => (b === null ? 'none' : `${(b.lowerHz / 1e6).toFixed(1)}–${(b.upperHz / 1e6).toFixed(1)}`);
		add('Estimates', 'axialRatioBandMHz', 'Axial ratio ≤ 3 dB band', mhz(cp.axialRatioBand), 'MHz');
		add('Estimates', 'cpImpedanceBandMHz', 'VSWR ≤ 2 band (both modes)', mhz(cp.impedanceBand), 'MHz');
		add('Estimates', 'usableBandMHz', 'Usable CP band (overlap)', mhz(cp.usableBand), 'MHz');
	}
	return q;
}

/** A value as text: fixed significant digits, no exponent for the ranges we show. */
export function formatValue(value: number | string, digits: number): string {
	if (typeof value === 'string') return value;
	if (!Number.isFinite(value)) return '—';
	const abs = Math.abs(value);
	if (abs === 0) return '0';
	const decimals = Math.max(0, Math.min(6, digits - 1 - Math.floor(Math.log10(abs))));
	return value.toFixed(decimals);
}

/** An input value as typed: up to seven significant digits, no trailing zeros ("2.45", "58000000"). */
export function formatPlain(value: number): string {
	return formatValue(value, 7).replace(/(\.\d*?)0+$/, '$1').replace(/\.$/, '');
}
