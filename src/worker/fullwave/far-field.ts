// The far field of one engine run: writes the far-field tool's request, runs `nf2ff` on the
// near-field dumps, reads its HDF5 result (h5wasm) and hands the arrays to the pure post-processor.
import { spawn } from 'node:child_process';
import { access, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import type { Dataset, Group } from 'h5wasm';
import type { FieldCheckPattern } from '../../lib/schemas/field-check';
import {
	FAR_FIELD_PHI_DEG,
	FAR_FIELD_RESULT_FILE,
	FAR_FIELD_THETA_DEG,
	NEAR_FIELD_E_DUMP,
	NEAR_FIELD_H_DUMP,
	acceptedPower,
	analyzeFarField,
	nearFieldDumpFile,
	serializeFarFieldRequest,
	type FarFieldSphere,
	type PortSeries
} from '../../lib/simulation';
import { EngineFailedError, FieldCheckAbortedError } from './errors';

/** The far-field tool: FRINGEFIELD_NF2FF, else `nf2ff` on PATH (Debian's openems package ships both). */
export function farFieldBinary(): string {
	return process.env.FRINGEFIELD_NF2FF || 'nf2ff';
}

/** The far-field tool's request file. */
const REQUEST_FILE = 'farfield.xml';
/** The far-field tool's time limit: it takes about a second for the default sphere. */
const FAR_FIELD_TIMEOUT_MS = 120_000;

function runTool(dir: string, signal?: AbortSignal): Promise<void> {
	return new Promise((resolve, reject) => {
		const child = spawn(farFieldBinary(), [REQUEST_FILE], { cwd: dir, stdio: ['ignore', 'pipe', 'pipe'], signal, timeout: FAR_FIELD_TIMEOUT_MS });
		let tail = '';
		const keep = (chunk: Buffer) => {
			tail = (tail + chunk.toString('utf8')).slice(-400);
		};
		child.stdout.on('data', keep);
		child.stderr.on('data', keep);
		child.on('error', (err: NodeJS.ErrnoException) => {
			if (err.name === 'AbortError') reject(new FieldCheckAbortedError('the Field check was cancelled during the far-field transform'));
			else if (err.code === 'ENOENT') reject(new EngineFailedError(`the far-field tool (${farFieldBinary()}) is not installed; it comes with the openems package`));
			else reject(new EngineFailedError(`the far-field tool could not start: ${err.message}`));
		});
		child.on('close', (code, sig) => {
			if (code === 0) resolve();
			else reject(new EngineFailedError(`the far-field tool stopped with ${code === null ? `signal ${sig}` : `exit code ${code}`}${tail ? `: ${tail.trim().slice(-200)}` : ''}`));
		});
	});
}

/** Reads the far-field tool's HDF5 result into a sphere for the post-processor. */
export async function readFarFieldResult(path: string): Promise<FarFieldSphere> {
	const h5wasm = await import('h5wasm/node');
	await h5wasm.ready;
	const file = new h5wasm.File(path, 'r');
	try {
		const numbers = (name: string): number[] => {
			const d = file.get(name) as Dataset | null;
			if (!d || !('value' in d)) throw new EngineFailedError(`the far-field result lacks ${name}`);
			return Array.from(d.value as ArrayLike<number>, Number);
		};
		const attr = (group: string, name: string): number => {
			const g = file.get(group) as Group | null;
			const a = g?.attrs[name]?.value as ArrayLike<number> | number | undefined;
			const v = typeof a === 'number' ? a : a ? Number(a[0]) : NaN;
			if (!Number.isFinite(v)) throw new EngineFailedError(`the far-field result lacks ${group}@${name}`);
			return v;
		};
		const toDeg = (rad: number[]) => rad.map((r) => (r * 180) / Math.PI);
		// the tool writes each component as [φ][θ] (θ fastest), the sphere's own order
		return {
			frequencyHz: attr('/nf2ff', 'Frequency'),
			radiusM: numbers('/Mesh/r')[0],
			thetaDeg: toDeg(numbers('/Mesh/theta')),
			phiDeg: toDeg(numbers('/Mesh/phi')),
			eThetaRe: numbers('/nf2ff/E_theta/FD/f0_real'),
			eThetaIm: numbers('/nf2ff/E_theta/FD/f0_imag'),
			ePhiRe: numbers('/nf2ff/E_phi/FD/f0_real'),
			ePhiIm: numbers('/nf2ff/E_phi/FD/f0_imag')
		};
	} finally {
		file.close();
	}
}

/**
 * The far field of a finished run in `dir` at `frequencyHz`: the six faces' near-field dumps →
 * `nf2ff` → the pattern, with the gain from the port's accepted power at that frequency.
 */
export async function computeFarField(dir: string, frequencyHz: number, port: { voltage: PortSeries; current: PortSeries }, signal?: AbortSignal): Promise<FieldCheckPattern> {
	const planes = Array.from({ length: 6 }, (_, face) => ({ eFile: nearFieldDumpFile(NEAR_FIELD_E_DUMP, face), hFile: nearFieldDumpFile(NEAR_FIELD_H_DUMP, face) }));
	for (const p of planes) {
		try {
			await Promise.all([access(join(dir, p.eFile)), access(join(dir, p.hFile))]);
		} catch {
			throw new EngineFailedError(`the engine wrote no near-field dump ${p.eFile} / ${p.hFile}`);
		}
	}
	await writeFile(join(dir, REQUEST_FILE), serializeFarFieldRequest({ frequencyHz, thetaDeg: FAR_FIELD_THETA_DEG, phiDeg: FAR_FIELD_PHI_DEG, planes }));
	await runTool(dir, signal);
	const sphere = await readFarFieldResult(join(dir, FAR_FIELD_RESULT_FILE));
	// the tool stores the angles in single precision: check them against the request, then use the request's
	const sameAngles = (read: readonly number[], asked: readonly number[]) => read.length === asked.length && read.every((a, i) => Math.abs(a - asked[i]) < 1e-3);
	if (!sameAngles(sphere.thetaDeg, FAR_FIELD_THETA_DEG) || !sameAngles(sphere.phiDeg, FAR_FIELD_PHI_DEG)) throw new EngineFailedError('the far-field result does not hold the requested angles');
	return analyzeFarField({ ...sphere, thetaDeg: FAR_FIELD_THETA_DEG, phiDeg: FAR_FIELD_PHI_DEG, frequencyHz }, acceptedPower(port.voltage, port.current, frequencyHz));
}
