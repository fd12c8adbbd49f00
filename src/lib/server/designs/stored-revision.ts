// JSON read back from a revision row is parsed through the one schema of its concept, never cast: a stored revision
// that no longer parses is a clear error naming the revision and the first field that fails.
import type { z } from 'zod';
import type { SizedDesign } from '../../rf';
import { designInputSchema, type DesignInput } from '../../schemas';
import { replaceControlCharacters } from '../../schemas/plain-text';
import { sizedDesignSchema } from '../../schemas/sized-design';

/**
 * The parse-time upgrade of what older rules let in: a design name stored before control characters were
 * refused has them replaced as the writers already replace them, so the revision parses and exports as before.
 */
function upgradeStoredInput(raw: unknown): unknown {
	if (!raw || typeof raw !== 'object' || Array.isArray(raw)) return raw;
	const name = (raw as { name?: unknown }).name;
	return typeof name === 'string' ? { ...raw, name: replaceControlCharacters(name) } : raw;
}

export class StoredRevisionError extends Error {
	constructor(
		readonly revisionId: string,
		readonly label: string,
		readonly column: 'input' | 'results',
		issue: z.core.$ZodIssue | undefined
	) {
		super(`Stored revision ${label} (${revisionId}) no longer parses: ${column}${issue?.path.length ? `.${issue.path.join('.')}` : ''}: ${issue?.message ?? 'invalid'}`);
		this.name = 'StoredRevisionError';
	}
}

export function parseStoredInput(raw: unknown, revision: { id: string; label: string }): DesignInput {
	const parsed = designInputSchema.safeParse(upgradeStoredInput(raw));
	if (!parsed.success) throw new StoredRevisionError(revision.id, revision.label, 'input', parsed.error.issues[0]);
	return parsed.data;
}

/**
 * The sized design a revision stored. The schema checks every field the writers and pages rely on and keeps
 * the rest as stored (a revision holds whatever its sizing engine wrote), so the value is the stored one.
 */
export function parseStoredResults(raw: unknown, revision: { id: string; label: string }): SizedDesign {
	const upgraded = raw && typeof raw === 'object' && 'input' in raw ? { ...raw, input: upgradeStoredInput(raw.input) } : raw;
	const parsed = sizedDesignSchema.safeParse(upgraded);
	if (!parsed.success) throw new StoredRevisionError(revision.id, revision.label, 'results', parsed.error.issues[0]);
	// checked above; the stored object itself is returned (upgraded name aside) so no other field or value is re-shaped
	return upgraded as SizedDesign;
}
