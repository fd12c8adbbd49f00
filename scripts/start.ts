// `npm start`, in one of two modes (src/lib/server/app-mode.ts decides what the server does in each):
// - no DATABASE_URL: the demo — the private cluster, migrations, demo data, the mail fake and its mailbox page;
// - DATABASE_URL set: the production path — migrations only (no demo data, no mail fake), and the server
//   refuses to start without real SMTP settings and an HTTPS ORIGIN unless FRINGEFIELD_LOCAL_TRIAL=1.
// Both build (unless FRINGEFIELD_SKIP_BUILD=1), serve `node build` and run one job worker (src/worker/main.ts).
import { spawn, spawnSync } from 'node:child_process';
import { decideAppMode, SettingError } from '../src/lib/server/app-mode.ts';
import { ConfigError, loadConfig, rootDir, runMain, type LocalConfig } from './lib/config.ts';
import { provideMail } from './lib/mail.ts';
import { migrateToLatest } from './lib/migrate.ts';
import { ensureOpenEms } from './lib/openems.ts';
import { canBind } from './lib/ports.ts';
import { APP_DATABASE, provideDatabase } from './lib/postgres.ts';
import { DEMO_PASSWORD, DEMO_PEOPLE, seedDemo } from './lib/seed.ts';
import { forgetPid, recordPid } from './lib/services.ts';
import { serverEnv } from './lib/server-env.ts';

interface Plan {
	env: NodeJS.ProcessEnv;
	origin: string;
	banner: string;
}

async function demo(config: LocalConfig): Promise<Plan> {
	if (process.env.FRINGEFIELD_MODE && process.env.FRINGEFIELD_MODE !== 'demo') {
		throw new ConfigError('FRINGEFIELD_MODE', `npm start without DATABASE_URL is the demo; for production set DATABASE_URL (see the README)`);
	}
	const databaseUrl = await provideDatabase(config, APP_DATABASE);
	await migrateToLatest(databaseUrl);
	await seedDemo(databaseUrl);
	const mail = await provideMail(config);
	const origin = process.env.ORIGIN || `http://127.0.0.1:${config.appPort}`;
	const people = DEMO_PEOPLE.map((p) => `    ${p.email.padEnd(32)} ${p.role}`).join('\n');
	return {
		env: { ...mail, DATABASE_URL: databaseUrl, HOST: '127.0.0.1', ORIGIN: origin, FRINGEFIELD_MODE: 'demo' },
		origin,
		banner: `Fringefield (demo) is running at ${origin}\n  demo sign-in (password ${DEMO_PASSWORD}):\n${people}\n  caught e-mail: ${origin}/dev/mailbox\n  everything here is public: the password above is published and anyone can read the caught mail\n`
	};
}

async function production(config: LocalConfig, databaseUrl: string): Promise<Plan> {
	if (process.env.FRINGEFIELD_MODE === 'demo') throw new ConfigError('FRINGEFIELD_MODE', 'the demo runs only on the private cluster; unset DATABASE_URL for it, or FRINGEFIELD_MODE for production');
	const trial = process.env.FRINGEFIELD_LOCAL_TRIAL === '1';
	const origin = process.env.ORIGIN || (trial ? `http://127.0.0.1:${config.appPort}` : '');
	const env = { FRINGEFIELD_MODE: 'production', ORIGIN: origin || undefined, HOST: process.env.HOST || '127.0.0.1' };
	try {
		decideAppMode({ ...process.env, ...env });
	} catch (err) {
		if (err instanceof SettingError) throw new ConfigError(err.setting, err.message.slice(err.setting.length + 2));
		throw err;
	}
	await provideDatabase(config, APP_DATABASE);
	await migrateToLatest(databaseUrl);
	return { env: { ...env, DATABASE_URL: databaseUrl }, origin, banner: `Fringefield is running at ${origin}${trial ? ' (local trial: plain http, no real mail required)' : ''}\n` };
}

runMain(async () => {
	const config = loadConfig();
	if (!(await canBind(config.appPort))) throw new ConfigError('PORT', `port ${config.appPort} on 127.0.0.1 is in use; set PORT to a free port`);
	const plan = config.databaseUrl ? await production(config, config.databaseUrl) : await demo(config);

	// the Field check's engine; the rest of the product runs without it
	ensureOpenEms();

	if (process.env.FRINGEFIELD_SKIP_BUILD !== '1') {
		console.log('building…');
		const build = spawnSync('npx', ['vite', 'build', '--logLevel', 'warn'], { cwd: rootDir, stdio: 'inherit' });
		if (build.status !== 0) throw new Error('the build failed');
	}

	const server = spawn(process.execPath, ['build'], {
		cwd: rootDir,
		stdio: 'inherit',
		env: { ...process.env, ...plan.env, PORT: String(config.appPort), ...serverEnv() }
	});
	recordPid(config, 'app', server.pid!);
	// One job worker beside the app (field checks and Homing); more on other machines scale out (README "Scaling out").
	const worker = spawn(process.execPath, ['--import', 'tsx', 'src/worker/main.ts'], {
		cwd: rootDir,
		stdio: 'inherit',
		detached: true,
		env: { ...process.env, ...plan.env }
	});
	recordPid(config, 'worker', worker.pid!);
	console.log(`\n${plan.banner}  stop with Ctrl-C or \`npm run stop\`\n`);
	for (const sig of ['SIGINT', 'SIGTERM'] as const)
		process.on(sig, () => {
			server.kill('SIGTERM');
			worker.kill('SIGTERM');
		});
	const code = await new Promise<number | null>((done) => server.on('exit', (c) => done(c)));
	forgetPid(config, 'app');
	if (worker.exitCode === null && worker.signalCode === null) {
		worker.kill('SIGTERM');
		await new Promise<void>((done) => worker.on('exit', () => done()));
	}
	forgetPid(config, 'worker');
	if (code) process.exit(code);
});
