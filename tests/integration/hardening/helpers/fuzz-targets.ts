// Every /api/v1 route and every form action, each with a generator of hostile requests aimed at it.
// A target's requests carry the caller that gets furthest (an editor or owner of team A), so the
// hostile part reaches the parsing and not just the access check.
import fc from 'fast-check';
import { deepNesting, hostileForm, hostileJson, hostileQuery, hostileSegment, hostileString, mutated } from './hostile';
import type { Caller } from './client';
import { demoDesign, type HardeningWorkspace } from './workspace';

export interface FuzzRequest {
	method: 'GET' | 'POST';
	path: string;
	caller: Caller;
	/** JSON (API) */
	json?: unknown;
	/** raw body with its content type */
	raw?: { body: string | Uint8Array; contentType: string };
	/** form fields (actions) */
	form?: Record<string, string>;
	/** multipart with a file (uploads) */
	multipart?: { fields: Record<string, string>; file?: { name: string; bytes: Uint8Array; type: string } };
}

export interface FuzzTarget {
	name: string;
	kind: 'api' | 'action';
	requests: fc.Arbitrary<FuzzRequest>;
}

const bodyTypes = ['application/json', 'text/plain', 'application/x-www-form-urlencoded', 'multipart/form-data', 'multipart/form-data; boundary=zz', 'application/xml', ''];

/** A JSON body: a mutated valid document, any hostile JSON, deep nesting, an oversize document, or garbage. */
function jsonBodies(valid: Record<string, unknown>): fc.Arbitrary<Pick<FuzzRequest, 'json' | 'raw'>> {
	return fc.oneof(
		{ weight: 6, arbitrary: mutated(valid).map((json) => ({ json })) },
		{ weight: 3, arbitrary: hostileJson.map((json) => ({ json })) },
		{ weight: 1, arbitrary: deepNesting.map((body) => ({ raw: { body, contentType: 'application/json' } })) },
		{ weight: 1, arbitrary: fc.integer({ min: 260_000, max: 400_000 }).map((n) => ({ raw: { body: JSON.stringify({ ...valid, name: 'x'.repeat(n) }), contentType: 'application/json' } })) },
		{ weight: 2, arbitrary: fc.record({ body: hostileString, contentType: fc.constantFrom(...bodyTypes) }).map((raw) => ({ raw })) }
	);
}

/** A form body: hostile fields (mostly), or a body that is not a form at all. */
function formBodies(names: readonly string[], fixed: Record<string, string> = {}): fc.Arbitrary<Pick<FuzzRequest, 'form' | 'raw'>> {
	return fc.oneof(
		{ weight: 8, arbitrary: hostileForm(names, fixed).map((form) => ({ form })) },
		{ weight: 2, arbitrary: fc.record({ body: fc.oneof(hostileString, deepNesting), contentType: fc.constantFrom(...bodyTypes) }).map((raw) => ({ raw })) }
	);
}

const designFormNames = ['name', 'frequencyGHz', 'shape', 'handedness', 'substrate.relativePermittivity', 'substrate.lossTangent', 'substrate.heightMm', 'feed', 'targetImpedanceOhm', 'feedLineImpedanceOhm', 'inset.notchGapMm', 'probe.drillDiameterMm', 'patchWidthMm', 'groundMarginMm', 'solderMask', 'note', 'from'];
const sweepFormNames = ['name', 'combine', ...[0, 1, 2, 3].flatMap((i) => ['field', 'mode', 'from', 'to', 'step', 'values'].map((k) => `axes.${i}.${k}`))];
const laminateFormNames = ['name', 'relativePermittivity', 'lossTangent', 'heightMm', 'copperThicknessUm', 'relativePermittivityTolerance', 'heightToleranceMm'];
const fabProfileFormNames = ['name', 'minTraceWidthMm', 'minSpacingMm', 'minDrillMm', 'minAnnularRingMm', 'copperToEdgeMm', 'minSlotWidthMm', 'etchToleranceMm', 'platedDrillToleranceMm', 'nonPlatedDrillToleranceMm', 'maxCopperLayers', 'boardThicknessTolerancePercent', 'mixedCores', 'finish'];
const queryKeys = ['page', 'pageSize', 'sort', 'order', 'waiver', 'kind', 'via', 'from', 'to', 'design', 'revision', 'points', 'format'];

export function fuzzTargets(ws: HardeningWorkspace): FuzzTarget[] {
	const a = ws.a;
	const editorToken: Caller = { token: ws.editor.token };
	const editor: Caller = { cookie: ws.editor.sessionId };
	const owner: Caller = { cookie: ws.owner.sessionId };
	const anonymous: Caller = {};
	const valid = demoDesign(`Fuzz ${ws.suffix}`);
	const rev = `/api/v1/designs/${a.designId}/revisions/${a.label}`;
	const get = (path: fc.Arbitrary<string>, caller: Caller = editorToken) => path.map((p): FuzzRequest => ({ method: 'GET', path: p, caller }));
	const post = (path: string, bodies: fc.Arbitrary<Pick<FuzzRequest, 'json' | 'raw' | 'form'>>, caller: Caller) => bodies.map((b): FuzzRequest => ({ method: 'POST', path, caller, ...b }));
	const segmentOr = (good: string) => fc.oneof({ weight: 1, arbitrary: fc.constant(good) }, { weight: 3, arbitrary: hostileSegment });

	const api: FuzzTarget[] = [
		{ name: 'POST /api/v1/size', kind: 'api', requests: post('/api/v1/size', jsonBodies(valid), editorToken) },
		{ name: 'POST /api/v1/teams/[teamId]/designs', kind: 'api', requests: post(`/api/v1/teams/${a.teamId}/designs`, jsonBodies({ input: valid }), editorToken) },
		{ name: 'POST /api/v1/designs/[designId]/revisions', kind: 'api', requests: post(`/api/v1/designs/${a.designId}/revisions`, jsonBodies({ parent: a.label, input: valid, note: 'fuzz' }), editorToken) },
		{ name: 'GET /api/v1/teams', kind: 'api', requests: get(hostileQuery(queryKeys).map((q) => `/api/v1/teams${q}`)) },
		{ name: 'GET /api/v1/teams/[teamId]/designs', kind: 'api', requests: get(fc.tuple(segmentOr(a.teamId), hostileQuery(queryKeys)).map(([t, q]) => `/api/v1/teams/${t}/designs${q}`)) },
		{ name: 'GET /api/v1/teams/[teamId]/exports', kind: 'api', requests: get(fc.tuple(segmentOr(a.teamId), hostileQuery(queryKeys)).map(([t, q]) => `/api/v1/teams/${t}/exports${q}`)) },
		{ name: 'GET /api/v1/designs/[designId]', kind: 'api', requests: get(fc.tuple(segmentOr(a.designId), hostileQuery(queryKeys)).map(([d, q]) => `/api/v1/designs/${d}${q}`)) },
		{ name: 'GET /api/v1/designs/[designId]/revisions/[label]', kind: 'api', requests: get(fc.tuple(segmentOr(a.designId), segmentOr(a.label), hostileQuery(queryKeys)).map(([d, l, q]) => `/api/v1/designs/${d}/revisions/${l}${q}`)) },
		{
			name: 'GET /api/v1/designs/[designId]/revisions/[label]/export/[format]',
			kind: 'api',
			requests: get(fc.tuple(segmentOr(a.label), fc.oneof(fc.constantFrom('bundle', 'gerber', 'dxf', 'svg'), hostileSegment), hostileQuery(queryKeys)).map(([l, f, q]) => `/api/v1/designs/${a.designId}/revisions/${l}/export/${f}${q}`))
		},
		{ name: 'GET /api/v1/designs/[designId]/revisions/[label]/sweep', kind: 'api', requests: get(fc.tuple(segmentOr(a.label), hostileQuery(queryKeys)).map(([l, q]) => `/api/v1/designs/${a.designId}/revisions/${l}/sweep${q}`)) },
		{ name: 'GET /api/v1/designs/[designId]/revisions/[label]/sweep-plans', kind: 'api', requests: get(fc.tuple(segmentOr(a.label), hostileQuery(queryKeys)).map(([l, q]) => `${`/api/v1/designs/${a.designId}/revisions/${l}`}/sweep-plans${q}`)) },
		{ name: 'GET /api/v1/designs/[designId]/revisions/[label]/sweep-plans/[planId]/sweep', kind: 'api', requests: get(fc.tuple(segmentOr(a.planId), hostileQuery(queryKeys)).map(([p, q]) => `${rev}/sweep-plans/${p}/sweep${q}`)) },
		{ name: 'GET /api/v1/designs/[designId]/revisions/[label]/simulations', kind: 'api', requests: get(fc.tuple(segmentOr(a.label), hostileQuery(queryKeys)).map(([l, q]) => `/api/v1/designs/${a.designId}/revisions/${l}/simulations${q}`)) },
		{ name: 'POST /api/v1/designs/[designId]/revisions/[label]/simulations', kind: 'api', requests: post(`${rev}/simulations`, jsonBodies({ mode: 'quick', homing: false }), editorToken) },
		{ name: 'GET /api/v1/simulations/[id]', kind: 'api', requests: get(fc.tuple(fc.oneof(fc.uuid(), hostileSegment), hostileQuery(queryKeys)).map(([id, q]) => `/api/v1/simulations/${id}${q}`)) },
		{ name: 'POST /api/v1/simulations/[id]/cancel', kind: 'api', requests: fc.tuple(fc.oneof(fc.uuid(), hostileSegment), jsonBodies({ reason: 'fuzz' })).map(([id, b]): FuzzRequest => ({ method: 'POST', path: `/api/v1/simulations/${id}/cancel`, caller: editorToken, ...b })) },
		{ name: 'GET /api/v1/openapi.json', kind: 'api', requests: get(hostileQuery(queryKeys).map((q) => `/api/v1/openapi.json${q}`), anonymous) },
		{ name: 'GET /api/v1/[...rest] (unknown routes)', kind: 'api', requests: get(fc.array(hostileSegment, { minLength: 1, maxLength: 4 }).map((segs) => `/api/v1/${segs.join('/')}`)) }
	];

	const page = `/designs/${a.designId}/r/${a.label}`;
	const actions: FuzzTarget[] = [
		{ name: 'POST /signin', kind: 'action', requests: post('/signin', formBodies(['email', 'password', 'next']), anonymous) },
		{ name: 'POST /signup', kind: 'action', requests: post('/signup', formBodies(['displayName', 'email', 'password']).map((b) => (b.form?.email !== undefined ? { form: { ...b.form, email: `${b.form.email}@${ws.domain}` } } : b)), anonymous) },
		{ name: 'POST /reset', kind: 'action', requests: post('/reset', formBodies(['email']), anonymous) },
		{ name: 'POST /reset/[token]', kind: 'action', requests: fc.tuple(hostileSegment, formBodies(['password', 'confirm'])).map(([t, b]): FuzzRequest => ({ method: 'POST', path: `/reset/${t}`, caller: anonymous, ...b })) },
		{ name: 'POST /invites/[token]?/accept', kind: 'action', requests: fc.tuple(hostileSegment, formBodies([])).map(([t, b]): FuzzRequest => ({ method: 'POST', path: `/invites/${t}?/accept`, caller: editor, ...b })) },
		{ name: 'POST /teams?/create', kind: 'action', requests: post('/teams?/create', formBodies(['name']), editor) },
		{ name: 'POST /teams?/switch', kind: 'action', requests: post('/teams?/switch', formBodies(['teamId', 'next']), editor) },
		{ name: 'POST /teams/[teamId]?/rename', kind: 'action', requests: post(`/teams/${a.teamId}?/rename`, formBodies(['name']), owner) },
		{ name: 'POST /teams/[teamId]?/invite', kind: 'action', requests: post(`/teams/${a.teamId}?/invite`, formBodies(['email', 'role']).map((b) => (b.form ? { form: { ...b.form, email: `${b.form.email ?? ''}\u0000@` } } : b)), owner) },
		{ name: 'POST /teams/[teamId]?/withdraw', kind: 'action', requests: post(`/teams/${a.teamId}?/withdraw`, formBodies(['inviteId']), owner) },
		{ name: 'POST /teams/[teamId]?/role', kind: 'action', requests: post(`/teams/${a.teamId}?/role`, formBodies(['userId', 'role']), owner) },
		{ name: 'POST /teams/[teamId]?/remove', kind: 'action', requests: post(`/teams/${a.teamId}?/remove`, formBodies(['userId']), owner) },
		{ name: 'POST /designs?/create', kind: 'action', requests: post('/designs?/create', formBodies(['name', 'frequencyGHz', 'shape', 'laminateId', 'teamId'], {}).map((b) => (b.form ? { form: { teamId: a.teamId, ...b.form } } : b)), editor) },
		{ name: 'POST /designs/[designId]/edit?/save', kind: 'action', requests: post(`/designs/${a.designId}/edit?/save`, formBodies(designFormNames), editor) },
		{ name: 'POST /designs/[designId]/r/[label]/sweeps?/save', kind: 'action', requests: post(`${page}/sweeps?/save`, formBodies(sweepFormNames), editor) },
		{
			name: 'POST /designs/[designId]/r/[label]/measurements?/upload',
			kind: 'action',
			requests: fc
				.record({
					name: fc.oneof(hostileString, fc.constantFrom('a.s1p', 'b.s2p', 'c.ts', 'd.S1P', '.s1p')),
					text: fc.oneof(hostileString, fc.constantFrom('# Hz S RI R 50\n', '! only a comment\n', '# GHz S MA R 50\n2.4 0.5 -10\n2.3 0.5 -10\n', '# Hz S DB R 50\n1e9 NaN 0\n2e9 Infinity 0\n')),
					type: fc.constantFrom('application/octet-stream', 'text/plain', ''),
					withFile: fc.boolean()
				})
				.map(({ name, text, type, withFile }): FuzzRequest => ({
					method: 'POST',
					path: `${page}/measurements?/upload`,
					caller: editor,
					multipart: { fields: withFile ? {} : { file: text }, file: withFile ? { name, bytes: new TextEncoder().encode(text), type } : undefined }
				}))
		},
		{ name: 'POST /designs/[designId]/r/[label]/measurements?/retune', kind: 'action', requests: post(`${page}/measurements?/retune`, formBodies(['measurementId', 'holdWidth']), editor) },
		{ name: 'POST /designs/[designId]/r/[label]/measurements?/delete', kind: 'action', requests: post(`${page}/measurements?/delete`, formBodies(['measurementId', 'confirm']), editor) },
		{ name: 'POST /designs/[designId]/r/[label]?/startFieldCheck', kind: 'action', requests: post(`${page}?/startFieldCheck`, formBodies(['mode', 'kind']), editor) },
		{ name: 'POST /designs/[designId]/r/[label]?/cancelFieldCheck', kind: 'action', requests: post(`${page}?/cancelFieldCheck`, formBodies(['checkId']), editor) },
		{ name: 'POST /fab-profiles?/add', kind: 'action', requests: post('/fab-profiles?/add', formBodies(fabProfileFormNames).map((b) => (b.form ? { form: { teamId: a.teamId, ...b.form } } : b)), editor) },
		{ name: 'POST /confirm?/resend', kind: 'action', requests: post('/confirm?/resend', formBodies([]), editor) },
		{ name: 'POST /confirm/[token]', kind: 'action', requests: fc.tuple(hostileSegment, formBodies([])).map(([t, b]): FuzzRequest => ({ method: 'POST', path: `/confirm/${t}`, caller: anonymous, ...b })) },
		{ name: 'POST /laminates?/add', kind: 'action', requests: post('/laminates?/add', formBodies(laminateFormNames).map((b) => (b.form ? { form: { teamId: a.teamId, ...b.form } } : b)), editor) },
		{ name: 'POST /settings?/units', kind: 'action', requests: post('/settings?/units', formBodies(['length', 'copper']), editor) },
		{ name: 'POST /settings/tokens?/create', kind: 'action', requests: post('/settings/tokens?/create', formBodies(['name']), editor) },
		{ name: 'POST /settings/tokens?/revoke', kind: 'action', requests: post('/settings/tokens?/revoke', formBodies(['tokenId']), editor) }
	];
	return [...api, ...actions];
}
