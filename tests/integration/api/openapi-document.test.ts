// The OpenAPI document is generated from the route schemas and is a valid 3.1 document.
import { describe, expect, it } from 'vitest';
import { openApiDocument } from '../../../src/lib/server/api/openapi-document';

describe('openApiDocument', () => {
	it('declares OpenAPI 3.1 and lists every /api/v1 route with its method', () => {
		const doc = openApiDocument();
		expect(doc.openapi).toBe('3.1.0');
		const routes = Object.entries(doc.paths ?? {}).flatMap(([path, item]) => Object.keys(item as object).map((m) => `${m.toUpperCase()} ${path}`));
		expect(routes.sort()).toEqual(
			[
				'GET /teams',
				'GET /teams/{teamId}/designs',
				'POST /teams/{teamId}/designs',
				'GET /teams/{teamId}/exports',
				'GET /designs/{designId}',
				'POST /designs/{designId}/revisions',
				'GET /designs/{designId}/revisions/{label}',
				'GET /designs/{designId}/revisions/{label}/sweep',
				'GET /designs/{designId}/revisions/{label}/export/{format}',
				'POST /designs/{designId}/revisions/{label}/export/{format}',
				'GET /designs/{designId}/revisions/{label}/sweep-plans',
				'GET /designs/{designId}/revisions/{label}/sweep-plans/{planId}/sweep',
				'GET /designs/{designId}/revisions/{label}/simulations',
				'POST /designs/{designId}/revisions/{label}/simulations',
				'GET /simulations/{id}',
				'POST /simulations/{id}/cancel',
				'POST /size'
			].sort()
		);
	});

	it('documents the design-rule gate: 422 with the violations on a download, the waiver POST body, the waiver on export records', () => {
		const doc = openApiDocument();
		const paths = doc.paths as Record<string, any>;
		const schemas = doc.components?.schemas as Record<string, any>;
		const download = paths['/designs/{designId}/revisions/{label}/export/{format}'];
		expect(download.get.responses['422'].content['application/json'].schema.$ref).toBe('#/components/schemas/ExportRefusal');
		expect(schemas.ExportRefusal.required).toEqual(expect.arrayContaining(['error', 'profile', 'violations']));
		expect(schemas.ExportRefusal.properties.violations.items.$ref).toBe('#/components/schemas/Violation');
		// the rule ids of src/lib/schemas/violation.ts (the connector launch's five, then the legend's three and the mounting holes' one, after the first seven)
		expect(schemas.Violation.properties.ruleId.enum).toEqual([
			'trace-width',
			'copper-spacing',
			'drill-size',
			'annular-ring',
			'edge-clearance',
			'slot-width',
			'stack-build',
			'launch-gap',
			'launch-via-edge',
			'launch-via-spacing',
			'launch-annular-ring',
			'launch-outside-board',
			'legend-width',
			'legend-clearance',
			'legend-edge',
			'hole-keep-out'
		]);
		expect(schemas.FabProfile.required).toContain('minTraceWidthMm');
		expect(download.post.requestBody.content['application/json'].schema.$ref).toBe('#/components/schemas/WaiverBody');
		expect(schemas.WaiverBody.required).toEqual(['waiver']);
		expect(Object.keys(download.post.responses)).toEqual(expect.arrayContaining(['200', '400', '401', '403', '404']));
		expect(schemas.ExportRecord.properties.waiver).toBeDefined();
		expect(schemas.ExportRecord.required).toContain('waiver');
	});

	it('documents the field-check endpoints: 202 on start, the status with the full-wave result and Homing, cancel outcomes', () => {
		const doc = openApiDocument();
		const paths = doc.paths as Record<string, any>;
		const schemas = doc.components?.schemas as Record<string, any>;
		const start = paths['/designs/{designId}/revisions/{label}/simulations'].post;
		expect(start.requestBody.content['application/json'].schema.$ref).toBe('#/components/schemas/StartFieldCheck');
		expect(Object.keys(start.responses)).toEqual(expect.arrayContaining(['202', '400', '401', '403', '404', '429']));
		expect(schemas.StartFieldCheck.properties.mode.enum).toEqual(['quick', 'standard', 'accurate']);
		const status = paths['/simulations/{id}'].get.responses['200'].content['application/json'].schema.$ref;
		expect(status).toBe('#/components/schemas/FieldCheckStatus');
		expect(Object.keys(schemas.FieldCheckStatus.properties)).toEqual(expect.arrayContaining(['state', 'progress', 'result', 'homing', 'statusUrl']));
		expect(Object.keys(paths['/simulations/{id}/cancel'].post.responses)).toEqual(expect.arrayContaining(['200', '202', '409']));
	});

	it('documents the sweep-plan endpoints with the plan schema and the planId parameter', () => {
		const doc = openApiDocument();
		const paths = doc.paths as Record<string, any>;
		const list = paths['/designs/{designId}/revisions/{label}/sweep-plans'].get;
		expect(list.responses['200'].content['application/json'].schema.$ref).toBe('#/components/schemas/SweepPlanList');
		const sweep = paths['/designs/{designId}/revisions/{label}/sweep-plans/{planId}/sweep'].get;
		expect(sweep.parameters.map((p: { name: string; in: string }) => `${p.in}:${p.name}`)).toEqual(['path:designId', 'path:label', 'path:planId']);
		const plan = (doc.components?.schemas as Record<string, any>).SweepPlan;
		expect(Object.keys(plan.properties)).toEqual(expect.arrayContaining(['planVersion', 'combine', 'axes']));
	});

	it('carries the design-input schema with its bounds, taken from the zod schema', () => {
		const doc = openApiDocument();
		const input = doc.components?.schemas?.DesignInput as { properties: Record<string, { minimum?: number; maximum?: number }>; required: string[] };
		// Bounds from src/lib/schemas/design-input.ts: frequencyHz in [100e6, 100e9].
		expect(input.properties.frequencyHz.minimum).toBe(100e6);
		expect(input.properties.frequencyHz.maximum).toBe(100e9);
		expect(input.required).toContain('frequencyHz');
	});

	it('documents the export-log query parameters and the format enum', () => {
		const doc = openApiDocument();
		const log = (doc.paths as Record<string, any>)['/teams/{teamId}/exports'].get;
		const names = log.parameters.map((p: { name: string; in: string }) => `${p.in}:${p.name}`);
		expect(names).toEqual(expect.arrayContaining(['path:teamId', 'query:sort', 'query:order', 'query:page', 'query:pageSize', 'query:q', 'query:designId']));
		const download = (doc.paths as Record<string, any>)['/designs/{designId}/revisions/{label}/export/{format}'].get;
		const format = download.parameters.find((p: { name: string }) => p.name === 'format');
		expect(format.schema.enum).toEqual(['bundle', 'gerber', 'drill', 'dxf', 'svg', 'sweep', 'notes', 'step']);
	});
});
