// Liveness and database reachability for GET /healthz.
import { sql } from 'kysely';
import { getDb } from './db';
import pkg from '../../../package.json' with { type: 'json' };

export interface Health {
	app: 'fringefield';
	version: string;
	database: 'reachable' | 'unreachable';
}

export async function checkHealth(): Promise<Health> {
	let database: Health['database'] = 'unreachable';
	try {
		await sql`select 1`.execute(getDb());
		database = 'reachable';
	} catch {
		/* reported as unreachable */
	}
	return { app: 'fringefield', version: pkg.version, database };
}
