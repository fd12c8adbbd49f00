// `npm run dev`: the private cluster, migrations, demo data and the mail catcher, then Vite's dev server.
import { spawn } from 'node:child_process';
import { loadConfig, rootDir, runMain } from './lib/config.ts';
import { provideMail } from './lib/mail.ts';
import { migrateToLatest } from './lib/migrate.ts';
import { APP_DATABASE, provideDatabase } from './lib/postgres.ts';
import { seedDemo } from './lib/seed.ts';

runMain(async () => {
	const config = loadConfig();
	const databaseUrl = await provideDatabase(config, APP_DATABASE);
	await migrateToLatest(databaseUrl);
	await seedDemo(databaseUrl);
	const mail = await provideMail(config);
	const vite = spawn('npx', ['vite', 'dev', '--host', '127.0.0.1', '--port', String(config.appPort), '--strictPort'], {
		cwd: rootDir,
		stdio: 'inherit',
		env: { ...process.env, ...mail, DATABASE_URL: databaseUrl, FRINGEFIELD_MODE: 'demo' }
	});
	await new Promise<void>((done) => vite.on('exit', () => done()));
});
