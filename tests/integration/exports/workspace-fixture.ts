// A team of our own in the shared test database: owner, editor, viewer, a non-member, sessions and API tokens, one design.
import { randomBytes, randomUUID } from 'node:crypto';
import type { Cookies, RequestEvent } from '@sveltejs/kit';
import { generateSecret, hashSecret } from '../../../src/lib/server/auth/api-token';
import { getLucia } from '../../../src/lib/server/auth/lucia';
import { identify, type RequestIdentity } from '../../../src/lib/server/auth/request-identity';
import { getDb } from '../../../src/lib/server/db';
import type { TeamRole } from '../../../src/lib/server/db/team.table';
import { createDesign } from '../../../src/lib/server/designs/create-design';

export const callerKinds = ['anonymous', 'non-member', 'viewer', 'editor', 'owner'] as const;
export type CallerKind = (typeof callerKinds)[number];

/** A 2.45 GHz inset-fed rectangular patch on a 1.524 mm, εr 3.55 laminate (demo data). */
export function demoInput(name = 'Bench patch 2G4') {
	return { name, frequencyHz: 2.45e9, shape: 'rectangular', feed: 'inset', substrate: { relativePermittivity: 3.55, heightMm: 1.524, lossTangent: 0.0027 } };
}

export interface Person {
	id: string;
	email: string;
	displayName: string;
	sessionId: string;
	/** A personal API token for the fixture's team (for the non-member: for their own team). */
	token: string;
}

export interface Workspace {
	suffix: string;
	teamId: string;
	otherTeamId: string;
	people: Record<Exclude<CallerKind, 'anonymous'>, Person>;
	designId: string;
}

async function addPerson(suffix: string, label: string): Promise<Omit<Person, 'token'>> {
	const id = `u_${label}_${suffix}`;
	const email = `${label}-${suffix}@exports.test`;
	const displayName = `${label[0].toUpperCase()}${label.slice(1)} ${suffix}`;
	await getDb().insertInto('app_user').values({ id, email, display_name: displayName, password_hash: 'not-a-real-hash' }).execute();
	const session = await getLucia().createSession(id, {});
	return { id, email, displayName, sessionId: session.id };
}

async function addToken(userId: string, teamId: string): Promise<string> {
	const secret = generateSecret();
	await getDb().insertInto('api_token').values({ id: randomUUID(), team_id: teamId, user_id: userId, name: 'fixture', token_hash: hashSecret(secret) }).execute();
	return secret;
}

async function addMember(teamId: string, userId: string, role: TeamRole) {
	await getDb().insertInto('team_member').values({ team_id: teamId, user_id: userId, role }).execute();
}

export async function createWorkspace(tag: string): Promise<Workspace> {
	const suffix = `${tag}${randomBytes(4).toString('hex')}`;
	const teamId = `t_${suffix}`;
	const otherTeamId = `t_other_${suffix}`;
	await getDb().insertInto('team').values([{ id: teamId, name: `Exports team ${suffix}` }, { id: otherTeamId, name: `Other team ${suffix}` }]).execute();
	const people = {} as Workspace['people'];
	for (const role of ['owner', 'editor', 'viewer'] as const) {
		const p = await addPerson(suffix, role);
		await addMember(teamId, p.id, role);
		people[role] = { ...p, token: await addToken(p.id, teamId) };
	}
	const outsider = await addPerson(suffix, 'outsider');
	await addMember(otherTeamId, outsider.id, 'owner');
	people['non-member'] = { ...outsider, token: await addToken(outsider.id, otherTeamId) };
	const { design } = await createDesign(getDb(), { teamId, userId: people.owner.id, raw: demoInput(`Bench patch ${suffix}`) });
	return { suffix, teamId, otherTeamId, people, designId: design.id };
}

function cookieJar(values: Record<string, string>): Cookies {
	return {
		get: (name: string) => values[name],
		getAll: () => Object.entries(values).map(([name, value]) => ({ name, value })),
		set: () => undefined,
		delete: () => undefined,
		serialize: () => ''
	} as unknown as Cookies;
}

export type AuthVia = 'session' | 'token';

/** The identity the hook would put on locals for this caller (through the real identify()). */
export async function identityOf(ws: Workspace, who: CallerKind, via: AuthVia, url = 'http://127.0.0.1/api/v1/teams'): Promise<RequestIdentity> {
	if (who === 'anonymous') return identify(new Request(url), cookieJar({}));
	const person = ws.people[who];
	if (via === 'token') return identify(new Request(url, { headers: { authorization: `Bearer ${person.token}` } }), cookieJar({}));
	return identify(new Request(url), cookieJar({ [getLucia().sessionCookieName]: person.sessionId }));
}

/** Calls a route handler the way SvelteKit would, with locals set from the identity. */
export async function callRoute(
	handler: (event: RequestEvent) => Response | Promise<Response>,
	opts: { identity: RequestIdentity; path: string; params: Record<string, string>; method?: string; body?: unknown; rawBody?: string; contentType?: string; headers?: Record<string, string> }
): Promise<Response> {
	const url = new URL(opts.path, 'http://127.0.0.1');
	const hasBody = opts.body !== undefined || opts.rawBody !== undefined;
	const request = new Request(url, {
		method: opts.method ?? 'GET',
		headers: { ...(hasBody ? { 'content-type': opts.contentType ?? 'application/json' } : {}), ...opts.headers },
		body: hasBody ? (opts.rawBody ?? JSON.stringify(opts.body)) : undefined
	});
	const event = {
		request,
		url,
		params: opts.params,
		locals: { identity: opts.identity, user: opts.identity.user, sessionId: opts.identity.sessionId, apiToken: opts.identity.apiToken },
		cookies: cookieJar({}),
		route: { id: null },
		setHeaders: () => undefined,
		getClientAddress: () => '127.0.0.1',
		isDataRequest: false,
		isSubRequest: false,
		platform: undefined,
		fetch
	} as unknown as RequestEvent;
	try {
		return await handler(event);
	} catch (err) {
		// A SvelteKit redirect/error thrown past the handler is what the framework would turn into a status.
		const e = err as { status?: number; location?: string; body?: { message: string } };
		if (typeof e?.status === 'number') return new Response(JSON.stringify(e.body ?? { location: e.location }), { status: e.status, headers: e.location ? { location: e.location } : {} });
		throw err;
	}
}
