// Abuse review item 11: every text field a person fills refuses control characters with one shared refinement,
// and the message names the field and the character as U+XXXX.
import type { z } from 'zod';
import { describe, expect, it } from 'vitest';
import {
	designInputSchema,
	designNameSchema,
	fabProfileSchema,
	findControlCharacter,
	laminateInputSchema,
	revisionNoteSchema,
	STANDARD_QUICK_TURN_PROFILE,
	toOneLine,
	waiverReasonSchema
} from '../../../src/lib/schemas';
import { createTeamSchema, createTokenSchema, signUpSchema } from '../../../src/lib/schemas/account';
import { createDesignBodySchema, createRevisionBodySchema, waiverBodySchema } from '../../../src/lib/schemas/api';
import { sweepPlanDraftSchema } from '../../../src/lib/schemas/sweep-plan';
import { startDesignSchema } from '../../../src/lib/server/designs/start-design';

const input = { name: 'Pier sensor', frequencyHz: 915e6, substrate: { relativePermittivity: 3.38, heightMm: 1.524 } };

/** Each field: its name, its schema and a valid document with `text` in that field. */
const singleLineFields: [string, z.ZodType, (text: string) => unknown][] = [
	['design input name', designInputSchema, (text) => ({ ...input, name: text })],
	['design name (API create)', createDesignBodySchema, (text) => ({ input, name: text })],
	['design name (new-design form)', startDesignSchema, (text) => ({ name: text, frequencyGHz: '2.45', shape: 'rectangular', laminateId: 'lam' })],
	['fab profile name', fabProfileSchema, (text) => ({ ...STANDARD_QUICK_TURN_PROFILE, name: text })],
	['laminate name', laminateInputSchema, (text) => ({ name: text, properties: { relativePermittivity: 3.38, lossTangent: 0.0027, heightMm: 1.524, copperThicknessUm: 35, relativePermittivityTolerance: 0.05, heightToleranceMm: 0.05 } })],
	['team name', createTeamSchema, (text) => ({ name: text })],
	['sign-up name', signUpSchema, (text) => ({ displayName: text, email: 'ana@example.org', password: 'a long enough password' })],
	['API token name', createTokenSchema, (text) => ({ name: text })],
	['sweep plan name', sweepPlanDraftSchema, (text) => ({ name: text, combine: 'grid', axes: [] })]
];

/** Text areas: Enter (LF, CR LF) and Tab are typed there; every other control character is refused. */
const multiLineFields: [string, z.ZodType, (text: string) => unknown][] = [
	['revision note', revisionNoteSchema, (text) => text],
	['revision note (API create)', createDesignBodySchema, (text) => ({ input, note: text })],
	['revision note (API revision)', createRevisionBodySchema, (text) => ({ parent: 'A', input, note: text })],
	['waiver reason', waiverReasonSchema, (text) => text],
	['waiver reason (API)', waiverBodySchema, (text) => ({ waiver: text })]
];

/** One of each class: C0 (with NUL, tab, LF, CR, VT, FF, ESC), DEL, C1 (with NEL), LS, PS. */
const LINE_BREAKS = ['\u0009', '\u000a', '\u000d'];
const CONTROL_CHARACTERS = ['\u0000', '\u0001', ...LINE_BREAKS, '\u000b', '\u000c', '\u001b', '\u001f', '\u007f', '\u0080', '\u0085', '\u009f', '\u2028', '\u2029'];
const label = (c: string) => `U+${c.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`;

function refusal(schema: z.ZodType, doc: unknown): string | null {
	const result = schema.safeParse(doc);
	return result.success ? null : result.error.issues.map((i) => i.message).join(' | ');
}

describe('every single-line text field', () => {
	it.each(singleLineFields)('%s accepts ordinary text (accents, symbols)', (_field, schema, doc) => {
		expect(refusal(schema, doc('Pier sensor — εr 3.38 (Kestrel Labs) №2'))).toBeNull();
	});

	for (const [field, schema, doc] of singleLineFields) {
		it.each(CONTROL_CHARACTERS.map((c) => [label(c), c]))(`${field} refuses %s, naming the field and the character`, (code, character) => {
			expect(refusal(schema, doc(`Pier${character}sensor`))).toMatch(new RegExp(`name must not contain control characters \\(found ${code.replace('+', '\\+')}\\)`));
		});
	}
});

describe('every multi-line text field', () => {
	for (const [field, schema, doc] of multiLineFields) {
		it.each(CONTROL_CHARACTERS.filter((c) => !LINE_BREAKS.includes(c)).map((c) => [label(c), c]))(`${field} refuses %s, naming the field and the character`, (code, character) => {
			expect(refusal(schema, doc(`Checked with the fab${character}by phone`))).toMatch(new RegExp(`(note|waiver reason) must not contain control characters other than line breaks \\(found ${code.replace('+', '\\+')}\\)`));
		});
		it(`${field} takes line breaks and tabs typed in a text area`, () => {
			expect(refusal(schema, doc('Checked with the fab\r\nby phone,\tthen by mail'))).toBeNull();
		});
	}

	it('the waiver reason folds line breaks into one line', () => {
		expect(waiverReasonSchema.parse('  Checked with the fab\r\n\r\nby phone\t ')).toBe('Checked with the fab by phone');
	});
});

describe('the shared helpers', () => {
	it('findControlCharacter names the first one as U+XXXX', () => {
		expect(findControlCharacter('a\u2029b\u0001')).toBe('U+2029');
		expect(findControlCharacter('Sunroof GNSS — ε')).toBeNull();
	});

	it('toOneLine turns control characters and runs of space into one space', () => {
		expect(toOneLine(' a\u0000b\r\n\u2028c\u0085 ')).toBe('a b c');
	});
});
