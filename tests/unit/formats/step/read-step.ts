// Reads a STEP file with occt-import-js 0.0.23 (Open CASCADE's STEP reader as WebAssembly, the independent reader) and measures each body's mesh.
import occtimportjs, { type Occt, type OcctNode } from 'occt-import-js';

export interface ReadBody {
	name: string;
	colour: readonly [number, number, number] | undefined;
	faceCount: number;
	min: [number, number, number];
	max: [number, number, number];
	/** From the closed triangle mesh by the divergence theorem: V = Σ p0 · (p1 × p2) / 6 over outward triangles. */
	volumeMm3: number;
}

export interface ReadStepResult {
	success: boolean;
	assemblyName: string;
	bodies: ReadBody[];
}

let occt: Promise<Occt> | undefined;
/** The reader is slow on big files: each text is read once per test run. */
const seen = new Map<string, Promise<ReadStepResult>>();

export function readStep(text: string): Promise<ReadStepResult> {
	let read = seen.get(text);
	if (!read) {
		read = readUncached(text);
		seen.set(text, read);
	}
	return read;
}

async function readUncached(text: string): Promise<ReadStepResult> {
	occt ??= occtimportjs();
	const result = (await occt).ReadStepFile(new TextEncoder().encode(text), { linearUnit: 'millimeter' });
	const bodies: ReadBody[] = [];
	const visit = (node: OcctNode) => {
		for (const m of node.meshes) {
			const mesh = result.meshes[m];
			const p = mesh.attributes.position.array;
			const min: [number, number, number] = [Infinity, Infinity, Infinity];
			const max: [number, number, number] = [-Infinity, -Infinity, -Infinity];
			for (let i = 0; i < p.length; i += 3) for (let k = 0; k < 3; k++) {
				min[k] = Math.min(min[k], p[i + k]);
				max[k] = Math.max(max[k], p[i + k]);
			}
			const idx = mesh.index.array;
			let six = 0;
			for (let t = 0; t < idx.length; t += 3) {
				const [a, b, c] = [idx[t] * 3, idx[t + 1] * 3, idx[t + 2] * 3];
				const cx = p[b + 1] * p[c + 2] - p[b + 2] * p[c + 1];
				const cy = p[b + 2] * p[c] - p[b] * p[c + 2];
				const cz = p[b] * p[c + 1] - p[b + 1] * p[c];
				six += p[a] * cx + p[a + 1] * cy + p[a + 2] * cz;
			}
			bodies.push({ name: node.name || mesh.name, colour: mesh.color, faceCount: mesh.brep_faces.length, min, max, volumeMm3: six / 6 });
		}
		node.children.forEach(visit);
	};
	visit(result.root);
	return { success: result.success, assemblyName: result.root.children[0]?.name ?? '', bodies };
}
