// `npm run bench -- --fullwave --engine-reference`: the Field check against the engine authors' own model of a probe-fed
// patch (openEMS 0.0.35, Tutorials/Simple_Patch_Antenna.m, shipped in Debian's octave-openems). The tutorial is read
// from the installed package and run headless through Octave as shipped, then with our model's choices swapped in one
// at a time (board, cells through h, boundary distance, x–y mesh), and with its own recipe on the measured patches R6
// and R8; our Field check runs the same patches (standard mode, one engine thread). Skips with a message when Octave or
// the tutorial is missing; never part of `npm test`.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { rootDir } from '../lib/config.ts';
import { runFieldCheck } from '../../src/worker/fullwave/index.ts';
import { CELLS_PER_WAVELENGTH, CHECK_BAND_FRACTION, EDGE_CELL_FRACTION, impedanceResonance } from '../../src/lib/simulation/index.ts';
import { SPEED_OF_LIGHT_M_PER_S, freeSpaceWavelengthMm } from '../../src/lib/units/index.ts';

const OCTAVE_PACKAGES = '/usr/share/octave/packages';
const TUTORIAL = 'Tutorials/Simple_Patch_Antenna.m';

/** The shipped tutorial, or null when Debian's octave-openems is not installed. */
export function findTutorial(): string | null {
	if (!existsSync(OCTAVE_PACKAGES)) return null;
	const dir = readdirSync(OCTAVE_PACKAGES).find((d) => d.startsWith('openems-') && existsSync(join(OCTAVE_PACKAGES, d, TUTORIAL)));
	return dir ? join(OCTAVE_PACKAGES, dir, TUTORIAL) : null;
}

const octaveRuns = () => !spawnSync('octave', ['--version'], { stdio: 'ignore', timeout: 30_000 }).error;

/**
 * The tutorial's parameters become environment variables (default: the shipped value); its plots, field dump and
 * far-field box go (they come after the mesh is fixed and do not change it); the engine runs on one thread and the
 * port's Zin and S11 are written as text. Throws when the shipped file is not the one these edits were written for.
 */
export function headlessScript(tutorial: string): string {
	const edits: [string, string][] = [
		['patch.width  = 32;', "patch.width  = envnum('PW', 32);"],
		['patch.length = 40;', "patch.length = envnum('PL', 40);"],
		['substrate.epsR   = 3.38;', "substrate.epsR   = envnum('EPS', 3.38);"],
		['substrate.kappa  = 1e-3 * 2*pi*2.45e9 * EPS0*substrate.epsR;', "substrate.kappa  = envnum('TAND', 1e-3) * 2*pi*envnum('FK', 2.45e9) * EPS0*substrate.epsR;"],
		['substrate.width  = 60;', "substrate.width  = envnum('SW', 60);"],
		['substrate.length = 60;', "substrate.length = envnum('SL', 60);"],
		['substrate.thickness = 1.524;', "substrate.thickness = envnum('H', 1.524);"],
		['substrate.cells = 4;', "substrate.cells = envnum('CELLS', 4);"],
		['feed.pos = -6;', "feed.pos = -envnum('FEED', 6);"],
		['SimBox = [200 200 150];', "SimBox = [200 200 150] / envnum('K', 1);"],
		['f0 = 2e9;', "f0 = 2e9 * envnum('K', 1);"],
		['fc = 1e9;', "fc = 1e9 * envnum('K', 1);"],
		[
			'mesh.z = [-SimBox(3)/3 SimBox(3)*2/3];',
			"mesh.z = [-SimBox(3)/3 SimBox(3)*2/3];\nbd = envnum('BD', 0);\nif bd > 0\n  mesh.x = [-substrate.width/2-bd substrate.width/2+bd];\n  mesh.y = [-substrate.length/2-bd substrate.length/2+bd];\n  mesh.z = [-bd substrate.thickness+bd];\nend"
		],
		["'2D_Metal_Edge_Res', c0/(f0+fc)/unit/50);", "'2D_Metal_Edge_Res', envnum('ER', c0/(f0+fc)/unit/50));"],
		['mesh = SmoothMesh(mesh, c0/(f0+fc)/unit/20);', "mesh = SmoothMesh(mesh, envnum('MAXC', c0/(f0+fc)/unit/20));"]
	];
	let text = readFileSync(tutorial, 'utf8');
	const cut = text.indexOf("CSX = AddDump(CSX,'Hf'");
	if (cut < 0) throw new Error(`${tutorial} is not the openEMS 0.0.35 tutorial this comparison edits`);
	text = text.slice(0, cut).replace(/^close all\s*$|^clear\s*$|^clc\s*$/gm, '');
	for (const [from, to] of edits) {
		if (!text.includes(from)) throw new Error(`${tutorial}: "${from}" not found; the comparison needs updating for this openEMS version`);
		text = text.replace(from, to);
	}
	return [
		'pkg load openems; pkg load csxcad;',
		'function v = envnum(n, d)',
		'  e = getenv(n); if isempty(e) v = d; else v = str2double(e); end',
		'end',
		text,
		"Sim_Path = getenv('SIM_PATH'); Sim_CSX = 'patch_ant.xml';",
		'mkdir(Sim_Path);',
		'WriteOpenEMS([Sim_Path "/" Sim_CSX], FDTD, CSX);',
		"RunOpenEMS(Sim_Path, Sim_CSX, '--numThreads=1');",
		'freq = linspace(max([1e9, f0-fc]), f0+fc, 2001);',
		'port = calcPort(port, Sim_Path, freq);',
		'Zin = port.uf.tot ./ port.if.tot; s11 = port.uf.ref ./ port.uf.inc;',
		"fid = fopen([Sim_Path '/zin.txt'], 'w'); fprintf(fid, '%.9e %.9g %.9g %.9g %.9g\\n', [freq; real(Zin); imag(Zin); real(s11); imag(s11)]); fclose(fid);",
		''
	].join('\n');
}

interface Reading {
	s11MinimumHz: number;
	s11MinimumDb: number;
	maxResistanceHz: number | null;
	maxResistanceOhm: number;
	seconds: number;
}

function runTheirs(script: string, env: Record<string, number>): Reading {
	const dir = mkdtempSync(join(tmpdir(), 'fringefield-engine-reference-'));
	try {
		writeFileSync(join(dir, 'run.m'), script);
		const started = performance.now();
		const simPath = join(dir, 'sim');
		const envText = Object.fromEntries(Object.entries(env).map(([k, v]) => [k, String(v)]));
		const r = spawnSync('octave', ['--no-gui', '--quiet', join(dir, 'run.m')], { env: { ...process.env, ...envText, SIM_PATH: simPath }, encoding: 'utf8', maxBuffer: 64 << 20 });
		const zin = join(simPath, 'zin.txt');
		if (!existsSync(zin)) throw new Error(`the tutorial did not finish: ${(r.stderr || r.stdout).slice(-400)}`);
		const rows = readFileSync(zin, 'utf8')
			.trim()
			.split('\n')
			.map((l) => l.trim().split(/\s+/).map(Number));
		const samples = rows.map(([f, re, im]) => ({ frequencyHz: f, resistanceOhm: re, reactanceOhm: im }));
		const magnitude = rows.map(([, , , sr, si]) => Math.hypot(sr, si));
		const iMin = magnitude.reduce((best, m, i) => (m < magnitude[best] ? i : best), 0);
		const z = impedanceResonance(samples, rows[iMin][0]);
		return { s11MinimumHz: rows[iMin][0], s11MinimumDb: 20 * Math.log10(magnitude[iMin]), maxResistanceHz: z.maxResistanceHz, maxResistanceOhm: z.maxResistanceOhm, seconds: (performance.now() - started) / 1000 };
	} finally {
		rmSync(dir, { recursive: true, force: true });
	}
}

async function runOurs(fixture: string): Promise<Reading> {
	const input = JSON.parse(readFileSync(join(rootDir, 'tests/fixtures', fixture, 'input.json'), 'utf8'));
	const r = await runFieldCheck(input, { mode: 'standard', budgetSeconds: 7200 }, { threads: 1 });
	const z = impedanceResonance(r.samples, r.resonance?.frequencyHz ?? r.targetFrequencyHz);
	if (!r.resonance) throw new Error(`${fixture}: no S11 minimum in the band`);
	return { s11MinimumHz: r.resonance.frequencyHz, s11MinimumDb: r.resonance.s11Db, maxResistanceHz: z.maxResistanceHz, maxResistanceOhm: z.maxResistanceOhm, seconds: r.runSeconds };
}

/** The tutorial patch as our Field check writes it: 2.45 GHz, εr 3.38 (the tutorial's loss tangent is set there). */
const TUTORIAL_TARGET_HZ = 2.45e9;
const TUTORIAL_EPS = 3.38;
/** Our standard mesh for that patch: λ/20 in the dielectric at the band's top, the thirds cell a third of it. */
const ourMaxCellMm = (SPEED_OF_LIGHT_M_PER_S * 1000) / (TUTORIAL_TARGET_HZ * (1 + CHECK_BAND_FRACTION) * Math.sqrt(TUTORIAL_EPS)) / CELLS_PER_WAVELENGTH.standard;

/** The tutorial's recipe scaled to a measured patch (its f0 and fc scaled with the frequency, its box too). */
const recipe = (p: { lengthMm: number; widthMm: number; heightMm: number; eps: number; offsetMm: number; marginMm: number; measuredHz: number }) => ({
	PW: p.lengthMm,
	PL: p.widthMm,
	SW: p.lengthMm + 2 * p.marginMm,
	SL: p.widthMm + 2 * p.marginMm,
	EPS: p.eps,
	H: p.heightMm,
	FEED: p.offsetMm,
	FK: p.measuredHz,
	K: p.measuredHz / TUTORIAL_TARGET_HZ
});

export async function engineReferenceStudy(): Promise<string[]> {
	const tutorial = findTutorial();
	if (!tutorial || !octaveRuns()) {
		const why = tutorial ? 'octave is not installed' : `the engine's tutorial (${OCTAVE_PACKAGES}/openems-*/${TUTORIAL}) is not installed`;
		console.log(`engine reference skipped: ${why}; install Debian's octave and octave-openems to run it`);
		return [];
	}
	const script = headlessScript(tutorial);
	const ghz = (hz: number | null) => (hz ? (hz / 1e9).toFixed(4) : '—');
	const lines = [
		`Engine reference: ${tutorial} (openEMS's own probe-fed patch) run headless, one engine thread, against the Field check (standard mode).`,
		'',
		'| patch | model | S11 minimum GHz | S11 there dB | largest Re Zin GHz | Re Zin Ω | seconds |',
		'| --- | --- | ---: | ---: | ---: | ---: | ---: |'
	];
	const add = (patch: string, model: string, r: Reading) => {
		lines.push(`| ${patch} | ${model} | ${ghz(r.s11MinimumHz)} | ${r.s11MinimumDb.toFixed(1)} | ${ghz(r.maxResistanceHz)} | ${r.maxResistanceOhm.toFixed(1)} | ${r.seconds.toFixed(0)} |`);
		console.error(lines[lines.length - 1]);
	};
	// our board is 10 mm beyond the 40 × 32 mm patch on every side: 52 mm along the tutorial's resonant x, 60 mm along y
	const ourBoard = { SW: 52, SL: 60 };
	const steps: [string, Record<string, number>][] = [
		['tutorial as shipped (60 × 60 mm board, 4 cells through h, boundaries 50–100 mm away, 2 mm thirds cell, 5 mm cells)', {}],
		['tutorial, our board (52 × 60 mm)', ourBoard],
		['tutorial, our board, 8 cells through h', { ...ourBoard, CELLS: 8 }],
		['tutorial, our board, 8 cells, boundaries λ0/4 from the board', { ...ourBoard, CELLS: 8, BD: freeSpaceWavelengthMm(TUTORIAL_TARGET_HZ) / 4 }],
		[
			`tutorial, all of the above and our x–y mesh (${(ourMaxCellMm * EDGE_CELL_FRACTION).toFixed(2)} mm thirds cell, ${ourMaxCellMm.toFixed(2)} mm cells)`,
			{ ...ourBoard, CELLS: 8, BD: freeSpaceWavelengthMm(TUTORIAL_TARGET_HZ) / 4, ER: ourMaxCellMm * EDGE_CELL_FRACTION, MAXC: ourMaxCellMm }
		]
	];
	for (const [model, env] of steps) add('40 × 32 mm, εr 3.38, h 1.524 mm', model, runTheirs(script, env));
	add('40 × 32 mm, εr 3.38, h 1.524 mm', 'Field check (simulation-validation/engine-tutorial)', await runOurs('simulation-validation/engine-tutorial'));
	// the measured patches of the Accuracy table (from memory), as in `--validation`: resonant length along the tutorial's x
	const measured = [
		{ row: 'R6 (measured 5.06 GHz)', fixture: 'simulation-validation/measured-r6', lengthMm: 18.6, widthMm: 17.2, heightMm: 1.57, eps: 2.33, offsetMm: 2.27, marginMm: 15, measuredHz: 5.06e9 },
		{ row: 'R8 (measured 6.56 GHz)', fixture: 'simulation-validation/measured-r8', lengthMm: 13.5, widthMm: 12.7, heightMm: 1.63, eps: 2.55, offsetMm: 1.65, marginMm: 15, measuredHz: 6.56e9 }
	];
	for (const p of measured) {
		add(p.row, "the tutorial's recipe (its mesh rules, a line port through h)", runTheirs(script, recipe(p)));
		add(p.row, `Field check (${p.fixture})`, await runOurs(p.fixture));
	}
	return lines;
}
