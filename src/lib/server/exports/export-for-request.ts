// The download routes' one call: find the revision, check the caller may download (and, with a waiver, waive) in its team, export and record it.
import { error } from '@sveltejs/kit';
import type { ExportKind } from '$lib/schemas/api';
import { authorize } from '../access';
import { roleInTeam } from '../access/team-role';
import type { RequestIdentity, RequestUser } from '../auth/request-identity';
import type { ExportVia } from '../db/export-record.table';
import type { ExportDependencies } from './export-dependencies';
import { exportRevision, type DeliveredExport } from './export-revision';
import { loadExportTarget } from './export-target';
import { asHttpRefusal } from './refusal-body';
import { parseWaiverReason } from './waiver-reason';

export interface ExportRequestOptions {
	/** The waiver reason as posted (unparsed); absent or null for a plain download. */
	waiver?: unknown;
	deps?: ExportDependencies;
}

/**
 * Throws SvelteKit HTTP errors: 404/403 for access, 422 with { message, profile, violations } when the
 * design breaks its profile without a waiver (see refusalOf), 500 with a support id when the files fail
 * their read-back; an InputError for a bad waiver reason.
 */
export async function exportForRequest(
	identity: RequestIdentity & { user: RequestUser },
	ref: { designId: string; label: string; kind: ExportKind },
	via: ExportVia,
	opts: ExportRequestOptions = {}
): Promise<DeliveredExport> {
	const target = await loadExportTarget(ref.designId, ref.label);
	const role = target ? await roleInTeam(identity, target.design.teamId) : null;
	// A design out of reach and a missing one answer alike (404), before anything about its revisions is said.
	authorize(role, 'export.download', 'Design or revision not found');
	if (!target) error(404, 'Design or revision not found');
	// Asking to waive is itself the act a viewer may not do (403), whether or not the design needs it.
	if (opts.waiver !== undefined && opts.waiver !== null) authorize(role, 'export.waive', 'Design or revision not found');
	const waiver = parseWaiverReason(opts.waiver);
	try {
		return await exportRevision(target, ref.kind, { userId: identity.user.id, via }, { waiver, deps: opts.deps });
	} catch (err) {
		throw asHttpRefusal(err);
	}
}
