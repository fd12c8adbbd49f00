// /api/v1 designs and revisions: read a design with its history, read one revision, save a new one from a parent.
import { error } from '@sveltejs/kit';
import { getDb } from '../db';
import type { Design } from '../designs/design-model';
import { findDesignWithRevisions, findRevision } from '../designs/find-designs';
import { saveRevision } from '../designs/save-revision';
import type { CreateRevisionBody } from '$lib/schemas/api';
import { toApiDesign, toApiRevision } from './api-views';
import { withInputPrefix } from './prefix-input-error';

export async function getDesignWithRevisions(design: Design) {
	const full = await findDesignWithRevisions(getDb(), design.id);
	if (!full) error(404, 'Design not found');
	return toApiDesign(full.design, full.revisions);
}

export async function getRevision(design: Design, label: string) {
	const revision = await findRevision(getDb(), design.id, label);
	if (!revision) error(404, `Revision ${label} not found`);
	return toApiRevision(design, revision);
}

export async function createRevision(design: Design, userId: string, body: CreateRevisionBody) {
	const saved = await withInputPrefix({ from: 'parent', note: 'note', designId: 'designId' }, () =>
		saveRevision(getDb(), { designId: design.id, parentLabel: body.parent, userId, raw: body.input, note: body.note })
	);
	return getRevision(design, saved.label);
}
