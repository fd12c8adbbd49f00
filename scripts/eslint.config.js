// One ESLint config. Its main job: keep the pure core pure (ARCHITECTURE.md, house rules).
import tseslint from 'typescript-eslint';

const pureCore = ['schemas', 'units', 'rf', 'geometry', 'artwork', 'drc', 'formats', 'design', 'simulation'].map((room) => `src/lib/${room}/**/*.ts`);

export default tseslint.config(
	{ ignores: ['**/*.svelte', '.svelte-kit/**', 'build/**', 'node_modules/**', '.data/**', 'tests/fixtures/**'] },
	{
		files: ['**/*.ts', '**/*.js'],
		languageOptions: { parser: tseslint.parser },
		plugins: { '@typescript-eslint': tseslint.plugin },
		rules: {
			'no-debugger': 'error',
			'no-var': 'error',
			'prefer-const': 'error',
			'no-restricted-syntax': ['error', { selector: "CallExpression[callee.property.name='only']", message: 'no .only in committed tests' }]
		}
	},
	{
		files: pureCore,
		rules: {
			'no-restricted-imports': [
				'error',
				{
					patterns: [
						{ group: ['node:*', 'fs', 'path', 'crypto', 'os', 'child_process'], message: 'The pure core runs in the browser too: no Node built-ins.' },
						{ group: ['svelte', 'svelte/*', '$app/*', '$env/*', '@sveltejs/*'], message: 'The pure core imports no framework.' },
						{ group: ['$lib/server', '$lib/server/*', '**/server/**', '$lib/components/*'], message: 'The pure core never imports server or UI code.' }
					]
				}
			],
			'no-restricted-syntax': [
				'error',
				{ selector: "NewExpression[callee.name='Date'][arguments.length=0]", message: 'Writers take dates from the revision, never the clock.' }
			],
			'no-restricted-globals': ['error', { name: 'fetch', message: 'The pure core does no I/O.' }, { name: 'document', message: 'The pure core touches no DOM.' }, { name: 'window', message: 'The pure core touches no DOM.' }],
			'no-restricted-properties': [
				'error',
				{ object: 'Math', property: 'random', message: 'Unseeded randomness: take a seed.' },
				{ object: 'Date', property: 'now', message: 'Writers take dates from the revision, never the clock.' }
			]
		}
	}
);
