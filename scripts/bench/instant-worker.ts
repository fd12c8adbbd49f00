// A worker whose engine returns a fixed result at once, for the queue's own ceiling in `npm run bench -- --jobs`.
import { startFieldCheckWorker } from '../../src/worker/field-check-worker.ts';
import { createScriptedEngine } from '../../tests/integration/jobs/helpers/scripted-engine.ts';

const { engine } = createScriptedEngine({ steps: 1, stepMs: 0 });
const worker = await startFieldCheckWorker({ engine, databaseUrl: process.env.DATABASE_URL!, pollMs: Number(process.env.FRINGEFIELD_WORKER_POLL_MS || 250), log: () => undefined });
process.on('SIGTERM', () => void worker.stop().then(() => process.exit(0)));
