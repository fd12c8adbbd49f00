import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

export default defineConfig({
	plugins: [tailwindcss(), sveltekit()],
	build: { assetsInlineLimit: 0 },
	server: { host: '127.0.0.1' },
	test: {
		include: ['tests/unit/**/*.test.ts', 'tests/integration/**/*.test.ts'],
		environment: 'node',
		testTimeout: 30_000,
		hookTimeout: 60_000,
		// Integration suites share one test database: run files one after another.
		fileParallelism: false,
		globalSetup: ['tests/global-setup.ts']
	}
});
