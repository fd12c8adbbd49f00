// When vitest runs on its own (not through `npm test`), provide the test database like npm test does.
import { loadConfig } from '../scripts/lib/config';
import { migrateToLatest } from '../scripts/lib/migrate';
import { TEST_DATABASE, provideDatabase } from '../scripts/lib/postgres';

export async function setup(): Promise<void> {
	if (process.env.DATABASE_URL) return;
	const url = await provideDatabase(loadConfig(), TEST_DATABASE, () => undefined);
	await migrateToLatest(url, () => undefined);
	process.env.DATABASE_URL = url;
}
