// No call in src spreads an array into its arguments (`Math.min(...points)`, `list.push(...more)`): every argument
// takes a stack slot, and a long array (a 150 000-point measurement) overflows the stack and breaks the page for
// everyone (abuse review, item 9). Loops and reduce() have no such limit. Scans every .ts and .svelte file.
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import ts from 'typescript';
import { parse } from 'svelte/compiler';
import { describe, expect, it } from 'vitest';

const root = join(import.meta.dirname, '..', '..', '..');
const src = join(root, 'src');

/**
 * Spreads left alone on purpose, each with why it is bounded; the scan still fails on one more in the same file.
 * Forwarding a function's own argument list is bounded by the arguments written at its call sites, and no call
 * site may spread (this scan).
 */
const knownBounded: Record<string, { count: number; why: string }> = {
	'src/lib/geometry/boolean-ops.ts': { count: 3, why: "forwards its callers' region groups to polygon-clipping's variadic union/difference/intersection" },
	'src/lib/formats/readback/image-item.ts': { count: 2, why: 'a run of one polarity, in batches of at most RUN_BATCH (2000) regions per call' },
	'src/lib/server/db/index.ts': { count: 1, why: "forwards pg's query(...) arguments unchanged" }
};

function files(dir: string): string[] {
	return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
		const path = join(dir, e.name);
		if (e.isDirectory()) return files(path);
		return /\.(ts|svelte)$/.test(e.name) && !e.name.endsWith('.d.ts') ? [path] : [];
	});
}

function lineOf(text: string, offset: number): number {
	let line = 1;
	for (let i = 0; i < offset; i++) if (text.charCodeAt(i) === 10) line++;
	return line;
}

/** Offsets of calls and `new` expressions with a spread argument, in TypeScript source. */
function tsSpreads(path: string, text: string): number[] {
	const found: number[] = [];
	const visit = (node: ts.Node): void => {
		if ((ts.isCallExpression(node) || ts.isNewExpression(node)) && node.arguments?.some(ts.isSpreadElement)) found.push(node.getStart());
		ts.forEachChild(node, visit);
	};
	visit(ts.createSourceFile(path, text, ts.ScriptTarget.Latest, true, ts.ScriptKind.TS));
	return found;
}

/** The same in a component: its scripts and every expression of its markup (Svelte's ESTree). */
function svelteSpreads(text: string): number[] {
	const found: number[] = [];
	const seen = new WeakSet<object>();
	const visit = (value: unknown): void => {
		if (!value || typeof value !== 'object' || seen.has(value)) return;
		seen.add(value);
		if (Array.isArray(value)) {
			for (const v of value) visit(v);
			return;
		}
		const node = value as { type?: string; arguments?: { type?: string }[]; start?: number };
		if ((node.type === 'CallExpression' || node.type === 'NewExpression') && node.arguments?.some((a) => a?.type === 'SpreadElement')) found.push(node.start ?? 0);
		for (const [key, v] of Object.entries(node)) if (key !== 'parent' && key !== 'metadata') visit(v);
	};
	visit(parse(text, { modern: true }));
	return found;
}

function spreadsIn(path: string, text: string): number[] {
	return path.endsWith('.svelte') ? svelteSpreads(text) : tsSpreads(path, text);
}

describe('argument spreading in src', () => {
	it('finds a spread in the shapes it must catch (so the scan can fail)', () => {
		expect(tsSpreads('a.ts', 'const m = Math.min(0, ...values);')).toHaveLength(1);
		expect(tsSpreads('a.ts', 'out.push(...more); new Set(...xs);')).toHaveLength(2);
		expect(tsSpreads('a.ts', 'const copy = [...values]; const o = { ...p }; f(values);')).toHaveLength(0);
		expect(svelteSpreads('<script lang="ts">const lo: number = Math.min(...points.map((p) => p[1]));</script>')).toHaveLength(1);
		expect(svelteSpreads('<p>{Math.max(1, ...counts)}</p>')).toHaveLength(1);
		expect(svelteSpreads('<script>const all = [...a, ...b];</script><p>{all.length}</p>')).toHaveLength(0);
	});

	it('has no call with a spread argument in any .ts or .svelte file', () => {
		const offenders: string[] = [];
		for (const path of files(src)) {
			const name = relative(root, path);
			const text = readFileSync(path, 'utf8');
			if (!text.includes('...')) continue;
			const found = spreadsIn(path, text);
			if (found.length <= (knownBounded[name]?.count ?? 0)) continue;
			for (const at of found) offenders.push(`${name}:${lineOf(text, at)}`);
		}
		expect(offenders).toEqual([]);
	});
});
