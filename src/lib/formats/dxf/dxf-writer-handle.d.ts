// dxf-writer's entity-handle counter (a CommonJS class with a static seed); no types ship for the deep path.
declare module 'dxf-writer/src/Handle.js' {
	const Handle: { seed: number; next(): string; peek(): string };
	export default Handle;
}
