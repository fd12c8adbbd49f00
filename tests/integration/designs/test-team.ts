// A team of our own for one test file: owner, editor, viewer and an outsider, with a random suffix (the test database is shared).
import { randomBytes } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { Database } from '../../../src/lib/server/db/database';
import type { TeamRole } from '../../../src/lib/server/db/team.table';

export interface TestTeam {
	teamId: string;
	suffix: string;
	users: Record<TeamRole | 'outsider', { id: string; email: string; displayName: string }>;
}

export async function createTestTeam(db: Kysely<Database>, tag: string): Promise<TestTeam> {
	const suffix = `${tag}-${randomBytes(4).toString('hex')}`;
	const teamId = `team-${suffix}`;
	const users = {} as TestTeam['users'];
	for (const who of ['owner', 'editor', 'viewer', 'outsider'] as const) {
		const user = { id: `user-${who}-${suffix}`, email: `${who}-${suffix}@designs.test`, displayName: `${who} ${suffix}` };
		await db.insertInto('app_user').values({ id: user.id, email: user.email, display_name: user.displayName, password_hash: 'not-a-hash' }).execute();
		users[who] = user;
	}
	await db.insertInto('team').values({ id: teamId, name: `Test team ${suffix}` }).execute();
	for (const role of ['owner', 'editor', 'viewer'] as const) {
		await db.insertInto('team_member').values({ team_id: teamId, user_id: users[role].id, role }).execute();
	}
	return { teamId, suffix, users };
}

/** A valid design-input document: a 2.45 GHz inset-fed patch on glass-epoxy (demo values). */
export function sampleInput(overrides: Record<string, unknown> = {}) {
	return {
		name: 'ISM test patch',
		frequencyHz: 2.45e9,
		shape: 'rectangular',
		feed: 'inset',
		substrate: { relativePermittivity: 4.4, lossTangent: 0.02, heightMm: 1.6 },
		...overrides
	};
}
