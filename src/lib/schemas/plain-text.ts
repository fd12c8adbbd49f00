// Text people type (names, notes, reasons): never a control character. One definition shared by every schema
// with user text (refused with the field and the character named, "U+000A"), and by the writers, which also strip
// what an older stored revision may still hold, so that no name can break a file's syntax or forge a line.
import type { z } from 'zod';

/**
 * The characters refused: C0 controls U+0000–U+001F (line feed, tab, vertical tab U+000B, form feed U+000C …),
 * DEL U+007F, C1 controls U+0080–U+009F (Unicode Standard, General Category Cc), and the line and paragraph
 * separators U+2028 and U+2029 (Zl, Zp) that some readers treat as line breaks.
 */
const CONTROL_CHARACTER = /[\u0000-\u001f\u007f-\u009f\u2028\u2029]/;
const CONTROL_CHARACTERS = /[\u0000-\u001f\u007f-\u009f\u2028\u2029]/g;
/** In a multi-line note typed into a text area, Enter gives LF or CR LF, and Tab may slip in: those stay allowed. */
const CONTROL_CHARACTER_BUT_LINE_BREAKS = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\u2028\u2029]/;

/** "U+000A" for "\n". */
export function toCodePointLabel(character: string): string {
	return `U+${(character.codePointAt(0) ?? 0).toString(16).toUpperCase().padStart(4, '0')}`;
}

/** The first control character in `text` as "U+XXXX", or null; `lineBreaks` lets LF, CR and tab through. */
export function findControlCharacter(text: string, opts: { lineBreaks?: boolean } = {}): string | null {
	const match = (opts.lineBreaks ? CONTROL_CHARACTER_BUT_LINE_BREAKS : CONTROL_CHARACTER).exec(text);
	return match ? toCodePointLabel(match[0]) : null;
}

/** Every control character replaced by a space (lengths and all other characters kept). */
export function replaceControlCharacters(text: string): string {
	return text.replace(CONTROL_CHARACTERS, ' ');
}

/** User text for one line of a file: control characters and runs of white space become one space, trimmed. */
export function toOneLine(text: string): string {
	return replaceControlCharacters(text).replace(/\s+/g, ' ').trim();
}

/**
 * The refinement every schema with user text uses: `z.string().trim().max(120).superRefine(plainText('name'))`.
 * The message names the field and the character: "name must not contain control characters (found U+000A)".
 */
export function plainText(field: string, opts: { lineBreaks?: boolean } = {}) {
	return (text: string, ctx: z.core.$RefinementCtx<string>): void => {
		const found = findControlCharacter(text, opts);
		if (found) ctx.addIssue({ code: 'custom', input: text, message: `${field} must not contain control characters${opts.lineBreaks ? ' other than line breaks' : ''} (found ${found})` });
	};
}
