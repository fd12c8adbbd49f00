// What the error pages say and where they lead back (issue 17: user's words, no internal permission names, a way back).
import { describe, expect, it } from 'vitest';
import { errorPageWords } from '../../../src/lib/components/error-page-words';

describe('errorPageWords', () => {
	// a missing design cannot be the way back: the designs list is
	it('leads from a missing design back to the designs list', () => {
		const w = errorPageWords({ status: 404, message: 'Design not found', designId: 'd1', signedIn: true });
		expect(w.title).toBe('This design is not here');
		expect(w.back).toEqual({ href: '/designs', label: 'Back to your designs' });
	});

	it('leads from a refused action inside a design back to that design', () => {
		const w = errorPageWords({ status: 403, message: 'You are a viewer in this team. Only editors and owners can make revisions.', designId: 'd1', signedIn: true });
		expect(w.detail).toContain('Only editors and owners can make revisions');
		expect(w.back.href).toBe('/designs/d1');
	});

	it('never repeats a message that carries an internal action name', () => {
		const w = errorPageWords({ status: 403, message: 'Your role (viewer) may not do this (revision.create)', signedIn: true });
		expect(w.detail).not.toContain('revision.create');
	});

	it('says an unknown address has no page, and leads a signed-out visitor to the start page', () => {
		const w = errorPageWords({ status: 404, message: 'Not found', signedIn: false });
		expect(w.title).toBe('There is no page at this address');
		expect(w.back.href).toBe('/');
	});

	it.each([
		[422, 'The files were not made'],
		[500, 'Something went wrong on our side'],
		[503, 'Fringefield is busy right now']
	])('titles a %i page in plain words', (status, title) => {
		expect(errorPageWords({ status, message: 'x', signedIn: true }).title).toBe(title);
	});
});
