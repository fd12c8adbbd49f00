// The part of occt-import-js 0.0.23 (Open CASCADE as WebAssembly) the STEP tests use; the package ships no types.
declare module 'occt-import-js' {
	export interface OcctMesh {
		name: string;
		color?: [number, number, number];
		brep_faces: { first: number; last: number; color: [number, number, number] | null }[];
		attributes: { position: { array: number[] }; normal?: { array: number[] } };
		index: { array: number[] };
	}
	export interface OcctNode {
		name: string;
		meshes: number[];
		children: OcctNode[];
	}
	export interface OcctResult {
		success: boolean;
		root: OcctNode;
		meshes: OcctMesh[];
	}
	export interface Occt {
		ReadStepFile(content: Uint8Array, params: Record<string, unknown> | null): OcctResult;
	}
	export default function occtimportjs(): Promise<Occt>;
}
