// Refusals of a form action: bad input → 400 with issues per field; an expected refusal → its status and message.
import { InputError } from '$lib/schemas/input-error';
import { formFail, type FieldError, type FormFailure } from '../http/form-failure';
import { AccountError, type AccountErrorCode } from './account-error';
import { MailDeliveryError } from '../mail';

const statusOf: Record<AccountErrorCode, number> = {
	'wrong-credentials': 400,
	'email-taken': 409,
	'link-invalid': 410,
	'last-owner': 409,
	'not-member': 404,
	'not-found': 404,
	'limit-reached': 409,
	'too-many': 429,
	'email-unconfirmed': 403,
	'invitee-unconfirmed': 409
};

/** An account form's failure: the one form-failure shape, with the refusal's code when it was an expected one (pages offer a way out for some). */
export type FormProblem = FormFailure<Record<string, string>, { code?: AccountErrorCode }>;

/** Turns an expected error into `fail(...)` of the one shape; anything else is rethrown (→ handleError). */
export function formFailure(err: unknown, action: string, values: Record<string, string> = {}) {
	const problem = (status: number, message: string, fieldErrors: FieldError[] = [], code?: AccountErrorCode) =>
		formFail<Record<string, string>, { code?: AccountErrorCode }>(status, { action, message, fieldErrors, values, detail: code ? { code } : {} });
	if (err instanceof InputError) {
		// the first issue of each field
		const fieldErrors: FieldError[] = [];
		for (const i of err.issues) if (!fieldErrors.some((e) => e.field === (i.path || 'form'))) fieldErrors.push({ field: i.path || 'form', message: i.message });
		return problem(400, 'Please correct the marked fields.', fieldErrors);
	}
	if (err instanceof AccountError) return problem(statusOf[err.code], err.message, [], err.code);
	if (err instanceof MailDeliveryError) {
		console.error(err.message);
		return problem(503, 'The e-mail could not be sent just now; please try again in a minute.');
	}
	throw err;
}

/** The string fields of a submitted form (files and repeated keys are ignored); never echoes passwords. */
export async function formFields(request: Request): Promise<Record<string, string>> {
	const data = await request.formData();
	const out: Record<string, string> = {};
	for (const [key, value] of data) if (typeof value === 'string' && !(key in out)) out[key] = value;
	return out;
}

export function withoutSecrets(values: Record<string, string>): Record<string, string> {
	const { password: _password, ...rest } = values;
	return rest;
}
