// Abuse review (issue 13) against the built server, the way browsers and scripts reach it: an API token
// never reaches another team through the ff_team cookie (item 3), redirects after sign-in never leave
// the site (item 4), and two app processes share one sign-in limit (item 5).
import { randomBytes } from 'node:crypto';
import { readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signUp } from '../../../src/lib/server/accounts/sign-up';
import { closeDb, getDb } from '../../../src/lib/server/db';
import * as memberQueries from '../../../src/lib/server/db/member.queries';
import { action } from './helpers/client';
import { copyBuild, rootDir, startBuiltServer, type BuiltServer } from './helpers/built-server';
import { createHardeningWorkspace, PASSWORD, type HardeningWorkspace } from './helpers/workspace';

let buildDir: string;
let server: BuiltServer;
let ws: HardeningWorkspace;

beforeAll(async () => {
	buildDir = copyBuild();
	[server, ws] = await Promise.all([startBuiltServer({ databaseUrl: process.env.DATABASE_URL!, buildDir }), createHardeningWorkspace('abuse')]);
	// The owner of team A is also a viewer in team B: their token for team A must still see only team A.
	await memberQueries.insertMember(getDb(), ws.b.teamId, ws.owner.id, 'viewer');
}, 120_000);
afterAll(async () => {
	await server?.stop();
	const { rmSync } = await import('node:fs');
	rmSync(buildDir, { recursive: true, force: true });
	await closeDb();
});

/** Every page folder under src/routes/(app), as a route id such as /designs/[designId]/r/[label]. */
function appPageRoutes(): string[] {
	const base = join(rootDir, 'src', 'routes', '(app)');
	const out: string[] = [];
	const walk = (dir: string) => {
		const names = readdirSync(dir);
		if (names.some((n) => /^\+page(\.server)?\.(ts|svelte)$/.test(n))) out.push('/' + relative(base, dir).split('/').filter(Boolean).join('/'));
		for (const n of names) if (statSync(join(dir, n)).isDirectory()) walk(join(dir, n));
	};
	walk(base);
	return out.sort();
}

/** The route with team A's ids (the token's own team) filled in; a parameter we do not know fails the test. */
function pathOf(route: string, w: HardeningWorkspace): string {
	const values: Record<string, string> = { teamId: w.a.teamId, designId: w.a.designId, label: w.a.label, planId: w.a.planId };
	return route.replace(/\[([^\]=]+)(=[^\]]+)?\]/g, (_m, name: string) => {
		if (!(name in values)) throw new Error(`no value for [${name}] in ${route}: add it to this test`);
		return values[name];
	});
}

async function dataJson(path: string, headers: Record<string, string>): Promise<{ status: number; text: string }> {
	const [pathname, query] = path.split('?');
	const url = `${server.origin}${pathname === '/' ? '' : pathname}/__data.json${query ? `?${query}` : ''}`;
	const res = await fetch(url, { headers, redirect: 'manual' });
	return { status: res.status, text: await res.text() };
}

describe('item 3: an API token is bound to its team on every page', () => {
	const bMarkers = (w: HardeningWorkspace) => [w.b.teamId, `Hardening B ${w.suffix}`, `Hardening patch ${w.suffix}-b`];

	it('shows nothing of another team on any (app) page, whatever the ff_team cookie says', async () => {
		const routes = appPageRoutes();
		expect(routes).toContain('/designs');
		expect(routes).toContain('/laminates');
		expect(routes).toContain('/fab-profiles');
		const headers = { authorization: `Bearer ${ws.owner.token}`, cookie: `ff_team=${ws.b.teamId}` };
		const leaks: string[] = [];
		for (const route of routes) {
			const { status, text } = await dataJson(pathOf(route, ws) + (route.endsWith('/diff') ? `?from=${ws.a.label}&to=${ws.a.label}` : ''), headers);
			expect(status, route).toBeLessThan(500);
			for (const marker of bMarkers(ws)) if (text.includes(marker)) leaks.push(`${route}: ${marker}`);
		}
		expect(leaks).toEqual([]);
	});

	it('still shows team A to that token, and team B to the same person signed in (the check can see a leak)', async () => {
		const byToken = await dataJson('/designs', { authorization: `Bearer ${ws.owner.token}`, cookie: `ff_team=${ws.b.teamId}` });
		expect(byToken.text).toContain(`Hardening patch ${ws.suffix}-a`);
		const bySession = await dataJson('/designs', { cookie: `ff_session=${ws.owner.sessionId}; ff_team=${ws.b.teamId}` });
		expect(bySession.text).toContain(`Hardening patch ${ws.suffix}-b`);
	});
});

describe('item 4: after sign-in and a team switch, only paths on this site', () => {
	// Hostile `next` values (WHATWG URL Standard §4.4: tabs/newlines are stripped and "\" reads as "/", so these
	// become //host in a browser; CR/LF and non-ASCII cannot go into a Location header at all).
	const hostile = ['/\t/evil.example/x', '/\r\n/evil.example', '//evil.example', '/\\evil.example', '/%2F%2Fevil.example', '%2F%2Fevil.example', '/evil\u3002example', 'https://evil.example/'];

	it.each(hostile)('sends a signed-in visitor of /signin?next=%j to /designs', async (next) => {
		const res = await fetch(`${server.origin}/signin?next=${encodeURIComponent(next)}`, { headers: { cookie: `ff_session=${ws.editor.sessionId}` }, redirect: 'manual' });
		await res.arrayBuffer();
		expect(res.status).toBe(303);
		expect(res.headers.get('location')).toBe('/designs');
	});

	it.each(hostile)('after signing in with next=%j, goes to /designs', async (next) => {
		const res = await action(server.origin, '/signin', {}, { email: ws.viewer.email, password: PASSWORD, next });
		expect(res.type).toBe('redirect');
		expect(res.body.location).toBe('/designs');
	});

	it.each(hostile)('after switching teams with redirectTo=%j, goes to /designs', async (redirectTo) => {
		const res = await action(server.origin, '/teams?/switch', { cookie: ws.editor.sessionId }, { teamId: ws.a.teamId, redirectTo });
		expect(res.type).toBe('redirect');
		expect(res.body.location).toBe('/designs');
	});
});

describe('item 5: one sign-in limit across app processes', () => {
	it('counts wrong passwords sent to two app processes against one limit of 10', async () => {
		const second = await startBuiltServer({ databaseUrl: process.env.DATABASE_URL!, buildDir });
		try {
			const user = await signUp({ displayName: `Two servers ${ws.suffix}`, email: `two-servers-${randomBytes(3).toString('hex')}@${ws.domain}`, password: PASSWORD });
			const servers = [server, second];
			for (let i = 0; i < 10; i++) expect((await action(servers[i % 2].origin, '/signin', {}, { email: user.email, password: 'not the password at all' })).actionStatus).toBe(400);
			// Five failures reached each process; the shared count is 10, so the right password is refused on both.
			for (const s of servers) expect((await action(s.origin, '/signin', {}, { email: user.email, password: PASSWORD })).actionStatus).toBe(429);
		} finally {
			await second.stop();
		}
	});
});
