// The second Gerber/Excellon reader of the tests (tests/integration/formats/gerbv-readback.test.ts): Debian's gerbv
// package, installed with apt-get when missing and root, the way scripts/lib/openems.ts installs the Field check's engine.
import { spawnSync } from 'node:child_process';

/** How to install the reader by hand (only the read-back test needs it; the product does not). */
export const GERBV_INSTALL_HINT = "install Debian's gerbv package as root (apt-get install gerbv), or set FRINGEFIELD_GERBV to a gerbv binary";

function readerRuns(binary: string): boolean {
	// `gerbv --version` prints its version and exits without opening a window
	const r = spawnSync(binary, ['--version'], { stdio: 'ignore', timeout: 15_000 });
	return !r.error && r.status === 0;
}

/**
 * Makes sure gerbv can start: FRINGEFIELD_GERBV or `gerbv` on PATH. When it is missing and we are root, installs
 * Debian's `gerbv` package (no binary is ever downloaded from elsewhere); otherwise prints how to install it and
 * returns false (the read-back test then fails, naming the same hint).
 */
export function ensureGerbv(): boolean {
	const binary = process.env.FRINGEFIELD_GERBV || 'gerbv';
	if (readerRuns(binary)) return true;
	if (process.getuid?.() !== 0 || process.env.FRINGEFIELD_GERBV) {
		console.warn(`gerbv (the second Gerber reader of the tests) is missing: ${GERBV_INSTALL_HINT}`);
		return false;
	}
	console.log("installing Debian's gerbv package for the Gerber read-back test…");
	const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
	for (const args of [['update', '-qq'], ['install', '-y', '-qq', 'gerbv']]) {
		const r = spawnSync('apt-get', args, { stdio: 'inherit', env });
		if (r.status !== 0) {
			console.warn(`apt-get ${args.join(' ')} failed; ${GERBV_INSTALL_HINT}`);
			return false;
		}
	}
	return readerRuns(binary);
}
