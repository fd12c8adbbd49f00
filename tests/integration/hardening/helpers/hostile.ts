// fast-check generators of hostile input: wrong types, huge and tiny numbers, NaN/Infinity as strings,
// deep nesting, unicode (including lone surrogates and control characters), injection-looking text, and
// oversize values. Shared by the seeded sample in `npm test` and the 10 000-case bench run.
import fc from 'fast-check';

/** Strings people (and scripts) send that parsers get wrong. */
export const nastyStrings = [
	'',
	' ',
	'NaN',
	'Infinity',
	'-Infinity',
	'+Infinity',
	'1e309',
	'-1e309',
	'1e-400',
	'5e-324',
	'-0',
	'0x1F',
	'0b101',
	'1_000',
	'١٢٣', // Arabic-Indic digits
	'2,45',
	'null',
	'undefined',
	'true',
	'[]',
	'{}',
	'{"__proto__":{"admin":true}}',
	'__proto__',
	'constructor',
	'<script>alert(1)</script>',
	"'; drop table design; --",
	'../../../../etc/passwd',
	'%00',
	'\u0000',
	'\r\nSet-Cookie: x=1',
	'\ud800', // a lone surrogate
	'\u202e\u0645\u0631\u062d\u0628\u0627', // right-to-left override + Arabic
	'👩🏽‍🔬📡',
	'Ω μm ±',
	'9'.repeat(400),
	'a'.repeat(5000)
] as const;

export const hostileString: fc.Arbitrary<string> = fc.oneof(
	{ weight: 3, arbitrary: fc.constantFrom(...nastyStrings) },
	{ weight: 2, arbitrary: fc.string({ maxLength: 40 }) },
	{ weight: 2, arbitrary: fc.string({ unit: 'grapheme', maxLength: 30 }) },
	{ weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 30 }) },
	{ weight: 1, arbitrary: fc.double().map(String) },
	{ weight: 1, arbitrary: fc.bigInt({ min: -(10n ** 40n), max: 10n ** 40n }).map(String) },
	{ weight: 1, arbitrary: fc.string({ minLength: 300, maxLength: 3000 }) }
);

const hostileNumber: fc.Arbitrary<number> = fc.oneof(
	fc.double(), // includes NaN, ±Infinity, -0 (JSON turns the non-finite into null)
	fc.integer(),
	fc.constantFrom(Number.MAX_VALUE, Number.MIN_VALUE, -Number.MAX_VALUE, Number.MAX_SAFE_INTEGER + 2, 1e21, 1e-21, 0, -1)
);

/** Any JSON value, hostile leaves, nesting up to a few levels. */
export const hostileJson: fc.Arbitrary<unknown> = fc.letrec((tie) => ({
	value: fc.oneof(
		{ depthSize: 'small', withCrossShrink: true },
		hostileString,
		hostileNumber,
		fc.boolean(),
		fc.constant(null),
		fc.array(tie('value'), { maxLength: 5 }),
		fc.dictionary(fc.oneof(hostileString, fc.constantFrom('name', 'frequencyHz', 'input', 'parent', 'substrate', '__proto__')), tie('value'), { maxKeys: 5 })
	)
})).value;

/** Arrays or objects nested 200–3000 levels deep (a parser-stack and recursion check). */
export const deepNesting: fc.Arbitrary<string> = fc.record({ depth: fc.integer({ min: 200, max: 3000 }), kind: fc.constantFrom('[', '{"a":') }).map(({ depth, kind }) =>
	kind === '[' ? '['.repeat(depth) + '1' + ']'.repeat(depth) : '{"a":'.repeat(depth) + '1' + '}'.repeat(depth)
);

/** A valid object with one to three of its paths replaced by hostile values (or deleted). */
export function mutated(valid: Record<string, unknown>): fc.Arbitrary<unknown> {
	const paths = leafPaths(valid);
	return fc
		.array(fc.record({ path: fc.constantFrom(...paths), value: fc.oneof(hostileJson, fc.constant(undefined)) }), { minLength: 1, maxLength: 3 })
		.map((changes) => {
			const copy = structuredClone(valid);
			for (const { path, value } of changes) setPath(copy, path, value);
			return copy;
		});
}

function leafPaths(obj: Record<string, unknown>, prefix = ''): string[] {
	const out: string[] = [];
	for (const [k, v] of Object.entries(obj)) {
		const p = prefix ? `${prefix}.${k}` : k;
		out.push(p);
		if (v && typeof v === 'object' && !Array.isArray(v)) out.push(...leafPaths(v as Record<string, unknown>, p));
	}
	return out;
}

function setPath(obj: Record<string, unknown>, path: string, value: unknown): void {
	const keys = path.split('.');
	let at: Record<string, unknown> = obj;
	for (const k of keys.slice(0, -1)) {
		if (!at[k] || typeof at[k] !== 'object') at[k] = {};
		at = at[k] as Record<string, unknown>;
	}
	if (value === undefined) delete at[keys.at(-1)!];
	else at[keys.at(-1)!] = value;
}

/** Form fields: the named ones with hostile text (some left out), plus a few unexpected keys. */
export function hostileForm(names: readonly string[], fixed: Record<string, string> = {}): fc.Arbitrary<Record<string, string>> {
	return fc
		.record({
			picked: fc.subarray([...names]),
			values: fc.array(hostileString, { minLength: names.length, maxLength: names.length }),
			extra: fc.dictionary(hostileString, hostileString, { maxKeys: 2 })
		})
		.map(({ picked, values, extra }) => {
			const form: Record<string, string> = { ...extra };
			picked.forEach((n, i) => (form[n] = values[i]));
			return { ...form, ...fixed };
		});
}

/** A path segment: hostile text, URL-encoded (so it reaches the route as a parameter). */
export const hostileSegment: fc.Arbitrary<string> = hostileString
	.filter((s) => s.length > 0 && s.length < 2000)
	// A lone surrogate has no UTF-8 form: send its (invalid) three bytes percent-encoded, as a careless client would.
	.map((s) => (s.isWellFormed() ? encodeURIComponent(s) : encodeURIComponent(s.toWellFormed()) + '%ED%A0%80').replace(/\./g, '%2E'));

/** A query string of known and unknown keys with hostile values. */
export function hostileQuery(keys: readonly string[]): fc.Arbitrary<string> {
	return fc.dictionary(fc.oneof(fc.constantFrom(...keys), hostileString), hostileString, { maxKeys: 4 }).map((q) => {
		const s = new URLSearchParams(q).toString();
		return s ? `?${s}` : '';
	});
}
