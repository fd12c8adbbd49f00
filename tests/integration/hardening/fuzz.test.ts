// Hostile input against every /api/v1 route and every form action of the built server: a seeded
// sample of 40 cases per route here (`npm run bench -- --fuzz` runs 10 000 per route). Every answer
// is a 4xx with a message, never a 5xx, and a route that accepted nothing wrote nothing.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDb, getDb } from '../../../src/lib/server/db';
import { cancelOpenFieldChecks } from '../jobs/helpers/open-checks';
import { startBuiltServer, type BuiltServer } from './helpers/built-server';
import { action, api } from './helpers/client';
import { fuzzTarget } from './helpers/fuzz-run';
import { fuzzTargets } from './helpers/fuzz-targets';
import { createHardeningWorkspace, demoDesign, type HardeningWorkspace } from './helpers/workspace';

const RUNS = 40;
const SEED = 9_2450;

let server: BuiltServer;
let ws: HardeningWorkspace;

beforeAll(async () => {
	[server, ws] = await Promise.all([startBuiltServer({ databaseUrl: process.env.DATABASE_URL! }), createHardeningWorkspace('fuzz')]);
}, 120_000);
afterAll(async () => {
	await server?.stop();
	// the simulation targets may have queued field checks: leave no open job for another file's worker
	if (ws) await cancelOpenFieldChecks(getDb(), ws.a.teamId);
	await closeDb();
});

describe('hostile input to the built server', () => {
	// Targets are built from the workspace, so list them by name here and look each up at run time.
	const names = fuzzTargets({ a: {}, b: {}, owner: {}, editor: {}, viewer: {}, outsider: {} } as unknown as HardeningWorkspace).map((t) => t.name);

	it.each(names)('%s: 4xx with a message, never 5xx, nothing written', async (name) => {
		const target = fuzzTargets(ws).find((t) => t.name === name)!;
		const report = await fuzzTarget(server.origin, ws, target, { runs: RUNS, seed: SEED, concurrency: 4 });
		expect(report.cases).toBe(RUNS);
		expect(report.samples, `server log:\n${server.log().slice(-3000)}`).toEqual([]);
		expect(report.serverErrors).toBe(0);
		expect(report.unexplained).toBe(0);
		expect(report.writtenTables).toEqual([]);
	}, 60_000);
});

describe('text PostgreSQL cannot store (found by the 10 000-case run as 500s)', () => {
	it('refuses a NUL in a form field with 400 naming the field', async () => {
		const res = await action(server.origin, '/teams?/switch', { cookie: ws.editor.sessionId }, { teamId: 'a\u0000b' });
		expect(res.status).toBe(400);
		expect(res.message).toBe('"teamId": must not contain the NUL character (U+0000) or an unpaired UTF-16 surrogate');
	});

	it('refuses an unpaired surrogate in a JSON string with 400 naming its path', async () => {
		const res = await api(server.origin, `/api/v1/designs/${ws.a.designId}/revisions`, { token: ws.editor.token }, { rawBody: JSON.stringify({ parent: ws.a.label, input: { ...demoDesign('x'), name: '\ud800' } }) });
		expect(res.status).toBe(400);
		expect(res.body.issues).toEqual([{ path: 'input.name', message: 'must not contain the NUL character (U+0000) or an unpaired UTF-16 surrogate' }]);
	});

	it('refuses a NUL in the query with 400 naming the parameter', async () => {
		const res = await api(server.origin, `/api/v1/teams/${ws.a.teamId}/exports?sort=%00`, { token: ws.editor.token });
		expect(res.status).toBe(400);
		expect(res.body.issues[0].path).toBe('query.sort');
	});
});

describe('parallel creations of one name (found by the 10 000-case run as 500s)', () => {
	it('makes 24 designs of the same name at once, each with its own slug', async () => {
		const answers = await Promise.all(Array.from({ length: 24 }, () => api(server.origin, `/api/v1/teams/${ws.a.teamId}/designs`, { token: ws.editor.token }, { body: { input: demoDesign(`Race ${ws.suffix}`) } })));
		expect(answers.map((a) => a.status)).toEqual(Array(24).fill(201));
		expect(new Set(answers.map((a) => a.body.slug ?? a.body.design?.slug ?? a.body.id)).size).toBe(24);
	});
});

describe('a method the route does not have (found by the 10 000-case run as a plain-text 405)', () => {
	it('answers JSON 405 naming the methods the address answers (RFC 9110 §15.5.6: Allow)', async () => {
		// "/simulations/%2E/cancel" is read as "/simulations/cancel": the status route, which answers GET only
		const res = await api(server.origin, `/api/v1/simulations/%2E/cancel`, { token: ws.editor.token }, { body: {} });
		expect(res.status).toBe(405);
		expect(res.body.error).toMatch(/^POST is not accepted at this address; it answers GET/);
		expect(res.headers.get('allow')).toMatch(/GET/);
	});
});
