// Accounts and teams: sign-up, sign-in, sessions, password reset, teams, members, invitations, API tokens.
export { AccountError, WRONG_CREDENTIALS_MESSAGE, type AccountErrorCode } from './account-error';
export { signUp, type AccountUser } from './sign-up';
export { checkCredentials } from './sign-in';
export { startSession, endSession, type SessionCookie } from './sessions';
export { requestPasswordReset, findPasswordResetLink, completePasswordReset, RESET_LINK_LIFETIME_MS, type CompletedReset } from './password-reset';
export { createTeam, renameTeam, findTeam } from './teams';
export { listTeamMembers, changeMemberRole, removeMember, type TeamMember } from './members';
export { inviteToTeam, listPendingInvites, withdrawInvite, describeInvite, acceptInvite, INVITE_LIFETIME_MS, type InviteDescription, type PendingInvite } from './invites';
export { createApiToken, listApiTokens, findOwnApiTokenTeam, revokeApiToken, type ApiTokenSummary } from './api-tokens';
export { safeNextPath, requireUser, requireSessionUser, DEFAULT_NEXT_PATH } from './request-user';
export { formFailure, formFields, withoutSecrets, type FormProblem } from './form-failure';
export { runTeamChange, teamChangeForms, type TeamChangeForm, type TeamChangeDone } from './team-changes';
export { takeSignInAttempt, settleSuccessfulSignIn, clearSignInFailures, takeResetMailAllowance, takeInviteAllowance, THROTTLE_LIMITS, type Throttle } from './attempt-throttle';
export { registerAccount, confirmEmail, resendEmailConfirmation, isEmailConfirmed, CONFIRM_LINK_LIFETIME_MS, type Registration } from './email-confirmation';
export { findDisplayUnits, setDisplayUnits } from './display-units';
