// `npm run migrate`: brings the app database (or DATABASE_URL) to the newest migration.
import { loadConfig, runMain } from './lib/config.ts';
import { migrateToLatest } from './lib/migrate.ts';
import { APP_DATABASE, provideDatabase } from './lib/postgres.ts';

runMain(async () => {
	const url = await provideDatabase(loadConfig(), process.env.FRINGEFIELD_DATABASE || APP_DATABASE);
	const applied = await migrateToLatest(url);
	console.log(applied ? `${applied} migration(s) applied` : 'database is up to date');
});
