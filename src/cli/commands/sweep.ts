// `sweep design.json --plan plan.json --out FILE.json`: a sweep document through the shared core; the CLI reads and writes.
import { writeFileSync } from 'node:fs';
import { createExportMeta } from '../../lib/formats/export-meta';
import { MAX_SWEEP_POINTS, SWEEP_SCHEMA_PATH, buildSweepDocument, serializeSweep, sweepModes, sweepableFields } from '../../lib/formats/sweep';
import { InputError, formatIssue, parseDesignInput } from '../../lib/schemas';
import { UsageError } from '../usage-error';
import { readJson } from './export';

export const summary = `size a design over a plan of swept fields (at most ${MAX_SWEEP_POINTS} points) into one sweep JSON`;

export const help = `Usage: npm run cli -- sweep design.json --plan plan.json --out FILE.json [--mode resize|hold-geometry] [--revision LABEL] [--date YYYY-MM-DD]

The plan: {"combine": "grid"|"zip", "mode": "resize"|"hold-geometry", "axes": [{"field": F, "from": a, "to": b, "step": s} | {"field": F, "values": [...]}]}
with F one of: ${sweepableFields.join(', ')}.
A grid takes every combination, zip the i-th value of each axis together. Mode resize (the default) sizes
every point afresh; hold-geometry keeps the design's patch, inset depth or probe offset and ground margin and
varies only the swept fields. An overrides.* axis sweeps that dimension and always holds the rest.
--mode replaces the plan's mode. The document (format version 2) follows the JSON Schema the app publishes
at ${SWEEP_SCHEMA_PATH}. More than ${MAX_SWEEP_POINTS} points is refused.

Exit codes: 0 ok; 2 bad input or a plan over the limit (one line), nothing written.`;

export async function run(argv: string[]): Promise<number> {
	const opts: Record<string, string> = {};
	let file: string | undefined;
	for (let i = 0; i < argv.length; i++) {
		const arg = argv[i];
		if (['--plan', '--out', '--mode', '--revision', '--date'].includes(arg)) {
			const v = argv[++i];
			if (v === undefined) return fail(`${arg} needs a value`);
			opts[arg.slice(2)] = v;
		} else if (arg.startsWith('--')) return fail(`unknown option "${arg}"; one of --plan, --out, --mode, --revision, --date`);
		else if (file === undefined) file = arg;
		else return fail(`one design file only; also got "${arg}"`);
	}
	if (!file) return fail('a design file is required: npm run cli -- sweep design.json --plan plan.json --out FILE.json');
	if (!opts.plan) return fail('--plan plan.json is required');
	if (!opts.out) return fail('--out FILE.json is required');
	if (opts.mode !== undefined && !(sweepModes as readonly string[]).includes(opts.mode)) return fail(`--mode must be one of: ${sweepModes.join(', ')}; got "${opts.mode}"`);
	try {
		const raw = readJson(file, 'design file');
		const planRaw = readJson(opts.plan, 'plan file');
		const plan = opts.mode !== undefined && planRaw !== null && typeof planRaw === 'object' && !Array.isArray(planRaw) ? { ...planRaw, mode: opts.mode } : planRaw;
		const input = parseDesignInput(raw);
		const meta = createExportMeta({ designName: input.name, revisionLabel: opts.revision ?? 'A', revisionDate: opts.date ?? '2000-01-01' });
		const text = serializeSweep(buildSweepDocument(raw, plan, meta));
		writeFileSync(opts.out, text);
		console.log(`wrote ${opts.out}`);
		return 0;
	} catch (err) {
		if (err instanceof InputError) return fail(formatIssue(err.first));
		if (err instanceof UsageError) return fail(err.message);
		throw err;
	}
}

function fail(line: string): number {
	console.error(line);
	return 2;
}
