// The demo data: in a scratch database of its own, the demo team with an owner, an editor and a viewer who all
// sign in with the one demo password; running it twice changes nothing.
import { randomBytes } from 'node:crypto';
import { Kysely, PostgresDialect } from 'kysely';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrateToLatest } from '../../../scripts/lib/migrate';
import { DEMO_EMAIL, DEMO_PASSWORD, DEMO_PEOPLE, DEMO_TEAM_ID, DEMO_TEAM_NAME, seedDemo } from '../../../scripts/lib/seed';
import { verifyPassword } from '../../../src/lib/server/auth/password';
import type { Database } from '../../../src/lib/server/db/database';

const scratch = `fringefield_seed_${randomBytes(4).toString('hex')}`;
const adminUrl = process.env.DATABASE_URL!.replace(/\/[^/]+$/, '/postgres');
const scratchUrl = process.env.DATABASE_URL!.replace(/\/[^/]+$/, `/${scratch}`);
let db: Kysely<Database>;

async function admin(sql: string): Promise<void> {
	const client = new pg.Client({ connectionString: adminUrl });
	await client.connect();
	try {
		await client.query(sql);
	} finally {
		await client.end();
	}
}

beforeAll(async () => {
	await admin(`create database "${scratch}"`);
	await migrateToLatest(scratchUrl, () => undefined);
	await seedDemo(scratchUrl);
	await seedDemo(scratchUrl);
	db = new Kysely<Database>({ dialect: new PostgresDialect({ pool: new pg.Pool({ connectionString: scratchUrl, max: 1 }) }) });
});
afterAll(async () => {
	await db?.destroy();
	await admin(`drop database if exists "${scratch}" with (force)`);
});

describe('the demo data', () => {
	it('makes the demo team with the demo owner, an editor and a viewer, once', async () => {
		const team = await db.selectFrom('team').selectAll().where('id', '=', DEMO_TEAM_ID).execute();
		expect(team.map((t) => t.name)).toEqual([DEMO_TEAM_NAME]);
		const members = await db
			.selectFrom('team_member')
			.innerJoin('app_user', 'app_user.id', 'team_member.user_id')
			.select(['app_user.email', 'team_member.role'])
			.where('team_id', '=', DEMO_TEAM_ID)
			.orderBy('app_user.email')
			.execute();
		expect(members).toEqual(
			[
				{ email: DEMO_EMAIL, role: 'owner' },
				{ email: 'editor.demo@fringefield.test', role: 'editor' },
				{ email: 'viewer.demo@fringefield.test', role: 'viewer' }
			].sort((a, b) => a.email.localeCompare(b.email))
		);
		expect(DEMO_PEOPLE).toHaveLength(3);
	});

	it('lets every demo person sign in with the same demo password', async () => {
		const users = await db.selectFrom('app_user').select(['email', 'password_hash']).execute();
		expect(users).toHaveLength(3);
		for (const u of users) expect(await verifyPassword(u.password_hash, DEMO_PASSWORD)).toBe(true);
	});

	it("has the demo people's e-mail addresses confirmed", async () => {
		// Abuse review item 13: unconfirmed accounts cannot make API tokens; the demo must work from the first sign-in.
		const users = await db.selectFrom('app_user').select(['email', 'email_verified_at']).execute();
		expect(users).toHaveLength(3);
		for (const u of users) expect(u.email_verified_at, u.email).not.toBeNull();
	});
});
