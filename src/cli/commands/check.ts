// `check design.json [--profile profile.json]`: design-rule check of a design's artwork against a fab profile, as JSON.
import { readFileSync } from 'node:fs';
import { gate, prepare } from '../../lib/design';
import { GeometryError } from '../../lib/geometry';
import { InputError, formatIssue, parseDesignInput } from '../../lib/schemas';
import { builtInFabProfileFor, parseFabProfile, STANDARD_MULTILAYER_PROFILE, STANDARD_QUICK_TURN_PROFILE } from '../../lib/schemas/fab-profile';
import { UsageError } from '../usage-error';

export const summary = 'check a design against a fab profile (trace, spacing, drill, ring, edge, notch); prints the violations as JSON';

export const help = `Usage: npm run cli -- check design.json [--profile profile.json]

Sizes the design, builds its artwork and checks it against a fab capability profile. Prints ONE
JSON object: \`design\` (its name), \`profile\` (the profile's name and every value it was checked
against), \`clean\` and \`violations\`, each with ruleId (trace-width, copper-spacing, drill-size,
annular-ring, edge-clearance, slot-width, stack-build; a connector launch's launch-gap, launch-via-edge,
launch-via-spacing, launch-annular-ring, launch-outside-board; the legend's legend-width, legend-clearance,
legend-edge; mounting holes' hole-keep-out), layerId, shapeIds, location {xMm, yMm}, measuredMm, requiredMm
and a message.

  --profile FILE  a fab profile JSON (name, minTraceWidthMm, minSpacingMm, minDrillMm,
                  minAnnularRingMm, copperToEdgeMm, minSlotWidthMm, etchToleranceMm,
                  platedDrillToleranceMm, nonPlatedDrillToleranceMm; optional: maxCopperLayers,
                  mixedCores, boardThicknessTolerancePercent, finish, minLegendWidthMm,
                  legendToOpeningMm, legendToEdgeMm); default: the built-in
                  "${STANDARD_QUICK_TURN_PROFILE.name}" profile, or "${STANDARD_MULTILAYER_PROFILE.name}"
                  for a stack of more than two coppers

Exit codes: 0 clean; 3 violations (the list is still printed on stdout); 2 bad input, with one line
on stderr naming the field, the value and the allowed range.`;


function readJson(path: string): unknown {
	let text: string;
	try {
		text = readFileSync(path, 'utf8');
	} catch (err) {
		throw new UsageError(`${path}: cannot read (${(err as NodeJS.ErrnoException).code ?? String(err)})`);
	}
	try {
		return JSON.parse(text);
	} catch (err) {
		throw new UsageError(`${path}: not valid JSON (${err instanceof Error ? err.message : String(err)})`);
	}
}

function parseArgs(argv: string[]): { design: string; profile: string | null } {
	let design: string | undefined;
	let profile: string | null = null;
	for (let i = 0; i < argv.length; i++) {
		const arg = argv[i];
		if (arg === '--profile' || arg.startsWith('--profile=')) {
			const v = arg.includes('=') ? arg.slice('--profile='.length) : argv[++i];
			if (!v) throw new UsageError('--profile needs a file: --profile profile.json');
			profile = v;
		} else if (arg.startsWith('--')) throw new UsageError(`unknown option "${arg}"; only --profile profile.json`);
		else if (design === undefined) design = arg;
		else throw new UsageError(`one design file only; also got "${arg}"`);
	}
	if (design === undefined) throw new UsageError('a design file is required: npm run cli -- check design.json [--profile profile.json]');
	return { design, profile };
}

export async function run(argv: string[]): Promise<number> {
	try {
		const args = parseArgs(argv);
		const input = parseDesignInput(readJson(args.design));
		const prepared = prepare(input);
		const profile = args.profile ? parseFabProfile(readJson(args.profile)) : builtInFabProfileFor(prepared.artwork.metadata.copperLayerCount);
		const violations = gate(prepared, profile);
		process.stdout.write(`${JSON.stringify({ design: input.name, profile, clean: violations.length === 0, violations }, null, 2)}\n`);
		return violations.length === 0 ? 0 : 3;
	} catch (err) {
		if (err instanceof InputError) console.error(formatIssue(err.first));
		else if (err instanceof GeometryError) console.error(`${err.code}: ${err.message}`);
		else if (err instanceof UsageError) console.error(err.message);
		else throw err;
		return 2;
	}
}
