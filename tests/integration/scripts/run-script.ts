// Runs one of scripts/*.ts as a user would, with a private data folder and ports.
import { spawnSync } from 'node:child_process';
import { resolve } from 'node:path';

export const rootDir = resolve(import.meta.dirname, '..', '..', '..');

export interface ScriptRun {
	status: number | null;
	stdout: string;
	stderr: string;
}

export function runScript(script: string, args: string[], env: Record<string, string | undefined>): ScriptRun {
	const childEnv: NodeJS.ProcessEnv = { ...process.env };
	delete childEnv.DATABASE_URL;
	for (const [k, v] of Object.entries(env)) {
		if (v === undefined) delete childEnv[k];
		else childEnv[k] = v;
	}
	const r = spawnSync(process.execPath, ['--import', 'tsx', `scripts/${script}`, ...args], { cwd: rootDir, env: childEnv, encoding: 'utf8', timeout: 120_000 });
	return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}
