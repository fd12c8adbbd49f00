// The API reference page's content, read from the OpenAPI document: calls grouped by task, a curl line per call,
// and a data dictionary (one table per named shape). Pure, so new routes and shapes appear without touching the page.

type Json = Record<string, any>;

export const HTTP_VERBS = ['get', 'post', 'put', 'patch', 'delete'] as const;

export interface ApiCall {
	verb: string;
	path: string;
	summary: string;
	anchor: string;
	curl: string;
	parameters: Json[];
	body: { contentType: string; schema: Json } | null;
	answers: { status: string; description: string; contentType: string | null; shape: string | null }[];
}

export interface ApiTask {
	id: string;
	title: string;
	blurb: string;
	calls: ApiCall[];
}

/** The tasks, in the order a newcomer meets them; the first whose test matches a call takes it. */
const TASKS: { id: string; title: string; blurb: string; takes: (path: string, tags: string[]) => boolean }[] = [
	{ id: 'size', title: 'Size a patch', blurb: 'Dimensions from a design input, stored nowhere.', takes: (p, t) => p === '/size' || t.includes('sizing') },
	{ id: 'downloads', title: 'Downloads', blurb: 'Gerber, Excellon, DXF, SVG, fab notes or the zip bundle of one revision, byte for byte the same each time.', takes: (p) => p.includes('/export/') },
	{ id: 'simulations', title: 'Simulations', blurb: 'Full-wave checks of a revision and their results.', takes: (p, t) => /simulation/.test(p) || t.some((x) => /simulation/.test(x)) },
	{ id: 'sweeps', title: 'Sweeps', blurb: 'Sweep definitions and saved sweep plans for a simulator.', takes: (p, t) => /\/sweep/.test(p) || t.includes('sweeps') },
	{ id: 'export-log', title: 'Export log', blurb: 'Who downloaded what, when, with the hashes of the files.', takes: (p) => /\/exports$/.test(p) },
	{
		id: 'designs',
		title: 'Teams, designs and revisions',
		blurb: 'What a token can reach, and the immutable revisions of each design.',
		takes: (p, t) => /^\/(teams|designs)\b/.test(p) || t.some((x) => ['teams', 'designs', 'revisions'].includes(x))
	}
];
const OTHER: Omit<ApiTask, 'calls'> = { id: 'other', title: 'Other calls', blurb: 'Calls that fit none of the tasks above.' };

/** `{designId}` → `$DESIGN_ID`, so the curl line runs once the shell variable is set. */
export function shellVariableFor(parameter: string): string {
	return '$' + parameter.replace(/([a-z0-9])([A-Z])/g, '$1_$2').toUpperCase();
}

/** One copyable command line: the real path under the server's base, the token from `$FF_TOKEN`. */
export function curlLine(baseUrl: string, verb: string, path: string, op: Json): string {
	const url = baseUrl + path.replace(/\{([^}]+)\}/g, (_m, name: string) => shellVariableFor(name));
	const parts = ['curl', '-sS'];
	if (verb !== 'get') parts.push('-X', verb.toUpperCase());
	parts.push('-H', '"Authorization: Bearer $FF_TOKEN"');
	if (op.requestBody) parts.push('-H', '"content-type: application/json"', '--data', '@body.json');
	const answersJson = Object.entries((op.responses ?? {}) as Json).some(([s, r]) => s.startsWith('2') && r?.content?.['application/json']);
	if (!answersJson) parts.push('-OJ');
	parts.push(`"${url}"`);
	return parts.join(' ');
}

function refName(schema: Json | undefined): string | null {
	return typeof schema?.$ref === 'string' ? schema.$ref.replace('#/components/schemas/', '') : null;
}

export function groupCalls(doc: Json, origin: string): ApiTask[] {
	const baseUrl = `${origin}${doc.servers?.[0]?.url ?? ''}`;
	const groups = new Map<string, ApiTask>();
	for (const task of [...TASKS, OTHER]) groups.set(task.id, { id: task.id, title: task.title, blurb: task.blurb, calls: [] });
	for (const [path, item] of Object.entries((doc.paths ?? {}) as Record<string, Json>)) {
		for (const verb of HTTP_VERBS) {
			const op = item[verb] as Json | undefined;
			if (!op) continue;
			const tags: string[] = op.tags ?? [];
			const task = TASKS.find((t) => t.takes(path, tags)) ?? OTHER;
			const bodyEntry = Object.entries((op.requestBody?.content ?? {}) as Record<string, Json>)[0];
			groups.get(task.id)!.calls.push({
				verb: verb.toUpperCase(),
				path,
				summary: op.summary ?? '',
				anchor: `${verb}-${path.replace(/[^a-zA-Z0-9]+/g, '-').replace(/^-|-$/g, '')}`,
				curl: curlLine(baseUrl, verb, path, op),
				parameters: op.parameters ?? [],
				body: bodyEntry ? { contentType: bodyEntry[0], schema: bodyEntry[1].schema ?? {} } : null,
				answers: Object.entries((op.responses ?? {}) as Record<string, Json>).map(([status, r]) => {
					const content = Object.entries((r.content ?? {}) as Record<string, Json>)[0];
					return { status, description: r.description ?? '', contentType: content?.[0] ?? null, shape: content ? refName(content[1].schema) : null };
				})
			});
		}
	}
	return [...groups.values()].filter((g) => g.calls.length > 0);
}

/** The unit a field's name carries (house rule: units live in names). */
const UNIT_SUFFIXES: [RegExp, string][] = [
	[/Mm$/, 'mm'],
	[/Um$/, 'µm'],
	[/Hz$/, 'Hz'],
	[/Ohm$/, 'Ω'],
	[/SPerM$/, 'S/m'],
	[/Deg$/, '°'],
	[/Db$/, 'dB'],
	[/Bytes$/, 'bytes']
];

export function unitOf(fieldName: string): string | null {
	return UNIT_SUFFIXES.find(([re]) => re.test(fieldName))?.[1] ?? null;
}

/** Our own words for the fields that recur across shapes and carry no description in the document. */
const GLOSSARY: Record<string, string> = {
	id: 'Identifier, stable for the life of the record',
	name: 'Name as people typed it',
	teamId: 'Identifier of the team that owns it',
	designId: 'Identifier of the design',
	label: 'Revision label (A, B, …), never reused within a design',
	parentLabel: 'Label of the revision this one was made from; null for the first',
	latestLabel: 'Label of the newest revision; null before the first',
	note: 'Free text from whoever saved it',
	createdAt: 'When it was made (ISO 8601, UTC)',
	role: 'Your role in the team: owner, editor or viewer',
	slug: 'Short name used in file names',
	error: 'One sentence on what went wrong',
	issues: 'One entry per bad field: its path and what is allowed',
	sha256: 'SHA-256 of the bytes, hexadecimal',
	total: 'How many records match, over all pages',
	page: 'Page number, from 1',
	pageSize: 'Records per page',
	items: 'The records on this page',
	message: 'One sentence for people',
	ruleId: 'Which design rule',
	schemaVersion: 'Version of this document’s layout',
	frequencyHz: 'Centre frequency',
	via: 'Where it was asked for: the web app (ui), the API (api) or the command line (cli)'
};

function humanise(fieldName: string): string {
	const words = fieldName
		.replace(/(Mm|Um|Hz|Ohm|SPerM|Deg|Db)$/, '')
		.replace(/([a-z0-9])([A-Z])/g, '$1 $2')
		.toLowerCase();
	return words.charAt(0).toUpperCase() + words.slice(1);
}

export interface DictionaryRow {
	field: string;
	type: string;
	unit: string | null;
	required: boolean;
	meaning: string;
	/** The named shape this field holds, for a link. */
	shape: string | null;
}

export interface DictionaryEntry {
	name: string;
	description: string;
	rows: DictionaryRow[];
}

function typeText(s: Json): string {
	const ref = refName(s);
	if (ref) return ref;
	if (s.enum) return s.enum.map((v: unknown) => JSON.stringify(v)).join(' | ');
	if (s.const !== undefined) return JSON.stringify(s.const);
	if (s.anyOf || s.oneOf) return (s.anyOf ?? s.oneOf).map(typeText).join(' | ');
	const t = Array.isArray(s.type) ? s.type.join(' | ') : s.type;
	if (t === 'array') return `list of ${s.items ? typeText(s.items) : 'anything'}`;
	if (t === 'integer') return 'whole number';
	return t ?? 'any';
}

function limits(s: Json): string {
	const parts: string[] = [];
	if (s.minimum !== undefined) parts.push(`≥ ${s.minimum}`);
	if (s.exclusiveMinimum !== undefined) parts.push(`> ${s.exclusiveMinimum}`);
	if (s.maximum !== undefined) parts.push(`≤ ${s.maximum}`);
	if (s.exclusiveMaximum !== undefined) parts.push(`< ${s.exclusiveMaximum}`);
	if (s.default !== undefined) parts.push(`default ${JSON.stringify(s.default)}`);
	return parts.length ? ` (${parts.join(', ')})` : '';
}

/** Flattens nested objects into dotted field names (lists of objects as `field[].x`), down to `maxDepth`. */
function rowsOf(schema: Json, prefix: string, depth: number, maxDepth: number): DictionaryRow[] {
	const required = new Set<string>(schema.required ?? []);
	const rows: DictionaryRow[] = [];
	for (const [name, prop] of Object.entries((schema.properties ?? {}) as Record<string, Json>)) {
		const field = prefix + name;
		const inner = prop.type === 'array' ? prop.items : prop;
		const shape = refName(inner);
		rows.push({
			field,
			type: typeText(prop) + limits(prop),
			unit: unitOf(name),
			required: required.has(name),
			meaning: prop.description ?? GLOSSARY[name] ?? humanise(name),
			shape
		});
		if (inner?.properties && !shape && depth < maxDepth) for (const row of rowsOf(inner, `${field}${prop.type === 'array' ? '[]' : ''}.`, depth + 1, maxDepth)) rows.push(row);
	}
	return rows;
}

export function dataDictionary(doc: Json, maxDepth = 2): DictionaryEntry[] {
	return Object.entries((doc.components?.schemas ?? {}) as Record<string, Json>).map(([name, schema]) => ({
		name,
		description: schema.description ?? '',
		rows: rowsOf(schema, '', 0, maxDepth)
	}));
}
