// `npm run bench -- --soak [--seconds N]`: five minutes (or N s; SOAK_SECONDS too) of mixed traffic on loopback
// against the built server — sign-in, editor compute (POST /api/v1/size), bundle exports, Touchstone uploads, the
// largest array's (64 × 64) bundle and a 10 000-point sweep plan — from a fixed number of workers, each one
// request at a time (bounded loops), while /healthz is asked every 250 ms (its p99 is reported, target < 100 ms).
// The asking runs on a thread of its own (this process is busy receiving 55 MB bodies, and its own delay must not
// count as the server's), and asks an idle second server at the same moments: the control, which shows how much
// of a slow answer is the machine (other programs on the same cores) rather than the app.
// The two large downloads are made once before the clock starts (a first build of the 64 × 64 bundle takes
// longer than the soak's short runs); in the mix they are repeat downloads, each still gated and recorded. Passes with 0 errors and resident memory
// (VmRSS of the server, /proc/<pid>/status, every 2 s) growing less than 10 %: the lowest RSS of the last
// minute against the lowest of the minute after the warm-up. RSS swings with each garbage collection; its
// floor is what stays allocated, so a leak shows as a rising floor.
import { mkdtempSync, rmSync } from 'node:fs';
import { get as httpGet } from 'node:http';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { loadConfig } from '../lib/config.ts';
import { migrateToLatest } from '../lib/migrate.ts';
import { connectionUrl, provideDatabase } from '../lib/postgres.ts';
import { action, api } from '../../tests/integration/hardening/helpers/client.ts';
import { startBuiltServer } from '../../tests/integration/hardening/helpers/built-server.ts';
import { startHealthProber } from '../../tests/integration/hardening/helpers/health-prober.ts';
import { build } from './fuzz.ts';
import { writeReliabilitySubsection } from './reliability-section.ts';

const SOAK_DATABASE = 'fringefield_soak';

async function freshDatabase(): Promise<string> {
	const config = loadConfig();
	if (config.databaseUrl) {
		await migrateToLatest(config.databaseUrl, () => undefined);
		return config.databaseUrl;
	}
	const url = await provideDatabase(config, SOAK_DATABASE, () => undefined);
	const admin = new pg.Client({ connectionString: connectionUrl(config, 'postgres') });
	await admin.connect();
	await admin.query(`drop database if exists "${SOAK_DATABASE}" with (force)`);
	await admin.query(`create database "${SOAK_DATABASE}"`);
	await admin.end();
	await migrateToLatest(url, () => undefined);
	return url;
}

interface Sample {
	seconds: number;
	rssMb: number;
	requests: number;
}

type Kind = 'sign-in' | 'size' | 'export' | 'upload' | 'array-download' | 'sweep-download';

const HEALTH_P99_TARGET_MS = 100;

const percentile99 = (times: number[]) => {
	const sorted = [...times].sort((a, b) => a - b);
	return sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * 0.99))] ?? Number.NaN;
};

/** fetch's "fetch failed" with its cause (a reset socket, a refused connection, a timeout), which says what went wrong. */
function describeError(err: unknown): string {
	const cause = (err as { cause?: { code?: string; message?: string } }).cause;
	return `${(err as Error).message}${cause ? ` (${cause.code ?? ''}${cause.code && cause.message ? ': ' : ''}${cause.message ?? ''})` : ''}`;
}

export async function soakRun(opts: { seconds: number; warmupSeconds: number; workers: number }) {
	build();
	const url = await freshDatabase();
	process.env.DATABASE_URL = url;
	const dataDir = mkdtempSync(join(tmpdir(), 'ff-soak-'));
	// a generous budget: the first 64 × 64 build (before the clock) must finish even on a busy machine
	const server = await startBuiltServer({ databaseUrl: url, env: { DATABASE_POOL_SIZE: '20', FRINGEFIELD_DATA_DIR: dataDir, FRINGEFIELD_WORK_BUDGET_MS: '900000' } });
	// the control: the same build on the same database, asked only for /healthz
	const idle = await startBuiltServer({ databaseUrl: url, env: { FRINGEFIELD_DATA_DIR: dataDir } });
	const counts: Record<Kind, { ok: number; errors: number }> = {
		'sign-in': { ok: 0, errors: 0 },
		size: { ok: 0, errors: 0 },
		export: { ok: 0, errors: 0 },
		upload: { ok: 0, errors: 0 },
		'array-download': { ok: 0, errors: 0 },
		'sweep-download': { ok: 0, errors: 0 }
	};
	let healthMs: number[] = [];
	let idleHealthMs: number[] = [];
	let warmupDownloadsMs = { array: 0, sweep: 0 };
	const errorSamples: string[] = [];
	const samples: Sample[] = [];
	try {
		const { createHardeningWorkspace, demoDesign, PASSWORD, touchstoneFixture } = await import('../../tests/integration/hardening/helpers/workspace.ts');
		const ws = await createHardeningWorkspace('soak');
		const file = touchstoneFixture();
		const auth = { token: ws.editor.token };
		const design = demoDesign('Soak patch');
		const { getDb } = await import('../../src/lib/server/db/index.ts');
		const { createDesign } = await import('../../src/lib/server/designs/index.ts');
		const { saveSweepPlan } = await import('../../src/lib/server/sweeps/index.ts');
		const { emptyAxisDraft } = await import('../../src/lib/schemas/sweep-plan.ts');
		const { arrayBenchDocument } = await import('../../src/lib/design/index.ts');
		const big = await createDesign(getDb(), { teamId: ws.a.teamId, userId: ws.owner.id, raw: { ...arrayBenchDocument(64), name: 'Soak largest array' } });
		const plan = await saveSweepPlan(getDb(), {
			revisionId: ws.a.revisionId,
			userId: ws.owner.id,
			draft: {
				name: 'Soak ten thousand',
				combine: 'grid',
				axes: [
					{ ...emptyAxisDraft('substrate.heightMm'), from: '1.0', to: '1.99', step: '0.01' },
					{ ...emptyAxisDraft('substrate.relativePermittivity'), from: '3.0', to: '3.99', step: '0.01' }
				]
			}
		});
		const download = async (path: string) => {
			const res = await fetch(`${server.origin}${path}`, { headers: { authorization: `Bearer ${ws.editor.token}` } });
			const bytes = (await res.arrayBuffer()).byteLength;
			return res.ok && bytes > 0;
		};
		const arrayPath = `/api/v1/designs/${big.design.id}/revisions/A/export/bundle`;
		const sweepPath = `/api/v1/designs/${ws.a.designId}/revisions/${ws.a.label}/sweep-plans/${plan.id}/sweep`;
		// The first build of each may take minutes on a busy machine: longer than fetch waits for response headers
		// (undici's 300 s), so the warm-up goes through node:http, which waits as long as the server works.
		const downloadPatiently = (path: string) =>
			new Promise<boolean>((done, fail) => {
				const req = httpGet(`${server.origin}${path}`, { headers: { authorization: `Bearer ${ws.editor.token}` } }, (res) => {
					let bytes = 0;
					res.on('data', (chunk: Buffer) => (bytes += chunk.byteLength));
					res.on('end', () => done(res.statusCode === 200 && bytes > 0));
					res.on('error', fail);
				});
				req.on('error', fail);
			});
		for (const [which, path] of [['array', arrayPath], ['sweep', sweepPath]] as const) {
			const t0 = performance.now();
			console.log(`soak: first ${which} download (built once, before the clock)…`);
			if (!(await downloadPatiently(path))) throw new Error(`the first ${which} download failed`);
			warmupDownloadsMs = { ...warmupDownloadsMs, [which]: performance.now() - t0 };
		}
		const steps: Record<Kind, (i: number) => Promise<boolean>> = {
			'sign-in': async () => (await action(server.origin, '/signin', {}, { email: ws.viewer.email, password: PASSWORD })).type === 'redirect',
			size: async (i) => (await api(server.origin, '/api/v1/size', auth, { body: { ...design, frequencyHz: 2.4e9 + (i % 100) * 1e6 } })).status === 200,
			export: async () => {
				const res = await fetch(`${server.origin}/api/v1/designs/${ws.a.designId}/revisions/${ws.a.label}/export/bundle`, { headers: { authorization: `Bearer ${ws.editor.token}` } });
				const bytes = (await res.arrayBuffer()).byteLength;
				return res.ok && bytes > 0;
			},
			upload: async () => {
				const fd = new FormData();
				fd.append('file', new File([file as BlobPart], 'bench-2g4.s1p'));
				return (await action(server.origin, `/designs/${ws.a.designId}/r/${ws.a.label}/measurements?/upload`, { cookie: ws.editor.sessionId }, fd)).type === 'redirect';
			},
			'array-download': () => download(arrayPath),
			'sweep-download': () => download(sweepPath)
		};
		// The mix: mostly editor compute and exports, some sign-ins and uploads, and the two large downloads.
		const mix: Kind[] = ['size', 'size', 'size', 'export', 'export', 'sign-in', 'upload', 'array-download', 'sweep-download'];
		const started = performance.now();
		const end = started + opts.seconds * 1000;
		let total = 0;
		const sampler = setInterval(() => samples.push({ seconds: (performance.now() - started) / 1000, rssMb: server.rssKb() / 1024, requests: total }), 2_000);
		samples.push({ seconds: 0, rssMb: server.rssKb() / 1024, requests: 0 });
		// /healthz every 250 ms, one at a time, for the whole run: of the busy server and of the idle control
		const busyProber = startHealthProber(server.origin, 250);
		const idleProber = startHealthProber(idle.origin, 250);
		const worker = async (w: number) => {
			for (let i = w; performance.now() < end; i += opts.workers) {
				const kind = mix[i % mix.length];
				let ok = false;
				try {
					ok = await steps[kind](i);
				} catch (err) {
					if (errorSamples.length < 5) errorSamples.push(`${kind}: ${describeError(err)}`);
				}
				counts[kind][ok ? 'ok' : 'errors']++;
				if (!ok && errorSamples.length < 5) errorSamples.push(`${kind} failed`);
				total++;
			}
		};
		await Promise.all(Array.from({ length: opts.workers }, (_, w) => worker(w)));
		const [busyHealth, idleHealth] = await Promise.all([busyProber.stop(), idleProber.stop()]);
		healthMs = busyHealth.times;
		idleHealthMs = idleHealth.times;
		for (const f of busyHealth.failures) if (errorSamples.length < 8) errorSamples.push(f);
		const died = server.process.exitCode !== null || server.process.signalCode !== null;
		if (died) errorSamples.push(`the server ended (${server.process.exitCode ?? server.process.signalCode}): ${server.log().slice(-2000)}`);
		clearInterval(sampler);
		samples.push({ seconds: (performance.now() - started) / 1000, rssMb: server.rssKb() / 1024, requests: total });
	} finally {
		await Promise.all([server.stop(), idle.stop()]);
		const { closeDb } = await import('../../src/lib/server/db/index.ts');
		await closeDb();
		rmSync(dataDir, { recursive: true, force: true });
	}
	const last = samples.at(-1)!.seconds;
	const windowMin = (from: number, to: number) => Math.min(...samples.filter((s) => s.seconds >= from && s.seconds <= to).map((s) => s.rssMb));
	const span = Math.min(60, (last - opts.warmupSeconds) / 2);
	const atWarmup = windowMin(opts.warmupSeconds, opts.warmupSeconds + span);
	const atEnd = windowMin(last - span, last);
	const growth = (atEnd - atWarmup) / atWarmup;
	const errors = Object.values(counts).reduce((n, c) => n + c.errors, 0);
	const healthP99Ms = percentile99(healthMs);
	const healthMaxMs = Math.max(...healthMs);
	const idleHealthP99Ms = percentile99(idleHealthMs);
	const healthPass = healthP99Ms < HEALTH_P99_TARGET_MS;
	return { counts, errors, errorSamples, samples, atWarmup, atEnd, growth, healthP99Ms, healthMaxMs, healthProbes: healthMs.length, idleHealthP99Ms, idleHealthProbes: idleHealthMs.length, healthPass, warmupDownloadsMs, pass: errors === 0 && growth < 0.1 && healthPass };
}

export async function runSoakBench(): Promise<void> {
	const flag = process.argv.indexOf('--seconds');
	const seconds = Number((flag >= 0 ? process.argv[flag + 1] : undefined) || process.env.SOAK_SECONDS || 300);
	if (!(seconds >= 10)) throw new Error(`--seconds must be a number of seconds, at least 10 (got ${process.argv[flag + 1]})`);
	const warmupSeconds = Math.min(60, Math.round(seconds / 5));
	const workers = 8;
	const r = await soakRun({ seconds, warmupSeconds, workers });
	const mixRows = ['| traffic | requests | errors |', '| --- | ---: | ---: |', ...Object.entries(r.counts).map(([k, c]) => `| ${k} | ${c.ok + c.errors} | ${c.errors} |`)];
	// The curve in 20 s buckets: lowest, median and highest RSS of the samples in each.
	const buckets = new Map<number, Sample[]>();
	for (const s of r.samples) buckets.set(Math.floor(s.seconds / 20), [...(buckets.get(Math.floor(s.seconds / 20)) ?? []), s]);
	const curve = ['| t (s) | RSS low (MB) | RSS median (MB) | RSS high (MB) | requests so far |', '| ---: | ---: | ---: | ---: | ---: |'];
	for (const [b, ss] of buckets) {
		const rss = ss.map((s) => s.rssMb).sort((x, y) => x - y);
		curve.push(`| ${b * 20}–${b * 20 + 20} | ${rss[0].toFixed(1)} | ${rss[Math.floor(rss.length / 2)].toFixed(1)} | ${rss.at(-1)!.toFixed(1)} | ${ss.at(-1)!.requests} |`);
	}
	const body = [
		`Measured on ${new Date().toISOString().slice(0, 10)}, Node.js ${process.version}: ${seconds} s of mixed traffic from ${workers} workers (one request at a time each) against \`node build\` on loopback. Memory is the server's VmRSS from /proc/<pid>/status every 2 s. RSS rises and falls with each garbage collection, so growth compares floors: the lowest RSS of the last minute against the lowest of the minute after the ${warmupSeconds} s warm-up.`,
		'',
		mixRows.join('\n'),
		'',
		`**Errors: ${r.errors}. RSS floor after warm-up ${r.atWarmup.toFixed(1)} MB → in the last minute ${r.atEnd.toFixed(1)} MB: growth ${(r.growth * 100).toFixed(1)} % (target < 10 %). /healthz p99 ${r.healthP99Ms.toFixed(1)} ms, max ${r.healthMaxMs.toFixed(1)} ms over ${r.healthProbes} probes (target p99 < ${HEALTH_P99_TARGET_MS} ms): ${r.healthPass ? 'met' : 'NOT met'}; the idle control server at the same moments: p99 ${r.idleHealthP99Ms.toFixed(1)} ms over ${r.idleHealthProbes} probes. Load average at the end: ${loadavg().map((l) => l.toFixed(1)).join(', ')} on ${availableParallelism()} cores. Overall: ${r.pass ? 'met' : 'NOT met'}.**`,
		'',
		`The large downloads in the mix: the 64 × 64 array's bundle (first build before the clock: ${(r.warmupDownloadsMs.array / 1000).toFixed(1)} s on a worker thread) and a 10 000-point sweep plan (first build ${(r.warmupDownloadsMs.sweep / 1000).toFixed(1)} s, then streamed from the file on disk).`,
		...(r.errorSamples.length ? ['', `First errors: ${r.errorSamples.join('; ')}`] : []),
		'',
		'Memory curve:',
		'',
		curve.join('\n')
	].join('\n');
	console.log(`\n${body}\n`);
	writeReliabilitySubsection('Soak', body);
	console.log('written to the Reliability section of BENCHMARKS.md');
	if (!r.pass) process.exitCode = 1;
}
