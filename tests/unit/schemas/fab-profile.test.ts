// The fab profile schema: the built-in profile validates, bad values are InputErrors naming the field and range.
import { describe, expect, it } from 'vitest';
import { builtInFabProfileFor, fabProfileSchema, parseFabProfile, STANDARD_MULTILAYER_PROFILE, STANDARD_QUICK_TURN_PROFILE } from '../../../src/lib/schemas/fab-profile';
import { InputError } from '../../../src/lib/schemas';

describe('fab profile schema', () => {
	it('accepts the built-in quick-turn profile unchanged', () => {
		expect(parseFabProfile({ ...STANDARD_QUICK_TURN_PROFILE })).toEqual(STANDARD_QUICK_TURN_PROFILE);
		expect(fabProfileSchema.safeParse(STANDARD_QUICK_TURN_PROFILE).success).toBe(true);
	});

	it('states the built-in values (common practice, no source)', () => {
		expect(STANDARD_QUICK_TURN_PROFILE).toMatchObject({
			minTraceWidthMm: 0.15,
			minSpacingMm: 0.15,
			minDrillMm: 0.3,
			minAnnularRingMm: 0.15,
			copperToEdgeMm: 0.3,
			minSlotWidthMm: 0.2,
			etchToleranceMm: 0.05,
			platedDrillToleranceMm: 0.075,
			nonPlatedDrillToleranceMm: 0.05
		});
	});

	it.each([
		// a negative trace width
		['minTraceWidthMm', -0.1],
		// a missing field
		['minDrillMm', undefined],
		// a string where a number belongs
		['copperToEdgeMm', '0.3'],
		// a slot narrower than the spacing
		['minSlotWidthMm', 0.1]
	])('rejects %s = %s with an InputError naming the field and the range', (field, value) => {
		const raw: Record<string, unknown> = { ...STANDARD_QUICK_TURN_PROFILE, [field]: value };
		if (value === undefined) delete raw[field];
		let caught: unknown;
		try {
			parseFabProfile(raw);
		} catch (e) {
			caught = e;
		}
		expect(caught).toBeInstanceOf(InputError);
		const issue = (caught as InputError).first;
		expect(issue.path).toBe(field);
		expect(issue.message).toMatch(/allowed range/);
	});

	it('rejects unknown keys and an empty name', () => {
		expect(() => parseFabProfile({ ...STANDARD_QUICK_TURN_PROFILE, minViaMm: 0.2 })).toThrow(InputError);
		expect(() => parseFabProfile({ ...STANDARD_QUICK_TURN_PROFILE, name: '  ' })).toThrow(/name/);
		expect(() => parseFabProfile(null)).toThrow(InputError);
	});
});

describe('fab profile: the process keys', () => {
	const storedBeforeTheProcessKeys = {
		name: 'Stored 8 mil house',
		minTraceWidthMm: 0.2,
		minSpacingMm: 0.2,
		minDrillMm: 0.3,
		minAnnularRingMm: 0.15,
		copperToEdgeMm: 0.3,
		minSlotWidthMm: 0.2,
		etchToleranceMm: 0.05,
		platedDrillToleranceMm: 0.075,
		nonPlatedDrillToleranceMm: 0.05
	};

	it('reads a profile stored before them as two-layer, one material, ±10 % thickness, ENIG', () => {
		expect(parseFabProfile(storedBeforeTheProcessKeys)).toEqual({ ...storedBeforeTheProcessKeys, maxCopperLayers: 2, mixedCores: false, boardThicknessTolerancePercent: 10, finish: 'ENIG' });
	});

	it.each([
		// half a copper layer
		['maxCopperLayers', 2.5],
		// a finish no house names that way
		['finish', 'gold-ish'],
		// a thickness tolerance beyond its range
		['boardThicknessTolerancePercent', 60],
		// a string for a yes/no
		['mixedCores', 'yes']
	])('rejects %s = %s with an InputError naming the field', (field, value) => {
		expect(() => parseFabProfile({ ...storedBeforeTheProcessKeys, [field]: value })).toThrow(InputError);
		try {
			parseFabProfile({ ...storedBeforeTheProcessKeys, [field]: value });
		} catch (e) {
			expect((e as InputError).first.path).toBe(field);
		}
	});

	it('builds up to 6 mixed-core coppers in the built-in multilayer profile, with the quick-turn minimums (common practice, no source)', () => {
		expect(STANDARD_MULTILAYER_PROFILE).toEqual({ ...STANDARD_QUICK_TURN_PROFILE, name: 'standard multilayer, bonded cores', maxCopperLayers: 6, mixedCores: true });
		expect(parseFabProfile({ ...STANDARD_MULTILAYER_PROFILE })).toEqual(STANDARD_MULTILAYER_PROFILE);
		expect(builtInFabProfileFor(2)).toBe(STANDARD_QUICK_TURN_PROFILE);
		expect(builtInFabProfileFor(3)).toBe(STANDARD_MULTILAYER_PROFILE);
	});
});
