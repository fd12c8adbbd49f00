// A person's display units: lengths in mm or mil, copper foil in µm or oz. Stored values stay in mm (and µm for foil);
// these conversions are only for what forms show and accept.

/** The length units a person can read and type lengths in. */
export const lengthUnits = ['mm', 'mil'] as const;
export type LengthUnit = (typeof lengthUnits)[number];

/** The units a person can read and type copper foil thickness in. */
export const copperUnits = ['um', 'oz'] as const;
export type CopperUnit = (typeof copperUnits)[number];

/** Lengths in `length`, copper foil thickness in `copper`. */
export interface DisplayUnits {
	length: LengthUnit;
	copper: CopperUnit;
}

/** Millimetres and micrometres: what everyone starts with, and what everything is stored in. */
export const DEFAULT_DISPLAY_UNITS: DisplayUnits = Object.freeze({ length: 'mm', copper: 'um' });

/** 1 mil = 0.001 inch = 0.0254 mm, exactly (the inch is 25.4 mm by the 1959 international yard and pound agreement). */
export const MM_PER_MIL = 0.0254;

/**
 * Micrometres of copper foil per ounce per square foot: 35 µm (common practice, no source; the figure board houses
 * print). From mass and area alone, 28.349523125 g over 0.09290304 m² of copper at 8.96 g/cm³ gives 34.06 µm; rolled
 * and electrodeposited foil tables carry a little more. Foil is ordered by weight, so oz is a name for a nominal thickness.
 */
export const UM_PER_OZ = 35;

/** Lengths converted from mil are kept to 10 nm: finer means nothing on a board, and it undoes binary noise (8 mil → 0.2032 mm). */
const MM_STEP = 1e-5;
/** Foil thickness converted from oz is kept to 0.01 µm. */
const UM_STEP = 1e-2;

const toStep = (value: number, step: number): number => Math.round(value / step) * step;
/** Removes the float noise a multiplication by a step leaves (0.20320000000000002 → 0.2032). */
const clean = (value: number): number => Number(value.toPrecision(12));

export const isLengthUnit = (text: unknown): text is LengthUnit => typeof text === 'string' && (lengthUnits as readonly string[]).includes(text);
export const isCopperUnit = (text: unknown): text is CopperUnit => typeof text === 'string' && (copperUnits as readonly string[]).includes(text);

export const milFromMm = (mm: number): number => mm / MM_PER_MIL;
export const mmFromMil = (mil: number): number => clean(toStep(mil * MM_PER_MIL, MM_STEP));
export const ozFromUm = (um: number): number => um / UM_PER_OZ;
export const umFromOz = (oz: number): number => clean(toStep(oz * UM_PER_OZ, UM_STEP));

/** A length in mm as a number in `unit`. */
export const lengthInUnit = (mm: number, unit: LengthUnit): number => (unit === 'mil' ? milFromMm(mm) : mm);
/** A number in `unit` as mm (a mil value kept to 10 nm). */
export const mmFromLengthUnit = (value: number, unit: LengthUnit): number => (unit === 'mil' ? mmFromMil(value) : value);
/** A foil thickness in µm as a number in `unit`. */
export const copperInUnit = (um: number, unit: CopperUnit): number => (unit === 'oz' ? ozFromUm(um) : um);
/** A number in `unit` as µm (an oz value kept to 0.01 µm). */
export const umFromCopperUnit = (value: number, unit: CopperUnit): number => (unit === 'oz' ? umFromOz(value) : value);

/** The symbol printed beside a value. */
export const lengthSymbol = (unit: LengthUnit): string => unit;
export const copperSymbol = (unit: CopperUnit): string => (unit === 'oz' ? 'oz' : 'µm');

/**
 * A length as form text in `unit`, precise enough to come back unchanged: mm as stored, mil to four decimals
 * (0.0001 mil = 2.5 nm, under the 10 nm a mil entry is kept to), so 1.6 mm shows as 62.9921 and saves as 1.6 again.
 */
export function lengthFormText(mm: number, unit: LengthUnit): string {
	if (unit === 'mm') return String(mm);
	return String(Number(milFromMm(mm).toFixed(4)));
}

/** A foil thickness as form text in `unit`: µm as stored, oz to four decimals (35 µm → 1, 18 µm → 0.5143). */
export function copperFormText(um: number, unit: CopperUnit): string {
	if (unit === 'um') return String(um);
	return String(Number(ozFromUm(um).toFixed(4)));
}
