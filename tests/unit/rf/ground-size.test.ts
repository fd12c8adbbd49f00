import { describe, expect, it } from 'vitest';
import { groundSize } from '../../../src/lib/rf/ground-size';
import { InputError } from '../../../src/lib/schemas';

describe('groundSize', () => {
	// Ground = patch + 6h by default (common practice, no source).
	it('adds 3h on every side by default', () => {
		expect(groundSize({ patchWidthMm: 30, patchLengthMm: 20, heightMm: 1.5 })).toEqual({ widthMm: 39, lengthMm: 29, marginMm: 4.5 });
	});

	it('takes an override, and grows the feed axis to fit a feed section', () => {
		expect(groundSize({ patchWidthMm: 30, patchLengthMm: 20, heightMm: 1.5, marginMm: 2, feedRoomMm: 10 })).toEqual({ widthMm: 34, lengthMm: 40, marginMm: 2 });
	});

	it('rejects a negative margin', () => {
		expect(() => groundSize({ patchWidthMm: 30, patchLengthMm: 20, heightMm: 1.5, marginMm: -1 })).toThrow(InputError);
	});
});
