// lucia sessions kept in PostgreSQL (user_session), cookies HttpOnly + SameSite=Lax, Secure behind HTTPS.
import { NodePostgresAdapter } from '@lucia-auth/adapter-postgresql';
import { Lucia, TimeSpan } from 'lucia';
import { getPool } from '../db';

let instance: ReturnType<typeof createLucia> | undefined;

function createLucia() {
	const adapter = new NodePostgresAdapter(getPool(), { user: 'app_user', session: 'user_session' });
	const secure = (process.env.ORIGIN ?? '').startsWith('https://');
	return new Lucia(adapter, {
		sessionExpiresIn: new TimeSpan(30, 'd'),
		sessionCookie: { name: 'ff_session', attributes: { secure, sameSite: 'lax' } },
		getUserAttributes: (row) => ({ email: row.email, displayName: row.display_name, emailVerified: row.email_verified_at !== null })
	});
}

export function getLucia() {
	instance ??= createLucia();
	return instance;
}

declare module 'lucia' {
	interface Register {
		Lucia: ReturnType<typeof createLucia>;
		DatabaseUserAttributes: { email: string; display_name: string; email_verified_at: Date | null };
	}
}
