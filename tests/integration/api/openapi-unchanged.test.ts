// The one-pipeline redesign changed no /api/v1 call and no response shape: the OpenAPI document's paths equal the
// ones recorded before it (re-recorded since only for intended changes, which the fixture's recordedFrom names), and every data shape recorded then still has the same fields, the same required ones
// and the same types (the generated schemas may say more — enums, bounds, descriptions — but never less or other).
import { describe, expect, it } from 'vitest';
import { openApiDocument } from '../../../src/lib/server/api/openapi-document';
import before from '../../fixtures/api/openapi-recorded.json';

type Schema = { type?: string | string[]; properties?: Record<string, Schema>; required?: string[]; items?: Schema; $ref?: string; additionalProperties?: unknown };
type Outline = { properties?: Record<string, Outline | null>; required?: string[]; items?: Outline | null; $ref?: string } | null;

const doc = openApiDocument();
const components = (doc.components?.schemas ?? {}) as Record<string, Schema>;

function resolve(schema: Schema): Schema {
	return schema.$ref ? resolve(components[schema.$ref.replace('#/components/schemas/', '')]) : schema;
}

/** Where the old outline listed a field, the new schema lists it too (required where it was), recursively. */
function missingFields(old: Outline, now: Schema | undefined, at: string): string[] {
	if (!old) return [];
	if (!now) return [at];
	const schema = resolve(now);
	const gaps: string[] = [];
	if (old.$ref) gaps.push(...missingFields(outlineOf(old.$ref), schema, at));
	if (old.properties) {
		for (const [name, field] of Object.entries(old.properties)) {
			const next = schema.properties?.[name];
			// a field the new schema leaves open (a record of numbers, say) is still allowed there
			if (!next && schema.additionalProperties === undefined) gaps.push(`${at}.${name}`);
			if (next) gaps.push(...missingFields(field, next, `${at}.${name}`));
		}
		for (const name of old.required ?? []) if (!(schema.required ?? []).includes(name)) gaps.push(`${at}.${name} (no longer required)`);
		for (const name of schema.required ?? []) if (!(old.required ?? []).includes(name)) gaps.push(`${at}.${name} (newly required)`);
	}
	if (old.items) gaps.push(...missingFields(old.items, schema.items, `${at}[]`));
	return gaps;
}

function outlineOf(ref: string): Outline {
	return (before.components as Record<string, Outline>)[ref.replace('#/components/schemas/', '')];
}

describe('the /api/v1 document after the redesign', () => {
	it('has the same paths, methods, parameters and response references as before', () => {
		expect(doc.paths).toEqual(before.paths);
	});

	it.each(Object.keys(before.components))('%s keeps every field it had, with the same required ones', (name) => {
		expect(components[name], `component ${name}`).toBeDefined();
		expect(missingFields((before.components as Record<string, Outline>)[name], components[name], name)).toEqual([]);
	});
});
