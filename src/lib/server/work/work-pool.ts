// A small pool of worker threads for work that can take longer than ~200 ms, so the event loop keeps answering
// (/healthz, sign-ins, small downloads) while a large design is built. Each job has a time budget; a job that
// overruns it is stopped by ending its thread (synchronous work cannot be interrupted any other way).
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import type { WorkResult, WorkTask } from './work-task';
import { WorkBudgetExceededError, workBudgetMs } from './work-budget';

interface Job {
	readonly id: number;
	readonly task: WorkTask;
	readonly what: string;
	readonly budgetMs: number;
	/** End the thread when the job is done (its heap is large: give the memory back at once). */
	readonly retire: boolean;
	readonly resolve: (value: WorkResult) => void;
	readonly reject: (reason: unknown) => void;
	timer: ReturnType<typeof setTimeout> | null;
	thread: Thread | null;
}

interface Thread {
	readonly worker: Worker;
	job: Job | null;
	idleTimer: ReturnType<typeof setTimeout> | null;
}

/** An idle thread is ended after this long, so a quiet server (or a test process) holds no spare threads. */
const IDLE_MS = 15_000;

/** Threads: FRINGEFIELD_WORK_THREADS, else one fewer than the cores, at least 2 (one large build never blocks every other). */
function threadCount(): number {
	const raw = Number(process.env.FRINGEFIELD_WORK_THREADS);
	if (Number.isInteger(raw) && raw > 0) return raw;
	return Math.max(2, availableParallelism() - 1);
}

/** How a thread is started: from the built chunk, or (TypeScript source) through tsx's loader first. */
interface EntryPlan {
	readonly source: string | URL;
	readonly eval: boolean;
}

let entry: Promise<EntryPlan> | null = null;

/**
 * The worker's entry module. It is imported dynamically, so the production build (vite, then adapter-node's
 * rollup) emits it as a chunk of its own whose import.meta.url is a file a thread can load. Under vitest and
 * `vite dev` that URL is the TypeScript source: the thread registers tsx's loader, then imports it.
 */
function workEntry(): Promise<EntryPlan> {
	entry ??= import('./work-entry').then(({ workEntryUrl }): EntryPlan => {
		const url = new URL(workEntryUrl);
		if (!url.pathname.endsWith('.ts')) return { source: url, eval: false };
		const code = `import('tsx/esm/api').then((tsx) => { tsx.register(); return import(${JSON.stringify(url.href)}); }).catch((err) => { throw err; });`;
		return { source: code, eval: true };
	});
	return entry;
}

const threads: Thread[] = [];
const queue: Job[] = [];
let nextId = 1;
let started = 0;

/** Jobs started since the process began (tests count builds with it). */
export function workStartedCount(): number {
	return started;
}

async function spawn(): Promise<Thread> {
	const plan = await workEntry();
	const worker = new Worker(plan.source, { eval: plan.eval, workerData: { fringefieldWork: true } });
	const thread: Thread = { worker, job: null, idleTimer: null };
	worker.unref();
	worker.on('message', (msg: { id: number; ok: boolean; result?: WorkResult; error?: { name: string; message: string } }) => {
		const job = thread.job;
		if (!job || job.id !== msg.id) return;
		finish(thread, job);
		if (job.retire) retire(thread);
		if (msg.ok) job.resolve(msg.result!);
		else job.reject(Object.assign(new Error(msg.error?.message ?? 'work failed'), { name: msg.error?.name ?? 'Error' }));
		pump();
	});
	const lost = (reason: unknown) => {
		const i = threads.indexOf(thread);
		if (i >= 0) threads.splice(i, 1);
		const job = thread.job;
		if (job) {
			finish(thread, job);
			job.reject(reason instanceof Error ? reason : new Error(`the work thread ended (${String(reason)})`));
		}
		pump();
	};
	worker.on('error', lost);
	worker.on('exit', (code) => lost(new Error(`the work thread ended with code ${code}`)));
	threads.push(thread);
	return thread;
}

function finish(thread: Thread, job: Job): void {
	if (job.timer) clearTimeout(job.timer);
	job.timer = null;
	job.thread = null;
	thread.job = null;
	thread.idleTimer = setTimeout(() => {
		if (thread.job) return;
		const i = threads.indexOf(thread);
		if (i >= 0) threads.splice(i, 1);
		void thread.worker.terminate();
	}, IDLE_MS);
	thread.idleTimer.unref();
}

function retire(thread: Thread): void {
	if (thread.idleTimer) clearTimeout(thread.idleTimer);
	thread.idleTimer = null;
	const i = threads.indexOf(thread);
	if (i >= 0) threads.splice(i, 1);
	void thread.worker.terminate();
}

let spawning = 0;

function pump(): void {
	while (queue.length > 0) {
		const idle = threads.find((t) => t.job === null);
		if (!idle) {
			if (threads.length + spawning < threadCount()) {
				spawning++;
				spawn().then(
					() => {
						spawning--;
						pump();
					},
					(err) => {
						spawning--;
						// no thread can start: fail what waits rather than leave it hanging
						for (const job of queue.splice(0)) {
							if (job.timer) clearTimeout(job.timer);
							job.reject(err);
						}
					}
				);
			}
			return;
		}
		const job = queue.shift()!;
		if (idle.idleTimer) clearTimeout(idle.idleTimer);
		idle.idleTimer = null;
		idle.job = job;
		job.thread = idle;
		started++;
		idle.worker.postMessage({ id: job.id, task: job.task });
	}
}

/**
 * Runs `task` on a worker thread. The budget counts from the call (waiting for a free thread included):
 * when it runs out the job is dropped from the queue, or its thread is ended, and the promise rejects with
 * WorkBudgetExceededError naming `what` and the budget.
 */
export function runWork(task: WorkTask, opts: { what: string; budgetMs?: number; retireThread?: boolean }): Promise<WorkResult> {
	const budgetMs = opts.budgetMs ?? workBudgetMs();
	return new Promise<WorkResult>((resolve, reject) => {
		const job: Job = { id: nextId++, task, what: opts.what, budgetMs, retire: opts.retireThread ?? false, resolve, reject, timer: null, thread: null };
		job.timer = setTimeout(() => {
			job.timer = null;
			const waiting = queue.indexOf(job);
			if (waiting >= 0) queue.splice(waiting, 1);
			const thread = job.thread;
			if (thread) {
				// ending the thread is the only way to stop synchronous work; a fresh one is started on demand
				thread.job = null;
				retire(thread);
			}
			reject(new WorkBudgetExceededError(opts.what, budgetMs));
			pump();
		}, budgetMs);
		queue.push(job);
		pump();
	});
}
