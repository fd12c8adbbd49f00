// The download routes' one call: find the revision, check the caller may download from its team, export and record it.
import { error } from '@sveltejs/kit';
import type { ExportKind } from '$lib/schemas/api';
import { authorize } from '../access';
import { roleInTeam } from '../access/team-role';
import type { RequestIdentity, RequestUser } from '../auth/request-identity';
import type { ExportVia } from '../db/export-record.table';
import { exportRevision, type DeliveredExport } from './export-revision';
import { loadExportTarget } from './export-target';

export async function exportForRequest(identity: RequestIdentity & { user: RequestUser }, ref: { designId: string; label: string; kind: ExportKind }, via: ExportVia): Promise<DeliveredExport> {
	const target = await loadExportTarget(ref.designId, ref.label);
	// A design out of reach and a missing one answer alike (404), before anything about its revisions is said.
	authorize(target ? await roleInTeam(identity, target.design.teamId) : null, 'export.download', 'Design or revision not found');
	if (!target) error(404, 'Design or revision not found');
	return exportRevision(target, ref.kind, { userId: identity.user.id, via });
}
