// Formats a Touchstone command list: one line per command, LF line ends, shortest round-trip decimal numbers.
import type { TouchstoneCommand } from './commands';

/** Shortest decimal that reads back as the same double (ECMAScript Number::toString), e.g. 2.45, 1e-7; keeps −0's sign. */
function formatNumber(value: number): string {
	return Object.is(value, -0) ? '-0' : String(value);
}

function formatCommand(command: TouchstoneCommand): string {
	switch (command.type) {
		case 'comment':
			return command.text === '' ? '!' : `! ${command.text}`;
		case 'keyword':
			return command.args.length === 0 ? `[${command.name}]` : `[${command.name}] ${command.args.join(' ')}`;
		case 'option':
			return `# ${command.frequencyUnit} S ${command.format} R ${command.referenceImpedanceOhm.map(formatNumber).join(' ')}`;
		case 'data':
			return command.values.map(formatNumber).join(' ');
	}
}

export function serializeTouchstone(commands: readonly TouchstoneCommand[]): string {
	return commands.map((c) => `${formatCommand(c)}\n`).join('');
}
