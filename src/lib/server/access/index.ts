// Access decisions and the errors that carry them to HTTP.
import { error } from '@sveltejs/kit';
import type { TeamRole } from '../db/team.table';
import { can, type Action } from './can';
import { refusalSentence } from './refusal-sentence';

export { refusalSentence } from './refusal-sentence';
export { can, actions, canAsAccount, confirmedEmailSteps, CONFIRM_EMAIL_FIRST, type Action, type AccountState, type ConfirmedEmailStep } from './can';

/**
 * Throws unless `role` may do `action`. A non-member gets 404 (no existence leak);
 * a member without the right gets 403.
 */
export function authorize(role: TeamRole | null | undefined, action: Action, what = 'Not found'): void {
	if (!role) error(404, what);
	if (!can(role, action)) error(403, refusalSentence(role, action));
}
