// Refusals read as sentences a team member understands; internal action names never reach the page.
import { describe, expect, it } from 'vitest';
import { actions } from '../../../../src/lib/server/access/can';
import { refusalSentence } from '../../../../src/lib/server/access/refusal-sentence';

describe('refusalSentence', () => {
	it('tells a viewer that only editors and owners make revisions', () => {
		expect(refusalSentence('viewer', 'revision.create')).toBe('You are a viewer in this team. Only editors and owners can make revisions.');
	});

	it('uses "an" before owner', () => {
		expect(refusalSentence('owner', 'team.read')).toMatch(/^You are an owner in this team\./);
	});

	it('never shows an internal action name for any action', () => {
		for (const action of actions) {
			const sentence = refusalSentence('viewer', action);
			expect(sentence).not.toContain(action);
			expect(sentence).toMatch(/\.$/);
			expect(sentence).not.toMatch(/undefined/);
		}
	});
});
