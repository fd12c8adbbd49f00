// ESLint rule "fringefield/one-pipeline": only src/lib/design/pipeline.ts may chain the artwork builder and a writer.
// A module that imports the artwork builder (`buildArtwork`) and also any writer or the pipeline's write step is
// building an artwork for files on its own: it must call design/pipeline (prepare → writeFiles) instead.

/** Names whose import means "writes files": the writers, the registry, the zip and the pipeline's write step. */
export const WRITER_NAMES = new Set([
	'toGerber',
	'toExcellon',
	'toDxf',
	'toSvg',
	'buildFabNotes',
	'serializeSweep',
	'serializeArrayPattern',
	'buildBundle',
	'formatRegistry',
	'formatEntry',
	'writeFiles'
]);
export const ARTWORK_BUILDER = 'buildArtwork';

/** @type {import('eslint').Rule.RuleModule} */
export const onePipeline = {
	meta: {
		type: 'problem',
		docs: { description: 'only design/pipeline chains the artwork builder and a writer' },
		messages: {
			chain: 'Only src/lib/design/pipeline.ts chains the artwork builder and a writer ({{writer}}); call prepare() and writeFiles() from $lib/design instead.'
		},
		schema: []
	},
	create(context) {
		let builder = null;
		const writers = [];
		return {
			ImportDeclaration(node) {
				for (const spec of node.specifiers) {
					const imported = spec.type === 'ImportSpecifier' ? (spec.imported.name ?? spec.imported.value) : null;
					if (imported === ARTWORK_BUILDER) builder = spec;
					else if (imported && WRITER_NAMES.has(imported)) writers.push({ spec, name: imported });
				}
			},
			'Program:exit'() {
				if (!builder || writers.length === 0) return;
				context.report({ node: builder, messageId: 'chain', data: { writer: writers[0].name } });
			}
		};
	}
};

export default { rules: { 'one-pipeline': onePipeline } };
