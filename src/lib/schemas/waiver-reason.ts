// A waiver's reason: free text a fab will read in the notes, so one trimmed paragraph of sensible length.
// Typed in a text area: line breaks and tabs fold into single spaces; every other control character is refused.
import { z } from 'zod';
import { plainText } from './plain-text';

export const WAIVER_MIN_CHARS = 5;
export const WAIVER_MAX_CHARS = 500;

const lengthMessage = `must say why, in ${WAIVER_MIN_CHARS}–${WAIVER_MAX_CHARS} characters; allowed range [${WAIVER_MIN_CHARS}, ${WAIVER_MAX_CHARS}] characters`;

export const waiverReasonSchema = z
	.string({ error: `must be text of ${WAIVER_MIN_CHARS}–${WAIVER_MAX_CHARS} characters` })
	.superRefine(plainText('waiver reason', { lineBreaks: true }))
	.overwrite((reason) => reason.replace(/\s+/g, ' ').trim())
	.min(WAIVER_MIN_CHARS, { error: lengthMessage })
	.max(WAIVER_MAX_CHARS, { error: lengthMessage });
