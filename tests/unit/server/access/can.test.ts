// The one access table, spelled out cell by cell: a change to who may do what must change this test too.
import { describe, expect, it } from 'vitest';
import { actions, can, type Action } from '../../../../src/lib/server/access/can';

const R = true;
const _ = false;
// action                        viewer editor owner
const expected: Record<Action, [boolean, boolean, boolean]> = {
	'team.read': [R, R, R],
	'team.manage': [_, _, R],
	'design.create': [_, R, R],
	'revision.create': [_, R, R],
	'laminate.write': [_, R, R],
	'fab-profile.write': [_, R, R],
	'sweep.write': [_, R, R],
	'measurement.upload': [_, R, R],
	'measurement.delete': [_, R, R],
	'field-check.start': [_, R, R],
	'field-check.cancel': [_, R, R],
	'export.download': [R, R, R],
	'export.waive': [_, R, R],
	'token.manage-own': [R, R, R]
};

describe('can(role, action)', () => {
	it('lists every action in the table', () => {
		expect(Object.keys(expected).sort()).toEqual([...actions].sort());
	});
	for (const action of actions) {
		it(`decides ${action} for viewer, editor and owner`, () => {
			expect([can('viewer', action), can('editor', action), can('owner', action)]).toEqual(expected[action]);
		});
		it(`refuses ${action} to a non-member`, () => {
			expect(can(null, action)).toBe(false);
			expect(can(undefined, action)).toBe(false);
		});
	}
});

describe('canAsAccount(account, step)', () => {
	// Abuse review item 13: an address nobody has confirmed may not mint tokens, invite, or hold the owner role by invitation.
	it('refuses every step to an unconfirmed account and allows it to a confirmed one', async () => {
		const { canAsAccount, confirmedEmailSteps } = await import('../../../../src/lib/server/access/can');
		expect([...confirmedEmailSteps].sort()).toEqual(['invite.accept-owner', 'invite.receive-owner', 'invite.send', 'token.create']);
		for (const step of confirmedEmailSteps) {
			expect(canAsAccount({ emailVerified: false }, step)).toBe(false);
			expect(canAsAccount(null, step)).toBe(false);
			expect(canAsAccount({ emailVerified: true }, step)).toBe(true);
		}
	});
});
