// Journey: make an API token → fetch a revision's sweep definition with it → it is version 2, validates against the sweep
// JSON Schema (ajv) and states its port; a version-1 file still validates against /schemas/sweep-v1.json; the token
// reaches only its team, and the fetch is recorded in the export log as coming from the API.
import { readFileSync } from 'node:fs';
import { expect, test } from '@playwright/test';
import Ajv2020 from 'ajv/dist/2020.js';
import { makeTeam, makeToken, newDesign, signUp, uniqueSuffix } from './helpers/exports';

test('a personal API token fetches a sweep definition that validates against the published schema', async ({ page, playwright, baseURL }) => {
	const s = uniqueSuffix();
	await signUp(page, { name: `Token Tester ${s}`, email: `token-${s}@e2e.test`, password: 'quarter wave transformer' });
	const teamId = await makeTeam(page, `Sweep lab ${s}`);
	const designId = await newDesign(page, `Mast patch ${s}`);
	const token = await makeToken(page, `sweep runner ${s}`);
	expect(token).toMatch(/^ff_/);

	// A fresh request context: no cookies, only the Authorization header.
	const api = await playwright.request.newContext({ baseURL, extraHTTPHeaders: { authorization: `Bearer ${token}` } });
	const teams = await (await api.get('/api/v1/teams')).json();
	expect(teams.teams.map((t: { id: string }) => t.id)).toEqual([teamId]);
	const design = await (await api.get(`/api/v1/designs/${designId}`)).json();
	expect(design.revisions.map((r: { label: string }) => r.label)).toEqual(['A']);

	const res = await api.get(`/api/v1/designs/${designId}/revisions/A/sweep`);
	expect(res.status()).toBe(200);
	expect(res.headers()['content-type']).toBe('application/json');
	const doc = await res.json();

	// ajv (JSON Schema draft 2020-12) against the schema the app publishes at the document's own $schema URL.
	expect(doc.$schema).toBe('/schemas/sweep-v2.json');
	expect(doc.formatVersion).toBe(2);
	const published = await api.get(doc.$schema);
	expect(published.status()).toBe(200);
	const ajv = new Ajv2020({ allErrors: true, strict: false });
	const validate = ajv.compile(await published.json());
	expect(validate(doc), JSON.stringify(validate.errors?.slice(0, 3))).toBe(true);
	expect(doc.design.revision).toBe('A');
	// A tampered document fails with a field-level error.
	expect(validate({ ...doc, formatVersion: 'one' })).toBe(false);
	// What a solver needs: the inset design's port is its feed line at the board edge, top copper against the ground.
	expect(doc.points[0].solverSetup.ports).toEqual([expect.objectContaining({ kind: 'edge-line', edge: 'bottom', signalCopper: 'copper-top', returnCopper: 'copper-bottom', referenceImpedanceOhm: 50 })]);
	expect(doc.points[0].solverSetup.materialsHoldAtHz).toBe(doc.points[0].derived.frequencyHz);
	expect(doc.base).not.toHaveProperty('handedness');

	// Version 1 stays readable: its schema is still published and validates a file written before version 2.
	const v1 = await api.get('/schemas/sweep-v1.json');
	expect(v1.status()).toBe(200);
	const validateV1 = new Ajv2020({ allErrors: true, strict: false }).compile(await v1.json());
	const oldFile = JSON.parse(readFileSync(new URL('../fixtures/sweep/v1-inset.json', import.meta.url), 'utf8'));
	expect(validateV1(oldFile), JSON.stringify(validateV1.errors?.slice(0, 3))).toBe(true);
	expect(validateV1(doc)).toBe(false);

	// Without the token: 401; the OpenAPI document is public.
	const anonymous = await playwright.request.newContext({ baseURL });
	expect((await anonymous.get(`/api/v1/designs/${designId}/revisions/A/sweep`)).status()).toBe(401);
	const openapi = await (await anonymous.get('/api/v1/openapi.json')).json();
	expect(openapi.openapi).toBe('3.1.0');

	// The fetch is in the team's log, from the API.
	const log = await (await api.get(`/api/v1/teams/${teamId}/exports?designId=${designId}`)).json();
	expect(log.items).toHaveLength(1);
	expect(log.items[0]).toMatchObject({ kind: 'sweep', via: 'api', earlier: null });

	await page.goto('/api/docs');
	await expect(page.getByRole('heading', { name: 'Fringefield API' })).toBeVisible();
	await expect(page.locator('article[id^="get-"]').first()).toBeVisible();
	await page.screenshot({ path: '/tmp/ff-api-docs.png', fullPage: false });
	await page.screenshot({ path: '/tmp/ff-api-docs-full.png', fullPage: true });
	await api.dispose();
	await anonymous.dispose();
});
