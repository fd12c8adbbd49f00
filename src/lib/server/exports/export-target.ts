// What an export is made from: one revision with its design (and so its team); null when either is missing.
import { getDb } from '../db';
import type { Design, Revision } from '../designs/design-model';
import { findDesign, findRevision } from '../designs/find-designs';

export interface ExportTarget {
	design: Design;
	revision: Revision;
}

export async function loadExportTarget(designId: string, label: string): Promise<ExportTarget | null> {
	const design = await findDesign(getDb(), designId);
	if (!design) return null;
	const revision = await findRevision(getDb(), designId, label);
	return revision ? { design, revision } : null;
}
