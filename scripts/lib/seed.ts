// Demo data for `npm start`: a scenario of our own — Kestrel Labs, a three-person team building GNSS
// and ISM-band boards. All three demo people share one password (shown below and printed by npm start):
//   demo@fringefield.test          Imke Varga     owner
//   editor.demo@fringefield.test   Joost Okafor   editor
//   viewer.demo@fringefield.test   Runa Castell   viewer
// Safe to run on every start: it adds what is missing and changes nothing that exists.
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';
import type { Database } from '../../src/lib/server/db/database.ts';
import type { TeamRole } from '../../src/lib/server/db/team.table.ts';
import { hashPassword } from '../../src/lib/server/auth/password.ts';

export const DEMO_EMAIL = 'demo@fringefield.test';
export const DEMO_PASSWORD = 'patch-demo-2450';
export const DEMO_TEAM_ID = 'demo-team-kestrel';
export const DEMO_TEAM_NAME = 'Kestrel Labs — GNSS & ISM';

/** The demo people's ids by role, as passed to seedDemoDesigns. */
export interface DemoUserIds {
	owner: string;
	editor: string;
	viewer: string;
}

export const DEMO_PEOPLE: readonly { id: string; email: string; displayName: string; role: TeamRole }[] = [
	{ id: 'demo-user-0001', email: DEMO_EMAIL, displayName: 'Imke Varga (demo)', role: 'owner' },
	{ id: 'demo-user-0002', email: 'editor.demo@fringefield.test', displayName: 'Joost Okafor (demo)', role: 'editor' },
	{ id: 'demo-user-0003', email: 'viewer.demo@fringefield.test', displayName: 'Runa Castell (demo)', role: 'viewer' }
];

/** Where another module adds the demo designs; loaded only if it exists. */
const designsModule = new URL('./seed-designs.ts', import.meta.url);

export async function seedDemo(databaseUrl: string): Promise<void> {
	const db = new Kysely<Database>({ dialect: new PostgresDialect({ pool: new pg.Pool({ connectionString: databaseUrl, max: 1 }) }) });
	try {
		const passwordHash = await hashPassword(DEMO_PASSWORD);
		const ids: Partial<Record<TeamRole, string>> = {};
		for (const person of DEMO_PEOPLE) {
			await db
				.insertInto('app_user')
				// Demo people count as having confirmed their addresses (they can make API tokens at once).
				.values({ id: person.id, email: person.email, display_name: person.displayName, password_hash: passwordHash, email_verified_at: new Date() })
				.onConflict((oc) => oc.column('email').doNothing())
				.execute();
			// An account made earlier under the same e-mail keeps its id.
			const row = await db.selectFrom('app_user').select('id').where('email', '=', person.email).executeTakeFirstOrThrow();
			ids[person.role] = row.id;
		}
		await db.insertInto('team').values({ id: DEMO_TEAM_ID, name: DEMO_TEAM_NAME }).onConflict((oc) => oc.column('id').doNothing()).execute();
		for (const person of DEMO_PEOPLE) {
			await db
				.insertInto('team_member')
				.values({ team_id: DEMO_TEAM_ID, user_id: ids[person.role]!, role: person.role })
				.onConflict((oc) => oc.columns(['team_id', 'user_id']).doNothing())
				.execute();
		}

		// Demo designs come from scripts/lib/seed-designs.ts when it exists, and only into a team that has none yet.
		if (existsSync(fileURLToPath(designsModule))) {
			const { n } = await db.selectFrom('design').select((eb) => eb.fn.countAll<string>().as('n')).where('team_id', '=', DEMO_TEAM_ID).executeTakeFirstOrThrow();
			if (Number(n) === 0) {
				const mod = (await import(designsModule.href)) as { seedDemoDesigns: (db: Kysely<Database>, teamId: string, userIds: DemoUserIds) => Promise<void> };
				await mod.seedDemoDesigns(db, DEMO_TEAM_ID, { owner: ids.owner!, editor: ids.editor!, viewer: ids.viewer! });
			}
		}
	} finally {
		await db.destroy();
	}
}
