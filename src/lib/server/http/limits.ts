// The limits of the workspace in one place, each with the sentence a refused request gets.
// Body and upload sizes are enforced where the bytes are read (adapter-node's BODY_SIZE_LIMIT=6M,
// parse-request.ts for JSON, measurements/read-upload.ts for Touchstone files, form-body-guard.ts for the
// fields and bytes of a form before anything parses it); the per-person counts
// are enforced by the accounts services.
export const LIMITS = {
	/** adapter-node refuses larger bodies with 413 (set by npm start, the bench and the e2e config). */
	bodyBytes: 6 * 1024 * 1024,
	/** Fields of one form post (parsing costs time per field: 1.4 M fields once blocked the server for seconds). */
	formFields: 1000,
	/** A form post that is not multipart (no file in it): url-encoded or text/plain. */
	formBytes: 1024 * 1024,
	/** A Touchstone upload. */
	uploadBytes: 5 * 1024 * 1024,
	/** Points of one sweep plan. */
	sweepPoints: 10_000,
	/** Teams one person may belong to when creating another. */
	teamsPerPerson: 20,
	/** API tokens one person may have live at once. */
	liveTokensPerPerson: 20
} as const;

export const formFieldsMessage = `The form has more than ${LIMITS.formFields} fields, the most a form may have`;
export const formBytesMessage = `The form is larger than ${LIMITS.formBytes / 1024 / 1024} MB, the most a form without a file may be`;
export const bodyBytesMessage = `The request body is larger than the limit (${LIMITS.bodyBytes / 1024 / 1024} MB)`;

export const teamLimitMessage = `You belong to ${LIMITS.teamsPerPerson} teams already, the most one person may have; leave one before making another.`;
export const tokenLimitMessage = `You have ${LIMITS.liveTokensPerPerson} live API tokens already, the most one person may have; revoke one before making another.`;
