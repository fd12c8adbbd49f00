// svgdom ships no types: the one function we use.
declare module 'svgdom' {
	export function createSVGWindow(): Window & typeof globalThis;
}
