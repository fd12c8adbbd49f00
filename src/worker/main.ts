// `npm run worker`: one job worker on DATABASE_URL, running field checks and Homing studies with the full-wave engine
// (openEMS as a subprocess). Start as many as you like, on any machines that reach the database (README "Scaling out").
// FRINGEFIELD_WORKER_CONCURRENCY (default 1) jobs at once; SIGTERM/SIGINT stop it, handing running jobs back to the queue.
import { runFieldCheck, runHoming } from './fullwave/index';
import type { FieldCheckEngine } from './engine';
import { startFieldCheckWorker } from './field-check-worker';

function positiveInteger(name: string, fallback: number): number {
	const raw = process.env[name];
	if (raw === undefined || raw === '') return fallback;
	const value = Number(raw);
	if (!Number.isInteger(value) || value < 1) {
		console.error(`${name}: "${raw}" is not a whole number ≥ 1`);
		process.exit(2);
	}
	return value;
}

const databaseUrl = process.env.DATABASE_URL;
if (!databaseUrl) {
	console.error('DATABASE_URL: not set; point the worker at the same PostgreSQL as the app');
	process.exit(2);
}

const engine: FieldCheckEngine = { runFieldCheck, runHoming };
const worker = await startFieldCheckWorker({
	engine,
	databaseUrl,
	concurrency: positiveInteger('FRINGEFIELD_WORKER_CONCURRENCY', 1),
	staleSeconds: positiveInteger('FRINGEFIELD_WORKER_STALE_SECONDS', 30),
	pollMs: positiveInteger('FRINGEFIELD_WORKER_POLL_MS', 1000)
});

let stopping = false;
for (const signal of ['SIGTERM', 'SIGINT'] as const) {
	process.on(signal, () => {
		if (stopping) return;
		stopping = true;
		console.log(`[worker ${worker.workerId}] ${signal}: stopping; running jobs go back to the queue`);
		void worker.stop().then(() => process.exit(0));
	});
}
