// `schema`: prints the JSON Schema of a document the product accepts, generated from its zod schema.
import { z } from 'zod';
import { designInputOutline } from '../../lib/schemas';

/** Documents whose schema can be printed, by the name used on the command line. */
const SCHEMAS: Record<string, z.ZodType> = { 'design-input': designInputOutline };

export const summary = 'print the JSON Schema of an input document (design-input)';

export const help = [
	'Usage: npm run cli -- schema <name>',
	'',
	'Prints the JSON Schema (draft 2020-12) of an input document, generated from its zod outline',
	'(z.toJSONSchema, input side: fields with defaults are optional). The parser checks more: which',
	'feed suits which shape, ranges that depend on other fields; it drops another feed\'s option object.',
	'',
	`Names: ${Object.keys(SCHEMAS).join(', ')}`,
	'Exit codes: 0 ok; 2 unknown or missing name.'
].join('\n');

export async function run(argv: string[]): Promise<number> {
	const name = argv[0];
	const schema = name === undefined ? undefined : SCHEMAS[name];
	if (!schema || argv.length > 1) {
		console.error(`schema: ${name === undefined ? 'missing' : JSON.stringify(argv.length > 1 ? argv.slice(1).join(' ') : name)} — expected one name: ${Object.keys(SCHEMAS).join(', ')}`);
		return 2;
	}
	process.stdout.write(`${JSON.stringify(z.toJSONSchema(schema, { io: 'input' }), null, 2)}\n`);
	return 0;
}
