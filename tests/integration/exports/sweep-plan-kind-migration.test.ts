// Migration 2026-12-02T0620 on rows written before it: plan sweeps (found by their file name) become 'sweep-plan'
// linked to their plan; the design sweep stays 'sweep'; two plans of one revision with the same slug stay unlinked.
import { mkdtempSync, readdirSync, rmSync, symlinkSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrateToLatest } from '../../../scripts/lib/migrate';

const MIGRATION = '2026-12-02T0620_separate_sweep_plan_exports.ts';
const migrationsDir = join(import.meta.dirname, '..', '..', '..', 'migrations');
const baseUrl = process.env.DATABASE_URL!;
const scratch = `ff_sweepkind_${process.pid}`;
const scratchUrl = baseUrl.replace(/\/[^/]+$/, `/${scratch}`);
const folder = mkdtempSync(join(tmpdir(), 'ff-migrations-'));

async function client<T>(url: string, fn: (c: pg.Client) => Promise<T>): Promise<T> {
	const c = new pg.Client({ connectionString: url });
	await c.connect();
	try {
		return await fn(c);
	} finally {
		await c.end();
	}
}

beforeAll(async () => {
	await client(baseUrl, (c) => c.query(`create database "${scratch}"`));
	// Every migration before this one.
	for (const f of readdirSync(migrationsDir).filter((f) => f.endsWith('.ts') && f < MIGRATION)) symlinkSync(join(migrationsDir, f), join(folder, f));
	await migrateToLatest(scratchUrl, () => undefined, folder);
	await client(scratchUrl, async (c) => {
		await c.query(`insert into app_user (id, email, display_name, password_hash) values ('u1', 'u1@x.test', 'U1', 'x')`);
		await c.query(`insert into team (id, name) values ('t1', 'T1')`);
		await c.query(`insert into design (id, team_id, slug, name, created_by) values ('d1', 't1', 'roof-gnss', 'Roof GNSS', 'u1')`);
		await c.query(`insert into revision (id, design_id, label, seq, input, results, created_by) values ('r1', 'd1', 'A', 1, '{}', '{}', 'u1')`);
		// Demo plans: one whose accented name slugs to "etude-hauteur", and two that share the slug "study".
		const plan = (id: string, name: string) => c.query(`insert into sweep_plan (id, revision_id, name, plan, point_count, created_by) values ($1, 'r1', $2, '{}', 3, 'u1')`, [id, name]);
		await plan('p-etude', 'Étude hauteur');
		await plan('p-study-1', 'Study');
		await plan('p-study-2', 'study!');
		const record = (id: string, file: string) =>
			c.query(`insert into export_record (id, team_id, design_id, revision_id, user_id, via, kind, files, sha256) values ($1, 't1', 'd1', 'r1', 'u1', 'api', 'sweep', $2, $3)`, [
				id,
				JSON.stringify([{ name: file, sizeBytes: 10, sha256: 'a'.repeat(64) }]),
				'a'.repeat(64)
			]);
		await record('e-design', 'roof-gnss-A.sweep.json');
		await record('e-etude', 'roof-gnss-A.sweep-etude-hauteur.sweep.json');
		await record('e-study', 'roof-gnss-A.sweep-study.sweep.json');
	});
	symlinkSync(join(migrationsDir, MIGRATION), join(folder, MIGRATION));
	await migrateToLatest(scratchUrl, () => undefined, folder);
});
afterAll(async () => {
	await client(baseUrl, (c) => c.query(`drop database if exists "${scratch}" with (force)`));
	rmSync(folder, { recursive: true, force: true });
});

describe('separating plan sweeps from the design sweep in existing export records', () => {
	it('gives plan sweeps their own kind and plan, and leaves the design sweep alone', async () => {
		const rows = await client(scratchUrl, async (c) => (await c.query(`select id, kind, sweep_plan_id from export_record order by id`)).rows);
		expect(rows).toEqual([
			{ id: 'e-design', kind: 'sweep', sweep_plan_id: null },
			{ id: 'e-etude', kind: 'sweep-plan', sweep_plan_id: 'p-etude' },
			// Two plans slug to "study": which one was downloaded cannot be told, so no link.
			{ id: 'e-study', kind: 'sweep-plan', sweep_plan_id: null }
		]);
	});
});
