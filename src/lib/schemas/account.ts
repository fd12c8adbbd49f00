// Account and team forms: sign-up, sign-in, password reset, team name, invites, roles, API token names.
import { z } from 'zod';
import { plainText } from './plain-text';
import { DISPLAY_NAME_MAX_LENGTH, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH, TEAM_NAME_MAX_LENGTH, teamRoles, TOKEN_NAME_MAX_LENGTH } from './account-limits';
import { commonPasswordReason } from './common-password';

export * from './account-limits';

export const teamRoleSchema = z.enum(teamRoles, { message: 'role must be one of owner, editor, viewer' });

/** E-mail addresses are compared in lower case (the app_user table insists on it). */
export const emailSchema = z
	.string({ message: 'e-mail is required' })
	.trim()
	.toLowerCase()
	.max(254, { message: 'e-mail must be at most 254 characters' })
	.pipe(z.email({ message: 'e-mail must look like name@example.org' }));

/** A new password (sign-up, reset): long enough, and neither a common password nor an easily guessed pattern. */
export const passwordSchema = z
	.string({ message: 'password is required' })
	.min(PASSWORD_MIN_LENGTH, { message: `password must be at least ${PASSWORD_MIN_LENGTH} characters` })
	.max(PASSWORD_MAX_LENGTH, { message: `password must be at most ${PASSWORD_MAX_LENGTH} characters` })
	.superRefine((password, ctx) => {
		if (password.length < PASSWORD_MIN_LENGTH || password.length > PASSWORD_MAX_LENGTH) return;
		const reason = commonPasswordReason(password);
		if (reason) ctx.addIssue({ code: 'custom', message: reason });
	});

export const displayNameSchema = z
	.string({ message: 'name is required' })
	.trim()
	.min(1, { message: 'name must be 1 to 80 characters' })
	.max(DISPLAY_NAME_MAX_LENGTH, { message: 'name must be 1 to 80 characters' })
	.superRefine(plainText('name')); // names end up in e-mail subjects and headers

export const teamNameSchema = z
	.string({ message: 'team name is required' })
	.trim()
	.min(1, { message: `team name must be 1 to ${TEAM_NAME_MAX_LENGTH} characters` })
	.max(TEAM_NAME_MAX_LENGTH, { message: `team name must be 1 to ${TEAM_NAME_MAX_LENGTH} characters` })
	.superRefine(plainText('team name'));

export const tokenNameSchema = z
	.string({ message: 'token name is required' })
	.trim()
	.min(1, { message: `token name must be 1 to ${TOKEN_NAME_MAX_LENGTH} characters` })
	.max(TOKEN_NAME_MAX_LENGTH, { message: `token name must be 1 to ${TOKEN_NAME_MAX_LENGTH} characters` })
	.superRefine(plainText('token name'));

export const signUpSchema = z.object({ displayName: displayNameSchema, email: emailSchema, password: passwordSchema });
export type SignUpInput = z.infer<typeof signUpSchema>;

/** Sign-in checks only the shape; a wrong pair gets the one generic message, never a field hint. */
export const signInSchema = z.object({
	email: emailSchema,
	password: z.string({ message: 'password is required' }).min(1, { message: 'password is required' }).max(PASSWORD_MAX_LENGTH, { message: `password must be at most ${PASSWORD_MAX_LENGTH} characters` })
});
export type SignInInput = z.infer<typeof signInSchema>;

export const resetRequestSchema = z.object({ email: emailSchema });
export const resetCompleteSchema = z.object({ password: passwordSchema });

export const createTeamSchema = z.object({ name: teamNameSchema });
export const inviteSchema = z.object({ email: emailSchema, role: teamRoleSchema });
export type InviteInput = z.infer<typeof inviteSchema>;
export const changeRoleSchema = z.object({ userId: z.string().min(1, { message: 'member is required' }), role: teamRoleSchema });
export const memberRefSchema = z.object({ userId: z.string().min(1, { message: 'member is required' }) });
export const createTokenSchema = z.object({ name: tokenNameSchema });
