// Sweep plans against the real PostgreSQL: the 10 000-point limit refuses before storing, and every export (page or API token) is recorded.
import { randomUUID } from 'node:crypto';
import Ajv2020 from 'ajv/dist/2020';
import type { Cookies, RequestEvent } from '@sveltejs/kit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sweepJsonSchema } from '../../../src/lib/formats/sweep';
import { InputError } from '../../../src/lib/schemas';
import { emptyAxisDraft } from '../../../src/lib/schemas/sweep-plan';
import { generateSecret, hashSecret } from '../../../src/lib/server/auth/api-token';
import { identify, type RequestIdentity } from '../../../src/lib/server/auth/request-identity';
import { closeDb, getDb } from '../../../src/lib/server/db';
import * as sweepPlanQueries from '../../../src/lib/server/db/sweep-plan.queries';
import { createDesign, findRevision } from '../../../src/lib/server/designs';
import { saveSweepPlan } from '../../../src/lib/server/sweeps';
import * as apiRoute from '../../../src/routes/api/v1/designs/[designId]/revisions/[label]/sweep-plans/[planId]/sweep/+server';
import * as pageRoute from '../../../src/routes/(app)/designs/[designId]/r/[label]/sweeps/[planId]/export/+server';
import { createTestTeam, sampleInput, type TestTeam } from '../designs/test-team';

const db = getDb();
let team: TestTeam;
let designId: string;
let revisionId: string;
const tokens: Record<string, string> = {};

const noCookies = { get: () => undefined, getAll: () => [], set: () => undefined, delete: () => undefined, serialize: () => '' } as unknown as Cookies;

beforeAll(async () => {
	team = await createTestTeam(db, 'sweep');
	const { design } = await createDesign(db, { teamId: team.teamId, userId: team.users.editor.id, raw: sampleInput({ name: `Sweep bench ${team.suffix}` }) });
	designId = design.id;
	revisionId = (await findRevision(db, designId, 'A'))!.id;
	// The outsider's token belongs to a team of its own.
	await db.insertInto('team').values({ id: `${team.teamId}-x`, name: 'elsewhere' }).execute();
	await db.insertInto('team_member').values({ team_id: `${team.teamId}-x`, user_id: team.users.outsider.id, role: 'owner' }).execute();
	for (const who of ['viewer', 'outsider'] as const) {
		const secret = generateSecret();
		await db
			.insertInto('api_token')
			.values({ id: randomUUID(), team_id: who === 'outsider' ? `${team.teamId}-x` : team.teamId, user_id: team.users[who].id, name: 'sweep test', token_hash: hashSecret(secret) })
			.execute();
		tokens[who] = secret;
	}
});
afterAll(async () => {
	await closeDb();
});

function draft(axes: ReturnType<typeof emptyAxisDraft>[], combine: 'grid' | 'zip' = 'grid', mode?: 'resize' | 'hold-geometry') {
	return { name: 'Bench study', combine, ...(mode ? { mode } : {}), axes };
}
const range = (field: string, from: string, to: string, step: string) => ({ ...emptyAxisDraft(field), from, to, step });

async function refusal(p: Promise<unknown>): Promise<InputError> {
	try {
		await p;
	} catch (err) {
		if (err instanceof InputError) return err;
		throw err;
	}
	throw new Error('expected an InputError');
}

async function call(handler: (e: RequestEvent) => Promise<Response> | Response, identity: RequestIdentity, params: Record<string, string>): Promise<Response> {
	const url = new URL(`http://127.0.0.1/test`);
	const event = { request: new Request(url), url, params, locals: { identity, user: identity.user, sessionId: identity.sessionId, apiToken: identity.apiToken }, cookies: noCookies } as unknown as RequestEvent;
	try {
		return await handler(event);
	} catch (err) {
		const e = err as { status?: number; body?: unknown };
		if (typeof e?.status === 'number') return new Response(JSON.stringify(e.body), { status: e.status });
		throw err;
	}
}
const tokenIdentity = (who: 'viewer' | 'outsider') => identify(new Request('http://127.0.0.1/api/v1', { headers: { authorization: `Bearer ${tokens[who]}` } }), noCookies);

const exportsOf = (kind: string) => db.selectFrom('export_record').selectAll().where('revision_id', '=', revisionId).where('kind', '=', kind).orderBy('created_at').execute();

describe('saving a sweep plan', () => {
	it('refuses a plan over 10 000 points, saying how many it makes, and stores nothing', async () => {
		const before = await sweepPlanQueries.countSweepPlansByRevision(db, revisionId);
		// 101 × 100 = 10 100 points.
		const err = await refusal(
			saveSweepPlan(db, { revisionId, userId: team.users.editor.id, draft: draft([range('substrate.relativePermittivity', '3', '4', '0.01'), range('substrate.heightMm', '1', '1.99', '0.01')]) })
		);
		expect(err.first.path).toBe('axes');
		expect(err.first.message).toMatch(/10100 points; allowed range \[1, 10000\]/);
		expect(await sweepPlanQueries.countSweepPlansByRevision(db, revisionId)).toBe(before);
	});

	it('names the form row of a bad number, and refuses zipped axes of unequal length', async () => {
		const bad = await refusal(saveSweepPlan(db, { revisionId, userId: team.users.editor.id, draft: draft([emptyAxisDraft(), range('substrate.heightMm', '1', 'x', '0.1')]) }));
		// The second form row (index 1) made the plan's first axis: the issue names the row.
		expect(bad.first.path).toMatch(/^axes\.1(\.|$)/);
		const zip = await refusal(
			saveSweepPlan(db, { revisionId, userId: team.users.editor.id, draft: draft([range('substrate.heightMm', '1', '1.2', '0.1'), range('groundMarginMm', '3', '6', '1')], 'zip') })
		);
		expect(zip.first.message).toMatch(/equal length/);
	});

	it('stores a plan of exactly 10 000 points with its count, frequencies typed in GHz stored in Hz', async () => {
		const saved = await saveSweepPlan(db, {
			revisionId,
			userId: team.users.editor.id,
			draft: draft([range('frequencyHz', '2.40', '2.49', '0.01'), range('substrate.heightMm', '1', '1.99', '0.01'), { ...emptyAxisDraft('groundMarginMm'), mode: 'list', values: '3, 4, 5, 6, 7, 8, 9, 10, 11, 12' }])
		});
		expect(saved.pointCount).toBe(10_000);
		const row = await sweepPlanQueries.findSweepPlanByRevisionAndId(db, revisionId, saved.id);
		expect(row!.point_count).toBe(10_000);
		expect((row!.plan as { axes: { from?: number }[] }).axes[0].from).toBe(2.4e9);
	});

	it('stores the mode of a hold-geometry plan, and a resize plan as plans were stored before modes (no mode)', async () => {
		const held = await saveSweepPlan(db, { revisionId, userId: team.users.editor.id, draft: draft([range('substrate.relativePermittivity', '3.4', '3.6', '0.1')], 'grid', 'hold-geometry') });
		expect((await sweepPlanQueries.findSweepPlanByRevisionAndId(db, revisionId, held.id))!.plan).toMatchObject({ mode: 'hold-geometry' });
		const resized = await saveSweepPlan(db, { revisionId, userId: team.users.editor.id, draft: draft([range('substrate.relativePermittivity', '3.4', '3.6', '0.1')], 'grid', 'resize') });
		expect((await sweepPlanQueries.findSweepPlanByRevisionAndId(db, revisionId, resized.id))!.plan).not.toHaveProperty('mode');
	});

	it('refuses a hold-geometry plan on a truncated-corner patch beside the mode, and stores nothing', async () => {
		const before = await sweepPlanQueries.countSweepPlansByRevision(db, revisionId);
		const err = await refusal(
			saveSweepPlan(db, { revisionId, userId: team.users.editor.id, base: { shape: 'truncated-corner' }, draft: draft([range('substrate.relativePermittivity', '3.4', '3.6', '0.1')], 'grid', 'hold-geometry') })
		);
		expect(err.first.path).toBe('mode');
		expect(await sweepPlanQueries.countSweepPlansByRevision(db, revisionId)).toBe(before);
	});
});

describe('exporting a sweep plan', () => {
	let planId: string;
	beforeAll(async () => {
		planId = (await saveSweepPlan(db, { revisionId, userId: team.users.editor.id, draft: draft([range('substrate.relativePermittivity', '4.3', '4.5', '0.05')]) })).id;
	});

	it('over the API with a viewer token: the sweep JSON, valid against its JSON Schema, recorded once via api', async () => {
		const before = (await exportsOf('sweep-plan')).length;
		const res = await call(apiRoute.GET as never, await tokenIdentity('viewer'), { designId, label: 'A', planId });
		expect(res.status).toBe(200);
		const body = new Uint8Array(await res.arrayBuffer());
		const doc = JSON.parse(new TextDecoder().decode(body));
		expect(doc.pointCount).toBe(5);
		expect(doc.points.map((p: { parameters: Record<string, number> }) => p.parameters['substrate.relativePermittivity'])).toEqual([4.3, 4.35, 4.4, 4.45, 4.5]);
		// ajv (JSON Schema 2020-12) checks the document against the schema the formats room publishes.
		const validate = new Ajv2020({ strict: false, allErrors: true }).compile(sweepJsonSchema);
		expect(validate(doc), JSON.stringify(validate.errors?.slice(0, 3))).toBe(true);
		expect(doc).toMatchObject({ $schema: '/schemas/sweep-v2.json', formatVersion: 2 });

		const records = await exportsOf('sweep-plan');
		expect(records.length).toBe(before + 1);
		const record = records[records.length - 1];
		expect(record).toMatchObject({ via: 'api', user_id: team.users.viewer.id, team_id: team.teamId, sweep_plan_id: planId, sha256: res.headers.get('x-content-sha256') });
		expect(record.files).toEqual([{ name: expect.stringMatching(/-A\.sweep-bench-study\.sweep\.json$/), sizeBytes: body.byteLength, sha256: record.sha256 }]);
		expect(res.headers.get('x-export-id')).toBe(record.id);
	});

	it('from the page: the same bytes, recorded via ui', async () => {
		const session = { user: { id: team.users.editor.id, email: team.users.editor.email, displayName: team.users.editor.displayName, emailVerified: true }, sessionId: 's', apiToken: null };
		const res = await call(pageRoute.GET as never, session, { designId, label: 'A', planId });
		expect(res.status).toBe(200);
		expect(res.headers.get('content-disposition')).toMatch(/^attachment; filename=".+\.sweep\.json"$/);
		const records = await exportsOf('sweep-plan');
		expect(records[records.length - 1]).toMatchObject({ via: 'ui', user_id: team.users.editor.id, sha256: records[records.length - 2].sha256 });
	});

	it('answers 404 to a token of another team and to an unknown plan, recording nothing', async () => {
		const before = (await exportsOf('sweep-plan')).length;
		expect((await call(apiRoute.GET as never, await tokenIdentity('outsider'), { designId, label: 'A', planId })).status).toBe(404);
		expect((await call(apiRoute.GET as never, await tokenIdentity('viewer'), { designId, label: 'A', planId: randomUUID() })).status).toBe(404);
		expect((await exportsOf('sweep-plan')).length).toBe(before);
	});
});
