// Invitations by e-mail: single use, seven days, the invited role; only the token's hash is stored; an invite never demotes.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { acceptInvite, AccountError, describeInvite, INVITE_LIFETIME_MS, inviteToTeam, listPendingInvites, withdrawInvite } from '../../../src/lib/server/accounts';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { findRoleByTeamAndUser, listTeamsByUser } from '../../../src/lib/server/db/team.queries';
import { emailFor, person, teamWithRoles, uniqueSuffix, type TeamFixture } from './helpers/people';
import { startSmtpCatcher, tokenFromLink, type SmtpCatcher } from './helpers/smtp-catcher';

const suffix = uniqueSuffix('invite');
let smtp: SmtpCatcher;
let team: TeamFixture;

beforeAll(async () => {
	smtp = await startSmtpCatcher();
	team = await teamWithRoles(suffix);
});
afterAll(async () => {
	await smtp.close();
	await closeDb();
});

async function invite(email: string, role: string, now = new Date()): Promise<string> {
	await inviteToTeam(team.teamId, team.owner.id, { email, role }, now);
	const mail = await smtp.waitFor(email);
	return tokenFromLink(mail.links[0], '/invites/');
}

const codeOf = (e: unknown) => (e instanceof AccountError ? e.code : String(e));

describe('inviting', () => {
	it('mails a link naming the team, the inviter and the role, and stores only the sha256 of its token', async () => {
		const email = emailFor('newcomer', suffix);
		const token = await invite(email, 'viewer');
		const mail = await smtp.waitFor(email);
		expect(mail.subject).toBe('An invitation to a team on Fringefield');
		expect(mail.text).toContain('as a viewer');
		expect(mail.text).toContain(`owner ${suffix} <${team.owner.email}> invited you`);
		expect(mail.text).toContain(`"Accounts team ${suffix}"`);
		const rows = await getDb().selectFrom('team_invite').selectAll().where('email', '=', email).execute();
		expect(rows).toHaveLength(1);
		expect(rows[0].token_hash).toMatch(/^[0-9a-f]{64}$/);
		expect(JSON.stringify(rows)).not.toContain(token);
		const pending = await listPendingInvites(team.teamId);
		expect(pending.map((p) => p.email)).toContain(email);
	});

	it('refuses an unknown role and a malformed e-mail as typed input errors', async () => {
		await expect(inviteToTeam(team.teamId, team.owner.id, { email: emailFor('x', suffix), role: 'admin' })).rejects.toMatchObject({ name: 'InputError' });
		await expect(inviteToTeam(team.teamId, team.owner.id, { email: 'nope', role: 'viewer' })).rejects.toMatchObject({ name: 'InputError' });
	});
});

describe('accepting', () => {
	it('makes the person a member in the invited role, once; the team becomes one of several', async () => {
		const joiner = await person('joiner', suffix);
		const token = await invite(joiner.email, 'editor');
		expect((await describeInvite(token))?.state).toBe('live');
		const result = await acceptInvite(token, joiner.id);
		expect(result).toEqual({ teamId: team.teamId, role: 'editor', joined: true });
		expect(await findRoleByTeamAndUser(getDb(), team.teamId, joiner.id)).toBe('editor');
		expect((await describeInvite(token))?.state).toBe('used');
		const again = await acceptInvite(token, team.outsider.id).catch((e: unknown) => e);
		expect(codeOf(again)).toBe('link-invalid');
		expect(await findRoleByTeamAndUser(getDb(), team.teamId, team.outsider.id)).toBeNull();

		const other = await inviteToTeam(team.outsiderTeamId, team.outsider.id, { email: joiner.email, role: 'viewer' });
		expect(other.inviteId).toBeTruthy();
		const mails = smtp.messages.filter((m) => m.to.includes(joiner.email));
		await acceptInvite(tokenFromLink(mails[mails.length - 1].links[0], '/invites/'), joiner.id);
		const teams = await listTeamsByUser(getDb(), joiner.id);
		expect(teams.map((t) => t.id).sort()).toEqual([team.teamId, team.outsiderTeamId].sort());
	});

	it('expires seven days after it was sent', async () => {
		const late = await person('late', suffix);
		const sent = new Date();
		const token = await invite(late.email, 'viewer', sent);
		expect(INVITE_LIFETIME_MS).toBe(7 * 24 * 3600 * 1000);
		expect((await describeInvite(token, new Date(sent.getTime() + INVITE_LIFETIME_MS + 1000)))?.state).toBe('expired');
		const err = await acceptInvite(token, late.id, new Date(sent.getTime() + INVITE_LIFETIME_MS + 1000)).catch((e: unknown) => e);
		expect(codeOf(err)).toBe('link-invalid');
		expect(await findRoleByTeamAndUser(getDb(), team.teamId, late.id)).toBeNull();
		await expect(acceptInvite(token, late.id, new Date(sent.getTime() + INVITE_LIFETIME_MS - 1000))).resolves.toMatchObject({ role: 'viewer' });
	});

	it('never demotes: an owner accepting a viewer invitation stays owner', async () => {
		const token = await invite(team.owner.email, 'viewer');
		expect(await acceptInvite(token, team.owner.id)).toMatchObject({ joined: false });
		expect(await findRoleByTeamAndUser(getDb(), team.teamId, team.owner.id)).toBe('owner');
	});

	it('a withdrawn invitation cannot be accepted; an unknown token describes nothing', async () => {
		const email = emailFor('withdrawn', suffix);
		const token = await invite(email, 'viewer');
		const pending = (await listPendingInvites(team.teamId)).find((p) => p.email === email)!;
		await withdrawInvite(team.teamId, pending.id);
		expect(await describeInvite(token)).toBeNull();
		expect(codeOf(await acceptInvite(token, team.outsider.id).catch((e: unknown) => e))).toBe('link-invalid');
		expect(codeOf(await withdrawInvite(team.teamId, pending.id).catch((e: unknown) => e))).toBe('not-found');
		expect(await describeInvite('no-such-token')).toBeNull();
	});

	it('withdraws the invitation again when the mail cannot be sent', async () => {
		const saved = process.env.SMTP_PORT;
		process.env.SMTP_PORT = '9'; // the discard port: nothing listens there on 127.0.0.1
		const email = emailFor('undeliverable', suffix);
		try {
			await expect(inviteToTeam(team.teamId, team.owner.id, { email, role: 'viewer' })).rejects.toMatchObject({ name: 'MailDeliveryError' });
		} finally {
			process.env.SMTP_PORT = saved;
		}
		expect(await getDb().selectFrom('team_invite').select('id').where('email', '=', email).execute()).toHaveLength(0);
	});
});
