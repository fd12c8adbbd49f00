// `npm test`: lint, type check, build, then vitest (unit + integration against the real PostgreSQL), then Playwright in
// Debian's Chromium against the production build. Ends with one line: `N passed, N failed`.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import pg from 'pg';
import { loadConfig, rootDir, runMain } from './lib/config.ts';
import { provideMail } from './lib/mail.ts';
import { migrateToLatest } from './lib/migrate.ts';
import { ensureGerbv } from './lib/gerbv.ts';
import { ensureOpenEms } from './lib/openems.ts';
import { TEST_DATABASE, connectionUrl, provideDatabase, stopCluster } from './lib/postgres.ts';
import { stopBackground } from './lib/services.ts';

interface Tally {
	suite: string;
	passed: number;
	failed: number;
}

function run(command: string, args: string[], env: NodeJS.ProcessEnv): number {
	const r = spawnSync(command, args, { cwd: rootDir, stdio: 'inherit', env });
	return r.status ?? 1;
}

function ensureChromium(): string {
	const path = process.env.CHROMIUM_PATH || '/usr/bin/chromium';
	if (existsSync(path)) return path;
	if (process.getuid?.() !== 0) throw new Error(`${path} is missing; install Debian's chromium package (apt-get install chromium)`);
	console.log('installing Debian\'s chromium package for the end-to-end tests…');
	const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
	if (run('apt-get', ['update', '-qq'], env) !== 0 || run('apt-get', ['install', '-y', '-qq', 'chromium'], env) !== 0) {
		throw new Error('apt-get install chromium failed');
	}
	return path;
}

/** A fresh test database on the private cluster, so every run starts from the migrations alone. */
async function recreateTestDatabase(url: string): Promise<void> {
	const admin = new pg.Client({ connectionString: url.replace(/\/[^/]+$/, '/postgres') });
	await admin.connect();
	try {
		await admin.query(`drop database if exists "${TEST_DATABASE}" with (force)`);
		await admin.query(`create database "${TEST_DATABASE}"`);
	} finally {
		await admin.end();
	}
}

function readJson(file: string): any {
	return existsSync(file) ? JSON.parse(readFileSync(file, 'utf8')) : undefined;
}

/**
 * `npm test -- PATH…` runs only the named test files or folders (for working on one area): vitest gets the
 * unit and integration paths, Playwright the `.e2e.ts` ones; a suite with no path given is skipped. Lint and
 * types run unless `--skip-static` is given; the build runs when an e2e path is given. With no paths, everything runs.
 */
function selectedPaths(argv: string[]): { vitest: string[]; e2e: string[] } | undefined {
	const paths = argv.filter((a) => !a.startsWith('-'));
	if (paths.length === 0) return undefined;
	const e2e = paths.filter((p) => p.includes('e2e'));
	return { vitest: paths.filter((p) => !e2e.includes(p)), e2e: e2e.map((p) => p.replace(/^tests\/e2e\/?/, '')).filter(Boolean) };
}

runMain(async () => {
	const only = selectedPaths(process.argv.slice(2));
	const config = { ...loadConfig(), smtpPort: Number(process.env.TEST_SMTP_PORT || 2526) };
	const tallies: Tally[] = [];
	const reports = join(config.dataDir, 'reports');
	rmSync(reports, { recursive: true, force: true });

	const startedCluster = !config.databaseUrl;
	let databaseUrl = await provideDatabase(config, TEST_DATABASE);
	if (startedCluster) {
		await recreateTestDatabase(databaseUrl);
		databaseUrl = connectionUrl(config, TEST_DATABASE);
	}
	await migrateToLatest(databaseUrl, () => undefined);
	const mail = await provideMail(config, 'mail-test', join(config.dataDir, 'mail-test'));
	const env: NodeJS.ProcessEnv = { ...process.env, ...mail, DATABASE_URL: databaseUrl, FRINGEFIELD_TEST: '1' };

	try {
		if (!process.argv.includes('--skip-static')) {
			console.log('\n── lint ──');
			const lint = run('npm', ['run', '--silent', 'lint'], env);
			tallies.push({ suite: 'lint', passed: lint === 0 ? 1 : 0, failed: lint === 0 ? 0 : 1 });

			console.log('\n── types (svelte-check) ──');
			const types = run('npm', ['run', '--silent', 'check', '--', '--threshold', 'error'], env);
			tallies.push({ suite: 'types', passed: types === 0 ? 1 : 0, failed: types === 0 ? 0 : 1 });
		}

		let built = 0;
		if (!only || only.e2e.length > 0) {
			console.log('\n── build ──');
			built = run('npx', ['vite', 'build', '--logLevel', 'error'], env);
			tallies.push({ suite: 'build', passed: built === 0 ? 1 : 0, failed: built === 0 ? 0 : 1 });
		}

		if (!only || only.vitest.length > 0) {
			console.log('\n── vitest: unit + integration ──');
			// the Field check's integration tests run the real engine
			ensureOpenEms();
			// the Gerber/Excellon read-back test runs Debian's gerbv as a second, independent reader
			ensureGerbv();
			const vitestReport = join(reports, 'vitest.json');
			const code = run('npx', ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${vitestReport}`, ...(only?.vitest ?? [])], env);
			const v = readJson(vitestReport);
			// a file that does not load, or an unhandled error, fails the run even when no single test failed
			const failed = v ? v.numFailedTests + (v.numRuntimeErrorTestSuites ?? 0) : 1;
			tallies.push({ suite: 'vitest', passed: v ? v.numPassedTests : 0, failed: failed === 0 && code !== 0 ? 1 : failed });
		}

		if (!only || only.e2e.length > 0) {
			console.log('\n── Playwright end-to-end in Chromium ──');
			const chromium = ensureChromium();
			// the field-check journey's worker runs the real engine
			ensureOpenEms();
			if (built !== 0) {
				tallies.push({ suite: 'e2e', passed: 0, failed: 1 });
			} else {
				const e2eReport = join(reports, 'e2e.json');
				const code = run('npx', ['playwright', 'test', '--config', 'tests/e2e/playwright.config.ts', ...(only?.e2e ?? [])], { ...env, CHROMIUM_PATH: chromium, PLAYWRIGHT_JSON_OUTPUT_NAME: e2eReport });
				const p = readJson(e2eReport);
				// errors outside any test (a spec file that does not load, a web server that does not start) fail the run too,
				// and so does a non-zero exit that the report does not explain
				const outside = Array.isArray(p?.errors) ? p.errors.length : 0;
				const failed = p ? p.stats.unexpected + outside : 1;
				tallies.push({ suite: 'e2e', passed: p ? p.stats.expected + (p.stats.flaky ?? 0) : 0, failed: failed === 0 && code !== 0 ? 1 : failed });
			}
		}
	} finally {
		await stopBackground(config, 'mail-test');
		if (startedCluster && process.env.CI) await stopCluster(config);
	}

	const passed = tallies.reduce((n, t) => n + t.passed, 0);
	const failed = tallies.reduce((n, t) => n + t.failed, 0);
	console.log('');
	for (const t of tallies) console.log(`${t.suite}: ${t.passed} passed, ${t.failed} failed`);
	console.log(`${passed} passed, ${failed} failed`);
	process.exitCode = failed > 0 || passed === 0 ? 1 : 0;
});
