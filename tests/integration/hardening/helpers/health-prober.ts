// Asks a server's /healthz at a fixed interval on a thread of its own, so the asking process's own work (receiving and
// hashing large bodies) never shows up as the server's delay. Used by the heavy-download tests and the soak bench.
import { Worker } from 'node:worker_threads';

export interface HealthProbes {
	/** Each answer's time in ms; Infinity for a non-200 or no answer at all. */
	times: number[];
	/** The first few failures, with their causes. */
	failures: string[];
}

export function startHealthProber(origin: string, intervalMs: number): { stop: () => Promise<HealthProbes> } {
	const prober = new Worker(
		`const { parentPort, workerData } = require('node:worker_threads');
		let stop = false;
		parentPort.on('message', () => (stop = true));
		(async () => {
			const times = [];
			const failures = [];
			while (!stop) {
				const t0 = performance.now();
				try {
					const res = await fetch(workerData.origin + '/healthz');
					await res.arrayBuffer();
					times.push(res.status === 200 ? performance.now() - t0 : Infinity);
					if (res.status !== 200 && failures.length < 5) failures.push('/healthz answered ' + res.status);
				} catch (err) {
					times.push(Infinity);
					if (failures.length < 5) failures.push('/healthz: ' + err.message + (err.cause ? ' (' + (err.cause.code || '') + ' ' + (err.cause.message || '') + ')' : ''));
				}
				await new Promise((r) => setTimeout(r, workerData.intervalMs));
			}
			parentPort.postMessage({ times, failures });
		})();`,
		{ eval: true, workerData: { origin, intervalMs } }
	);
	const result = new Promise<HealthProbes>((resolve, reject) => {
		prober.once('message', resolve);
		prober.once('error', reject);
	});
	return {
		stop: async () => {
			prober.postMessage('stop');
			const r = await result;
			await prober.terminate();
			return r;
		}
	};
}
