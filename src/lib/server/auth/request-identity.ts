// Who is asking: a signed-in session (cookie) or a personal API token (Authorization: Bearer ff_…).
import type { Cookies } from '@sveltejs/kit';
import { getDb } from '../db';
import * as tokenQueries from '../db/token.queries';
import { hashSecret, TOKEN_PREFIX } from './api-token';
import { getLucia } from './lucia';

export interface RequestUser {
	id: string;
	email: string;
	displayName: string;
	/** The person followed the confirmation link mailed at sign-up (or completed a password reset). */
	emailVerified: boolean;
}

export interface RequestIdentity {
	user: RequestUser | null;
	sessionId: string | null;
	/** Set when the request came with an API token: the one team it may reach. */
	apiToken: { id: string; teamId: string } | null;
}

const anonymous: RequestIdentity = { user: null, sessionId: null, apiToken: null };

export async function identify(request: Request, cookies: Cookies): Promise<RequestIdentity> {
	const header = request.headers.get('authorization');
	if (header) {
		const match = /^Bearer\s+(\S+)$/i.exec(header);
		if (!match || !match[1].startsWith(TOKEN_PREFIX)) return anonymous;
		const token = await tokenQueries.findLiveTokenByHash(getDb(), hashSecret(match[1]));
		if (!token) return anonymous;
		if (tokenQueries.isTouchDue(token.last_used_at)) await tokenQueries.touchTokenById(getDb(), token.id);
		return {
			user: { id: token.user_id, email: token.email, displayName: token.display_name, emailVerified: token.email_verified_at !== null },
			sessionId: null,
			apiToken: { id: token.id, teamId: token.team_id }
		};
	}

	const lucia = getLucia();
	const sessionId = cookies.get(lucia.sessionCookieName);
	if (!sessionId) return anonymous;
	const { session, user } = await lucia.validateSession(sessionId);
	if (session?.fresh) {
		const cookie = lucia.createSessionCookie(session.id);
		cookies.set(cookie.name, cookie.value, { path: '.', ...cookie.attributes });
	}
	if (!session) {
		const blank = lucia.createBlankSessionCookie();
		cookies.set(blank.name, blank.value, { path: '.', ...blank.attributes });
		return anonymous;
	}
	return { user: { id: user.id, email: user.email, displayName: user.displayName, emailVerified: user.emailVerified }, sessionId: session.id, apiToken: null };
}
