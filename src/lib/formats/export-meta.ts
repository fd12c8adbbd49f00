// What every writer needs besides the artwork: names, revision label and date. Dates come from here, never from the clock.
import { InputError } from '../schemas';
import { replaceControlCharacters } from '../schemas/plain-text';

export interface ExportMeta {
	/** URL-safe design name: lowercase letters, digits and hyphens ("sunroof-gnss"). */
	readonly designSlug: string;
	/** Human design name for titles. */
	readonly designName: string;
	/** Revision label ("A", "B", "3"). Letters, digits, dot, hyphen. */
	readonly revisionLabel: string;
	/** Revision date, ISO calendar date "YYYY-MM-DD". */
	readonly revisionDate: string;
	/** Version of this software written into the files. */
	readonly softwareVersion: string;
}

export const SOFTWARE_NAME = 'Fringefield';
export const SOFTWARE_VERSION = '0.1.0';

/** Name → URL-safe slug: accents dropped, lowercase, runs of other characters become one hyphen. */
export function toSlug(name: string, maxLength: number, fallback: string): string {
	const slug = name
		.normalize('NFKD')
		.replace(/[\u0300-\u036f]/g, '')
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, '-')
		.replace(/^-+|-+$/g, '')
		.slice(0, maxLength)
		.replace(/-+$/g, '');
	return slug || fallback;
}

/** Design name → slug of at most 60 characters ("Sunroof GNSS" → "sunroof-gnss"). */
export function toDesignSlug(name: string): string {
	return toSlug(name, 60, 'design');
}

const LABEL = /^[A-Za-z0-9][A-Za-z0-9.-]{0,15}$/;
const DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Builds the meta for a design, checking label and date; bad values are an InputError. */
export function createExportMeta(opts: { designName: string; revisionLabel: string; revisionDate: string; softwareVersion?: string }): ExportMeta {
	if (!LABEL.test(opts.revisionLabel)) {
		throw new InputError([{ path: 'revision', value: opts.revisionLabel, message: 'must be 1–16 letters, digits, dots or hyphens, starting with a letter or digit' }]);
	}
	const m = DATE.exec(opts.revisionDate);
	const valid = m && (() => {
		const d = new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])));
		return d.getUTCFullYear() === Number(m[1]) && d.getUTCMonth() === Number(m[2]) - 1 && d.getUTCDate() === Number(m[3]) && Number(m[1]) >= 1980 && Number(m[1]) <= 2107;
	})();
	if (!valid) {
		throw new InputError([{ path: 'date', value: opts.revisionDate, message: 'must be a calendar date YYYY-MM-DD between 1980-01-01 and 2107-12-31' }]);
	}
	return {
		designSlug: toDesignSlug(opts.designName),
		// A name stored before control characters were refused must not break a file's syntax (see schemas/plain-text.ts).
		designName: replaceControlCharacters(opts.designName),
		revisionLabel: opts.revisionLabel,
		revisionDate: opts.revisionDate,
		softwareVersion: opts.softwareVersion ?? SOFTWARE_VERSION
	};
}
