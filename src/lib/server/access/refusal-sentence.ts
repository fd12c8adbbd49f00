// The sentence a person reads when their role refuses an action: the trade's words, never our internal action names.
import type { TeamRole } from '../db/team.table';
import type { Action } from './can';

const who: Record<Action, string> = {
	'team.read': 'Only members of this team can see it.',
	'team.manage': 'Only owners can rename the team, invite people or change their roles.',
	'design.create': 'Only editors and owners can make designs.',
	'revision.create': 'Only editors and owners can make revisions.',
	'laminate.write': 'Only editors and owners can add laminates.',
	'fab-profile.write': 'Only editors and owners can add fab profiles.',
	'sweep.write': 'Only editors and owners can save sweep plans.',
	'measurement.upload': 'Only editors and owners can upload measurements.',
	'measurement.delete': 'Only editors and owners can delete measurements.',
	'field-check.start': 'Only editors and owners can start a field check or a Homing study.',
	'field-check.cancel': 'Only editors and owners can cancel a field check.',
	'export.download': 'Only members of this team can download its files.',
	'export.waive': 'Only editors and owners can record a waiver for design-rule findings.',
	'token.manage-own': 'Only members of this team can make API tokens for it.'
};

/** "You are a viewer in this team. Only editors and owners can make revisions." */
export function refusalSentence(role: TeamRole, action: Action): string {
	return `You are ${role === 'owner' ? 'an' : 'a'} ${role} in this team. ${who[action]}`;
}
