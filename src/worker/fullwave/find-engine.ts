// Finds the openEMS binary and its version (null when it is not installed).
import { execFile } from 'node:child_process';

export interface EngineInfo {
	name: 'openEMS';
	version: string;
	binary: string;
}

/** How to install the engine, for error messages, the CLI and the scripts. */
export const ENGINE_INSTALL_HINT = 'install it with `sudo apt-get install openems` (Debian/Ubuntu), or set FRINGEFIELD_OPENEMS to the openEMS binary';

/** The binary to run: FRINGEFIELD_OPENEMS, else `openEMS` on PATH. */
export function engineBinary(): string {
	return process.env.FRINGEFIELD_OPENEMS || 'openEMS';
}

/** The engine on PATH (or FRINGEFIELD_OPENEMS) and its version, or null when it cannot start. */
export function findEngine(): Promise<EngineInfo | null> {
	const binary = engineBinary();
	return new Promise((resolve) => {
		// without arguments the engine prints its banner and usage, then exits
		execFile(binary, [], { timeout: 15_000 }, (error, stdout, stderr) => {
			const text = `${stdout}${stderr}`;
			const match = /openEMS\s+\S*\s*--\s*version\s+v?([\w.+-]+)/i.exec(text);
			if (error && (error as NodeJS.ErrnoException).code === 'ENOENT') return resolve(null);
			resolve(match ? { name: 'openEMS', version: match[1], binary } : null);
		});
	});
}
