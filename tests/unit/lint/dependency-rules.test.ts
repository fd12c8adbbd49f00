// The dependency rules of scripts/eslint.config.js, run through ESLint's own Node API on small sources placed at
// real paths: the server may not import the UI folder, and only design/pipeline may chain the artwork builder and a writer.
import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';

const eslint = new ESLint({ overrideConfigFile: 'scripts/eslint.config.js' });

async function messagesOf(code: string, filePath: string): Promise<string[]> {
	const [result] = await eslint.lintText(code, { filePath });
	return result.messages.map((m) => `${m.ruleId}: ${m.message}`);
}

const chain = `import { buildArtwork } from '$lib/artwork';
import { toGerber } from '$lib/formats';
export const files = (sized: never, meta: never) => { const artwork = buildArtwork(sized); return artwork.layers.map((l) => toGerber(artwork, l.id, meta)); };
`;

describe('the dependency rules', () => {
	it('fail when src/lib/server imports src/lib/components', async () => {
		const code = `import { previewLayerStyles } from '$lib/components/preview-paths';\nexport const styles = previewLayerStyles;\n`;
		expect(await messagesOf(code, 'src/lib/server/designs/example.ts')).toEqual([expect.stringMatching(/^no-restricted-imports: .*src\/lib\/components/)]);
		// the same import by a relative path is caught too
		expect(await messagesOf(code.replace('$lib/components', '../../components'), 'src/lib/server/designs/example.ts')).toHaveLength(1);
	});

	it('let the server import the pure design helpers', async () => {
		expect(await messagesOf(`import { revisionSummary } from '$lib/design';\nexport const s = revisionSummary;\n`, 'src/lib/server/designs/example.ts')).toEqual([]);
	});

	it.each(['src/lib/server/exports/example.ts', 'src/cli/commands/example.ts', 'src/lib/formats/bundle/example.ts', 'src/lib/design/example.ts'])(
		'fail when %s builds the artwork and writes files from it',
		async (filePath) => {
			expect(await messagesOf(chain, filePath)).toEqual([expect.stringMatching(/^fringefield\/one-pipeline: Only src\/lib\/design\/pipeline\.ts chains the artwork builder and a writer \(toGerber\)/)]);
		}
	);

	it('fail for the pipeline\u2019s own write step called after a private artwork build', async () => {
		const code = `import { buildArtwork } from '../../lib/artwork';\nimport { writeFiles } from '../../lib/design';\nexport const both = [buildArtwork, writeFiles];\n`;
		expect(await messagesOf(code, 'src/cli/commands/example.ts')).toHaveLength(1);
	});

	it('let design/pipeline chain them, and let others use either alone', async () => {
		expect(await messagesOf(chain, 'src/lib/design/pipeline.ts')).toEqual([]);
		expect(await messagesOf(`import { toGerber } from '$lib/formats';\nexport const w = toGerber;\n`, 'src/lib/server/exports/example.ts')).toEqual([]);
		expect(await messagesOf(`import { buildArtwork } from '$lib/artwork';\nexport const b = buildArtwork;\n`, 'src/lib/formats/sweep/example.ts')).toEqual([]);
	});
});
