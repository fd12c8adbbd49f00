// Two teams of our own in a database (the shared test database, or a private one): team A with an
// owner, an editor and a viewer, team B with its own owner; each team with a design (revision A), a
// sweep plan, a measurement and a pending invitation. Everyone has a session and an API token for
// their team. Made through the server's own functions, with a random suffix per test file.
import { randomBytes, randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
// Single modules, not the accounts index: the index pulls in the mail templates (Vite ?raw imports),
// which the bench (plain tsx) cannot load.
import { createApiToken } from '../../../../src/lib/server/accounts/api-tokens';
import { createLinkToken } from '../../../../src/lib/server/accounts/link-token';
import { signUp } from '../../../../src/lib/server/accounts/sign-up';
import { createTeam } from '../../../../src/lib/server/accounts/teams';
import * as inviteQueries from '../../../../src/lib/server/db/invite.queries';
import { getLucia } from '../../../../src/lib/server/auth/lucia';
import { getDb } from '../../../../src/lib/server/db';
import * as memberQueries from '../../../../src/lib/server/db/member.queries';
import * as verificationQueries from '../../../../src/lib/server/db/verification.queries';
import { createDesign, findRevision } from '../../../../src/lib/server/designs';
import { uploadMeasurement } from '../../../../src/lib/server/measurements';
import { saveSweepPlan } from '../../../../src/lib/server/sweeps';
import { emptyAxisDraft } from '../../../../src/lib/schemas/sweep-plan';
import { rootDir } from './built-server';

export const PASSWORD = 'hardening-password-2450';

export interface Member {
	id: string;
	email: string;
	sessionId: string;
	token: string;
	tokenId: string;
}

export interface TeamThings {
	teamId: string;
	designId: string;
	revisionId: string;
	label: string;
	planId: string;
	measurementId: string;
	inviteId: string;
}

export interface HardeningWorkspace {
	suffix: string;
	domain: string;
	owner: Member;
	editor: Member;
	viewer: Member;
	/** Owner of team B only. */
	outsider: Member;
	a: TeamThings;
	b: TeamThings;
	userIds: string[];
	teamIds: string[];
}

/** A 2.45 GHz inset-fed rectangular patch (demo data). */
export function demoDesign(name: string) {
	return { name, frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 3.55, heightMm: 1.524, lossTangent: 0.0027 } };
}

export const touchstoneFixture = () => new Uint8Array(readFileSync(join(rootDir, 'tests', 'fixtures', 'touchstone-upload', 'bench-2g4.s1p')));

async function member(label: string, suffix: string, domain: string, teamId: string | null): Promise<Omit<Member, 'token' | 'tokenId'> & { teamId: string | null }> {
	const user = await signUp({ displayName: `${label} ${suffix}`, email: `${label}-${suffix}@${domain}`, password: PASSWORD });
	await verificationQueries.markEmailVerifiedById(getDb(), user.id, new Date());
	const session = await getLucia().createSession(user.id, {});
	return { id: user.id, email: user.email, sessionId: session.id, teamId };
}

async function things(teamId: string, userId: string, suffix: string, inviteEmail: string): Promise<TeamThings> {
	const db = getDb();
	const { design, revisionLabel } = await createDesign(db, { teamId, userId, raw: demoDesign(`Hardening patch ${suffix}`) });
	const revision = (await findRevision(db, design.id, revisionLabel))!;
	const plan = await saveSweepPlan(db, { revisionId: revision.id, userId, draft: { name: 'Hardening sweep', combine: 'grid', axes: [{ ...emptyAxisDraft('substrate.heightMm'), from: '1.4', to: '1.6', step: '0.1' }] } });
	const measurement = await uploadMeasurement(db, { revisionId: revision.id, userId, fileName: 'bench-2g4.s1p', bytes: touchstoneFixture() });
	// A pending invitation, stored as the invite service stores it (no mail needed here).
	const inviteId = randomUUID();
	await inviteQueries.insertTeamInvite(db, { id: inviteId, team_id: teamId, email: inviteEmail, role: 'viewer', token_hash: createLinkToken().tokenHash, invited_by: userId, expires_at: new Date(Date.now() + 7 * 86400_000) });
	return { teamId, designId: design.id, revisionId: revision.id, label: revision.label, planId: plan.id, measurementId: measurement.id, inviteId };
}

export async function createHardeningWorkspace(tag: string): Promise<HardeningWorkspace> {
	const suffix = `${tag}${randomBytes(4).toString('hex')}`;
	const domain = `${suffix}.hardening.test`;
	const owner = await member('owner', suffix, domain, null);
	const outsider = await member('outsider', suffix, domain, null);
	const { id: teamA } = await createTeam(owner.id, { name: `Hardening A ${suffix}` });
	const { id: teamB } = await createTeam(outsider.id, { name: `Hardening B ${suffix}` });
	const editor = await member('editor', suffix, domain, teamA);
	const viewer = await member('viewer', suffix, domain, teamA);
	await memberQueries.insertMember(getDb(), teamA, editor.id, 'editor');
	await memberQueries.insertMember(getDb(), teamA, viewer.id, 'viewer');
	const withToken = async (m: typeof owner, teamId: string): Promise<Member> => {
		const t = await createApiToken(m.id, teamId, { name: 'hardening' });
		return { id: m.id, email: m.email, sessionId: m.sessionId, token: t.secret, tokenId: t.id };
	};
	const ws: HardeningWorkspace = {
		suffix,
		domain,
		owner: await withToken(owner, teamA),
		editor: await withToken(editor, teamA),
		viewer: await withToken(viewer, teamA),
		outsider: await withToken(outsider, teamB),
		a: await things(teamA, owner.id, `${suffix}-a`, `invited-a-${suffix}@${domain}`),
		b: await things(teamB, outsider.id, `${suffix}-b`, `invited-b-${suffix}@${domain}`),
		userIds: [owner.id, editor.id, viewer.id, outsider.id],
		teamIds: [teamA, teamB]
	};
	return ws;
}
