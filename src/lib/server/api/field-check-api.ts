// /api/v1 field checks: start one on a revision, list a revision's, read one (status, progress, result), cancel one.
import { json } from '@sveltejs/kit';
import type { StartFieldCheckBody } from '$lib/schemas/api';
import type { RequestIdentity, RequestUser } from '../auth/request-identity';
import { getDb } from '../db';
import { cancelFieldCheck, listFieldChecks, requireFieldCheck, startFieldCheck } from '../field-checks';
import { fieldCheckStatusUrl, toApiFieldCheckStatus, toApiFieldCheckSummary, type ApiFieldCheckStatus, type ApiFieldCheckSummary } from '../field-checks/field-check-view';
import { requireRevision } from '../measurements/revision-access';
import { problem } from './api-handler';

export { fieldCheckStatusUrl, toApiFieldCheckStatus, toApiFieldCheckSummary, type ApiFieldCheckStatus, type ApiFieldCheckSummary } from '../field-checks/field-check-view';

/** 202 with the new check and where to follow it. */
export async function startRevisionFieldCheck(identity: RequestIdentity & { user: RequestUser }, designId: string, label: string, body: StartFieldCheckBody): Promise<Response> {
	const { design, revision } = await requireRevision(identity, designId, label, 'field-check.start');
	const { id } = await startFieldCheck(getDb(), { design, revision, userId: identity.user.id, kind: body.homing ? 'homing' : 'check', mode: body.mode });
	const { check } = await requireFieldCheck(identity, id, 'team.read');
	return json(toApiFieldCheckStatus(check), { status: 202, headers: { location: fieldCheckStatusUrl(id) } });
}

export async function listRevisionFieldChecks(identity: RequestIdentity, designId: string, label: string): Promise<{ items: ApiFieldCheckSummary[] }> {
	const { revision } = await requireRevision(identity, designId, label, 'team.read');
	return { items: (await listFieldChecks(getDb(), revision.id)).map(toApiFieldCheckSummary) };
}

export async function getFieldCheckStatus(identity: RequestIdentity, id: string): Promise<ApiFieldCheckStatus> {
	const { check } = await requireFieldCheck(identity, id, 'team.read');
	return toApiFieldCheckStatus(check);
}

/** 200 when it ended at once (it was queued), 202 while its worker stops the engine, 409 when it had already ended. */
export async function cancelFieldCheckForRequest(identity: RequestIdentity & { user: RequestUser }, id: string): Promise<Response> {
	const { check } = await requireFieldCheck(identity, id, 'field-check.cancel');
	const outcome = await cancelFieldCheck(getDb(), id, identity.user.displayName);
	if (outcome === 'already-final') return problem(409, `This field check has already ${check.state === 'succeeded' ? 'succeeded' : 'ended'}; there is nothing to cancel`);
	const { check: now } = await requireFieldCheck(identity, id, 'team.read');
	return json(toApiFieldCheckStatus(now), { status: outcome === 'cancelled' ? 200 : 202 });
}
