// `export design.json --out DIR|FILE.zip`: the shared export pipeline, with the CLI doing only reading and writing.
// A design that breaks its fab profile is refused (exit 3, the violations as JSON) unless --waive gives a reason;
// every Gerber and drill file is read back and compared with the artwork before anything is written.
import { randomUUID } from 'node:crypto';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { bundle, gate, holdsFabFiles, prepare, readBack, writeFiles } from '../../lib/design';
import { createExportMeta } from '../../lib/formats/export-meta';
import { bundleFormatIds, formatIds } from '../../lib/formats/format-ids';
import { hashFiles, type ExportFile } from '../../lib/formats/manifest';
import { parseFormatList } from '../../lib/formats/parse-format-list';
import { GeometryError } from '../../lib/geometry';
import { InputError, formatIssue, parseDesignInput, WAIVER_MAX_CHARS, WAIVER_MIN_CHARS, waiverReasonSchema } from '../../lib/schemas';
import { builtInFabProfileFor, parseFabProfile, STANDARD_MULTILAYER_PROFILE, STANDARD_QUICK_TURN_PROFILE } from '../../lib/schemas/fab-profile';
import { UsageError } from '../usage-error';

export const summary = 'write Gerber, drill, DXF, SVG, sweep JSON and fab notes for a design, or one zip of them';

export const help = `Usage: npm run cli -- export design.json --out DIR|FILE.zip [--formats LIST] [--revision LABEL] [--date YYYY-MM-DD]
                            [--profile profile.json] [--waive "reason"]

Sizes the design and writes its files into DIR, or into one zip when --out ends in .zip.
Every export includes a manifest (names, sizes, SHA-256). The same input, revision and date give
the same bytes every time.

Before anything is written the artwork is checked against a fab profile (as \`check\` does): a design
that breaks a rule is refused with the violations as JSON on stdout, unless --waive says why they
are acceptable; the reason and every waived violation are then printed in the fab notes. Every
Gerber and drill file is also read back (@tracespace/parser) and compared with the artwork.

  --out PATH        a folder (created if missing) or a .zip file
  --formats LIST    comma-separated, from: ${formatIds.join(', ')} (default: ${bundleFormatIds.join(',')}; step only when named)
  --revision LABEL  revision label used in file names and headers (default A)
  --date DATE       revision date written into the files (default 2000-01-01; no clock is read)
  --profile FILE    a fab profile JSON (see \`check --help\`); its name and figures go into the fab
                    notes; default: the built-in "${STANDARD_QUICK_TURN_PROFILE.name}" profile, or
                    "${STANDARD_MULTILAYER_PROFILE.name}" for a stack of more than two coppers
  --waive REASON    export despite design-rule violations, for this reason (${WAIVER_MIN_CHARS}–${WAIVER_MAX_CHARS} characters)

Exit codes: 0 ok; 2 bad input (one line naming the field, the value and the allowed range);
3 design-rule violations without --waive (the JSON on stdout); 1 the files failed their read-back
(a bug: nothing is written, a support id is printed). Nothing is written unless the exit code is 0.`;

/** TEST ONLY: rewrites the built files before the read-back check (tests call run() in-process with it). */
export interface ExportCommandDependencies {
	readonly corruptFiles?: (files: ExportFile[]) => ExportFile[];
}

/** A bad command line or unreadable file: reported as one line, exit 2. */

interface ExportArgs {
	file: string;
	out: string;
	formats: string;
	revision: string;
	date: string;
	profile: string | null;
	waive: string | null;
}

function parseArgs(argv: string[]): ExportArgs {
	let file: string | undefined;
	const opts: Record<string, string> = {};
	for (let i = 0; i < argv.length; i++) {
		const arg = argv[i];
		if (['--out', '--formats', '--revision', '--date', '--profile', '--waive'].includes(arg)) {
			const v = argv[++i];
			if (v === undefined) throw new UsageError(`${arg} needs a value`);
			opts[arg.slice(2)] = v;
		} else if (arg.startsWith('--')) throw new UsageError(`unknown option "${arg}"; one of --out, --formats, --revision, --date, --profile, --waive`);
		else if (file === undefined) file = arg;
		else throw new UsageError(`one design file only; also got "${arg}"`);
	}
	if (file === undefined) throw new UsageError('a design file is required: npm run cli -- export design.json --out DIR|FILE.zip');
	if (!opts.out) throw new UsageError('--out DIR|FILE.zip is required');
	return { file, out: opts.out, formats: opts.formats ?? bundleFormatIds.join(','), revision: opts.revision ?? 'A', date: opts.date ?? '2000-01-01', profile: opts.profile ?? null, waive: opts.waive ?? null };
}

export function readJson(path: string, what: string): unknown {
	let text: string;
	try {
		text = readFileSync(path, 'utf8');
	} catch (err) {
		const code = (err as NodeJS.ErrnoException).code;
		throw new UsageError(`${what} "${path}" cannot be read${code ? ` (${code})` : ''}`);
	}
	try {
		return JSON.parse(text);
	} catch (err) {
		throw new UsageError(`${what} "${path}" is not JSON: ${(err as Error).message}`);
	}
}

/** The same schema as a waiver recorded by the web app (src/lib/schemas/waiver-reason.ts). */
function parseWaive(raw: string | null): string | null {
	if (raw === null) return null;
	const result = waiverReasonSchema.safeParse(raw);
	if (!result.success) throw new InputError([{ path: '--waive', value: raw, message: result.error.issues[0].message }]);
	return result.data;
}

export async function run(argv: string[], deps: ExportCommandDependencies = {}): Promise<number> {
	try {
		const args = parseArgs(argv);
		const raw = readJson(args.file, 'design file');
		const formats = parseFormatList(args.formats, '--formats');
		const waive = parseWaive(args.waive);
		const input = parseDesignInput(raw);
		const meta = createExportMeta({ designName: input.name, revisionLabel: args.revision, revisionDate: args.date });
		const prepared = prepare(input);
		const profile = args.profile ? parseFabProfile(readJson(args.profile, 'fab profile')) : builtInFabProfileFor(prepared.artwork.metadata.copperLayerCount);
		const violations = gate(prepared, profile);
		if (violations.length > 0 && waive === null) {
			process.stdout.write(`${JSON.stringify({ design: input.name, profile, clean: false, violations }, null, 2)}\n`);
			console.error(`refused: ${violations.length} design-rule violation(s) of the "${profile.name}" profile; nothing written (fix them, or give --waive "reason")`);
			return 3;
		}
		const waiver = violations.length > 0 && waive ? { reason: waive, profileName: profile.name, violations: violations.map((v) => v.message) } : undefined;
		const written = await writeFiles(prepared, formats, meta, { profile, ...(waiver ? { waiver } : {}) });
		const files = deps.corruptFiles ? await hashFiles(deps.corruptFiles(written)) : written;
		if (holdsFabFiles(files)) {
			// judged with the complete Gerber + drill set, the delivered files taking the place of their twins
			const result = readBack(files, prepared, meta);
			if (!result.ok) {
				const supportId = randomUUID();
				console.error(JSON.stringify({ event: 'export.read-back-mismatch', supportId, mismatches: result.mismatches }));
				console.error(`internal error: the files failed their read-back self-check and nothing was written; please report support id ${supportId}`);
				return 1;
			}
		}
		// everything is built and checked before anything is written: bad input leaves no partial output
		if (args.out.toLowerCase().endsWith('.zip')) {
			writeFileSync(args.out, await bundle(files, meta));
			console.log(`wrote ${args.out} (${files.length} files)${waiver ? `; ${violations.length} violation(s) waived` : ''}`);
		} else {
			mkdirSync(args.out, { recursive: true });
			for (const f of files) writeFileSync(join(args.out, f.name), f.bytes);
			console.log(`wrote ${files.length} files to ${args.out}${waiver ? `; ${violations.length} violation(s) waived` : ''}`);
		}
		return 0;
	} catch (err) {
		if (err instanceof InputError) {
			console.error(formatIssue(err.first));
			return 2;
		}
		if (err instanceof UsageError) {
			console.error(err.message);
			return 2;
		}
		if (err instanceof GeometryError) {
			console.error(`geometry: ${err.message}`);
			return 2;
		}
		throw err;
	}
}
