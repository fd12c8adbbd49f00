// The words a refused Touchstone upload is answered with.
import { describe, expect, it } from 'vitest';
import { TouchstoneError } from '../../../../src/lib/formats/touchstone';
import { InputError } from '../../../../src/lib/schemas';
import { uploadRefusal } from '../../../../src/lib/server/measurements/upload-refusal';

describe('uploadRefusal', () => {
	it('names the file, the line and what the reader expected, and says nothing was stored', () => {
		expect(uploadRefusal('patch.s1p', new TouchstoneError(7, 'a number', 'abc'))).toEqual({ message: 'patch.s1p, line 7: expected a number (found "abc"). Nothing was stored.', line: 7 });
	});

	it('shows at most 40 characters of what it found, and no "found" for a file that ended', () => {
		const long = 'x'.repeat(60);
		expect(uploadRefusal('a.s1p', new TouchstoneError(3, '[End]', long))?.message).toBe(`a.s1p, line 3: expected [End] (found "${'x'.repeat(40)}"). Nothing was stored.`);
		expect(uploadRefusal('a.s1p', new TouchstoneError(9, '[End]', ''))?.message).toBe('a.s1p, line 9: expected [End]. Nothing was stored.');
	});

	it('answers other bad input with its first message and no line', () => {
		const err = new InputError([{ path: 'file', value: 'x', message: 'must be a Touchstone file' }]);
		expect(uploadRefusal('notes.txt', err)).toEqual({ message: 'notes.txt: must be a Touchstone file. Nothing was stored.', line: null });
	});

	it('leaves an error that is not the file\'s fault to be thrown', () => {
		expect(uploadRefusal('a.s1p', new Error('database down'))).toBeUndefined();
	});
});
