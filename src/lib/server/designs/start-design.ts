// The "new design" form: a name, a frequency, a shape and a laminate become a full first revision.
import type { Kysely } from 'kysely';
import { z } from 'zod';
import { defaultFeedFor, designNameSchema, patchShapes } from '../../schemas';
import { InputError, parseWith } from '../../schemas/input-error';
import { laminateAsOrdered } from '../../design/ordered-laminate';
import { hzFromGhz } from '../../units';
import type { Database } from '../db/database';
import { createDesign, type CreatedDesign } from './create-design';
import { listLaminates } from './laminates';

export const startDesignSchema = z.strictObject({
	name: designNameSchema,
	frequencyGHz: z.coerce.number({ error: 'must be a number in GHz; allowed range [0.1, 100]' }).gte(0.1, { error: 'allowed range [0.1, 100] GHz' }).lte(100, { error: 'allowed range [0.1, 100] GHz' }),
	shape: z.enum(patchShapes, { error: `one of: ${patchShapes.join(', ')}` }),
	laminateId: z.string().min(1, { error: 'choose a laminate' })
});

/** Throws InputError (paths name the form's own fields) for bad input; nothing is written then. */
export async function startDesign(db: Kysely<Database>, opts: { teamId: string; userId: string; raw: Record<string, unknown> }): Promise<CreatedDesign> {
	const form = parseWith(startDesignSchema, opts.raw);
	const laminate = (await listLaminates(db, opts.teamId)).find((l) => l.id === form.laminateId);
	if (!laminate) throw new InputError([{ path: 'laminateId', value: form.laminateId, message: 'not in this team’s laminate library' }]);
	const raw = {
		name: form.name,
		frequencyHz: hzFromGhz(form.frequencyGHz),
		shape: form.shape,
		feed: defaultFeedFor(form.shape),
		// a new design starts with mask layers (the patch left bare under an opening) and a top legend; a document
		// without these keys (the API, the CLI, a stored revision) keeps its own meaning: no mask, no legend
		solderMask: true,
		maskCoverage: 'exposed',
		legend: {},
		substrate: { ...laminate.properties },
		// named, so the fab notes order this laminate by name with its stated values
		laminate: laminateAsOrdered(laminate.name, laminate.properties)
	};
	try {
		return await createDesign(db, { teamId: opts.teamId, userId: opts.userId, raw, note: `Started on ${laminate.name}` });
	} catch (err) {
		// Report document paths under the form's names where there is one.
		if (err instanceof InputError) throw new InputError(err.issues.map((i) => (i.path === 'frequencyHz' ? { ...i, path: 'frequencyGHz' } : i.path.startsWith('substrate.') ? { ...i, path: 'laminateId', message: `${i.path}: ${i.message}` } : i)));
		throw err;
	}
}
