// `npm start`: PostgreSQL, migrations, demo data, the mail fake, a production build, then the server and one job worker.
import { spawn, spawnSync } from 'node:child_process';
import { ConfigError, loadConfig, rootDir, runMain } from './lib/config.ts';
import { provideMail } from './lib/mail.ts';
import { migrateToLatest } from './lib/migrate.ts';
import { ensureOpenEms } from './lib/openems.ts';
import { canBind } from './lib/ports.ts';
import { APP_DATABASE, provideDatabase } from './lib/postgres.ts';
import { DEMO_PASSWORD, DEMO_PEOPLE, seedDemo } from './lib/seed.ts';
import { forgetPid, recordPid } from './lib/services.ts';

runMain(async () => {
	const config = loadConfig();
	if (!(await canBind(config.appPort))) throw new ConfigError('PORT', `port ${config.appPort} on 127.0.0.1 is in use; set PORT to a free port`);
	const databaseUrl = await provideDatabase(config, APP_DATABASE);
	await migrateToLatest(databaseUrl);
	await seedDemo(databaseUrl);
	const mail = await provideMail(config);
	// the Field check's engine; the rest of the product runs without it
	ensureOpenEms();

	if (process.env.FRINGEFIELD_SKIP_BUILD !== '1') {
		console.log('building…');
		const build = spawnSync('npx', ['vite', 'build', '--logLevel', 'warn'], { cwd: rootDir, stdio: 'inherit' });
		if (build.status !== 0) throw new Error('the build failed');
	}

	const origin = process.env.ORIGIN || `http://127.0.0.1:${config.appPort}`;
	const server = spawn(process.execPath, ['build'], {
		cwd: rootDir,
		stdio: 'inherit',
		env: { ...process.env, ...mail, DATABASE_URL: databaseUrl, HOST: '127.0.0.1', PORT: String(config.appPort), ORIGIN: origin, BODY_SIZE_LIMIT: process.env.BODY_SIZE_LIMIT || '6M', FRINGEFIELD_DEV_MAILBOX: '1' }
	});
	recordPid(config, 'app', server.pid!);
	// One job worker beside the app (field checks and Homing); more on other machines scale out (README "Scaling out").
	const worker = spawn(process.execPath, ['--import', 'tsx', 'src/worker/main.ts'], {
		cwd: rootDir,
		stdio: 'inherit',
		detached: true,
		env: { ...process.env, DATABASE_URL: databaseUrl }
	});
	recordPid(config, 'worker', worker.pid!);
	const people = DEMO_PEOPLE.map((p) => `    ${p.email.padEnd(32)} ${p.role}`).join('\n');
	console.log(`\nFringefield is running at ${origin}\n  demo sign-in (password ${DEMO_PASSWORD}):\n${people}\n  caught e-mail: ${origin}/dev/mailbox\n  stop with Ctrl-C or \`npm run stop\`\n`);
	for (const sig of ['SIGINT', 'SIGTERM'] as const)
		process.on(sig, () => {
			server.kill('SIGTERM');
			worker.kill('SIGTERM');
		});
	await new Promise<void>((done) => server.on('exit', () => done()));
	forgetPid(config, 'app');
	if (worker.exitCode === null && worker.signalCode === null) {
		worker.kill('SIGTERM');
		await new Promise<void>((done) => worker.on('exit', () => done()));
	}
	forgetPid(config, 'worker');
});
