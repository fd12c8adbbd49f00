// Lets pg-boss run its SQL on a Kysely connection or transaction, so a job is sent, cancelled or completed in the same
// transaction that writes our own rows: both happen or neither.
import { CompiledQuery, type Kysely } from 'kysely';

export interface BossDb {
	executeSql(text: string, values: unknown[]): Promise<{ rows: any[] }>;
}

export function toBossDb(db: Kysely<any>): BossDb {
	return {
		async executeSql(text, values) {
			const result = await db.executeQuery(CompiledQuery.raw(text, values ?? []));
			return { rows: result.rows as any[] };
		}
	};
}
