// One parser for typed lengths and foil thicknesses: a number in the person's unit, or a number with an explicit unit
// ("8 mil", "0.2 mm", "0.008 in", "1 oz"). Bad text is a message for the field, never an exception.
import { mmFromMil, umFromOz, MM_PER_MIL, type CopperUnit, type LengthUnit } from './display-units';

export type ParsedQuantity = { ok: true; value: number } | { ok: false; message: string };

// A plain decimal number: optional sign, digits with an optional point, optional exponent. No thousands separators.
const NUMBER = String.raw`[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?`;
const WITH_UNIT = new RegExp(String.raw`^(${NUMBER})\s*([A-Za-zµμ"]*)$`);

/** Length unit words we accept, lower-cased, to mm per unit (mil and thou are the same 0.001 inch). */
const lengthFactors: Record<string, { unit: LengthUnit | 'other'; mmPer: number }> = {
	mm: { unit: 'mm', mmPer: 1 },
	mil: { unit: 'mil', mmPer: MM_PER_MIL },
	mils: { unit: 'mil', mmPer: MM_PER_MIL },
	thou: { unit: 'mil', mmPer: MM_PER_MIL },
	um: { unit: 'other', mmPer: 1e-3 },
	'µm': { unit: 'other', mmPer: 1e-3 },
	'μm': { unit: 'other', mmPer: 1e-3 },
	in: { unit: 'other', mmPer: 25.4 },
	'"': { unit: 'other', mmPer: 25.4 },
	cm: { unit: 'other', mmPer: 10 }
};
const copperFactors: Record<string, CopperUnit> = { um: 'um', 'µm': 'um', 'μm': 'um', oz: 'oz' };

function split(text: string): { number: number; unitWord: string } | { message: string } {
	const trimmed = text.trim();
	if (trimmed === '') return { message: 'required' };
	const m = WITH_UNIT.exec(trimmed);
	if (!m) return { message: trimmed.includes(',') ? 'use a point for decimals and no thousands separators (0.2, not 0,2)' : 'must be a number, optionally followed by a unit' };
	const number = Number(m[1]);
	if (!Number.isFinite(number)) return { message: 'must be a finite number' };
	return { number, unitWord: m[2].toLowerCase() };
}

/**
 * A typed length in mm. A bare number is in `defaultUnit`; an explicit unit wins (mm, mil, mils, thou, µm/um, cm, in
 * or "). Mil and thou are kept to 10 nm, so "8 mil" is 0.2032 mm exactly.
 */
export function parseLengthMm(text: string, defaultUnit: LengthUnit): ParsedQuantity {
	const parts = split(text);
	if ('message' in parts) return { ok: false, message: parts.message };
	const word = parts.unitWord === '' ? defaultUnit : parts.unitWord;
	const factor = lengthFactors[word];
	if (!factor) return { ok: false, message: `unknown unit "${parts.unitWord}"; use mm or mil` };
	if (factor.unit === 'mil') return { ok: true, value: mmFromMil(parts.number) };
	return { ok: true, value: Number((parts.number * factor.mmPer).toPrecision(12)) };
}

/** A typed copper foil thickness in µm. A bare number is in `defaultUnit`; "35 µm", "35 um" and "1 oz" say it. */
export function parseCopperUm(text: string, defaultUnit: CopperUnit): ParsedQuantity {
	const parts = split(text);
	if ('message' in parts) return { ok: false, message: parts.message };
	const unit = parts.unitWord === '' ? defaultUnit : copperFactors[parts.unitWord];
	if (!unit) return { ok: false, message: `unknown unit "${parts.unitWord}"; use µm or oz` };
	return { ok: true, value: unit === 'oz' ? umFromOz(parts.number) : parts.number };
}
