// A solder mask over the patch: the covered εeff by the covered-microstrip model, and the equivalent substrate εr the sizing uses.
import type { DesignInput } from '../schemas';
import { staticEffectivePermittivity } from './analyze-microstrip';
import { coveredEffectivePermittivity, equivalentSubstratePermittivity } from './covered-microstrip';

/** Mask εr when the document states none: common practice, no source (liquid photoimageable masks state 3.5–4.2). */
export const DEFAULT_MASK_RELATIVE_PERMITTIVITY = 3.8;
/** Mask thickness over copper when the document states none: common practice, no source (10–30 µm over copper). */
export const DEFAULT_MASK_THICKNESS_UM = 20;

/** The correction's name, shown in the sizing report and the fab notes. */
export const MASK_COVER_MODEL =
	'mask-covered patch: εeff of the patch as a wide microstrip under a thin dielectric cover (partial-capacitance covered-microstrip model, rf/covered-microstrip.ts; the effect Bahl, Bhartia & Stuchly treat in IEEE Trans. AP-30(2), 1982, from memory), the patch then sized on the equivalent substrate εr';

/** What the sizing was told about a mask over the patch. */
export interface SizedMaskCover {
	model: string;
	/** The mask's εr and thickness used (the document's, else the defaults above). */
	relativePermittivity: number;
	thicknessMm: number;
	/** Whether εr and thickness came from the document or are the stated defaults. */
	assumed: { relativePermittivity: boolean; thickness: boolean };
	/** εeff of the patch bare and under the mask (Hammerstad–Jensen at the patch's W/h, then covered). */
	uncoveredEffectivePermittivity: number;
	coveredEffectivePermittivity: number;
	/** The substrate εr the single-layer sizing was given so that it sizes on the covered εeff. */
	equivalentSubstratePermittivity: number;
	/** The patch's resonant extent along the feed axis (length L, or diameter 2a) as if bare, for comparison. */
	uncoveredResonantSizeMm: number;
}

/** The mask's εr and thickness for a covered design, with which of them are the stated defaults. */
export function maskCoverValues(d: Pick<DesignInput, 'maskCover'>): { relativePermittivity: number; thicknessMm: number; assumed: SizedMaskCover['assumed'] } {
	const er = d.maskCover?.relativePermittivity;
	const t = d.maskCover?.thicknessUm;
	return {
		relativePermittivity: er ?? DEFAULT_MASK_RELATIVE_PERMITTIVITY,
		thicknessMm: (t ?? DEFAULT_MASK_THICKNESS_UM) / 1000,
		assumed: { relativePermittivity: er === undefined, thickness: t === undefined }
	};
}

/**
 * The covered εeff of a patch of width `widthMm` on h, εr under a mask of thickness tc and εr2, and the
 * equivalent substrate εr whose bare Hammerstad–Jensen εeff at the same W/h equals it. A 20 µm, εr 3.8 mask
 * on a 38 mm patch over 1.6 mm εr 4.4 raises εeff from ≈ 4.08 to ≈ 4.09 (the resonance drops ≈ 0.1 %).
 */
export function maskCoverPermittivities(widthMm: number, heightMm: number, relativePermittivity: number, cover: { relativePermittivity: number; thicknessMm: number }) {
	const covered = coveredEffectivePermittivity({ widthMm, heightMm, relativePermittivity, coverHeightMm: cover.thicknessMm, coverRelativePermittivity: cover.relativePermittivity });
	return {
		uncoveredEffectivePermittivity: staticEffectivePermittivity(widthMm / heightMm, relativePermittivity),
		coveredEffectivePermittivity: covered,
		equivalentSubstratePermittivity: equivalentSubstratePermittivity(widthMm, heightMm, covered)
	};
}
