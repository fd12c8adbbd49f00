// Settings read from the environment, in one place, with their defaults.
import { resolve } from 'node:path';

export const rootDir = resolve(import.meta.dirname, '..', '..');

export interface LocalConfig {
	/** Folder of the private cluster and the mail fake's mailbox (git-ignored). */
	dataDir: string;
	/** Port of the private PostgreSQL cluster (never 5432, so a system server is left alone). */
	pgPort: number;
	/** Port of the local SMTP fake. */
	smtpPort: number;
	/** Port the app listens on. */
	appPort: number;
	/** Set: use this server and start none. */
	databaseUrl: string | undefined;
}

function portFrom(name: string, fallback: number): number {
	const raw = process.env[name];
	if (raw === undefined || raw === '') return fallback;
	const port = Number(raw);
	if (!Number.isInteger(port) || port < 1 || port > 65535) {
		throw new ConfigError(name, `${JSON.stringify(raw)} is not a port number (1–65535)`);
	}
	return port;
}

export function loadConfig(): LocalConfig {
	return {
		dataDir: resolve(process.env.FRINGEFIELD_DATA_DIR || resolve(rootDir, '.data')),
		pgPort: portFrom('FRINGEFIELD_PG_PORT', 54329),
		smtpPort: portFrom('SMTP_PORT', 2525),
		appPort: portFrom('PORT', 3000),
		databaseUrl: process.env.DATABASE_URL || undefined
	};
}

/** A configuration problem: printed as one line naming the setting, exit code 1, no stack trace. */
export class ConfigError extends Error {
	constructor(
		readonly setting: string,
		detail: string
	) {
		super(`${setting}: ${detail}`);
	}
}

/** Runs a script's main, turning ConfigError (and any other error) into one line and exit 1. */
export function runMain(main: () => Promise<void>): void {
	main().catch((err: unknown) => {
		const message = err instanceof ConfigError ? err.message : `error: ${err instanceof Error ? err.message : String(err)}`;
		console.error(message);
		process.exit(1);
	});
}
