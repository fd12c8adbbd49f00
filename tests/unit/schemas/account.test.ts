// New passwords (sign-up and reset share passwordSchema): long enough, and not a common or easily guessed one (abuse review item 15).
import { describe, expect, it } from 'vitest';
import { passwordSchema, resetCompleteSchema, signUpSchema } from '../../../src/lib/schemas/account';
import { COMMON_PASSWORD_MESSAGE, GUESSABLE_PASSWORD_MESSAGE } from '../../../src/lib/schemas/common-password';

const messagesOf = (value: unknown) => {
	const r = passwordSchema.safeParse(value);
	return r.success ? [] : r.error.issues.map((i) => i.message);
};

describe('passwordSchema', () => {
	// Each refused value: where the refusal comes from. The list is @zxcvbn-ts/language-common's "passwords-common";
	// the score is @zxcvbn-ts/core's estimate (0–4), refused below 2.
	const refused: [string, string][] = [
		['1234567890', COMMON_PASSWORD_MESSAGE], // on the shipped common-password list
		['qwertyuiop', COMMON_PASSWORD_MESSAGE], // on the list (a keyboard row)
		['Password123', COMMON_PASSWORD_MESSAGE], // on the list, compared in lower case
		['1q2w3e4r5t', COMMON_PASSWORD_MESSAGE], // on the list
		['aaaaaaaaaa', GUESSABLE_PASSWORD_MESSAGE], // not on the list; a repeat, score 0
		['abcdefghij', GUESSABLE_PASSWORD_MESSAGE] // not on the list; a sequence, score 0
	];
	it.each(refused)('refuses %j and says why', (password, message) => {
		expect(messagesOf(password)).toEqual([message]);
	});

	it('accepts a few unrelated words', () => {
		for (const password of ['quarter wave transformer', 'copper pour on the ground', 'patch-demo-2450']) expect(messagesOf(password)).toEqual([]);
	});

	it('reports only the length for a short password (the list is not consulted)', () => {
		expect(messagesOf('123456')).toEqual(['password must be at least 10 characters']);
	});

	it('is the one rule of sign-up and of a password reset', () => {
		expect(signUpSchema.safeParse({ displayName: 'A', email: 'a@example.org', password: 'aaaaaaaaaa' }).success).toBe(false);
		expect(resetCompleteSchema.safeParse({ password: '1234567890' }).success).toBe(false);
		expect(resetCompleteSchema.safeParse({ password: 'slot in the middle ground' }).success).toBe(true);
	});
});
