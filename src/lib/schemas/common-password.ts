// Why a password is too easy to guess, or null: it is in the common-password list that the zxcvbn-ts
// strength estimator ships (@zxcvbn-ts/language-common, "passwords-common", about 49 000 entries), or
// zxcvbn-ts scores it below 2 ("somewhat guessable"), as with repeats ("aaaaaaaaaa"), sequences
// ("abcdefghij") and keyboard walks. Pure and deterministic; the list is decompressed once, on first use
// (about 0.1 s). Imported only by server code: the browser never downloads the list.
import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import { adjacencyGraphs, dictionary } from '@zxcvbn-ts/language-common';

/** zxcvbn's scale: 0 too guessable, 1 very guessable, 2 somewhat guessable, 3 safely unguessable, 4 very unguessable. */
export const MIN_PASSWORD_SCORE = 2;

let estimator: { common: ReadonlySet<string>; factory: ZxcvbnFactory } | undefined;

function load() {
	estimator ??= {
		common: new Set(dictionary['passwords-common']),
		factory: new ZxcvbnFactory({ dictionary: { ...dictionary }, graphs: adjacencyGraphs })
	};
	return estimator;
}

export const COMMON_PASSWORD_MESSAGE = 'password is one of the most common passwords (it is on the list password guessers try first); choose another';
export const GUESSABLE_PASSWORD_MESSAGE = 'password is too easy to guess (a repeat, a sequence or a keyboard pattern); a few unrelated words work well';

export function commonPasswordReason(password: string): string | null {
	const { common, factory } = load();
	if (common.has(password.toLowerCase())) return COMMON_PASSWORD_MESSAGE;
	if (factory.check(password).score < MIN_PASSWORD_SCORE) return GUESSABLE_PASSWORD_MESSAGE;
	return null;
}
