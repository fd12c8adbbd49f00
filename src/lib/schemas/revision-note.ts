// A revision's note ("εr 3.48 after measuring"): typed in a text area, so line breaks and tabs are kept;
// every other control character is refused.
import { z } from 'zod';
import { parseWith } from './input-error';
import { plainText } from './plain-text';

export const REVISION_NOTE_MAX_CHARS = 500;

export const revisionNoteSchema = z
	.string({ error: 'must be text' })
	.trim()
	.max(REVISION_NOTE_MAX_CHARS, { error: `at most ${REVISION_NOTE_MAX_CHARS} characters` })
	.superRefine(plainText('note', { lineBreaks: true }));

const noteFieldSchema = z.object({ note: revisionNoteSchema });

/** The trimmed note ('' when absent), or an InputError at path "note". */
export function parseRevisionNote(raw: unknown): string {
	return parseWith(noteFieldSchema, { note: raw ?? '' }).note;
}
