// The production build (`node build`) on a free loopback port, the way a user meets it. The build is
// copied (under the shared build lock, so nobody's build is half-written) into a private folder first:
// other engineers rebuild build/ while our tests run. `npm test` builds before vitest runs.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { join, resolve } from 'node:path';
import { randomBytes } from 'node:crypto';
import { serverEnv } from '../../../../scripts/lib/server-env.ts';

export const rootDir = resolve(import.meta.dirname, '..', '..', '..', '..');
const BUILD_LOCK = '/tmp/ff-build.lock';

export function freePort(): Promise<number> {
	return new Promise((done, fail) => {
		const server = createServer();
		server.once('error', fail);
		server.listen(0, '127.0.0.1', () => {
			const { port } = server.address() as { port: number };
			server.close(() => done(port));
		});
	});
}

/** A private copy of build/ (inside the repository, so node_modules resolves); removed by `stop()`. */
export function copyBuild(): string {
	const source = join(rootDir, 'build');
	const target = join(rootDir, '.data', 'hardening', `build-${randomBytes(4).toString('hex')}`);
	mkdirSync(join(target, '..'), { recursive: true });
	// Someone may hold the lock for a whole build + e2e run; after 60 s copy anyway (npm test builds
	// before vitest starts, so build/ is complete then) rather than time the test out.
	let r = spawnSync('flock', ['-w', '60', BUILD_LOCK, 'cp', '-r', source, target], { encoding: 'utf8' });
	if (r.status !== 0) {
		rmSync(target, { recursive: true, force: true });
		r = spawnSync('cp', ['-r', source, target], { encoding: 'utf8' });
	}
	if (r.status !== 0 || !existsSync(join(target, 'index.js'))) throw new Error(`could not copy build/ (run \`npx vite build\` first): ${r.stderr}`);
	return target;
}

export interface BuiltServer {
	origin: string;
	port: number;
	process: ChildProcess;
	pid: number;
	/** Everything the server wrote to stderr so far. */
	log: () => string;
	/** Resident memory in kB, from /proc/<pid>/status. */
	rssKb: () => number;
	stop: () => Promise<void>;
}

export interface StartOptions {
	databaseUrl: string;
	env?: Record<string, string>;
	/** Reuse a copied build (several servers in one file). */
	buildDir?: string;
	/** The public origin the server believes it has (defaults to its own http URL). */
	origin?: string;
}

export async function startBuiltServer(opts: StartOptions): Promise<BuiltServer> {
	const buildDir = opts.buildDir ?? copyBuild();
	const ownsBuild = !opts.buildDir;
	const port = await freePort();
	const origin = `http://127.0.0.1:${port}`;
	let stderr = '';
	const child = spawn(process.execPath, [buildDir], {
		cwd: rootDir,
		stdio: ['ignore', 'ignore', 'pipe'],
		env: {
			...process.env,
			DATABASE_URL: opts.databaseUrl,
			HOST: '127.0.0.1',
			PORT: String(port),
			ORIGIN: opts.origin ?? origin,
			...serverEnv(),
			SMTP_HOST: process.env.SMTP_HOST ?? '127.0.0.1',
			SMTP_PORT: process.env.SMTP_PORT ?? '2526',
			// production mode on loopback: plain http and the test mail catcher (see src/lib/server/app-mode.ts)
			FRINGEFIELD_LOCAL_TRIAL: '1',
			...opts.env
		}
	});
	child.stderr!.on('data', (chunk: Buffer) => {
		stderr += chunk.toString();
		if (stderr.length > 200_000) stderr = stderr.slice(-100_000);
	});
	const exited = new Promise<void>((done) => child.once('exit', () => done()));
	const until = Date.now() + 60_000;
	for (;;) {
		try {
			const res = await fetch(`${origin}/healthz`);
			await res.arrayBuffer();
			break;
		} catch {
			if (child.exitCode !== null || Date.now() > until) throw new Error(`the built server did not start: ${stderr}`);
			await new Promise((r) => setTimeout(r, 100));
		}
	}
	return {
		origin,
		port,
		process: child,
		pid: child.pid!,
		log: () => stderr,
		rssKb: () => Number(/VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${child.pid}/status`, 'utf8'))?.[1] ?? NaN),
		async stop() {
			if (child.exitCode === null && child.signalCode === null) {
				child.kill('SIGTERM');
				const timer = setTimeout(() => child.kill('SIGKILL'), 5000);
				await exited;
				clearTimeout(timer);
			}
			if (ownsBuild) rmSync(buildDir, { recursive: true, force: true });
		}
	};
}
