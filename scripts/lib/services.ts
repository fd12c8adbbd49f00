// Background services started by start/test: a pid file each under .data/run/.
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, openSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { LocalConfig } from './config.ts';
import { rootDir } from './config.ts';

const runDir = (config: LocalConfig) => join(config.dataDir, 'run');
const pidFile = (config: LocalConfig, name: string) => join(runDir(config), `${name}.pid`);

export function alivePid(config: LocalConfig, name: string): number | undefined {
	const file = pidFile(config, name);
	if (!existsSync(file)) return undefined;
	const pid = Number(readFileSync(file, 'utf8'));
	try {
		process.kill(pid, 0);
		return pid;
	} catch {
		rmSync(file, { force: true });
		return undefined;
	}
}

/** Starts `command args` detached with its output in .data/run/<name>.log, unless it already runs. */
export function startBackground(config: LocalConfig, name: string, command: string, args: string[], env: NodeJS.ProcessEnv): number {
	const running = alivePid(config, name);
	if (running) return running;
	mkdirSync(runDir(config), { recursive: true });
	const out = openSync(join(runDir(config), `${name}.log`), 'a');
	const child = spawn(command, args, { cwd: rootDir, env, detached: true, stdio: ['ignore', out, out] });
	child.unref();
	writeFileSync(pidFile(config, name), String(child.pid));
	return child.pid!;
}

export function recordPid(config: LocalConfig, name: string, pid: number): void {
	mkdirSync(runDir(config), { recursive: true });
	writeFileSync(pidFile(config, name), String(pid));
}

export function forgetPid(config: LocalConfig, name: string): void {
	rmSync(pidFile(config, name), { force: true });
}

/** Ends a recorded service (SIGTERM, then SIGKILL after 5 s). */
export async function stopBackground(config: LocalConfig, name: string): Promise<boolean> {
	const pid = alivePid(config, name);
	if (!pid) return false;
	const signal = (sig: NodeJS.Signals) => {
		try {
			process.kill(-pid, sig);
		} catch {
			try {
				process.kill(pid, sig);
			} catch {
				/* already gone */
			}
		}
	};
	signal('SIGTERM');
	for (let i = 0; i < 50; i++) {
		await new Promise((r) => setTimeout(r, 100));
		try {
			process.kill(pid, 0);
		} catch {
			forgetPid(config, name);
			return true;
		}
	}
	signal('SIGKILL');
	forgetPid(config, name);
	return true;
}
