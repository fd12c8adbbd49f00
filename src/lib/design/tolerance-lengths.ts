// The tolerance study's two length fields (laminate thickness ± and etch ±) in the person's length unit. The page's GET
// form carries them as ?h= and ?etch=, with ?lengthUnit= naming the unit they were typed in; a link without it (every
// link made before units) is read in mm. Pure: the same text in browser and server.
import { isLengthUnit, lengthFormText, parseLengthMm, type LengthUnit, type ParsedQuantity } from '../units';
import { LENGTH_UNIT_FIELD } from './form-units';

/** The query keys of the two length fields, as the page has always named them. */
export const TOLERANCE_LENGTH_KEYS = { heightToleranceMm: 'h', etchToleranceMm: 'etch' } as const;
export type ToleranceLengthName = keyof typeof TOLERANCE_LENGTH_KEYS;
export type ToleranceLengthTexts = Record<ToleranceLengthName, string>;

/**
 * The fields' starting text in `unit`: what the query asked for (read in the unit its lengthUnit names, mm when none),
 * else the saved value. Query text the parser refuses is kept as typed, so the page names the problem beside it.
 */
export function toleranceLengthTexts(get: (key: string) => string | null, saved: Record<ToleranceLengthName, number>, unit: LengthUnit): ToleranceLengthTexts {
	const said = get(LENGTH_UNIT_FIELD);
	const queryUnit: LengthUnit = isLengthUnit(said) ? said : 'mm';
	const text = (name: ToleranceLengthName): string => {
		const raw = get(TOLERANCE_LENGTH_KEYS[name]);
		if (raw === null || raw.trim() === '') return lengthFormText(saved[name], unit);
		const parsed = parseLengthMm(raw, queryUnit);
		// typed in this person's unit (or refused): shown as typed; typed in the other unit: restated in this one
		return !parsed.ok || queryUnit === unit ? raw : lengthFormText(parsed.value, unit);
	};
	return { heightToleranceMm: text('heightToleranceMm'), etchToleranceMm: text('etchToleranceMm') };
}

/** The fields' text read as mm through the one parser (a bare number in `unit`, or "4 mil", "0.1 mm"). */
export function toleranceLengthsMm(texts: ToleranceLengthTexts, unit: LengthUnit): Record<ToleranceLengthName, ParsedQuantity> {
	return { heightToleranceMm: parseLengthMm(texts.heightToleranceMm, unit), etchToleranceMm: parseLengthMm(texts.etchToleranceMm, unit) };
}
