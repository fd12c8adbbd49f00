// The private PostgreSQL cluster: find Debian's binaries, initdb under .data/, start on 127.0.0.1, stop.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, chmodSync } from 'node:fs';
import { createHash } from 'node:crypto';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import pg from 'pg';
import { ConfigError, type LocalConfig } from './config.ts';
import { canBind, isPortOpen, waitFor } from './ports.ts';

export const APP_DATABASE = 'fringefield';
export const TEST_DATABASE = 'fringefield_test';
const SERVER_USER = 'postgres';

const isRoot = () => process.getuid?.() === 0;

function binDirCandidates(): string[] {
	const dirs: string[] = [];
	try {
		const out = execFileSync('pg_config', ['--bindir'], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'ignore'] }).trim();
		if (out) dirs.push(out);
	} catch {
		/* no pg_config: fall through to the Debian layout */
	}
	const debian = '/usr/lib/postgresql';
	if (existsSync(debian)) {
		for (const version of readdirSync(debian).sort((a, b) => Number(b) - Number(a))) dirs.push(join(debian, version, 'bin'));
	}
	return dirs;
}

/** Debian's server binaries; installs the `postgresql` package with apt-get when there are none. */
export function findServerBinDir(log: (line: string) => void = console.log): string {
	const found = binDirCandidates().find((dir) => existsSync(join(dir, 'initdb')) && existsSync(join(dir, 'pg_ctl')));
	if (found) return found;
	if (!isRoot()) throw new ConfigError('PostgreSQL', 'no server binaries found (initdb, pg_ctl); install Debian\'s postgresql package or set DATABASE_URL');
	log('PostgreSQL server binaries not found; installing Debian\'s postgresql package…');
	for (const args of [['update', '-qq'], ['install', '-y', '-qq', 'postgresql']]) {
		const r = spawnSync('apt-get', args, { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
		if (r.status !== 0) throw new ConfigError('PostgreSQL', `apt-get ${args.join(' ')} failed`);
	}
	const after = binDirCandidates().find((dir) => existsSync(join(dir, 'initdb')));
	if (!after) throw new ConfigError('PostgreSQL', 'installed the postgresql package but found no initdb');
	return after;
}

/** Runs a server binary, as the unprivileged `postgres` user when we are root. */
function runServerCommand(binDir: string, tool: string, args: string[]): { status: number | null; output: string } {
	const command = isRoot() ? 'runuser' : join(binDir, tool);
	const fullArgs = isRoot() ? ['-u', SERVER_USER, '--', join(binDir, tool), ...args] : args;
	const r = spawnSync(command, fullArgs, { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
	return { status: r.status, output: `${r.stdout ?? ''}${r.stderr ?? ''}`.trim() };
}

/** True when the unprivileged server user can enter `dir` (every folder above it must be searchable). */
function serverUserCanReach(dir: string): boolean {
	return spawnSync('runuser', ['-u', SERVER_USER, '--', 'test', '-x', dir], { stdio: 'ignore' }).status === 0;
}

/**
 * The cluster's folder: `<data dir>/pg`. As root, the server runs as `postgres`; when the checkout sits
 * below a folder that user cannot enter (a home folder of mode 700, say), the cluster goes to a folder of
 * its own under the system's temporary folder instead, named after the data folder so that start and stop agree.
 */
export function clusterDir(config: LocalConfig): string {
	const preferred = join(config.dataDir, 'pg');
	if (!isRoot()) return preferred;
	mkdirSync(config.dataDir, { recursive: true });
	// The data folder is ours: open it to the server user; the folders above it are not ours to change.
	chmodSync(config.dataDir, 0o755);
	if (serverUserCanReach(config.dataDir)) return preferred;
	const tag = createHash('sha256').update(config.dataDir).digest('hex').slice(0, 12);
	return join(tmpdir(), `fringefield-pg-${tag}`, 'pg');
}

export function connectionUrl(config: LocalConfig, database: string): string {
	return `postgres://${SERVER_USER}@127.0.0.1:${config.pgPort}/${database}`;
}

function ensureCluster(binDir: string, dir: string): void {
	if (existsSync(join(dir, 'PG_VERSION'))) return;
	mkdirSync(dir, { recursive: true });
	chmodSync(dir, 0o700);
	// The server user must be able to reach its folder through the data folder.
	if (isRoot()) chmodSync(dirname(dir), 0o755);
	if (isRoot()) execFileSync('chown', ['-R', `${SERVER_USER}:${SERVER_USER}`, dir]);
	const r = runServerCommand(binDir, 'initdb', ['-D', dir, '-U', SERVER_USER, '--auth=trust', '--encoding=UTF8', '--locale=C.UTF-8']);
	if (r.status !== 0) throw new ConfigError('PostgreSQL', `initdb failed: ${r.output.split('\n').pop()}`);
}

/** The postmaster's pid from postmaster.pid, when that process is alive. */
export function runningPostmasterPid(dir: string): number | undefined {
	const pidFile = join(dir, 'postmaster.pid');
	if (!existsSync(pidFile)) return undefined;
	const pid = Number(readFileSync(pidFile, 'utf8').split('\n')[0]);
	if (!Number.isInteger(pid) || pid <= 0) return undefined;
	try {
		process.kill(pid, 0);
		return pid;
	} catch {
		return undefined;
	}
}

async function serverAnswers(config: LocalConfig): Promise<boolean> {
	const client = new pg.Client({ connectionString: connectionUrl(config, 'postgres'), connectionTimeoutMillis: 2000 });
	try {
		await client.connect();
		await client.query('select 1');
		return true;
	} catch {
		return false;
	} finally {
		await client.end().catch(() => undefined);
	}
}

export interface StartResult {
	started: boolean;
	pid: number | undefined;
}

/** Starts the private cluster unless it already runs. Idempotent; handles a stale pid file. */
export async function startCluster(config: LocalConfig, log: (line: string) => void = console.log): Promise<StartResult> {
	const dir = clusterDir(config);
	const running = runningPostmasterPid(dir);
	if (running && (await serverAnswers(config))) return { started: false, pid: running };

	const binDir = findServerBinDir(log);
	ensureCluster(binDir, dir);
	if (!running && existsSync(join(dir, 'postmaster.pid'))) {
		log('removing a stale postmaster.pid left by a crash');
		rmSync(join(dir, 'postmaster.pid'));
	}
	if (!running && !(await canBind(config.pgPort))) {
		throw new ConfigError('FRINGEFIELD_PG_PORT', `port ${config.pgPort} on 127.0.0.1 is in use by another program; choose a free port`);
	}
	const opts = `-c listen_addresses=127.0.0.1 -p ${config.pgPort} -k ${dir} -c fsync=off -c full_page_writes=off -c synchronous_commit=off`;
	const r = runServerCommand(binDir, 'pg_ctl', ['-D', dir, '-w', '-t', '60', '-l', join(dir, 'server.log'), '-o', opts, 'start']);
	if (r.status !== 0) throw new ConfigError('PostgreSQL', `pg_ctl start failed (see ${join(dir, 'server.log')}): ${r.output.split('\n').pop()}`);
	if (!(await waitFor(() => serverAnswers(config), 30_000))) throw new ConfigError('PostgreSQL', `server on 127.0.0.1:${config.pgPort} did not answer`);
	return { started: true, pid: runningPostmasterPid(dir) };
}

/** Stops the private cluster; a no-op when it is not running. */
export async function stopCluster(config: LocalConfig): Promise<boolean> {
	const dir = clusterDir(config);
	if (!runningPostmasterPid(dir)) return false;
	const binDir = findServerBinDir();
	const r = runServerCommand(binDir, 'pg_ctl', ['-D', dir, '-w', '-t', '60', '-m', 'fast', 'stop']);
	if (r.status !== 0) throw new ConfigError('PostgreSQL', `pg_ctl stop failed: ${r.output.split('\n').pop()}`);
	await waitFor(async () => !(await isPortOpen(config.pgPort)), 10_000);
	return true;
}

/** Creates a database when it does not exist yet. */
export async function ensureDatabase(config: LocalConfig, name: string): Promise<void> {
	const client = new pg.Client({ connectionString: connectionUrl(config, 'postgres') });
	await client.connect();
	try {
		const { rowCount } = await client.query('select 1 from pg_database where datname = $1', [name]);
		if (!rowCount) await client.query(`create database "${name}"`);
	} finally {
		await client.end();
	}
}

/** Checks that a DATABASE_URL answers; a clear one-line error naming the setting otherwise. */
export async function checkDatabaseUrl(url: string): Promise<void> {
	let parsed: URL;
	try {
		parsed = new URL(url);
	} catch {
		throw new ConfigError('DATABASE_URL', 'is not a valid postgres:// URL');
	}
	const client = new pg.Client({ connectionString: url, connectionTimeoutMillis: 5000 });
	try {
		await client.connect();
		await client.query('select 1');
	} catch (err) {
		const reason = (err as { code?: string }).code ?? (err instanceof Error ? err.message : String(err));
		throw new ConfigError('DATABASE_URL', `cannot reach PostgreSQL at ${parsed.hostname}:${parsed.port || 5432} (${reason})`);
	} finally {
		await client.end().catch(() => undefined);
	}
}

/**
 * The database URL to use: DATABASE_URL as given (nothing started), or the private cluster,
 * started on demand, with the named database created.
 */
export async function provideDatabase(config: LocalConfig, database: string, log: (line: string) => void = console.log): Promise<string> {
	if (config.databaseUrl) {
		await checkDatabaseUrl(config.databaseUrl);
		return config.databaseUrl;
	}
	const { started } = await startCluster(config, log);
	if (started) log(`PostgreSQL started on 127.0.0.1:${config.pgPort} (data in ${clusterDir(config)})`);
	await ensureDatabase(config, database);
	return connectionUrl(config, database);
}
