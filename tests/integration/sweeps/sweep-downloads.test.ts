// Large sweep downloads against the real PostgreSQL (issue 13, item 8): a 10 000-point plan is built once on a
// worker thread, kept on disk under the data folder, and every download (four at once included) streams the same
// bytes and is recorded.
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { emptyAxisDraft } from '../../../src/lib/schemas/sweep-plan';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { createDesign, findRevision } from '../../../src/lib/server/designs';
import { findDesign } from '../../../src/lib/server/designs/find-designs';
import { exportSweepPlan, findSweepPlan, saveSweepPlan, sweepBuildCount, sweepCacheDir, sweepResponse } from '../../../src/lib/server/sweeps';
import { createTestTeam, sampleInput, type TestTeam } from '../designs/test-team';

const db = getDb();
let team: TestTeam;
let dataDir: string;
const savedDataDir = process.env.FRINGEFIELD_DATA_DIR;
const savedBudget = process.env.FRINGEFIELD_WORK_BUDGET_MS;
let target: { designId: string; revisionId: string; planId: string };

beforeAll(async () => {
	dataDir = mkdtempSync(join(tmpdir(), 'ff-sweep-cache-'));
	process.env.FRINGEFIELD_DATA_DIR = dataDir;
	// these tests are about one build and its file, not the budget (tests/unit/server/work covers that), on however busy a machine
	process.env.FRINGEFIELD_WORK_BUDGET_MS = '900000';
	team = await createTestTeam(db, 'bigsweep');
	const { design } = await createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: `Big sweep ${team.suffix}` }) });
	const revision = (await findRevision(db, design.id, 'A'))!;
	// 100 × 100 = 10 000 points, the most a plan may hold
	const plan = await saveSweepPlan(db, {
		revisionId: revision.id,
		userId: team.users.editor.id,
		draft: {
			name: 'Full grid',
			combine: 'grid',
			axes: [
				{ ...emptyAxisDraft('substrate.heightMm'), from: '1.0', to: '1.99', step: '0.01' },
				{ ...emptyAxisDraft('substrate.relativePermittivity'), from: '4.0', to: '4.99', step: '0.01' }
			]
		}
	});
	expect(plan.pointCount).toBe(10_000);
	target = { designId: design.id, revisionId: revision.id, planId: plan.id };
}, 120_000);
afterAll(async () => {
	if (savedDataDir === undefined) delete process.env.FRINGEFIELD_DATA_DIR;
	else process.env.FRINGEFIELD_DATA_DIR = savedDataDir;
	if (savedBudget === undefined) delete process.env.FRINGEFIELD_WORK_BUDGET_MS;
	else process.env.FRINGEFIELD_WORK_BUDGET_MS = savedBudget;
	rmSync(dataDir, { recursive: true, force: true });
	await closeDb();
});

async function download(via: 'api' | 'ui' = 'api') {
	const design = (await findDesign(db, target.designId))!;
	const revision = (await findRevision(db, target.designId, 'A'))!;
	const plan = (await findSweepPlan(db, target.revisionId, target.planId))!;
	return exportSweepPlan({ design, revision, plan, userId: team.users.viewer.id, via });
}

const sha256 = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');
const recordsOfPlan = () => db.selectFrom('export_record').selectAll().where('revision_id', '=', target.revisionId).where('kind', '=', 'sweep-plan').execute();

describe('a 10 000-point sweep plan', () => {
	it('is built once for four concurrent downloads, which get identical bytes and one record each', async () => {
		const buildsBefore = sweepBuildCount();
		const recordsBefore = (await recordsOfPlan()).length;
		const four = await Promise.all([download(), download(), download('ui'), download()]);
		expect(sweepBuildCount() - buildsBefore).toBe(1);
		expect(new Set(four.map((d) => d.sha256)).size).toBe(1);
		expect(new Set(four.map((d) => d.exportId)).size).toBe(4);
		expect((await recordsOfPlan()).length - recordsBefore).toBe(4);
		const bytes = new Uint8Array(readFileSync(four[0].path));
		expect(sha256(bytes)).toBe(four[0].sha256);
		expect(bytes.byteLength).toBe(four[0].sizeBytes);
		expect(four[0].pointCount).toBe(10_000);
		expect(JSON.parse(new TextDecoder().decode(bytes)).points).toHaveLength(10_000);
	}, 600_000);

	it('keeps the file under FRINGEFIELD_DATA_DIR/cache/sweeps and serves later downloads from it without building', async () => {
		const first = await download();
		const buildsBefore = sweepBuildCount();
		const again = await download();
		expect(sweepBuildCount()).toBe(buildsBefore);
		expect(again.sha256).toBe(first.sha256);
		expect(sweepCacheDir()).toBe(join(dataDir, 'cache', 'sweeps'));
		expect(again.path.startsWith(sweepCacheDir())).toBe(true);
		// the body and its facts; no temporary file left behind
		const names = readdirSync(sweepCacheDir());
		expect(names.filter((n) => n.endsWith('.tmp'))).toEqual([]);
		expect(names.sort()).toEqual([`${again.path.split('/').pop()!.replace(/\.json$/, '')}.facts.json`, again.path.split('/').pop()!].sort());
	}, 600_000);

	it('streams the file with its length, hash and export id', async () => {
		const d = await download();
		const res = sweepResponse(d);
		expect(res.headers.get('content-length')).toBe(String(d.sizeBytes));
		expect(res.headers.get('x-content-sha256')).toBe(d.sha256);
		expect(res.headers.get('x-export-id')).toBe(d.exportId);
		expect(res.headers.get('x-sweep-point-count')).toBe('10000');
		const body = new Uint8Array(await res.arrayBuffer());
		expect(sha256(body)).toBe(d.sha256);
	}, 600_000);

	it('builds again when the cached file is gone (a cleared cache is never an error)', async () => {
		const d = await download();
		rmSync(d.path);
		const buildsBefore = sweepBuildCount();
		const again = await download();
		expect(sweepBuildCount()).toBe(buildsBefore + 1);
		expect(existsSync(again.path)).toBe(true);
		expect(again.sha256).toBe(d.sha256);
	}, 600_000);
});
