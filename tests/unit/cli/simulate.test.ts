// `npm run cli -- simulate`: argument handling and exit codes, with the engine swapped for a missing one (no simulation runs).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const ROOT = resolve(__dirname, '../../..');
let dir: string;

function cli(args: string[], env: NodeJS.ProcessEnv = {}) {
	const r = spawnSync('npx', ['tsx', 'src/cli/main.ts', 'simulate', ...args], { cwd: ROOT, encoding: 'utf8', env: { ...process.env, ...env } });
	return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

describe('cli simulate', () => {
	beforeAll(() => {
		dir = mkdtempSync(join(tmpdir(), 'ff-simulate-'));
		writeFileSync(join(dir, 'good.json'), JSON.stringify({ frequencyHz: 2.45e9, feed: 'inset', substrate: { relativePermittivity: 4.3, heightMm: 1.6 } }));
		writeFileSync(join(dir, 'bad.json'), JSON.stringify({ frequencyHz: 2.45e9, substrate: { relativePermittivity: 0.5, heightMm: 1.6 } }));
		writeFileSync(join(dir, 'layered.json'), JSON.stringify({ frequencyHz: 2.45e9, feed: 'inset', array: { columns: 2 }, substrate: { relativePermittivity: 4.3, heightMm: 1.6 } }));
	});
	afterAll(() => rmSync(dir, { recursive: true, force: true }));

	it('documents the engine-missing exit code in --help', () => {
		const r = cli(['--help']);
		expect(r.code).toBe(0);
		expect(r.stdout).toMatch(/4 the openEMS engine is not installed/);
		expect(r.stdout).toMatch(/--tune/);
	});

	it('exits 2 naming the field for a bad document', () => {
		const r = cli([join(dir, 'bad.json'), '--quick']);
		expect(r.code).toBe(2);
		expect(r.stderr).toMatch(/substrate\.relativePermittivity/);
	});

	it('exits 2 for a design the model cannot hold (an array)', () => {
		const r = cli([join(dir, 'layered.json'), '--quick']);
		expect(r.code).toBe(2);
		expect(r.stderr).toMatch(/arrays are not modelled/);
	});

	it('exits 2 for conflicting or unknown options', { timeout: 120_000 }, () => {
		expect(cli([join(dir, 'good.json'), '--quick', '--accurate']).code).toBe(2);
		expect(cli([join(dir, 'good.json'), '--fast']).code).toBe(2);
		expect(cli([]).code).toBe(2);
		expect(cli([join(dir, 'missing.json')]).code).toBe(2);
	});

	it('exits 4 and says how to install the engine when openEMS is missing', () => {
		const r = cli([join(dir, 'good.json'), '--quick'], { FRINGEFIELD_OPENEMS: '/nonexistent/openEMS' });
		expect(r.code).toBe(4);
		expect(r.stderr).toMatch(/apt-get install openems/);
	});
});
