// A new design: a slug unique in its team, and its first revision A, written together.
import { randomUUID } from 'node:crypto';
import type { Kysely } from 'kysely';
import { toDesignSlug } from '../../formats';
import { builtInFabProfileFor, copperLayerCountOf, parseRevisionNote } from '../../schemas';
import type { Database } from '../db/database';
import * as designQueries from '../db/design.queries';
import { toDesign, type Design } from './design-model';
import { revisionLabel } from './revision-label';
import { sizeInput } from './sized-input';

export interface CreateDesignOptions {
	teamId: string;
	userId: string;
	/** A design-input document; its name becomes the design's name. */
	raw: unknown;
	note?: string;
}

export interface CreatedDesign {
	design: Design;
	revisionLabel: string;
}

/** Throws InputError for bad input (nothing written). */
export async function createDesign(db: Kysely<Database>, opts: CreateDesignOptions): Promise<CreatedDesign> {
	const { input, sized } = sizeInput(opts.raw);
	const note = parseRevisionNote(opts.note);
	const base = toDesignSlug(input.name);
	// Two designs of one name made at once: the loser of the unique (team, slug) constraint tries the next number.
	for (let attempt = 0; ; attempt++) {
		try {
			return await db.transaction().execute(async (trx) => {
				const taken = new Set(await designQueries.listSlugsByTeamAndBase(trx, opts.teamId, base));
				let slug = base;
				for (let n = 2; taken.has(slug); n++) slug = `${base}-${n}`;
				const id = randomUUID();
				await designQueries.insertDesign(trx, { id, team_id: opts.teamId, slug, name: input.name, created_by: opts.userId });
				const label = revisionLabel(1);
				await designQueries.insertRevision(trx, {
					id: randomUUID(),
					design_id: id,
					label,
					seq: 1,
					parent_id: null,
					input: JSON.stringify(input),
					results: JSON.stringify(sized),
					note,
					created_by: opts.userId,
					// the built-in profile that can build the stack (a three-copper first revision needs the multilayer one)
					fab_profile: JSON.stringify(builtInFabProfileFor(copperLayerCountOf(input)))
				});
				const row = await designQueries.findDesignById(trx, id);
				return { design: toDesign(row!), revisionLabel: label };
			});
		} catch (err) {
			// Each round of a same-name race has one winner: enough rounds for a burst of parallel creations.
			if ((err as { code?: string }).code === '23505' && attempt < 40) continue;
			throw err;
		}
	}
}
