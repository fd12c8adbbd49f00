// The workspace's limits, each refused with a clear message, and the security log: what is written to
// audit_event and who may read it at /teams/[teamId]/audit.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApiToken, createTeam, signUp } from '../../../src/lib/server/accounts';
import { closeDb, getDb } from '../../../src/lib/server/db';
import * as auditQueries from '../../../src/lib/server/db/audit-event.queries';
import { recordExport } from '../../../src/lib/server/exports/record-export';
import { LIMITS } from '../../../src/lib/server/http/limits';
import type { ExportTarget } from '../../../src/lib/server/exports/export-target';
import { action, api } from './helpers/client';
import { startBuiltServer, type BuiltServer } from './helpers/built-server';
import { workspaceRowCounts } from './helpers/row-counts';
import { createHardeningWorkspace, demoDesign, PASSWORD, type HardeningWorkspace } from './helpers/workspace';

let server: BuiltServer;
let ws: HardeningWorkspace;

beforeAll(async () => {
	[server, ws] = await Promise.all([startBuiltServer({ databaseUrl: process.env.DATABASE_URL! }), createHardeningWorkspace('lim')]);
}, 120_000);
afterAll(async () => {
	await server?.stop();
	await closeDb();
});

describe('limits', () => {
	it('refuses a body over the 6 MB server limit with 413 and a message', async () => {
		const res = await api(server.origin, '/api/v1/size', { token: ws.editor.token }, { rawBody: 'x'.repeat(7 * 1024 * 1024) });
		expect(res.status).toBe(413);
		expect(res.text).toMatch(/limit/i);
	});

	it('refuses JSON over 256 kB naming the body', async () => {
		const res = await api(server.origin, '/api/v1/size', { token: ws.editor.token }, { body: { ...demoDesign('Big'), name: 'x'.repeat(300_000) } });
		expect(res.status).toBe(400);
		expect(res.body.issues[0].message).toMatch(/the body is at most 262144 bytes/);
	});

	it('refuses an upload over 5 MB and stores nothing', async () => {
		const before = await workspaceRowCounts(ws.teamIds, ws.userIds, ws.domain);
		const fd = new FormData();
		fd.append('file', new File([new Uint8Array(LIMITS.uploadBytes + 1024).fill(0x21)], 'huge.s1p'));
		const res = await action(server.origin, `/designs/${ws.a.designId}/r/${ws.a.label}/measurements?/upload`, { cookie: ws.editor.sessionId }, fd);
		expect(res.actionStatus).toBe(413);
		expect(res.message).toMatch(/larger than 5 MB/);
		expect(await workspaceRowCounts(ws.teamIds, ws.userIds, ws.domain)).toEqual(before);
	});

	it('refuses a sweep plan of more than 10 000 points naming the axes', async () => {
		const res = await action(server.origin, `/designs/${ws.a.designId}/r/${ws.a.label}/sweeps?/save`, { cookie: ws.editor.sessionId }, {
			name: 'Too many',
			combine: 'grid',
			'axes.0.field': 'substrate.heightMm',
			'axes.0.mode': 'range',
			'axes.0.from': '1',
			'axes.0.to': '2',
			'axes.0.step': '0.01',
			'axes.1.field': 'substrate.relativePermittivity',
			'axes.1.mode': 'range',
			'axes.1.from': '3',
			'axes.1.to': '4',
			'axes.1.step': '0.01'
		});
		expect(res.actionStatus).toBe(400);
		expect(JSON.stringify(res.data)).toMatch(/10[  ,]?000/);
	});

	it('refuses names over their length limits naming the field', async () => {
		const team = await action(server.origin, `/teams/${ws.a.teamId}?/rename`, { cookie: ws.owner.sessionId }, { name: 'n'.repeat(81) });
		expect([team.actionStatus, team.data.fieldErrors.find((e: { field: string }) => e.field === 'name')?.message]).toEqual([400, 'team name must be 1 to 80 characters']);
		const token = await action(server.origin, '/settings/tokens?/create', { cookie: ws.editor.sessionId }, { name: 't'.repeat(61) });
		expect([token.actionStatus, token.data.fieldErrors.find((e: { field: string }) => e.field === 'name')?.message]).toEqual([400, 'token name must be 1 to 60 characters']);
	});

	it(`lets one person belong to at most ${LIMITS.teamsPerPerson} teams when making another`, async () => {
		const user = await signUp({ displayName: 'Many teams', email: `teams-${ws.suffix}@${ws.domain}`, password: PASSWORD });
		for (let i = 0; i < LIMITS.teamsPerPerson; i++) await createTeam(user.id, { name: `Team ${i}` });
		await expect(createTeam(user.id, { name: 'One more' })).rejects.toMatchObject({ code: 'limit-reached', message: expect.stringMatching(/20 teams already/) });
	});

	it(`lets one person have at most ${LIMITS.liveTokensPerPerson} live API tokens, counted after revocation`, async () => {
		const user = await signUp({ displayName: 'Many tokens', email: `tokens-${ws.suffix}@${ws.domain}`, password: PASSWORD });
		const { id: teamId } = await createTeam(user.id, { name: 'Token team' });
		const made = [];
		for (let i = 0; i < LIMITS.liveTokensPerPerson; i++) made.push(await createApiToken(user.id, teamId, { name: `t${i}` }));
		await expect(createApiToken(user.id, teamId, { name: 'one more' })).rejects.toMatchObject({ code: 'limit-reached', message: expect.stringMatching(/20 live API tokens/) });
		const { revokeApiToken } = await import('../../../src/lib/server/accounts');
		await revokeApiToken(user.id, made[0].id);
		await expect(createApiToken(user.id, teamId, { name: 'after a revocation' })).resolves.toMatchObject({ name: 'after a revocation' });
	});
});

describe('the security log', () => {
	it('records failed sign-ins, role changes, token creation and revocation, and waivers', async () => {
		const db = getDb();
		await action(server.origin, '/signin', {}, { email: ws.viewer.email, password: 'not the password' });
		expect((await action(server.origin, `/teams/${ws.a.teamId}?/role`, { cookie: ws.owner.sessionId }, { userId: ws.viewer.id, role: 'editor' })).type).toBe('success');
		const made = await action(server.origin, '/settings/tokens?/create', { cookie: ws.viewer.sessionId }, { name: 'audited' });
		expect(made.type).toBe('success');
		const tokenRow = await db.selectFrom('api_token').select('id').where('user_id', '=', ws.viewer.id).where('name', '=', 'audited').executeTakeFirstOrThrow();
		expect((await action(server.origin, '/settings/tokens?/revoke', { cookie: ws.viewer.sessionId }, { tokenId: tokenRow.id })).type).toBe('success');
		const target = { design: { id: ws.a.designId, teamId: ws.a.teamId }, revision: { id: ws.a.revisionId } } as unknown as ExportTarget;
		await recordExport({ target, userId: ws.editor.id, via: 'api', kind: 'bundle', files: [], sha256: '0'.repeat(64), sizeBytes: 0, waiver: 'Ring below minimum accepted by the fab' });

		const events = await auditQueries.listAuditEventsByTeam(db, ws.a.teamId, 50);
		const kinds = events.map((e) => `${e.kind} by ${e.actor_user_id}`);
		expect(kinds).toContain(`signin.failed by ${ws.viewer.id}`);
		expect(kinds).toContain(`member.role-changed by ${ws.owner.id}`);
		expect(kinds).toContain(`token.created by ${ws.viewer.id}`);
		expect(kinds).toContain(`token.revoked by ${ws.viewer.id}`);
		expect(kinds).toContain(`export.waived by ${ws.editor.id}`);
		const role = events.find((e) => e.kind === 'member.role-changed')!;
		expect(role.details).toMatchObject({ memberId: ws.viewer.id, from: 'viewer', to: 'editor' });
		expect(events.find((e) => e.kind === 'export.waived')!.details).toMatchObject({ reason: 'Ring below minimum accepted by the fab' });
		// Team B's log holds none of it.
		expect((await auditQueries.listAuditEventsByTeam(db, ws.b.teamId, 50)).filter((e) => e.kind !== 'token.created')).toEqual([]);
	});

	it('shows the log to owners only: editors and viewers 403, other teams 404, anonymous to sign-in', async () => {
		const page = (session?: string) => fetch(`${server.origin}/teams/${ws.a.teamId}/audit`, { headers: session ? { cookie: `ff_session=${session}` } : {}, redirect: 'manual' });
		const ownerPage = await page(ws.owner.sessionId);
		expect(ownerPage.status).toBe(200);
		const html = await ownerPage.text();
		expect(html).toContain('Security log');
		expect(html).toContain('Role changed');
		expect((await page(ws.editor.sessionId)).status).toBe(403);
		expect((await page(ws.outsider.sessionId)).status).toBe(404);
		expect((await page()).status).toBe(303);
	});
});
