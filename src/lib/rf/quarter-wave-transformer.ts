// Quarter-wave transformer feed: Z = √(Z_in·R_edge), its width, and λg/4 at the design frequency.
import { ghzFromHz, mmFromM, SPEED_OF_LIGHT_M_PER_S } from '../units';
import { kirschningJansen } from './dispersive-permittivity';
import { requireNonNegative, requireObject, requirePositive, requireInRange } from './guard';
import { synthesizeMicrostrip } from './synthesize-microstrip';
import type { SizedLine } from './sized-design';

export interface TransformerInput {
	/** Resistance to transform (the patch edge). */
	loadResistanceOhm: number;
	/** Resistance the section should present at its far end. */
	sourceResistanceOhm: number;
	frequencyHz: number;
	heightMm: number;
	relativePermittivity: number;
	thicknessMm?: number;
}

/**
 * A microstrip line of width W (synthesised for the impedance) and its dispersive εeff(f)
 * (Kirschning–Jansen), with the given length.
 */
export function microstripSection(
	impedanceOhm: number,
	frequencyHz: number,
	heightMm: number,
	relativePermittivity: number,
	thicknessMm: number,
	lengthMm: number
): SizedLine {
	const line = synthesizeMicrostrip({ impedanceOhm, heightMm, relativePermittivity, thicknessMm });
	const eps = kirschningJansen(line.widthMm / heightMm, relativePermittivity, line.effectivePermittivity, ghzFromHz(frequencyHz) * heightMm);
	return { widthMm: line.widthMm, lengthMm, impedanceOhm: line.impedanceOhm, effectivePermittivity: eps };
}

/** Guided quarter wavelength λg/4 = c/(4f√εeff(f)). */
export function quarterGuidedWavelengthMm(frequencyHz: number, effectivePermittivity: number): number {
	return mmFromM(SPEED_OF_LIGHT_M_PER_S / (4 * frequencyHz * Math.sqrt(effectivePermittivity)));
}

/**
 * The λ/4 section between a load R_L and a source R_S: Zt = √(R_S·R_L) (Pozar, Microwave
 * Engineering, §2.5), width by synthesis, length λg/4 with the dispersive εeff at f0.
 * Example: 50 Ω to a 228 Ω edge → Zt ≈ 106.8 Ω.
 */
export function quarterWaveTransformer(input: TransformerInput): SizedLine {
	const d = requireObject('input', input);
	const load = requirePositive('loadResistanceOhm', d.loadResistanceOhm);
	const source = requirePositive('sourceResistanceOhm', d.sourceResistanceOhm);
	const frequencyHz = requirePositive('frequencyHz', d.frequencyHz);
	const heightMm = requirePositive('heightMm', d.heightMm);
	const er = requireInRange('relativePermittivity', d.relativePermittivity, 1, 1000);
	const thicknessMm = d.thicknessMm === undefined ? 0 : requireNonNegative('thicknessMm', d.thicknessMm);
	const section = microstripSection(Math.sqrt(load * source), frequencyHz, heightMm, er, thicknessMm, 0);
	return { ...section, lengthMm: quarterGuidedWavelengthMm(frequencyHz, section.effectivePermittivity) };
}
