// Sign-in sessions through lucia: a new session id on every sign-in (the old one ends), sign-out, ending all.
import { getLucia } from '../auth/lucia';

export interface SessionCookie {
	name: string;
	value: string;
	attributes: Record<string, unknown>;
}

/** Starts a session for `userId`; `previousSessionId` (the one the browser came with, if any) is ended first. */
export async function startSession(userId: string, previousSessionId: string | null | undefined): Promise<{ sessionId: string; cookie: SessionCookie }> {
	const lucia = getLucia();
	if (previousSessionId) await lucia.invalidateSession(previousSessionId);
	const session = await lucia.createSession(userId, {});
	const cookie = lucia.createSessionCookie(session.id);
	return { sessionId: session.id, cookie: { name: cookie.name, value: cookie.value, attributes: { ...cookie.attributes } } };
}

/** Ends one session; returns the cookie that clears it in the browser. */
export async function endSession(sessionId: string | null | undefined): Promise<SessionCookie> {
	const lucia = getLucia();
	if (sessionId) await lucia.invalidateSession(sessionId);
	const blank = lucia.createBlankSessionCookie();
	return { name: blank.name, value: blank.value, attributes: { ...blank.attributes } };
}
