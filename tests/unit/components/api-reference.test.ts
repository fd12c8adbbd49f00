// The API reference page's content, read from a small OpenAPI 3.1 document (OpenAPI Specification 3.1.0 §4.8.8 paths, §4.8.7 components).
import { describe, expect, it } from 'vitest';
import { curlLine, dataDictionary, groupCalls, shellVariableFor, unitOf } from '../../../src/lib/components/api-reference';

const doc = {
	openapi: '3.1.0',
	servers: [{ url: '/api/v1' }],
	paths: {
		'/size': { post: { tags: ['sizing'], summary: 'Size', requestBody: { content: { 'application/json': { schema: { $ref: '#/components/schemas/DesignInput' } } } }, responses: { 200: { description: 'ok', content: { 'application/json': { schema: { $ref: '#/components/schemas/Sized' } } } } } } },
		'/designs/{designId}/revisions/{label}/export/{format}': { get: { tags: ['exports'], summary: 'Download', responses: { 200: { description: 'the file' } } } },
		'/designs/{designId}/revisions/{label}/sweep-plans': { get: { tags: ['sweeps'], summary: 'Plans', responses: {} } },
		'/teams/{teamId}/exports': { get: { tags: ['exports'], summary: 'Log', responses: {} } },
		'/designs/{designId}': { get: { tags: ['designs'], summary: 'A design', responses: {} } },
		'/designs/{designId}/revisions/{label}/simulations': { post: { tags: ['simulations'], summary: 'Start a check', responses: {} } },
		'/brand-new': { get: { tags: ['novel'], summary: 'Something new', responses: {} } }
	},
	components: {
		schemas: {
			DesignInput: {
				type: 'object',
				required: ['frequencyHz'],
				properties: {
					frequencyHz: { type: 'number', minimum: 1 },
					substrate: { type: 'object', properties: { heightMm: { type: 'number', description: 'Laminate thickness' } } }
				}
			},
			Sized: { type: 'object', description: 'What sizing found', properties: { input: { $ref: '#/components/schemas/DesignInput' } } }
		}
	}
};

describe('groupCalls', () => {
	const tasks = groupCalls(doc, 'http://h');
	const byId = Object.fromEntries(tasks.map((t) => [t.id, t.calls.map((c) => `${c.verb} ${c.path}`)]));

	it('puts every call under one task by what it is for', () => {
		expect(byId.size).toEqual(['POST /size']);
		expect(byId.downloads).toEqual(['GET /designs/{designId}/revisions/{label}/export/{format}']);
		expect(byId.sweeps).toEqual(['GET /designs/{designId}/revisions/{label}/sweep-plans']);
		expect(byId['export-log']).toEqual(['GET /teams/{teamId}/exports']);
		expect(byId.designs).toEqual(['GET /designs/{designId}']);
		expect(byId.simulations).toEqual(['POST /designs/{designId}/revisions/{label}/simulations']);
	});

	// a route added to the document later appears without a change to the page
	it('keeps a call that fits no task under "Other calls"', () => {
		expect(byId.other).toEqual(['GET /brand-new']);
		expect(tasks.reduce((n, t) => n + t.calls.length, 0)).toBe(7);
	});

	it('writes verbs as plain upper-case text', () => {
		expect(tasks.flatMap((t) => t.calls.map((c) => c.verb))).toEqual(expect.arrayContaining(['GET', 'POST']));
	});
});

describe('curlLine', () => {
	it('uses $FF_TOKEN, the real path under the base and shell variables for path values', () => {
		const line = curlLine('http://h/api/v1', 'get', '/designs/{designId}/revisions/{label}/export/{format}', { responses: { 200: { description: 'zip' } } });
		expect(line).toBe('curl -sS -H "Authorization: Bearer $FF_TOKEN" -OJ "http://h/api/v1/designs/$DESIGN_ID/revisions/$LABEL/export/$FORMAT"');
	});

	it('sends a JSON body from a file for a POST and keeps JSON answers on the screen', () => {
		const line = curlLine('http://h/api/v1', 'post', '/size', doc.paths['/size'].post);
		expect(line).toBe('curl -sS -X POST -H "Authorization: Bearer $FF_TOKEN" -H "content-type: application/json" --data @body.json "http://h/api/v1/size"');
	});

	it('names shell variables in upper snake case', () => {
		expect(shellVariableFor('planId')).toBe('$PLAN_ID');
	});
});

describe('dataDictionary', () => {
	const [input, sized] = dataDictionary(doc);

	it('lists nested fields with dotted names, their unit from the name and the document’s description', () => {
		expect(input.rows.map((r) => r.field)).toEqual(['frequencyHz', 'substrate', 'substrate.heightMm']);
		expect(input.rows[0]).toMatchObject({ unit: 'Hz', required: true, type: 'number (≥ 1)' });
		expect(input.rows[2]).toMatchObject({ unit: 'mm', meaning: 'Laminate thickness', required: false });
	});

	it('links a field holding a named shape to that shape', () => {
		expect(sized.description).toBe('What sizing found');
		expect(sized.rows[0]).toMatchObject({ field: 'input', shape: 'DesignInput' });
	});

	it('reads units from the names our schemas use', () => {
		expect([unitOf('impedanceOhm'), unitOf('copperThicknessUm'), unitOf('copperConductivitySPerM'), unitOf('rotationDeg'), unitOf('name')]).toEqual(['Ω', 'µm', 'S/m', '°', null]);
	});
});
