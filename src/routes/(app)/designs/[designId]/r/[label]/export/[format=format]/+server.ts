// Download from the app: one format or the bundle of any revision, old ones included; recorded with via 'ui'. Viewers may download.
import { redirect } from '@sveltejs/kit';
import { parseParams } from '$lib/server/api/parse-request';
import { downloadResponse, exportForRequest } from '$lib/server/exports';
import { withInputErrors } from '$lib/server/http/input-error-response';
import { exportParamsSchema } from '$lib/schemas/api';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = ({ locals, params, url }) =>
	withInputErrors(async () => {
		if (!locals.user) redirect(303, `/signin?next=${encodeURIComponent(url.pathname)}`);
		const { designId, label, format } = parseParams(exportParamsSchema, params);
		const delivered = await exportForRequest({ ...locals.identity, user: locals.user }, { designId, label, kind: format }, 'ui');
		return downloadResponse(delivered);
	});
