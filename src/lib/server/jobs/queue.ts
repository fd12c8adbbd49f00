// The job queue: pg-boss on DATABASE_URL. The app only sends and cancels (and installs pg-boss's schema and our queues
// on first use); workers (src/worker/main.ts) also take jobs and supervise expiry. Workers on any number of machines
// pointed at the same database share the queues with no other setting.
import PgBoss from 'pg-boss';
import { allJobNames, JOB_RETRY_LIMIT } from './job-names';

export type Boss = PgBoss;

export interface QueueOptions {
	databaseUrl?: string;
	/** 'app' sends and cancels; 'worker' also supervises (pg-boss's expiry and retries). */
	role: 'app' | 'worker';
	/** Connections of pg-boss's own pool. */
	poolSize?: number;
	/** Seconds between pg-boss maintenance runs (expiry of jobs whose worker was lost); workers only. */
	maintenanceIntervalSeconds?: number;
}

let current: { role: QueueOptions['role']; boss: Promise<PgBoss> } | undefined;

function databaseUrl(given?: string): string {
	const url = given ?? process.env.DATABASE_URL;
	if (!url) throw new Error('DATABASE_URL is not set (npm start and npm test set it; see README)');
	return url;
}

/** A started pg-boss with our queues created (idempotent: pg-boss skips a queue that exists). */
export async function createQueue(options: QueueOptions): Promise<PgBoss> {
	const boss = new PgBoss({
		connectionString: databaseUrl(options.databaseUrl),
		application_name: `fringefield-${options.role}`,
		max: options.poolSize ?? 2,
		migrate: true,
		schedule: false,
		supervise: options.role === 'worker',
		maintenanceIntervalSeconds: options.maintenanceIntervalSeconds ?? 30
	});
	boss.on('error', (err) => console.error(`job queue: ${err.message}`));
	await boss.start();
	for (const name of allJobNames) await boss.createQueue(name, { name, retryLimit: JOB_RETRY_LIMIT, retryDelay: 0 });
	return boss;
}

/** The process's queue, started on first use. */
export function getQueue(options: QueueOptions = { role: 'app' }): Promise<PgBoss> {
	if (!current) {
		const boss = createQueue(options);
		current = { role: options.role, boss };
		// A failed start is not cached: the next call tries again.
		boss.catch(() => {
			if (current?.boss === boss) current = undefined;
		});
	}
	return current.boss;
}

/** Stops the process's queue (its pool included). */
export async function stopQueue(): Promise<void> {
	const stopping = current;
	current = undefined;
	if (!stopping) return;
	const boss = await stopping.boss.catch(() => undefined);
	await boss?.stop({ graceful: false, close: true, wait: true });
}
