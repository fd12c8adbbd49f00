// The worker thread's side of the pool: takes one task at a time, runs it, posts the result back (large byte
// arrays moved, not copied). Loaded only as a thread's entry module (see work-pool.ts).
import { isMainThread, parentPort, workerData } from 'node:worker_threads';
import { transferablesOf } from './transferables';
import type { WorkTask } from './work-task';

/** This module's own address: the file a worker thread is started from. */
export const workEntryUrl = import.meta.url;

if (!isMainThread && parentPort && (workerData as { fringefieldWork?: boolean } | null)?.fringefieldWork) {
	const port = parentPort;
	port.on('message', async (msg: { id: number; task: WorkTask }) => {
		try {
			// loaded here, on the thread: the main thread imports this module only to learn its address,
			// and must not pay for the writers' module graph (svgdom, the parsers, the zip) on a request
			const { runTask } = await import('./work-task');
			const result = await runTask(msg.task);
			port.postMessage({ id: msg.id, ok: true, result }, transferablesOf(result));
		} catch (err) {
			const e = err instanceof Error ? err : new Error(String(err));
			port.postMessage({ id: msg.id, ok: false, error: { name: e.name, message: e.message } });
		}
	});
}
