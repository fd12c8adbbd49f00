// `export design.json --out DIR|FILE.zip`: the shared export pipeline, with the CLI doing only reading and writing.
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { createSVGWindow } from 'svgdom';
import { buildBundle, buildFilesFromInput, exportFormats, parseExportFormats } from '../../lib/formats/bundle';
import { createExportMeta } from '../../lib/formats/export-meta';
import type { SvgWindow } from '../../lib/formats/svg';
import { GeometryError } from '../../lib/geometry';
import { InputError, formatIssue, parseDesignInput } from '../../lib/schemas';

export const summary = 'write Gerber, drill, DXF, SVG, sweep JSON and fab notes for a design, or one zip of them';

export const help = `Usage: npm run cli -- export design.json --out DIR|FILE.zip [--formats LIST] [--revision LABEL] [--date YYYY-MM-DD]

Sizes the design and writes its files into DIR, or into one zip when --out ends in .zip.
Every export includes a manifest (names, sizes, SHA-256). The same input, revision and date give
the same bytes every time.

  --out PATH        a folder (created if missing) or a .zip file
  --formats LIST    comma-separated, from: ${exportFormats.join(', ')} (default: all)
  --revision LABEL  revision label used in file names and headers (default A)
  --date DATE       revision date written into the files (default 2000-01-01; no clock is read)

Exit codes: 0 ok; 2 bad input (one line naming the field, the value and the allowed range), nothing written.`;

/** A bad command line or unreadable file: reported as one line, exit 2. */
export class UsageError extends Error {}

interface ExportArgs {
	file: string;
	out: string;
	formats: string;
	revision: string;
	date: string;
}

function parseArgs(argv: string[]): ExportArgs {
	let file: string | undefined;
	const opts: Record<string, string> = {};
	for (let i = 0; i < argv.length; i++) {
		const arg = argv[i];
		if (['--out', '--formats', '--revision', '--date'].includes(arg)) {
			const v = argv[++i];
			if (v === undefined) throw new UsageError(`${arg} needs a value`);
			opts[arg.slice(2)] = v;
		} else if (arg.startsWith('--')) throw new UsageError(`unknown option "${arg}"; one of --out, --formats, --revision, --date`);
		else if (file === undefined) file = arg;
		else throw new UsageError(`one design file only; also got "${arg}"`);
	}
	if (file === undefined) throw new UsageError('a design file is required: npm run cli -- export design.json --out DIR|FILE.zip');
	if (!opts.out) throw new UsageError('--out DIR|FILE.zip is required');
	return { file, out: opts.out, formats: opts.formats ?? exportFormats.join(','), revision: opts.revision ?? 'A', date: opts.date ?? '2000-01-01' };
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

export async function run(argv: string[]): Promise<number> {
	try {
		const args = parseArgs(argv);
		const raw = readJson(args.file, 'design file');
		const formats = parseExportFormats(args.formats, '--formats');
		const input = parseDesignInput(raw);
		const meta = createExportMeta({ designName: input.name, revisionLabel: args.revision, revisionDate: args.date });
		const files = buildFilesFromInput(raw, meta, formats, { svgWindow: createSVGWindow() as unknown as SvgWindow });
		// everything is built before anything is written: bad input leaves no partial output
		if (args.out.toLowerCase().endsWith('.zip')) {
			writeFileSync(args.out, await buildBundle(files, meta.revisionDate));
			console.log(`wrote ${args.out} (${files.length} files)`);
		} else {
			mkdirSync(args.out, { recursive: true });
			for (const f of files) writeFileSync(join(args.out, f.name), f.bytes);
			console.log(`wrote ${files.length} files to ${args.out}`);
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
