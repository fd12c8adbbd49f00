// The expected ways an account or team change is refused; routes turn each code into a form message.
export type AccountErrorCode =
	| 'wrong-credentials' // sign-in: the one generic answer for an unknown e-mail or a wrong password
	| 'email-taken' // sign-up with an e-mail that has an account
	| 'link-invalid' // a reset or invite link that is unknown, used or expired
	| 'last-owner' // the change would leave the team without an owner
	| 'not-member' // the person named is not a member of this team
	| 'not-found' // the invitation or token named does not exist (for this team or person)
	| 'limit-reached' // a per-person limit (teams, live API tokens) is used up
	| 'too-many' // an hourly allowance (invitations, confirmation mails) is used up: try again later
	| 'email-unconfirmed' // the caller's own address is not confirmed yet (the page offers to send the link again)
	| 'invitee-unconfirmed'; // the person invited as owner has an account whose address is not confirmed

export class AccountError extends Error {
	readonly name = 'AccountError';
	constructor(
		readonly code: AccountErrorCode,
		message: string
	) {
		super(message);
	}
}

export const WRONG_CREDENTIALS_MESSAGE = 'E-mail or password is wrong';
