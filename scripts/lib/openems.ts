// The full-wave engine for the Field check: Debian's openems package, installed with apt-get when missing and root.
import { spawnSync } from 'node:child_process';

/** How to install the engine by hand (the Field check and its tests need it; the rest of the product does not). */
export const OPENEMS_INSTALL_HINT = 'install Debian\'s openems package as root (apt-get install openems), or set FRINGEFIELD_OPENEMS to an openEMS binary';

function engineRuns(binary: string): boolean {
	// without arguments the engine prints its banner and usage, then exits
	const r = spawnSync(binary, [], { stdio: 'ignore', timeout: 15_000 });
	return !r.error;
}

/**
 * Makes sure the openEMS binary can start: FRINGEFIELD_OPENEMS or `openEMS` on PATH. When it is
 * missing and we are root, installs Debian's `openems` package (no binary is ever downloaded from
 * elsewhere); otherwise prints how to install it and returns false, so the rest of the product
 * still starts (only the Field check needs the engine).
 */
export function ensureOpenEms(): boolean {
	const binary = process.env.FRINGEFIELD_OPENEMS || 'openEMS';
	if (engineRuns(binary)) return true;
	if (process.getuid?.() !== 0 || process.env.FRINGEFIELD_OPENEMS) {
		console.warn(`openEMS (the Field check's engine) is missing: ${OPENEMS_INSTALL_HINT}`);
		return false;
	}
	console.log("installing Debian's openems package for the Field check…");
	const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
	for (const args of [['update', '-qq'], ['install', '-y', '-qq', 'openems']]) {
		const r = spawnSync('apt-get', args, { stdio: 'inherit', env });
		if (r.status !== 0) {
			console.warn(`apt-get ${args.join(' ')} failed; ${OPENEMS_INSTALL_HINT}`);
			return false;
		}
	}
	return engineRuns(binary);
}
