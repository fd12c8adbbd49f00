// The migrations apply to an empty database, and a second run changes nothing.
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrateToLatest } from '../../scripts/lib/migrate';

const baseUrl = process.env.DATABASE_URL!;
const scratch = `ff_migrate_${process.pid}`;
const scratchUrl = baseUrl.replace(/\/[^/]+$/, `/${scratch}`);

async function admin<T>(fn: (c: pg.Client) => Promise<T>, url = baseUrl): Promise<T> {
	const client = new pg.Client({ connectionString: url });
	await client.connect();
	try {
		return await fn(client);
	} finally {
		await client.end();
	}
}

const schemaSnapshot = () =>
	admin(
		async (c) =>
			(
				await c.query(
					`select table_name, column_name, data_type, is_nullable from information_schema.columns
					 where table_schema = 'public' order by table_name, column_name`
				)
			).rows,
		scratchUrl
	);

beforeAll(() => admin((c) => c.query(`create database "${scratch}"`)));
afterAll(() => admin((c) => c.query(`drop database if exists "${scratch}" with (force)`)));

describe('migrations', () => {
	it('apply on an empty database, then a second run applies nothing and changes nothing', async () => {
		const first = await migrateToLatest(scratchUrl, () => undefined);
		expect(first).toBeGreaterThan(0);
		const before = await schemaSnapshot();
		expect(before.some((r) => r.table_name === 'app_user')).toBe(true);
		const second = await migrateToLatest(scratchUrl, () => undefined);
		expect(second).toBe(0);
		expect(await schemaSnapshot()).toEqual(before);
	});
});
