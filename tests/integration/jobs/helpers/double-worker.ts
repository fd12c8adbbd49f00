// A worker process with the scripted test double, for the lost-worker test (it is killed with SIGKILL mid-job).
import { startFieldCheckWorker } from '../../../../src/worker/field-check-worker';
import { createScriptedEngine } from './scripted-engine';

const { engine } = createScriptedEngine({ steps: Number(process.env.DOUBLE_STEPS || 100), stepMs: Number(process.env.DOUBLE_STEP_MS || 300) });
await startFieldCheckWorker({ engine, databaseUrl: process.env.DATABASE_URL!, heartbeatMs: 500, staleSeconds: 3, pollMs: 300 });
