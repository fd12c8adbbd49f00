// Playwright in Debian's Chromium against the production build (`node build`) on 127.0.0.1.
// scripts/test.ts provides DATABASE_URL (the test database) and the mail fake's settings; a job worker runs beside the app.
import { defineConfig } from '@playwright/test';

const port = Number(process.env.E2E_PORT || 3100);
export const baseURL = `http://127.0.0.1:${port}`;

export default defineConfig({
	testDir: '.',
	testMatch: '**/*.e2e.ts',
	outputDir: '../../.data/e2e-results',
	fullyParallel: false,
	workers: 1,
	retries: 0,
	// Every journey that signs up now confirms the address through the caught mail before signing in.
	timeout: 120_000,
	reporter: [['list'], ['json']],
	use: {
		baseURL,
		trace: 'off',
		screenshot: 'off',
		launchOptions: {
			executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
			args: [
				'--no-sandbox',
				'--disable-gpu',
				'--disable-quic',
				'--no-first-run',
				'--disable-background-networking',
				'--disable-component-update',
				'--disable-sync'
			]
		}
	},
	webServer: [
		{
			command: 'node build',
			cwd: '../..',
			url: `${baseURL}/healthz`,
			reuseExistingServer: false,
			timeout: 60_000,
			env: {
				...(process.env as Record<string, string>),
				HOST: '127.0.0.1',
				PORT: String(port),
				ORIGIN: baseURL,
				BODY_SIZE_LIMIT: '6M',
				// the demo mode (src/lib/server/app-mode.ts): the journeys read caught mail at /dev/mailbox.json
				FRINGEFIELD_MODE: 'demo'
			}
		},
		// One job worker (field checks with openEMS), as `npm start` runs beside the app.
		{
			command: 'node --import tsx src/worker/main.ts',
			cwd: '../..',
			wait: { stdout: /taking .* jobs/ },
			stdout: 'pipe',
			reuseExistingServer: false,
			timeout: 60_000,
			gracefulShutdown: { signal: 'SIGTERM', timeout: 5000 },
			env: { ...(process.env as Record<string, string>) }
		}
	]
});
