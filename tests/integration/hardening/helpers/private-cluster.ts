// A PostgreSQL cluster of our own (its own data folder and port) for tests that stop and start the
// server: never the shared test cluster on 54329.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import type { LocalConfig } from '../../../../scripts/lib/config';
import { migrateToLatest } from '../../../../scripts/lib/migrate';
import { connectionUrl, ensureDatabase, startCluster, stopCluster } from '../../../../scripts/lib/postgres';
import { freePort } from './built-server';

export interface PrivateCluster {
	config: LocalConfig;
	url: (database: string) => string;
	start: () => Promise<void>;
	stop: () => Promise<void>;
	/** Creates (and migrates, unless told not to) a database. */
	database: (name: string, migrate?: boolean) => Promise<string>;
	/** Stops the cluster and removes its folder. */
	destroy: () => Promise<void>;
}

export async function privateCluster(): Promise<PrivateCluster> {
	const dataDir = mkdtempSync(join(tmpdir(), 'ff-hardening-pg-'));
	const config: LocalConfig = { dataDir, pgPort: await freePort(), smtpPort: 2526, appPort: 0, databaseUrl: undefined };
	const cluster: PrivateCluster = {
		config,
		url: (database) => connectionUrl(config, database),
		start: async () => {
			await startCluster(config, () => undefined);
		},
		stop: async () => {
			await stopCluster(config);
		},
		database: async (name, migrate = true) => {
			await ensureDatabase(config, name);
			if (migrate) await migrateToLatest(connectionUrl(config, name), () => undefined);
			return connectionUrl(config, name);
		},
		destroy: async () => {
			await stopCluster(config).catch(() => undefined);
			rmSync(dataDir, { recursive: true, force: true });
		}
	};
	await cluster.start();
	return cluster;
}

export async function queryOnce<T extends pg.QueryResultRow>(url: string, text: string, values: unknown[] = []): Promise<T[]> {
	const client = new pg.Client({ connectionString: url });
	await client.connect();
	try {
		return (await client.query<T>(text, values)).rows;
	} finally {
		await client.end();
	}
}
