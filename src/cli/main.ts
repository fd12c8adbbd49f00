// Fringefield command line: `npm run cli -- <command> [options]`. Each command lives in commands/<name>.ts
// and exports `summary` (one line), `help` (full text) and `run(argv): Promise<number>` (the exit code).
// Exit codes: 0 success, 2 bad input (one line on stderr naming the field), 3 design-rule violations.
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export interface CliCommand {
	summary: string;
	help: string;
	run(argv: string[]): Promise<number>;
}

const commandsDir = join(dirname(fileURLToPath(import.meta.url)), 'commands');

function commandNames(): string[] {
	return readdirSync(commandsDir)
		.filter((f) => f.endsWith('.ts') && !f.startsWith('_'))
		.map((f) => f.slice(0, -3))
		.sort();
}

async function load(name: string): Promise<CliCommand> {
	return (await import(join(commandsDir, `${name}.ts`))) as CliCommand;
}

async function usage(): Promise<string> {
	const lines = ['Usage: npm run cli -- <command> [options]', '', 'Commands:'];
	for (const name of commandNames()) lines.push(`  ${name.padEnd(10)} ${(await load(name)).summary}`);
	lines.push('', 'Run `npm run cli -- <command> --help` for a command\'s options.');
	lines.push('Exit codes: 0 ok, 2 bad input, 3 design-rule violations, 4 Field check engine (openEMS) missing, 5 engine failed or over budget.');
	return lines.join('\n');
}

async function main(argv: string[]): Promise<number> {
	const [name, ...rest] = argv;
	if (!name || name === '--help' || name === '-h' || name === 'help') {
		console.log(await usage());
		return name ? 0 : 2;
	}
	if (!commandNames().includes(name)) {
		console.error(`unknown command "${name}"; one of: ${commandNames().join(', ')}`);
		return 2;
	}
	const command = await load(name);
	if (rest.includes('--help') || rest.includes('-h')) {
		console.log(command.help);
		return 0;
	}
	return command.run(rest);
}

main(process.argv.slice(2)).then(
	(code) => {
		process.exitCode = code;
	},
	(err: unknown) => {
		console.error(`internal error: ${err instanceof Error ? err.message : String(err)}`);
		process.exitCode = 1;
	}
);
