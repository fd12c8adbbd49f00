// People and teams of our own in the shared test database, with a random suffix per test file.
import { randomBytes } from 'node:crypto';
import { signUp, createTeam, type AccountUser } from '../../../../src/lib/server/accounts';
import { getDb } from '../../../../src/lib/server/db';
import * as memberQueries from '../../../../src/lib/server/db/member.queries';
import { throttleKey } from '../../../../src/lib/server/accounts/attempt-throttle';
import * as verificationQueries from '../../../../src/lib/server/db/verification.queries';
import type { TeamRole } from '../../../../src/lib/server/db/team.table';

export const TEST_PASSWORD = 'correct horse battery';

export function uniqueSuffix(tag: string): string {
	return `${tag}-${randomBytes(4).toString('hex')}`;
}

export function emailFor(label: string, suffix: string): string {
	return `${label}-${suffix}@accounts.test`;
}

/** A person whose e-mail is confirmed (`confirmed: false` leaves it as sign-up does). */
export async function person(label: string, suffix: string, opts: { confirmed?: boolean } = {}): Promise<AccountUser> {
	const user = await signUp({ displayName: `${label} ${suffix}`, email: emailFor(label, suffix), password: TEST_PASSWORD });
	if (opts.confirmed !== false) await verificationQueries.markEmailVerifiedById(getDb(), user.id, new Date());
	return user;
}

export interface TeamFixture {
	teamId: string;
	owner: AccountUser;
	editor: AccountUser;
	viewer: AccountUser;
	/** Belongs to another team only. */
	outsider: AccountUser;
	outsiderTeamId: string;
}

export async function teamWithRoles(suffix: string): Promise<TeamFixture> {
	const [owner, editor, viewer, outsider] = await Promise.all([person('owner', suffix), person('editor', suffix), person('viewer', suffix), person('outsider', suffix)]);
	const { id: teamId } = await createTeam(owner.id, { name: `Accounts team ${suffix}` });
	const { id: outsiderTeamId } = await createTeam(outsider.id, { name: `Outsider team ${suffix}` });
	await addMember(teamId, editor.id, 'editor');
	await addMember(teamId, viewer.id, 'viewer');
	return { teamId, owner, editor, viewer, outsider, outsiderTeamId };
}

export async function addMember(teamId: string, userId: string, role: TeamRole): Promise<void> {
	await memberQueries.insertMember(getDb(), teamId, userId, role);
}

/** Gives a team and its inviter a fresh hourly invitation allowance (for tests that send many invitations). */
export async function forgetInviteAllowance(teamId: string, userId: string): Promise<void> {
	await getDb()
		.deleteFrom('rate_limit')
		.where('key', 'in', [throttleKey('invitesPerPerson', userId), throttleKey('invitesPerTeam', teamId)])
		.execute();
}
